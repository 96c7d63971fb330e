package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.rcbench.common.BadInputException;
import org.rcbench.probe.CalibrationStore;
import org.rcbench.probe.ProbeProfile;
import org.rcbench.probe.SessionConfig;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.LinkFaults;
import org.rcbench.sim.Pace;
import org.rcbench.sim.ProbeOptions;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.Stimulus;
import org.rcbench.source.DemoDesigns;
import org.rcbench.source.LiveSource;
import org.rcbench.source.SourceSpec;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;
import picocli.CommandLine.Option;

/**
 * The options every live command shares to say where edges come from: a probe ({@code --port}), a
 * simulated board ({@code --sim} and its deviations), or a capture file replayed ({@code --replay});
 * with none of them, the simulated Piper Mk2 ({@value DemoDesigns#DEFAULT}). Use as a picocli
 * {@code @Mixin}; {@link #sourceSpec()} gives the plain {@link SourceSpec} (what the GUI builds
 * itself) and {@link #open(PrintWriter)} the {@link LiveSource}.
 */
public final class SourceOptions {
    @Option(names = "--port", paramLabel = "PORT",
            description = "Read the probe on this serial port: a device path (/dev/ttyACM0, a /dev/serial/by-id link)"
                + " or a USB id vvvv:pppp[:serial] as 'rcbench ports' shows it.")
    String port;

    @Option(names = "--probe-type", paramLabel = "TYPE", defaultValue = "reset-on-open",
            description = "How the probe behaves when the port opens: reset-on-open (USB-serial bridge boards),"
                + " native-usb, no-reset, stream (default: ${DEFAULT-VALUE}).")
    String probeType;

    @Option(names = "--sim", paramLabel = "DESIGN",
            description = "Simulate a board instead: a design file, demo:NAME (demo:piper-mk2, demo:wren, ...), or"
                + " reference:FREQ (a clean reference signal, to try calibrate).")
    String sim;

    @Option(names = "--replay", paramLabel = "FILE", description = "Replay a capture file as if it were live.")
    Path replay;

    @Option(names = "--fault", paramLabel = "NAME=VALUE", split = ",",
            description = "Simulated board: a part fault or condition, e.g. C1=-35%%, R2=12k, C1=68n, leak=1M,"
                + " control=4k7, supply=7.2V (repeatable).")
    List<String> faults = new ArrayList<>();

    @Option(names = "--jitter", paramLabel = "TIME", converter = ValueConverters.TimeOrZero.class,
            description = "Simulated board: white period noise, RMS (e.g. 2us).")
    double jitterSeconds;

    @Option(names = "--ripple", paramLabel = "VOLTS@FREQ",
            description = "Simulated board: supply ripple, peak amplitude at a frequency (e.g. 0.5V@100Hz).")
    String ripple;

