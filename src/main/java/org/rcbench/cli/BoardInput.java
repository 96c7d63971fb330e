package org.rcbench.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.history.DesignRef;
import org.rcbench.history.ProbeInfo;
import org.rcbench.probe.SessionState;
import org.rcbench.probe.SessionStatus;
import org.rcbench.sim.Deviation;
import org.rcbench.source.DemoDesigns;
import org.rcbench.source.DurationGate;
import org.rcbench.source.LiveSource;
import org.rcbench.source.SourceSpec;
import org.rcbench.source.StreamStart;
import org.rcbench.units.SiFormat;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * Where {@code check} and {@code tune} get the board from, as a picocli mixin: either a capture
 * file ({@code CAPTURE}) or a live source ({@link SourceOptions}: {@code --port}, {@code --sim})
 * measured for {@code --duration} of probe time; the design ({@code --design}, or the simulated
 * board's own); and the {@link CaptureOptions}. Call {@link #validate()} first, then
 * {@link #design()} and {@link #read}.
 *
 * <p>A live source is measured with the same meters as a file ({@link CaptureMeasurement.Meters});
 * a simulated board runs as fast as it can be read unless {@code --sim-speed realtime} is given.
 */
final class BoardInput {
    /** Default live measurement: this much probe time ... */
    static final double DEFAULT_SECONDS = 5;
    /** ... or this many nominal periods of a slow board ... */
    static final int DEFAULT_PERIODS = 200;
    /** ... or, for a monostable, this many trigger intervals. */
    static final int DEFAULT_TRIGGERS = 3;
    /** How long to wait for the end of a live stream once it has been closed. */
    private static final long END_WAIT_MILLIS = 5000;

    @Parameters(index = "0", arity = "0..1", paramLabel = "CAPTURE",
            description = "Capture file of the board's output (or measure it live with --port or --sim).")
    Path file;

    @Option(names = "--design", paramLabel = "DESIGN",
            description = "The board's design: a file (TOML) or demo:NAME (default: with --sim, the simulated board's"
                + " own design).")
    String design;

    @Option(names = "--duration", paramLabel = "TIME", converter = ValueConverters.Time.class,
            description = "Live: probe time to measure (default: 5 s, or 200 periods of a slower board; a monostable:"
                + " three trigger intervals).")
    Double duration;

    @Mixin
    CaptureOptions capture;

    @Mixin
    SourceOptions source;

    private Design resolved;

    /**
     * What was read.
     *
     * @param measurement the meters after the whole capture or live span
     * @param source      the source in words: {@code capture FILE}, or the live source with its simulated faults
     * @param captureFile the capture file, or null for a live source
     * @param probe       the probe and the clock calibration applied
     */
    record Reading(CaptureMeasurement measurement, String source, Path captureFile, ProbeInfo probe) {
    }

    /** Refuses a bad combination of a capture file, live source options, {@code --duration} and {@code --design}. */
    void validate() {
        List<String> live = source.given();
        if (file != null) {
            if (!live.isEmpty()) {
                throw new BadInputException("CAPTURE", "give a capture file or a live source, not both (also given: "
                        + String.join(", ", live) + ")");
            }
            if (duration != null) {
                throw new BadInputException("--duration", "only for a live source (--port, --sim); a capture file is"
                        + " read whole");
            }
            if (design == null) {
                throw new BadInputException("--design", "needed with a capture file: the board's design file or demo:NAME");
            }
            return;
        }
        if (source.replay != null) {
            throw new BadInputException("--replay", "give the capture file as CAPTURE instead (e.g. rcbench check"
                    + " FILE --design DESIGN)");
        }
        if (source.port == null && source.sim == null) {
            throw new BadInputException("CAPTURE", "missing: give a capture file, or a live source (--port PORT or"
                    + " --sim DESIGN)");
        }
        if (design == null && source.port != null) {
            throw new BadInputException("--design", "needed with --port: the board's design file or demo:NAME");
        }
        if (design == null && source.sim.startsWith("reference:")) {
            throw new BadInputException("--design", "needed: a simulated reference signal has no design of its own");
        }
        source.preferFast();
    }

    /** Whether the board is measured live. */
    boolean live() {
        return file == null;
    }

    /** The design: {@code --design}, else the simulated board's. */
    Design design() {
        if (resolved == null) {
            resolved = DemoDesigns.resolve(designSpec());
        }
        return resolved;
    }

    /** The design with its whole text, for storing with a run. */
    DesignRef designRef() {
        String spec = designSpec();
        String name = spec.startsWith(DemoDesigns.PREFIX) ? spec : String.valueOf(Path.of(spec).getFileName());
        return DesignRef.of(name, DemoDesigns.text(spec));
    }

    private String designSpec() {
        return design != null ? design : source.sim;
    }

    /**
     * Reads the board: the capture file whole, or the live source for the duration. Capture
     * warnings and live progress go to {@code err}; the probe calibrations come from {@code db}.
     */
    Reading read(PrintWriter err, DatabaseOption db) throws IOException, InterruptedException {
        return file != null ? readFile(err) : readLive(err, db);
    }

    private Reading readFile(PrintWriter err) throws IOException {
        try (Capture c = CaptureFiles.open(file)) {
            Timebase tb = capture.timebase(c);
            CaptureMeasurement.Meters meters = new CaptureMeasurement.Meters(capture, Channels.of(c), tb, monostable());
            c.streamTo(meters);
            CaptureOptions.warn(c, err);
            String calibration = capture.overridesClock() ? "given on the command line"
                    : c.header().containsKey(EdgeCaptureFormat.CALIBRATION_U_PPM) ? "capture header" : "not calibrated";
            return new Reading(meters.measurement(), "capture " + file, file, SaveOptions.probeOf(c, tb, calibration));
        }
    }

    private Reading readLive(PrintWriter err, DatabaseOption db) throws InterruptedException {
        SourceSpec spec = source.sourceSpec();
        LiveSource src = source.open(err, db.calibrations(), spec);
        double seconds = duration != null ? duration : defaultSeconds(src);
        DurationGate gate = new DurationGate(seconds);
        AtomicReference<CaptureMeasurement.Meters> meters = new AtomicReference<>();
        AtomicReference<Timebase> applied = new AtomicReference<>();
        AtomicReference<RuntimeException> refused = new AtomicReference<>();
        try (ShutdownGuard guard = new ShutdownGuard(src::close)) {
            src.start(start -> {
                try {
                    Timebase tb = capture.timebase(start.timebase(), true);
                    CaptureMeasurement.Meters m = new CaptureMeasurement.Meters(capture, Channels.of(start), tb,
                            monostable());
                    applied.set(tb);
                    meters.set(m);
                    return gate.wrap(m, tb.ticksPerSecond());
                } catch (RuntimeException e) { // a channel the source does not have: reported below
                    refused.set(e);
                    return new EdgeSink() {
                        @Override
                        public void onEdge(long tick, int channel, int level) {
                        }
                    };
                }
            }, gate);
            StreamStart start;
            try {
                start = src.awaitStreaming(source.streamTimeout());
            } catch (BadInputException e) {
                if (guard.triggered()) {
                    throw new BadInputException(src.name(), "stopped before the probe streamed; nothing was measured", e);
                }
                throw e;
            }
            if (refused.get() != null) {
                throw refused.get();
            }
            err.println("rcbench: measuring " + src.name() + " for " + SiFormat.format(seconds, "s", 3)
                    + " of probe time; " + start.clockNote());
            err.flush();
            LiveLoop.End end = LiveLoop.run(src, gate, guard, source, seconds, 100, () -> false, () -> { });
            SessionStatus last = src.status();
            src.close();
            CaptureMeasurement.Meters m = meters.get();
            if (refused.get() != null) {
                throw refused.get();
            }
            if (m == null || !m.awaitEnd(END_WAIT_MILLIS)) {
                throw new BadInputException(src.name(), "nothing was measured: " + last.line());
            }
            if (last.state() == SessionState.FAILED) {
                throw new BadInputException(src.name(), last.line());
            }
            if (end == LiveLoop.End.STOPPED || end == LiveLoop.End.WALL_CLOCK || end == LiveLoop.End.SOURCE_ENDED) {
                err.println("rcbench: warning: " + (end == LiveLoop.End.STOPPED ? "stopped" : "the source sent no more")
                        + " before the full duration; checking what was measured");
            }
            String calibration = capture.overridesClock() ? "given on the command line" : start.clockNote();
            return new Reading(m.measurement(), describe(spec), null,
                    SaveOptions.probeOf(start, applied.get(), calibration));
        } finally {
            src.close();
        }
    }

    private boolean monostable() {
        return design().circuit().topology() == Topology.MONOSTABLE;
    }

    /**
     * Probe time for a live check: {@value #DEFAULT_SECONDS} s, or {@value #DEFAULT_PERIODS} nominal
     * periods when that is longer; for a monostable {@value #DEFAULT_TRIGGERS} trigger intervals (the
     * simulated board's, else the design's, else 2.5 nominal pulse widths, the simulated default).
     */
    private double defaultSeconds(LiveSource src) {
        Design d = design();
        TimerModel model = TimerModels.build(d.circuit());
        Timing t = model.evaluate(model.nominal());
        if (d.circuit().topology() != Topology.MONOSTABLE) {
            double period = t.runs() ? t.value(TimingQuantity.PERIOD) : Double.NaN;
            return Double.isFinite(period) ? Math.max(DEFAULT_SECONDS, DEFAULT_PERIODS * period) : DEFAULT_SECONDS;
        }
        double interval = d.circuit().trigger().intervalSeconds();
        if (src.simulatedProbe() != null && src.simulatedProbe().board().model() != null) {
            interval = src.simulatedProbe().board().model().spec().trigger().intervalSeconds();
        }
        if (Double.isNaN(interval)) {
            interval = 2.5 * t.value(TimingQuantity.PULSE_WIDTH);
        }
        return Double.isFinite(interval) ? Math.max(DEFAULT_SECONDS, DEFAULT_TRIGGERS * interval) : DEFAULT_SECONDS;
    }

    /** The live source in words, with a simulated board's deviations: {@code simulated Piper Mk2 (demo:piper-mk2) with C1=-25%}. */
    private static String describe(SourceSpec spec) {
        StringBuilder sb = new StringBuilder(spec.name());
        if (spec instanceof SourceSpec.Simulated sim && !sim.simulation().deviations().isEmpty()) {
            sb.append(" with");
            for (Deviation dv : sim.simulation().deviations()) {
                sb.append(' ').append(dv);
            }
        }
        return sb.toString();
    }
}
