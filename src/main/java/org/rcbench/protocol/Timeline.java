package org.rcbench.protocol;

import org.rcbench.edge.EdgeSink;

/**
 * The decoder's output side: maps probe clock steps onto one non-negative, non-decreasing host
 * timeline, delivers edges to the sink and marks gaps on the channels whose level was known.
 *
 * <p>Interpreters report time as steps between consecutive probe events, never as absolute probe
 * ticks: this keeps 48-bit wrap-around (binary) and free-running 62-bit counters (text) out of
 * here, and makes overflow impossible. A negative step means the probe's clock went backwards
 * (it reset); the timeline marks a gap and carries on from the last tick, so the sink's contract
 * (non-decreasing ticks) holds whatever bytes arrive. Not thread-safe; allocation-free.
 */
final class Timeline {
    /** Ticks saturate here: 2^62 ticks is about 9000 years at 16 MHz. */
    static final long LIMIT = 1L << 62;

    private final EdgeSink sink;
    private final ProbeEvents events;
    /** Channels whose level is known (an edge was delivered since the last gap), bit n = channel n. */
    private final long[] known = new long[4];
    private long lastTick;
    private long segmentBase;
    long edges;
    long gapMarks;
    long probeRestarts;

    Timeline(EdgeSink sink, ProbeEvents events) {
        this.sink = sink;
        this.events = events;
    }

    /** The last tick delivered or vouched for. */
    long lastTick() {
        return lastTick;
    }

    /** The timeline tick of the first event of a segment (after start, restart or reconnect). */
    long first() {
        lastTick = segmentBase;
        return lastTick;
    }

    /** The timeline tick of an event {@code step} probe ticks after the previous one. */
    long next(long step) {
        if (step < 0) {
            probeRestarts++;
            gap(Trouble.PROBE_RESTART);
            return lastTick;
        }
        long t = lastTick + step;
        lastTick = t > LIMIT ? LIMIT : t;
        return lastTick;
    }

    /** Starts a new segment: its first event maps to {@code lastTick + advanceTicks}. */
    void restart(long advanceTicks) {
        long base = lastTick + Math.max(0, Math.min(advanceTicks, LIMIT));
        segmentBase = base > LIMIT ? LIMIT : base;
    }

    /** Delivers one edge at timeline tick {@code tick} (from {@link #first()} or {@link #next(long)}). */
    void edge(long tick, int channel, int level) {
        known[channel >>> 6] |= 1L << (channel & 63);
        edges++;
        sink.onEdge(tick, channel, level);
    }

    /** Marks a gap at the last tick on every channel whose level was known, and reports why. */
    void gap(Trouble why) {
        for (int w = 0; w < known.length; w++) {
            long bits = known[w];
            while (bits != 0) {
                int bit = Long.numberOfTrailingZeros(bits);
                bits &= bits - 1;
                gapMarks++;
                sink.onEdge(lastTick, w * 64 + bit, EdgeSink.UNKNOWN);
            }
            known[w] = 0;
        }
        events.onTrouble(why, lastTick);
    }

    /** The probe vouched for the timeline up to the last tick. */
    void vouched() {
        events.onProbeTime(lastTick);
    }

    void end() {
        sink.onEnd(lastTick);
    }
}