    @Option(names = "--warm-up", paramLabel = "CHANGE@TIME",
            description = "Simulated board: timing starts off by CHANGE and settles with time constant TIME"
                + " (e.g. +2%%@30s).")
    String warmUp;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "1",
            description = "Simulated board: seed of every random draw (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--sim-speed", paramLabel = "realtime|fast",
            description = "Simulated board or replay: real time, or as fast as it can be read (default: realtime; for"
                + " check and tune, which want the answer rather than the wait: fast).")
    String speed;

    /** The pace when {@code --sim-speed} is not given. */
    private Pace unsetPace = Pace.REALTIME;

    @Option(names = "--sim-clock-ppm", paramLabel = "PPM", defaultValue = "0",
            description = "Simulated probe: how fast its clock really runs, ppm (default: ${DEFAULT-VALUE}).")
    double clockPpm;

    @Option(names = "--sim-clock-hz", paramLabel = "HZ", defaultValue = "16000000",
            description = "Simulated probe: its tick frequency, Hz (default: ${DEFAULT-VALUE}).")
    long clockHz;

    @Option(names = "--sim-trigger-every", paramLabel = "TIME", converter = ValueConverters.Time.class,
            description = "Simulated monostable: time between trigger presses (default: the design's, else 2.5 pulse"
                + " widths).")
    Double triggerEvery;

    @Option(names = "--sim-byte-errors", paramLabel = "RATE", defaultValue = "0",
            description = "Simulated probe: probability per byte that it arrives damaged (e.g. 1e-4).")
    double byteErrors;

    @Option(names = "--sim-lost-bytes", paramLabel = "RATE", defaultValue = "0",
            description = "Simulated probe: probability per byte that it is lost.")
    double lostBytes;

    @Option(names = "--sim-overruns", paramLabel = "RATE", defaultValue = "0",
            description = "Simulated probe: probability per edge that its buffer overflows there.")
    double overruns;

    @Option(names = "--sim-unplug", paramLabel = "AT:DOWN",
            description = "Simulated probe: pull the cable at board time AT for DOWN (e.g. 5s:1s; repeatable).")
    List<String> unplugs = new ArrayList<>();

    /** True when no source option was given (the built-in simulated board is used). */
    public boolean usesDefault() {
        return port == null && sim == null && replay == null;
    }

    /** True for a source that runs as fast as it is read (no wall-clock meaning). */
    public boolean fast() {
        return port == null && pace() == Pace.FAST;
    }

    /** The source the options describe; a conflicting or bad option is a one-line error naming it. */
    public SourceSpec sourceSpec() {
        int given = (port != null ? 1 : 0) + (sim != null ? 1 : 0) + (replay != null ? 1 : 0);
        if (given > 1) {
            throw new BadInputException("source", "give one of --port, --sim and --replay");
        }
        if (port != null) {
            rejectSimOptions("--port");
            return new SourceSpec.Port(port, ProbeProfile.named(probeType));
        }
        if (replay != null) {
            rejectSimOptions("--replay");
            return new SourceSpec.CaptureFile(replay, pace());
        }
        String label = sim == null ? DemoDesigns.DEFAULT : sim;
        SimulationSpec s = simulation();
        ProbeOptions p = ProbeOptions.defaults().withPace(pace()).withFaults(faults());
        if (label.startsWith("reference:")) {
            double hz = parse("--sim", label.substring("reference:".length()), Unit.HERTZ);
            return new SourceSpec.Simulated(label, null, hz, s, p);
        }
        return new SourceSpec.Simulated(label, DemoDesigns.resolve(label), Double.NaN, s, p);
    }

    /**
     * The source, not yet started, applying the calibrations in {@code store}; prints a note on
     * {@code err} when the built-in board stands in.
     */
    public LiveSource open(PrintWriter err, CalibrationStore store) {
        return open(err, store, sourceSpec());
    }

    /** As {@link #open(PrintWriter, CalibrationStore)} for a spec already made with {@link #sourceSpec()}. */
    public LiveSource open(PrintWriter err, CalibrationStore store, SourceSpec spec) {
        if (usesDefault()) {
            err.println("rcbench: no --port, --sim or --replay given: simulating the demo board " + DemoDesigns.DEFAULT);
            err.flush();
        }
        return LiveSource.of(spec, sessionConfig(), store);
    }

    /** The session configuration: the defaults, with a faster reconnect poll for simulated probes. */
    public SessionConfig sessionConfig() {
        SessionConfig c = SessionConfig.defaults();
        return port == null ? c.withReconnectPollMillis(50) : c;
    }

    /** How long to wait for a source to stream: the probe type's hello timeout and some. */
    public Duration streamTimeout() {
        return port == null ? Duration.ofSeconds(10) : ProbeProfile.named(probeType).helloTimeout().plusSeconds(4);
    }

    Pace pace() {
        return speed == null ? unsetPace : Pace.parse(speed);
    }

    /** Makes a simulated board or a replay run as fast as it can be read unless {@code --sim-speed} says otherwise. */
    void preferFast() {
        unsetPace = Pace.FAST;
    }

    /**
     * The source options given on the command line, by name (options left at their defaults are
     * not told apart from options not given, which makes no difference to the source).
     */
    List<String> given() {
        List<String> g = new ArrayList<>();
        String[][] named = {{"--port", port}, {"--sim", sim}, {"--ripple", ripple}, {"--warm-up", warmUp},
            {"--sim-speed", speed}};
        for (String[] n : named) {
            if (n[1] != null) {
                g.add(n[0]);
            }
        }
        if (replay != null) {
            g.add("--replay");
        }
        if (!probeType.equals(ProbeProfile.RESET_ON_OPEN.name())) {
            g.add("--probe-type");
        }
        if (!faults.isEmpty()) {
            g.add("--fault");
        }
        if (jitterSeconds != 0) {
            g.add("--jitter");
        }
        if (seed != 1) {
            g.add("--seed");
        }
        if (clockPpm != 0 || clockHz != 16_000_000L || triggerEvery != null || byteErrors != 0 || lostBytes != 0
                || overruns != 0 || !unplugs.isEmpty()) {
            g.add("--sim-...");
        }
        return g;
    }

    private SimulationSpec simulation() {
        if (clockHz < 1 || clockHz > 0xFFFF_FFFFL) {
            throw new BadInputException("--sim-clock-hz", "out of 1..4294967295: " + clockHz);
        }
        if (!(Math.abs(clockPpm) < 1e5)) {
            throw new BadInputException("--sim-clock-ppm", "out of range: " + clockPpm);
        }
        SimulationSpec s = SimulationSpec.defaults().withDeviations(Deviation.parseAll(faults))
                .withJitterSeconds(jitterSeconds).withSeed(seed).withClockHz(clockHz).withClockOffsetPpm(clockPpm);
        if (ripple != null) {
            String[] a = at("--ripple", ripple);
            double volts = parse("--ripple", a[0], Unit.VOLT);
            s = s.withRipple(volts, parse("--ripple", a[1], Unit.HERTZ));
        }
        if (warmUp != null) {
            String[] a = at("--warm-up", warmUp);
            Deviation change = Deviation.parse("warm-up=" + a[0]);
            if (!change.isRelative() || !(Math.abs(change.relative()) < 1)) {
                throw new BadInputException("--warm-up", "\"" + warmUp + "\": write the change as a signed percentage,"
                        + " e.g. +2%@30s");
            }
            s = s.withWarmUp(change.relative(), parse("--warm-up", a[1], Unit.SECOND));
        }
        if (triggerEvery != null) {
            s = s.withStimulus(Stimulus.defaults().withTriggerIntervalSeconds(triggerEvery));
        }
        return s;
    }

    private LinkFaults faults() {
        for (double r : new double[] {byteErrors, lostBytes, overruns}) {
            if (!(r >= 0 && r <= 1)) {
                throw new BadInputException("--sim-byte-errors/--sim-lost-bytes/--sim-overruns",
                        "a rate is a probability from 0 to 1, not " + r);
            }
        }
        LinkFaults f = LinkFaults.none().withByteFlipRate(byteErrors).withByteDropRate(lostBytes)
                .withOverrunRate(overruns).withSeed(seed);
        for (String u : unplugs) {
            int colon = u.indexOf(':');
            if (colon < 0) {
                throw new BadInputException("--sim-unplug", "\"" + u + "\" is not AT:DOWN (e.g. 5s:1s)");
            }
            f = f.withUnplug(parse("--sim-unplug", u.substring(0, colon), Unit.SECOND, true),
                    parse("--sim-unplug", u.substring(colon + 1), Unit.SECOND, true));
        }
        return f;
    }

    private void rejectSimOptions(String source) {
        List<String> used = new ArrayList<>();
        if (!faults.isEmpty()) {
            used.add("--fault");
        }
        if (jitterSeconds != 0) {
            used.add("--jitter");
        }
        if (ripple != null) {
            used.add("--ripple");
        }
        if (warmUp != null) {
            used.add("--warm-up");
        }
        if (!unplugs.isEmpty() || byteErrors != 0 || lostBytes != 0 || overruns != 0) {
            used.add("--sim-...");
        }
        if (!used.isEmpty()) {
            throw new BadInputException(String.join(", ", used), "only for a simulated board (--sim), not with " + source);
        }
    }

    private static String[] at(String option, String text) {
        int i = text.indexOf('@');
        if (i < 0 || i != text.lastIndexOf('@')) {
            throw new BadInputException(option, "\"" + text + "\" is not VALUE@VALUE (e.g. "
                    + (option.equals("--ripple") ? "0.5V@100Hz" : "+2%@30s") + ")");
        }
        return new String[] {text.substring(0, i).strip(), text.substring(i + 1).strip()};
    }

    private static double parse(String option, String text, Unit unit) {
        return parse(option, text, unit, false);
    }

    private static double parse(String option, String text, Unit unit, boolean zeroOk) {
        try {
            double v = zeroOk ? ValueCode.parseValue(text, unit) : ValueCode.parsePositive(text, unit);
            if (v < 0) {
                throw new BadInputException(option, "\"" + text + "\" is negative");
            }
            return v;
        } catch (BadInputException e) {
            throw new BadInputException(option, e.what());
        }
    }
}
