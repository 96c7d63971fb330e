package org.rcbench.diagnose;

import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;

/**
 * A histogram of measured periods for plots: {@code counts[i]} periods fell in
 * {@code [edgesSeconds[i], edgesSeconds[i+1])} (the last bin includes its upper edge). Bins are equal,
 * at least one probe tick wide (periods are whole ticks), at most {@link #MAX_BINS}. Immutable by
 * convention (arrays are copies).
 */
public record PeriodHistogram(double[] edgesSeconds, long[] counts) {
    /** Most bins in a histogram. */
    public static final int MAX_BINS = 40;
    /** No periods. */
    public static final PeriodHistogram EMPTY = new PeriodHistogram(new double[0], new long[0]);

    public PeriodHistogram {
        edgesSeconds = edgesSeconds.clone();
        counts = counts.clone();
        if (counts.length > 0 && edgesSeconds.length != counts.length + 1) {
            throw new IllegalArgumentException("edges " + edgesSeconds.length + " for " + counts.length + " bins");
        }
    }

    /** The histogram of the newest cycles a meter keeps ({@link CycleMeter#recentCycles}). Call from the meter's thread. */
    public static PeriodHistogram of(CycleMeter meter) {
        int cap = meter.config().recentCycles();
        long[] start = new long[cap];
        long[] high = new long[cap];
        long[] low = new long[cap];
        int n = meter.recentCycles(start, high, low);
        long[] periods = new long[n];
        for (int i = 0; i < n; i++) {
            periods[i] = high[i] + low[i];
        }
        return of(periods, n, meter.config().timebase());
    }

    /** The histogram of {@code n} periods given in ticks. */
    public static PeriodHistogram of(long[] periodTicks, int n, Timebase timebase) {
        if (n == 0) {
            return EMPTY;
        }
        long min = Long.MAX_VALUE;
        long max = Long.MIN_VALUE;
        for (int i = 0; i < n; i++) {
            min = Math.min(min, periodTicks[i]);
            max = Math.max(max, periodTicks[i]);
        }
        long span = max - min + 1;
        long width = Math.max(1, (span + MAX_BINS - 1) / MAX_BINS);
        int bins = (int) ((span + width - 1) / width);
        long[] counts = new long[bins];
        for (int i = 0; i < n; i++) {
            counts[(int) ((periodTicks[i] - min) / width)]++;
        }
        double[] edges = new double[bins + 1];
        for (int b = 0; b <= bins; b++) {
            edges[b] = timebase.seconds(min + b * width);
        }
        return new PeriodHistogram(edges, counts);
    }

    /** The number of periods counted. */
    public long total() {
        long t = 0;
        for (long c : counts) {
            t += c;
        }
        return t;
    }
}
