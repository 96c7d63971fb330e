package org.rcbench.cli;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Map;
import org.rcbench.capture.Capture;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.Timebase;
import org.rcbench.history.CaptureRef;
import org.rcbench.history.DesignRef;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.ProbeInfo;
import org.rcbench.history.RunContext;
import org.rcbench.history.RunRecord;
import org.rcbench.protocol.Hello;
import org.rcbench.source.StreamStart;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The options {@code rcbench check} takes to store its result ({@code --save}, {@code --serial},
 * {@code --note}, {@code --board}, {@code --db}, {@code --db-wait}) and the saving itself. Mix it in
 * with {@code @Mixin SaveOptions save;}, call {@link #validate()} before the work and
 * {@link #save} with the check's JSON document after it. The run stores the document's own plot
 * data ({@code histogram}, {@code trend}: what the check computed), nothing recomputed.
 */
public final class SaveOptions {
    @Option(names = "--save", description = "Store this check in the history (see rcbench history, rcbench report).")
    boolean save;

    @Option(names = "--serial", paramLabel = "SN", description = "Serial number of the unit, stored with --save.")
    String serial;

    @Option(names = "--note", paramLabel = "TEXT", description = "Operator's note, stored with --save.")
    String note;

    @Option(names = "--board", paramLabel = "NAME", description = "Board name to store (default: the design's name).")
    String board;

    @Mixin
    DatabaseOption database;

    /**
     * What the check command knows about the run besides its JSON document.
     *
     * @param boardName   the design's board name, or null (then the design file's name)
     * @param design      the design checked against, name and text
     * @param captureFile the capture file, or null for a live source
     * @param probe       the probe and the clock calibration applied
     */
    public record Request(String boardName, DesignRef design, Path captureFile, ProbeInfo probe) {
    }

    /** Whether {@code --save} was given. */
    public boolean requested() {
        return save;
    }

    /** The history {@code --db} names (also where live sources find probe calibrations). */
    public DatabaseOption database() {
        return database;
    }

    /**
     * Refuses {@code --serial}, {@code --note} or {@code --board} without {@code --save}, so a note is
     * never silently dropped.
     */
    public void validate() {
        if (!save) {
            for (String[] o : new String[][] {{"--serial", serial}, {"--note", note}, {"--board", board}}) {
                if (o[1] != null) {
                    throw new BadInputException(o[0], "is stored only with --save");
                }
            }
        }
    }

    /**
     * Stores the check: context from {@code request} and these options. Prints {@code rcbench: saved
     * as run N in PATH} on {@code err}.
     *
     * @return the new run's id
     */
    public long save(JsonNode checkDocument, Request request, PrintWriter err) throws IOException {
        String name = board != null ? board : request.boardName();
        if (name == null || name.isBlank()) {
            String file = Path.of(request.design().name()).getFileName().toString();
            name = file.contains(".") ? file.substring(0, file.lastIndexOf('.')) : file;
        }
        RunContext context = new RunContext(name, serial, request.design(), request.probe(),
                request.captureFile() == null ? null : CaptureRef.of(request.captureFile()), note, Instant.now());
        RunRecord run = RunRecord.of(checkDocument, context);
        try (HistoryStore store = database.open(err)) {
            long id = store.saveRun(run);
            err.println("rcbench: saved as run " + id + " in " + store.name());
            err.flush();
            return id;
        }
    }

    /**
     * The probe of {@code capture} (its header's {@code probe_id}, else {@code probe}, and
     * {@code firmware}) with the clock calibration actually applied ({@code applied}) and where that
     * came from.
     */
    public static ProbeInfo probeOf(Capture capture, Timebase applied, String calibrationSource) {
        Map<String, String> h = capture.header();
        return new ProbeInfo(h.getOrDefault("probe_id", h.get(EdgeCaptureFormat.PROBE)), h.get("firmware"),
                applied.offsetPpm(), applied.tolerancePpm(), calibrationSource);
    }

    /**
     * The probe of a live stream (its hello's id and firmware version) with the clock calibration
     * applied ({@code applied}) and where that came from.
     */
    public static ProbeInfo probeOf(StreamStart start, Timebase applied, String calibrationSource) {
        Hello hello = start.hello();
        return new ProbeInfo(hello == null ? start.source() : hello.probeIdHex(),
                hello == null ? null : hello.firmwareVersion(), applied.offsetPpm(), applied.tolerancePpm(),
                calibrationSource);
    }
}
