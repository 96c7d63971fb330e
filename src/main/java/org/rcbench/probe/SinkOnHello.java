package org.rcbench.probe;

import java.util.function.Function;
import org.rcbench.edge.EdgeSink;
import org.rcbench.protocol.Ack;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.protocol.StreamDecoder;
import org.rcbench.protocol.Trouble;

/**
 * An edge sink made from the probe's first hello, for consumers that need the probe's clock before
 * the first edge (a recorder writing {@code clock_hz} into its header). Pass the same object to
 * {@link ProbeSession} as its sink and as its events: a session delivers the first hello of a
 * connection before any edge of it, so the target exists before edges flow. Edges or an end before
 * any hello go nowhere. Other events pass on to {@code next}. Called on the session's reader thread.
 */
public final class SinkOnHello implements EdgeSink, ProbeEvents {
    private final Function<Hello, EdgeSink> factory;
    private final ProbeEvents next;
    private volatile EdgeSink target;

    /** {@code factory} is called once, with the first hello; {@code next} gets every event. */
    public SinkOnHello(Function<Hello, EdgeSink> factory, ProbeEvents next) {
        this.factory = factory;
        this.next = next;
    }

    /** The sink made from the first hello, or null before it. */
    public synchronized EdgeSink target() {
        return target;
    }

    @Override
    public void onEdge(long tick, int channel, int level) {
        EdgeSink t = target;
        if (t != null) {
            t.onEdge(tick, channel, level);
        }
    }

    @Override
    public void onEnd(long lastTick) {
        EdgeSink t = target;
        if (t != null) {
            t.onEnd(lastTick);
        }
    }

    @Override
    public void onHello(Hello hello) {
        synchronized (this) {
            if (target == null) {
                target = factory.apply(hello);
            }
        }
        next.onHello(hello);
    }

    @Override
    public void onAck(Ack ack) {
        next.onAck(ack);
    }

    @Override
    public void onAdc(int channel, int bits, int fullScaleMv, long firstTick, long periodTicks, int[] samples,
            int count) {
        next.onAdc(channel, bits, fullScaleMv, firstTick, periodTicks, samples, count);
    }

    @Override
    public void onNote(String text) {
        next.onNote(text);
    }

    @Override
    public void onProbeTime(long tick) {
        next.onProbeTime(tick);
    }

    @Override
    public void onTrouble(Trouble trouble, long tick) {
        next.onTrouble(trouble, tick);
    }

    @Override
    public void onMode(StreamDecoder.Mode mode) {
        next.onMode(mode);
    }
}
