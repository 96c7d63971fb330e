package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Min/max decimation for the waveform strip: no pulse may vanish between pixel columns. */
class MinMaxColumnsTest {
    @Test
    void oneColumnPerTickReproducesTheLevels() {
        // Two cycles: high 3 ticks, low 2 ticks, from tick 10.
        long[] start = {10, 15};
        long[] high = {3, 3};
        long[] low = {2, 2};
        int[] min = new int[10];
        int[] max = new int[10];
        MinMaxColumns.decimate(start, high, low, 0, 2, 10, 20, 10, min, max);
        assertThat(min).containsExactly(1, 1, 1, 0, 0, 1, 1, 1, 0, 0);
        assertThat(max).containsExactly(1, 1, 1, 0, 0, 1, 1, 1, 0, 0);
    }

    @Test
    void aRuntPulseNarrowerThanAColumnStillShowsBothLevels() {
        // A 1-tick high pulse inside a 100-tick column.
        long[] start = {0, 1};
        long[] high = {1, 1};
        long[] low = {1, 998};
        int[] min = new int[10];
        int[] max = new int[10];
        MinMaxColumns.decimate(start, high, low, 0, 2, 0, 1000, 10, min, max);
        assertThat(min[0]).isEqualTo(0);
        assertThat(max[0]).isEqualTo(1);
        for (int c = 1; c < 10; c++) {
            assertThat(min[c]).isEqualTo(0);
            assertThat(max[c]).isEqualTo(0);
        }
    }

    @Test
    void aBreakBetweenCyclesIsNoData() {
        // Cycle 0 ends at 10; cycle 1 starts at 20 (a gap from 10 to 20).
        long[] start = {0, 20};
        long[] high = {5, 5};
        long[] low = {5, 5};
        int[] min = new int[3];
        int[] max = new int[3];
        MinMaxColumns.decimate(start, high, low, 0, 2, 0, 30, 3, min, max);
        assertThat(min).containsExactly(0, -1, 0);
        assertThat(max).containsExactly(1, -1, 1);
    }

    @Test
    void manyCyclesPerColumnGiveFullSwingEverywhere() {
        int n = 1000;
        long[] start = new long[n];
        long[] high = new long[n];
        long[] low = new long[n];
        for (int i = 0; i < n; i++) {
            start[i] = 7L * i;
            high[i] = 3;
            low[i] = 4;
        }
        int[] min = new int[50];
        int[] max = new int[50];
        MinMaxColumns.decimate(start, high, low, 0, n, 0, 7L * n, 50, min, max);
        for (int c = 0; c < 50; c++) {
            assertThat(min[c]).isZero();
            assertThat(max[c]).isEqualTo(1);
        }
    }
}
