package org.rcbench.measure;

import java.util.Arrays;
import org.rcbench.edge.EdgeSink;

/** A list of edges built by tests and replayed into a sink. */
final class Edges {
    long[] ticks = new long[64];
    int[] channels = new int[64];
    int[] levels = new int[64];
    int size;

    Edges add(long tick, int channel, int level) {
        if (size == ticks.length) {
            ticks = Arrays.copyOf(ticks, size * 2);
            channels = Arrays.copyOf(channels, size * 2);
            levels = Arrays.copyOf(levels, size * 2);
        }
        ticks[size] = tick;
        channels[size] = channel;
        levels[size] = level;
        size++;
        return this;
    }

    /** Adds cycles on channel 0: rising at {@code t}, falling at {@code t + high}, for each (high, low). */
    Edges cycles(long t, long[] high, long[] low) {
        for (int k = 0; k < high.length; k++) {
            add(t, 0, EdgeSink.HIGH);
            add(t + high[k], 0, EdgeSink.LOW);
            t += high[k] + low[k];
        }
        add(t, 0, EdgeSink.HIGH);
        return this;
    }

    long last() {
        return ticks[size - 1];
    }

    void feed(EdgeSink sink) {
        for (int k = 0; k < size; k++) {
            sink.onEdge(ticks[k], channels[k], levels[k]);
        }
        sink.onEnd(size == 0 ? 0 : ticks[size - 1]);
    }

    static long[] repeat(long v, int n) {
        long[] a = new long[n];
        Arrays.fill(a, v);
        return a;
    }
}
