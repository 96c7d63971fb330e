package org.rcbench.source;

import org.rcbench.circuit.Topology;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.BistableMeter;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;
import org.rcbench.measure.MonostableMeter;
import org.rcbench.protocol.ProbeEvents;

/**
 * Measures a live stream and publishes readings for a view: an {@link EdgeSink} (and
 * {@link ProbeEvents}, for the probe's heartbeats) that feeds the measurement core on the source's
 * thread and, at most every {@code intervalMillis}, publishes a {@link LiveReading} that any thread
 * may take with {@link #latest()} (a GUI per frame, a terminal view a few times a second).
 *
 * <p>Channels: the output on {@code outputChannel}; for a monostable also the trigger on
 * {@code outputChannel + 1}, for a bistable set and reset on the next two (the simulated board's
 * layout, {@link org.rcbench.sim.VirtualBoard#TRIGGER}). Triggers are falling edges and buttons pull
 * low (the 555 convention); edges within 20 ms of a press are bounce (common practice, no source).
 */
public final class LiveMeasurement implements EdgeSink, ProbeEvents {
    private static final double BOUNCE_SECONDS = 20e-3;

    private final CycleMeter cycles;
    private final MonostableMeter mono;
    private final BistableMeter latch;
    private final long intervalNanos;
    private final double ticksPerSecond;
    private long nextPublish;
    private long edges;
    private long gaps;
    private long firstTick = -1;
    private long lastTick = -1;
    private volatile LiveReading latest;

    /**
     * @param topology      the circuit's topology (chooses the extra meters), or null for a plain signal
     * @param outputChannel the timer's output channel
     * @param timebase      ticks to seconds, with the probe's calibration
     */
    public LiveMeasurement(Topology topology, int outputChannel, Timebase timebase, long intervalMillis) {
        this.cycles = new CycleMeter(MeterConfig.of(outputChannel, timebase));
        this.mono = topology == Topology.MONOSTABLE
                ? new MonostableMeter(outputChannel + 1, outputChannel, LOW, timebase) : null;
        this.latch = topology == Topology.BISTABLE ? new BistableMeter(outputChannel + 1, outputChannel + 2,
                outputChannel, LOW, Math.round(BOUNCE_SECONDS * timebase.ticksPerSecond()), timebase) : null;
        this.intervalNanos = intervalMillis * 1_000_000L;
        this.ticksPerSecond = timebase.ticksPerSecond();
        this.nextPublish = System.nanoTime();
    }

    @Override
    public void onEdge(long tick, int channel, int level) {
        cycles.onEdge(tick, channel, level);
        if (mono != null) {
            mono.onEdge(tick, channel, level);
        }
        if (latch != null) {
            latch.onEdge(tick, channel, level);
        }
        if (firstTick < 0) {
            firstTick = tick;
        }
        lastTick = Math.max(lastTick, tick);
        if (level == UNKNOWN) {
            gaps++;
        } else {
            edges++;
        }
        if ((edges & 63) == 0) {
            poll();
        }
    }

    @Override
    public void onProbeTime(long tick) {
        if (firstTick >= 0) {
            lastTick = Math.max(lastTick, tick);
        }
        poll();
    }

    @Override
    public void onEnd(long end) {
        cycles.onEnd(end);
        if (firstTick >= 0) {
            lastTick = Math.max(lastTick, end);
        }
        publish(true);
    }

    /** Publishes a reading when the interval has passed; call on the feeding thread only. */
    public void poll() {
        if (System.nanoTime() - nextPublish >= 0) {
            publish(false);
        }
    }

    private void publish(boolean end) {
        double seconds = firstTick < 0 ? 0 : (lastTick - firstTick) / ticksPerSecond;
        latest = new LiveReading(cycles.snapshot(), mono == null ? null : mono.result(),
                latch == null ? null : latch.result(), edges, gaps, seconds, end);
        nextPublish = System.nanoTime() + intervalNanos;
    }

    /** The latest reading, or null before the first. Any thread. */
    public LiveReading latest() {
        return latest;
    }
}
