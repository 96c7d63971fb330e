package org.rcbench.probe;

import org.rcbench.edge.EdgeSink;
import org.rcbench.protocol.Ack;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.protocol.StreamDecoder;
import org.rcbench.protocol.Trouble;
import org.rcbench.protocol.Wire;

/**
 * Sits between a session's decoder and the user's sink and events: passes edges and ADC samples on
 * only while the gate is open (edges sent before the hello belong to nobody; gaps always pass),
 * notes the hello and acknowledgements of the current connection, and tells the session when the
 * probe reset while streaming. Used on the reader thread only, except the volatile fields.
 */
final class SessionTap implements EdgeSink, ProbeEvents {

    /** What the tap asks of its session. */
    interface Session {
        /** Whether this hello is from the probe the session wants. */
        boolean sameProbe(Hello hello);

        /** The wanted probe sent another hello while streaming ({@code atBoot}: it reset and must be started again). */
        void helloWhileStreaming(Hello hello);
    }

    private final EdgeSink sink;
    private final ProbeEvents events;
    private final Session session;
    /** Open while streaming. */
    volatile boolean gateOpen;
    /** The first hello of the current connection, or null. */
    Hello connectionHello;
    /** The probe acknowledged start on this connection. */
    volatile boolean startAcked;
    /** The latest refusal by the probe, for the status line, or "". */
    volatile String refusal = "";

    SessionTap(EdgeSink sink, ProbeEvents events, Session session) {
        this.sink = sink;
        this.events = events;
        this.session = session;
    }

    /** A new connection: gate closed, no hello, no ack. */
    void newConnection() {
        gateOpen = false;
        connectionHello = null;
        startAcked = false;
    }

    @Override
    public void onEdge(long tick, int channel, int level) {
        if (gateOpen || level == UNKNOWN) {
            sink.onEdge(tick, channel, level);
        }
    }

    @Override
    public void onEnd(long lastTick) {
        sink.onEnd(lastTick);
    }

    @Override
    public void onHello(Hello h) {
        if (connectionHello == null) {
            connectionHello = h;
        } else if (gateOpen && session.sameProbe(h)) {
            session.helloWhileStreaming(h);
        }
        events.onHello(h);
    }

    @Override
    public void onAck(Ack ack) {
        if (ack.commandType() == Wire.T_START) {
            startAcked = true;
        }
        if (!ack.ok()) {
            refusal = "the probe answered command 0x" + Integer.toHexString(ack.commandType()) + ": "
                    + ack.statusText();
        }
        events.onAck(ack);
    }

    @Override
    public void onAdc(int channel, int bits, int fullScaleMv, long firstTick, long periodTicks, int[] samples,
            int count) {
        if (gateOpen) {
            events.onAdc(channel, bits, fullScaleMv, firstTick, periodTicks, samples, count);
        }
    }

    @Override
    public void onNote(String text) {
        events.onNote(text);
    }

    @Override
    public void onProbeTime(long tick) {
        events.onProbeTime(tick);
    }

    @Override
    public void onTrouble(Trouble trouble, long tick) {
        events.onTrouble(trouble, tick);
    }

    @Override
    public void onMode(StreamDecoder.Mode mode) {
        events.onMode(mode);
    }
}
