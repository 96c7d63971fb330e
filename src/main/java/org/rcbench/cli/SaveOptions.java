package org.rcbench.cli;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Map;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.Timebase;
import org.rcbench.history.CaptureRef;
import org.rcbench.history.DesignRef;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.ProbeInfo;
import org.rcbench.history.RunContext;
import org.rcbench.history.RunRecord;
import org.rcbench.report.CapturePlots;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * The options {@code rcbench check} takes to store its result ({@code --save}, {@code --serial},
 * {@code --note}, {@code --board}, {@code --db}, {@code --db-wait}) and the saving itself. Mix it in
 * with {@code @Mixin SaveOptions save;}, call {@link #validate()} before the work and
 * {@link #save} with the check's JSON document after it.
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

    /** What the check command knows about the run besides its JSON document. */
    public record Request(String boardName, Path designFile, Path captureFile, int channel, ProbeInfo probe) {
    }

    /** Whether {@code --save} was given. */
    public boolean requested() {
        return save;
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
     * Stores the check: context from {@code request} and these options, plot data from the document
     * or, when it has none, from the capture's raw cycles. Prints {@code rcbench: saved as run N in
     * PATH} on {@code err}.
     *
     * @return the new run's id
     */
    public long save(JsonNode checkDocument, Request request, PrintWriter err) throws IOException {
        String name = board != null ? board : request.boardName();
        if (name == null || name.isBlank()) {
            String file = request.designFile().getFileName().toString();
            name = file.contains(".") ? file.substring(0, file.lastIndexOf('.')) : file;
        }
        DesignRef design = DesignRef.of(request.designFile().getFileName().toString(), readText(request.designFile()));
        RunContext context = new RunContext(name, serial, design, request.probe(),
                request.captureFile() == null ? null : CaptureRef.of(request.captureFile()), note, Instant.now());
        RunRecord run = RunRecord.of(checkDocument, context);
        if (request.captureFile() != null && run.content().histogram() == null && run.content().trend().isEmpty()) {
            try (Capture c = CaptureFiles.open(request.captureFile())) {
                CapturePlots plots = CapturePlots.of(c, request.channel());
                run = run.withPlots(plots.histogram(), plots.trend());
            }
        }
        try (HistoryStore store = database.open(err)) {
            long id = store.saveRun(run);
            err.println("rcbench: saved as run " + id + " in " + store.name());
            err.flush();
            return id;
        }
    }

    /**
     * The probe of {@code capture} (its header's {@code probe} and {@code firmware}) with the clock
     * calibration actually applied ({@code applied}) and where that came from.
     */
    public static ProbeInfo probeOf(Capture capture, Timebase applied, String calibrationSource) {
        Map<String, String> h = capture.header();
        return new ProbeInfo(h.get(EdgeCaptureFormat.PROBE), h.get("firmware"), applied.offsetPpm(),
                applied.tolerancePpm(), calibrationSource);
    }

    private static String readText(Path file) throws IOException {
        try {
            return Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new BadInputException(file.toString(), "no such file", e);
        }
    }
}
