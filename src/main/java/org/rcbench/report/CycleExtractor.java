package org.rcbench.report;

import org.rcbench.edge.EdgeSink;

/**
 * Cuts one channel's edges into cycles, rising edge to rising edge, for export and plots.
 *
 * <p>A minimal pass, kept here until the measurement core offers a per-cycle callback: a cycle is
 * reported for two rising edges with one falling edge between them. A rising edge counts only when
 * the level before it is known to be low, so the first edge of a capture and the first edge after
 * a gap ({@link EdgeSink#UNKNOWN}) or after a repeated level (a lost edge) only establish the level:
 * no cycle spans a gap. Unlike the measurement core it does not exclude settling cycles or glitches:
 * every complete cycle is reported. Allocation-free per edge; not thread-safe.
 */
public final class CycleExtractor implements EdgeSink {
    /** Receives each complete cycle, in ticks. */
    public interface CycleSink {
        /**
         * @param startTick   tick of the cycle's rising edge
         * @param highTicks   rising to falling edge
         * @param periodTicks rising edge to the next rising edge
         */
        void onCycle(long startTick, long highTicks, long periodTicks);
    }

    private static final int NONE = -2;

    private final int channel;
    private final CycleSink sink;
    private int level = NONE;
    private long rise = -1;
    private long fall = -1;
    private long cycles;
    private long gaps;
    private long breaks;

    public CycleExtractor(int channel, CycleSink sink) {
        this.channel = channel;
        this.sink = sink;
    }

    @Override
    public void onEdge(long tick, int ch, int lvl) {
        if (ch != channel) {
            return;
        }
        if (lvl == UNKNOWN) {
            if (level != UNKNOWN) {
                gaps++;
            }
            rise = -1;
            fall = -1;
        } else if (lvl == HIGH) {
            if (level == LOW) {
                if (rise >= 0 && fall > rise) {
                    cycles++;
                    sink.onCycle(rise, fall - rise, tick - rise);
                }
                rise = tick;
            } else {
                if (level == HIGH) {
                    breaks++;
                }
                rise = -1;
            }
            fall = -1;
        } else {
            if (level == HIGH && rise >= 0) {
                fall = tick;
            } else {
                if (level == LOW) {
                    breaks++;
                }
                rise = -1;
                fall = -1;
            }
        }
        level = lvl;
    }

    /** Complete cycles reported so far. */
    public long cycles() {
        return cycles;
    }

    /** Gaps seen on the channel. */
    public long gaps() {
        return gaps;
    }

    /** Repeated levels (an edge lost between two equal levels) seen on the channel. */
    public long repeatedLevels() {
        return breaks;
    }
}
