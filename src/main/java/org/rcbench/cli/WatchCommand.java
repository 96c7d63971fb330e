package org.rcbench.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.probe.SessionStatus;
import org.rcbench.source.DemoDesigns;
import org.rcbench.source.DurationGate;
import org.rcbench.source.LiveMeasurement;
import org.rcbench.source.LiveReading;
import org.rcbench.source.LiveSource;
import org.rcbench.source.SourceSpec;
import org.rcbench.source.StreamStart;
import org.rcbench.tolerance.Predictor;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench watch}: a live terminal readout of a probe or a simulated board, redrawn a few
 * times a second; with a design, a verdict per quantity, the leading suspect and a tuning step,
 * re-solved at most once per redraw ({@link WatchJudge}).
 */
@Command(name = "watch", mixinStandardHelpOptions = true,
        description = {"Show a live readout: frequency, duty, high and low time (or pulse width), jitter; with a design"
            + " its nominal value, 95 %% band and a verdict per quantity, the leading suspect, and a tuning step for a"
                + " potentiometer.",
            "Exit status 1 when a quantity ends outside the design's worst-case band.",
            "Caution: the probe's ground is the computer's ground. Never connect it to mains-referenced or"
                + " transformerless circuits without isolation; mind charged capacitors."})
public final class WatchCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    SourceOptions source;

    @Mixin
    DatabaseOption database;

    @Option(names = "--design", paramLabel = "DESIGN",
            description = "Compare with this design (a file or demo:NAME); default for --sim: the simulated design.")
    String design;

    @Option(names = "--once", description = "Print one readout once enough cycles are in, then exit.")
    boolean once;

    @Option(names = "--duration", paramLabel = "TIME", converter = ValueConverters.Time.class,
            description = "Stop after this much probe time and print the final readout.")
    Double duration;

    @Option(names = "--every", paramLabel = "TIME", converter = ValueConverters.Time.class,
            description = "Redraw interval (default: 0.25 s on a terminal, 2 s as appended text).")
    Double every;

    @Option(names = "--plain", description = "Appended text even on a terminal (no redrawing).")
    boolean plain;

    @Option(names = "--channel", paramLabel = "N", defaultValue = "0",
            description = "The timer's output channel (default: ${DEFAULT-VALUE}; a monostable's trigger on N+1, a"
                + " latch's buttons on N+1 and N+2).")
    int channel;

    /** Cycles (or pulses, or presses) that make a readout worth printing with {@code --once}. */
    static final int ONCE_CYCLES = 64;
    /** Probe time a fast source runs for {@code --once} without {@code --duration}: two Wren pulses. */
    static final double FAST_ONCE_SECONDS = 30;
    private static final long ONCE_TIMEOUT_NANOS = 120_000_000_000L;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (channel < 0 || channel > 7) {
            throw new BadInputException("--channel", "out of 0..7: " + channel);
        }
        Terminal term = new Terminal(out, !plain && Terminal.detect());
        SourceSpec sourceSpec = source.sourceSpec();
        Design d = design != null ? DemoDesigns.resolve(design)
                : sourceSpec instanceof SourceSpec.Simulated sim ? sim.design() : null;
        WatchJudge judge = d == null ? null : new WatchJudge(d, new Predictor(20_000, 1).predict(d));
        Topology topology = d == null ? null : d.circuit().topology();
        LiveSource src = source.open(err, database.calibrations(), sourceSpec);
        // A fast source with --once reads a fixed stretch of probe time, so that the readout is repeatable.
        Double span = duration != null ? duration : once && source.fast() ? (Double) FAST_ONCE_SECONDS : null;
        DurationGate gate = new DurationGate(span == null ? Double.POSITIVE_INFINITY : span);
        LiveMeasurement[] live = new LiveMeasurement[1];
        src.addStatusListener(st -> {
            LiveMeasurement l = live[0];
            if (l != null) {
                l.poll(); // on the source's thread: keeps readings coming while no edge arrives
            }
        });
        long interval = Math.round((every != null ? every : term.interactive() ? 0.25 : 2.0) * 1000);
        boolean failed = false;
        try (ShutdownGuard guard = new ShutdownGuard(src::close)) {
            src.start(start -> {
                live[0] = new LiveMeasurement(topology, channel, start.timebase(), Math.min(interval, 250));
                return gate.wrap(live[0], live[0], start.timebase().ticksPerSecond());
            }, gate);
            while (src.started() == null && !src.ended() && !guard.triggered()) {
                SessionStatus st = src.status();
                if (!once) {
                    term.status(st.line(), st.state().name());
                }
                Thread.sleep(100);
            }
            StreamStart start = src.awaitStreaming(source.streamTimeout());
            term.finish();
            long begun = System.nanoTime();
            long[] nextDraw = {System.nanoTime()};
            LiveLoop.run(src, gate, guard, source, span, Math.min(interval, 100), () -> once && (span == null
                    && enough(live[0].latest()) || System.nanoTime() - begun > ONCE_TIMEOUT_NANOS), () -> {
                        if (!once && System.nanoTime() - nextDraw[0] >= 0) {
                            term.block(WatchView.render(start, src.status(), live[0].latest(), d, judge).lines());
                            nextDraw[0] = System.nanoTime() + interval * 1_000_000L;
                        }
                    });
            SessionStatus before = src.status();
            src.close();
            LiveReading r = live[0].latest();
            WatchView.Screen screen = WatchView.render(start, src.status(), r, d, judge);
            term.block(screen.lines());
            failed = screen.fails();
            if (before.state().isFinal() && before.state() == org.rcbench.probe.SessionState.FAILED) {
                err.println("rcbench: " + before.line());
                return ExitCodes.BAD_INPUT;
            }
        } finally {
            src.close();
        }
        return failed ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
    }

    /** Whether a reading holds enough to print once: 64 cycles, or a timed pulse, or four presses. */
    static boolean enough(LiveReading r) {
        if (r == null) {
            return false;
        }
        if (r.bistable() != null) {
            return r.bistable().setPresses() + r.bistable().resetPresses() >= 4;
        }
        if (r.monostable() != null) {
            return r.monostable().pulses() >= 1;
        }
        return r.measurement().rolling().cycles() >= ONCE_CYCLES;
    }
}
