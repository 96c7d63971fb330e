package org.rcbench.gui;

import java.util.Locale;
import org.rcbench.design.Design;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;

/**
 * The simulated board as a window source: a {@link VirtualBoard} played in step with the wall clock
 * on a thread of its own, its edges fed straight to the window (no wire protocol in between).
 * Thread-safe.
 */
public final class SimulatedBoardSource implements BenchSource {
    private final Design design;
    private final SimulationSpec spec;
    private final String faults;
    private volatile boolean stopping;
    private Thread player;

    /**
     * @param faults the deviations as the user wrote them, for the status line
     */
    public SimulatedBoardSource(Design design, SimulationSpec spec, String faults) {
        this.design = design;
        this.spec = spec;
        this.faults = faults;
        VirtualBoard.of(design, spec); // fail now, on the caller's thread, when a deviation does not fit
    }

    /**
     * The window's simulated bench: a little timing noise (50 ppm of the nominal period, rms) and a
     * warm-up that settles within a few seconds (+0.4 %, 3 s), so settling and drift show; demo
     * conditions, not measured ones.
     */
    public static SimulationSpec benchSpec(Design design, String faults) {
        double period = org.rcbench.circuit.TimerModels.build(design.circuit()).evaluateNominal().periodSeconds();
        SimulationSpec s = SimulationSpec.defaults().withWarmUp(0.004, 3);
        if (Double.isFinite(period)) {
            s = s.withJitterSeconds(50e-6 * period);
        }
        String f = faults.strip();
        if (!f.isEmpty()) {
            s = s.withDeviations(Deviation.parseAll(java.util.Arrays.asList(f.split("[\\s,]+"))));
        }
        return s.withSeed(System.nanoTime());
    }

    @Override
    public String name() {
        return "simulated " + design.title();
    }

    @Override
    public Design design() {
        return design;
    }

    @Override
    public synchronized void start(SourceSink sink) {
        if (player != null) {
            throw new IllegalStateException("simulation already started");
        }
        player = new Thread(() -> run(sink), "rcbench-sim " + design.title());
        player.setDaemon(true);
        player.start();
    }

    @Override
    public void stop() {
        stopping = true;
        Thread p;
        synchronized (this) {
            p = player;
        }
        if (p != null && p != Thread.currentThread()) {
            try {
                p.join(2000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    private void run(SourceSink sink) {
        VirtualBoard board = VirtualBoard.of(design, spec);
        String clock = String.format(Locale.ROOT, "%.0f MHz simulated clock, exact", spec.clockHz() / 1e6);
        String probe = "simulated board, no probe";
        String line = "simulating " + design.title() + (faults.isBlank() ? ", no fault" : ", fault " + faults.strip());
        sink.onClock(board.timebase(), board.channelNames());
        sink.onStatus(new SourceStatus(ConnectionState.STREAMING, line, probe, clock, 0, 0));
        long edges = board.play(Double.MAX_VALUE, sink, () -> !stopping);
        sink.onStatus(new SourceStatus(ConnectionState.ENDED, "simulation stopped after " + edges + " edges", probe,
                clock, 0, 0));
    }
}
