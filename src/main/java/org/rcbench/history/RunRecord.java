package org.rcbench.history;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;
import java.util.Objects;
import org.rcbench.history.CheckContent.FrequencyPoint;
import org.rcbench.history.CheckContent.PeriodHistogram;

/**
 * One stored check: its context, the rows read from its check document, and the document itself.
 *
 * @param id       the run's number in the history, or 0 before it is saved
 * @param context  board, serial, design, probe, capture, note, time
 * @param content  verdict, measurements, prediction, checks, estimates, suspects, plots
 * @param document the whole check document as given (a private copy)
 */
public record RunRecord(long id, RunContext context, CheckContent content, JsonNode document) {
    public RunRecord {
        if (id < 0) {
            throw new IllegalArgumentException("id < 0: " + id);
        }
        Objects.requireNonNull(context, "context");
        Objects.requireNonNull(content, "content");
        document = document.deepCopy();
    }

    /**
     * A run to save from a check document ({@code rcbench check --json}) and its context. A part
     * tolerance the document does not state is taken from the context's design text.
     *
     * @throws org.rcbench.common.BadInputException when the document has no verdict or a known key
     *                                              has the wrong shape (see {@link CheckDocument})
     */
    public static RunRecord of(JsonNode checkDocument, RunContext context) {
        CheckContent content = DesignTolerances.fill(CheckDocument.parse(checkDocument), context.design());
        return new RunRecord(0, context, content, checkDocument);
    }

    @Override
    public JsonNode document() {
        return document.deepCopy();
    }

    /** This run with plot data the check document did not carry (kept compact, see {@link CheckDocument}). */
    public RunRecord withPlots(PeriodHistogram histogram, List<FrequencyPoint> trend) {
        PeriodHistogram h = histogram == null ? null : CheckDocument.compact(histogram);
        return new RunRecord(id, context, content.withPlots(h, CheckDocument.decimate(trend)), document);
    }

    RunRecord withId(long newId) {
        return new RunRecord(newId, context, content, document);
    }
}
