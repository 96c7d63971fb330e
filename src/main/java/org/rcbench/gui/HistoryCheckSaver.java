package org.rcbench.gui;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Locale;
import org.rcbench.common.BadInputException;
import org.rcbench.design.DesignText;
import org.rcbench.diagnose.CheckResult;
import org.rcbench.diagnose.Checker;
import org.rcbench.diagnose.PeriodHistogram;
import org.rcbench.edge.Timebase;
import org.rcbench.history.CaptureRef;
import org.rcbench.history.DesignRef;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.ProbeInfo;
import org.rcbench.history.RunContext;
import org.rcbench.history.RunRecord;
import org.rcbench.json.CheckJson;

/**
 * Saves the window's check the way {@code rcbench check --save} does: the diagnosis stage's
 * {@link Checker} (its default prediction) over the whole-run measurement, the period histogram of
 * the newest cycles and the frequency trend, as a check document in the history database. The
 * design is stored as the window holds it, edits included. Thread-safe; runs on the worker.
 */
public final class HistoryCheckSaver implements CheckSaver {
    private final Path database;

    /** @param database the history file, e.g. {@link org.rcbench.history.DataFolder#defaultDatabase()} */
    public HistoryCheckSaver(Path database) {
        this.database = database;
    }

    @Override
    public String save(Request r) {
        LiveFrame f = r.frame();
        long[] periods = new long[f.recentCount()];
        for (int i = 0; i < periods.length; i++) {
            periods[i] = f.highTicks()[i] + f.lowTicks()[i];
        }
        CheckResult result = Checker.of(r.design()).check(f.measurement(), null,
                PeriodHistogram.of(periods, periods.length, f.timebase()), f.trend());
        Path source = Path.of(r.design().source());
        String name = source.getFileName() == null ? r.design().source() : source.getFileName().toString();
        Timebase tb = f.timebase();
        ProbeInfo probe = new ProbeInfo(r.probeId().isEmpty() ? null : r.probeId(), null, tb.offsetPpm(),
                tb.tolerancePpm(), "as the source stated it when the check was saved");
        CaptureRef capture;
        try {
            capture = r.capture() == null ? null : CaptureRef.of(r.capture());
        } catch (IOException e) {
            throw new BadInputException(r.capture().toString(), "cannot read the recording: " + e.getMessage(), e);
        }
        RunContext context = new RunContext(r.design().title(), null,
                DesignRef.of(name, DesignText.toToml(r.design())), probe, capture, null, Instant.now());
        RunRecord run = RunRecord.of(CheckJson.of(result), context);
        try (HistoryStore store = HistoryStore.open(database)) {
            long id = store.saveRun(run);
            return String.format(Locale.ROOT, "check saved as run %d in %s: %s", id, store.name(),
                    result.verdict().fileName());
        }
    }
}
