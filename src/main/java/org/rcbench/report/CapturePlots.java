package org.rcbench.report;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.rcbench.capture.Capture;
import org.rcbench.edge.Timebase;
import org.rcbench.history.CheckContent.FrequencyPoint;
import org.rcbench.history.CheckContent.PeriodHistogram;

/**
 * A period histogram and a decimated frequency trend computed from a capture's raw cycles
 * ({@link CycleExtractor}: settling cycles and glitches are not excluded), for runs whose check
 * document carries no plot data.
 *
 * <p>Histogram: bins a whole number of probe ticks wide, edges half a tick off the tick grid so
 * every quantized period falls inside a bin; the range is the 0.1 % to 99.9 % quantiles of the
 * periods (the rest counted as below/above), at most {@value #BINS} bins. Trend: at most
 * {@value #TREND_POINTS} points, each the mean frequency (cycles over their summed periods) of a
 * run of consecutive cycles that spans no gap, at the run's middle time. Holds the cycles in
 * primitive arrays (16 bytes per cycle). Not thread-safe.
 *
 * @param histogram the period histogram, or null with no cycle
 * @param trend     the frequency trend, empty with no cycle
 * @param cycles    cycles used
 */
public record CapturePlots(PeriodHistogram histogram, List<FrequencyPoint> trend, long cycles) {
    /** Most histogram bins. */
    public static final int BINS = 60;
    /** Most trend points. */
    public static final int TREND_POINTS = 200;

    /** Reads {@code capture}'s channel {@code channel} once. */
    public static CapturePlots of(Capture capture, int channel) throws IOException {
        long[][] buf = {new long[1024], new long[1024]};
        int[] n = {0};
        CycleExtractor extractor = new CycleExtractor(channel, (start, high, period) -> {
            if (n[0] == buf[0].length) {
                buf[0] = Arrays.copyOf(buf[0], n[0] * 2);
                buf[1] = Arrays.copyOf(buf[1], n[0] * 2);
            }
            buf[0][n[0]] = start;
            buf[1][n[0]] = period;
            n[0]++;
        });
        capture.streamTo(extractor::onEdge);
        return of(Arrays.copyOf(buf[0], n[0]), Arrays.copyOf(buf[1], n[0]), capture.timebase());
    }

    /** The plots of cycles starting at {@code starts} with {@code periods} (ticks of {@code tb}). */
    static CapturePlots of(long[] starts, long[] periods, Timebase tb) {
        int n = periods.length;
        if (n == 0) {
            return new CapturePlots(null, List.of(), 0);
        }
        return new CapturePlots(histogram(periods, tb), trend(starts, periods, tb), n);
    }

    private static PeriodHistogram histogram(long[] periods, Timebase tb) {
        long[] sorted = periods.clone();
        Arrays.sort(sorted);
        int n = sorted.length;
        long lo = sorted[(int) Math.floor(0.001 * (n - 1))];
        long hi = sorted[(int) Math.ceil(0.999 * (n - 1))];
        long width = Math.max(1, (hi - lo + BINS) / BINS); // ceil((hi - lo + 1) / BINS)
        int bins = (int) ((hi - lo) / width) + 1;
        long[] counts = new long[bins];
        long below = 0;
        long above = 0;
        for (long p : periods) {
            if (p < lo) {
                below++;
            } else if (p > lo + bins * width - 1) {
                above++;
            } else {
                counts[(int) ((p - lo) / width)]++;
            }
        }
        double[] edges = new double[bins + 1];
        for (int i = 0; i <= bins; i++) {
            edges[i] = (lo - 0.5 + i * (double) width) / tb.ticksPerSecond();
        }
        return new PeriodHistogram(edges, counts, below, above);
    }

    private static List<FrequencyPoint> trend(long[] starts, long[] periods, Timebase tb) {
        int n = periods.length;
        int per = (n + TREND_POINTS - 1) / TREND_POINTS;
        List<FrequencyPoint> out = new ArrayList<>();
        int i = 0;
        while (i < n) {
            int first = i;
            long sum = periods[i++];
            // extend the run while cycles follow each other without a break
            while (i < n && i - first < per && starts[i] == starts[i - 1] + periods[i - 1]) {
                sum += periods[i++];
            }
            long end = starts[first] + sum;
            out.add(new FrequencyPoint(tb.seconds(starts[first] + end) / 2, (i - first) / tb.seconds(sum)));
        }
        return out;
    }
}
