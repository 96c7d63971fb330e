package org.rcbench.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The bounded MTIE record against the ITU-T G.810 definition evaluated directly. */
class TimeErrorRecordTest {
    private static final double SLOPE = 1000.25;

    private static long[] walk(int n) {
        SplittableRandom r = new SplittableRandom(8);
        long[] t = new long[n];
        double x = 0;
        for (int i = 0; i < n; i++) {
            t[i] = (long) Math.floor(i * SLOPE + x);
            x += 3 * Synth.gauss(r);
        }
        return t;
    }

    /** Exact MTIE(n) of {@code t_i - slope i} by brute force (ITU-T G.810 definition). */
    private static double brute(long[] t, double slope, long window) {
        double best = 0;
        for (int s = 0; s + window < t.length; s++) {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (int i = s; i <= s + window; i++) {
                double u = t[i] - slope * i;
                lo = Math.min(lo, u);
                hi = Math.max(hi, u);
            }
            best = Math.max(best, hi - lo);
        }
        return best;
    }

    @Test
    void mergedBlocksStillBracketTheExactMtie() {
        long[] t = walk(4000);
        TimeErrorRecord record = new TimeErrorRecord(256, 1000);
        for (int i = 0; i < t.length; i++) {
            record.add(0, i, t[i], () -> SLOPE);
        }
        assertThat(record.blockLength()).isEqualTo(16);
        assertThat(record.wholeMtie(SLOPE)).isCloseTo(brute(t, SLOPE, t.length - 1), within(1e-6));
        long[] windows = {63, 255, 1023};
        double[] got = record.windowMtie(SLOPE, windows);
        for (int w = 0; w < windows.length; w++) {
            // Whole blocks: between the exact MTIE one block shorter and the window itself.
            assertThat(got[w]).isBetween(brute(t, SLOPE, windows[w] - 16) - 1e-6, brute(t, SLOPE, windows[w]) + 1e-6);
        }
    }

    @Test
    void segmentsAreNeverJoined() {
        TimeErrorRecord record = new TimeErrorRecord(64, 100);
        for (int i = 0; i < 10; i++) {
            record.add(0, i, 100L * i, () -> 100);
        }
        for (int i = 0; i < 10; i++) {
            record.add(1, i, 100L * i + 7 * (i % 2), () -> 100);
        }
        assertThat(record.wholeMtie(100)).isCloseTo(7, within(1e-9));
        assertThat(record.windowMtie(100, new long[] {1, 12})[0]).isCloseTo(7, within(1e-9));
        assertThat(record.windowMtie(100, new long[] {1, 12})[1]).isNaN();
    }
}
