package org.rcbench.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.rcbench.edge.Timebase;
import org.rcbench.history.CheckContent.FrequencyPoint;
import org.rcbench.history.CheckContent.PeriodHistogram;

class CapturePlotsTest {
    @Test
    void histogramBinsAreWholeTicksCentredOnTheQuantizedPeriods() {
        // periods 999, 1000, 1000, 1001 ticks repeated 250 times: 1000 cycles, back to back, 1 MHz clock.
        int n = 1000;
        long[] periods = new long[n];
        long[] starts = new long[n];
        long t = 0;
        for (int i = 0; i < n; i++) {
            periods[i] = switch (i % 4) {
                case 0 -> 999;
                case 3 -> 1001;
                default -> 1000;
            };
            starts[i] = t;
            t += periods[i];
        }
        CapturePlots p = CapturePlots.of(starts, periods, Timebase.of(1e6));
        PeriodHistogram h = p.histogram();
        assertThat(h.counts()).containsExactly(250, 500, 250);
        assertThat(h.edgesSeconds()[0]).isCloseTo(998.5e-6, within(1e-15));
        assertThat(h.edgesSeconds()[3]).isCloseTo(1001.5e-6, within(1e-15));
        assertThat(h.below() + h.above()).isZero();
        // 1000 cycles in 200 points of 5 cycles; points of 5 cycles alternate in length, but every four
        // cycles take exactly 4000 ticks, so the first point, cycles 0-4 (999+1000+1000+1001+999 = 4999
        // ticks), is 5 / 4.999 ms = 1000.2 Hz at its middle 2499.5 us.
        assertThat(p.trend()).hasSize(200);
        FrequencyPoint first = p.trend().get(0);
        assertThat(first.frequencyHz()).isCloseTo(5 / 4999e-6, within(1e-9));
        assertThat(first.tSeconds()).isCloseTo(2499.5e-6, within(1e-15));
    }

    @Test
    void trendPointsDoNotSpanABreak() {
        // 400 cycles of 1000 ticks: points of 2 cycles; a break (5000 lost ticks) before cycle 201.
        int n = 400;
        long[] starts = new long[n];
        long[] periods = new long[n];
        for (int i = 0; i < n; i++) {
            periods[i] = 1000;
            starts[i] = 1000L * i + (i >= 201 ? 5000 : 0);
        }
        CapturePlots p = CapturePlots.of(starts, periods, Timebase.of(1e6));
        // 100 points before the break, cycle 200 alone, then 100 points from cycle 201 (the last one single).
        assertThat(p.trend()).hasSize(201);
        assertThat(p.trend().get(100).tSeconds()).isCloseTo(200_500e-6, within(1e-12));
        assertThat(p.trend().get(101).tSeconds()).isCloseTo(207_000e-6, within(1e-12));
        assertThat(p.trend()).allSatisfy(f -> assertThat(f.frequencyHz()).isCloseTo(1000, within(1e-9)));
    }

    @Test
    void outliersBeyondTheQuantilesAreCountedNotBinned() {
        int n = 2000;
        long[] periods = new long[n];
        long[] starts = new long[n];
        for (int i = 0; i < n; i++) {
            periods[i] = 1000;
            starts[i] = 1000L * i;
        }
        periods[0] = 1580; // a long first cycle after power-up
        starts[1] = 1580;
        for (int i = 2; i < n; i++) {
            starts[i] = starts[i - 1] + periods[i - 1];
        }
        PeriodHistogram h = CapturePlots.of(starts, periods, Timebase.of(1e6)).histogram();
        assertThat(h.counts()).containsExactly(1999);
        assertThat(h.above()).isEqualTo(1);
    }
}
