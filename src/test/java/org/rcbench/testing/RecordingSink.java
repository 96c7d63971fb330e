package org.rcbench.testing;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.edge.EdgeSink;

/** Collects every edge and the end call, for comparing what sources deliver. Test use only. */
public final class RecordingSink implements EdgeSink {
    /** One delivered edge. */
    public record Edge(long tick, int channel, int level) {
        @Override
        public String toString() {
            return tick + "," + channel + "," + (level == UNKNOWN ? "x" : Integer.toString(level));
        }
    }

    public final List<Edge> edges = new ArrayList<>();
    public long endTick = -1;
    public int endCalls;

    @Override
    public void onEdge(long tick, int channel, int level) {
        if (endCalls > 0) {
            throw new AssertionError("edge after onEnd: " + tick);
        }
        edges.add(new Edge(tick, channel, level));
    }

    @Override
    public void onEnd(long lastTick) {
        endCalls++;
        endTick = lastTick;
    }
}
