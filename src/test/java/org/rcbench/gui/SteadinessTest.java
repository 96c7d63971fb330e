package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** The "settling" test: do the newest cycles agree with the ones before them? */
class SteadinessTest {
    private static int fill(long[] high, long[] low, int n, double period, double noise, double driftPerCycle,
            long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double p = period;
        for (int i = 0; i < n; i++) {
            long q = Math.round(p + noise * TestCaptures.gauss(r));
            high[i] = q / 2;
            low[i] = q - q / 2;
            p *= 1 + driftPerCycle;
        }
        return n;
    }

    @Test
    void aStationarySignalIsSteadyAcrossSeeds() {
        long[] h = new long[600];
        long[] l = new long[600];
        int steady = 0;
        for (long seed = 0; seed < 50; seed++) {
            fill(h, l, 600, 23188, 40, 0, seed);
            steady += Steadiness.steady(h, l, 600, 256) ? 1 : 0;
        }
        // Three sigma: well under 1 % false alarms expected; allow 2 of 50.
        assertThat(steady).isGreaterThanOrEqualTo(48);
    }

    @Test
    void aDriftOfAThousandthOverTheWindowIsNotSteady() {
        long[] h = new long[600];
        long[] l = new long[600];
        fill(h, l, 600, 23188, 4, 1e-3 / 256, 1);
        assertThat(Steadiness.steady(h, l, 600, 256)).isFalse();
    }

    @Test
    void driftBelowTheHundredPpmFloorCountsAsSteady() {
        long[] h = new long[600];
        long[] l = new long[600];
        // 50 ppm between the halves, noiseless: below the 100 ppm floor.
        fill(h, l, 600, 23188, 0, 50e-6 / 256, 1);
        assertThat(Steadiness.steady(h, l, 600, 256)).isTrue();
    }

    @Test
    void tooFewCyclesAreNotYetSteady() {
        long[] h = new long[40];
        long[] l = new long[40];
        fill(h, l, 31, 23188, 0, 0, 1);
        assertThat(Steadiness.steady(h, l, 31, 256)).isFalse();
        fill(h, l, 32, 23188, 0, 0, 1);
        assertThat(Steadiness.steady(h, l, 32, 256)).isTrue();
    }
}
