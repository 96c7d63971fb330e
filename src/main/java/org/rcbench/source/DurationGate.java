package org.rcbench.source;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.rcbench.edge.EdgeSink;
import org.rcbench.protocol.ProbeEvents;

/**
 * Ends a live stream after a given span of probe time: passes edges on while their tick is at most
 * {@code limitTicks} after the stream's first event, and opens its latch once the probe's time
 * (an edge, or a heartbeat through {@link #onProbeTime}) passes the limit. The end handed on is then
 * the limit itself, so a recording of ten seconds says it covers ten seconds. Probe time, not wall
 * time: a fast simulation ends after the right amount of board time. Use one gate per stream;
 * called on the source's thread, {@link #await} from any.
 */
public final class DurationGate implements EdgeSink, ProbeEvents {
    private final double seconds;
    private final CountDownLatch reached = new CountDownLatch(1);
    private volatile EdgeSink target;
    private volatile ProbeEvents events = new ProbeEvents() { };
    private volatile long limitTicks = Long.MAX_VALUE;
    private long firstTick = -1;
    private boolean done;

    /** A gate that closes {@code seconds} of probe time after the first event (+inf: never). */
    public DurationGate(double seconds) {
        if (!(seconds > 0)) {
            throw new IllegalArgumentException("seconds <= 0: " + seconds);
        }
        this.seconds = seconds;
    }

    /** Sets where the edges go and the probe's tick rate; call once, before the first edge. */
    public EdgeSink wrap(EdgeSink sink, double ticksPerSecond) {
        return wrap(sink, new ProbeEvents() { }, ticksPerSecond);
    }

    /** As {@link #wrap(EdgeSink, double)}, also handing on the probe's time up to the limit. */
    public EdgeSink wrap(EdgeSink sink, ProbeEvents probeTime, double ticksPerSecond) {
        this.target = sink;
        this.events = probeTime;
        if (!Double.isInfinite(seconds)) {
            this.limitTicks = (long) Math.ceil(seconds * ticksPerSecond);
        }
        return this;
    }

    @Override
    public void onEdge(long tick, int channel, int level) {
        if (firstTick < 0) {
            firstTick = tick;
        }
        if (tick - firstTick > limitTicks) {
            reach();
            return;
        }
        if (!done) {
            target.onEdge(tick, channel, level);
        }
    }

    @Override
    public void onProbeTime(long tick) {
        if (firstTick >= 0 && tick - firstTick > limitTicks) {
            reach();
        } else if (!done) {
            events.onProbeTime(tick);
        }
    }

    @Override
    public void onEnd(long lastTick) {
        EdgeSink t = target;
        if (t == null) {
            return;
        }
        long end = firstTick < 0 ? lastTick : done ? firstTick + limitTicks : Math.min(lastTick, firstTick + limitTicks);
        t.onEnd(end);
    }

    private void reach() {
        done = true;
        reached.countDown();
    }

    /** True once the probe's time has passed the limit. */
    public boolean reached() {
        return reached.getCount() == 0;
    }

    /** Waits at most {@code millis} for the limit; returns whether it was reached. */
    public boolean await(long millis) throws InterruptedException {
        return reached.await(millis, TimeUnit.MILLISECONDS);
    }
}
