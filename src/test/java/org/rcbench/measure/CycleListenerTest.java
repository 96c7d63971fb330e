package org.rcbench.measure;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * The cycles a {@link CycleMeter} reports to its {@link CycleListener}. The edges are constructed,
 * so the known answer is the construction: a 1 MHz clock, a rising edge every 1000 ticks, high for
 * 400 ticks, low for 600.
 */
class CycleListenerTest {
    record Cycle(long start, long high, long low, int flags) {
    }

    private static List<Cycle> run(Edges e, CycleMeter[] meter) {
        List<Cycle> got = new ArrayList<>();
        CycleMeter m = new CycleMeter(MeterConfig.of(0, Timebase.of(1e6)),
                (start, high, low, flags) -> got.add(new Cycle(start, high, low, flags)));
        e.feed(m);
        meter[0] = m;
        return got;
    }

    /** {@code n} cycles of 400/600 from tick {@code t0}, ending on a rising edge. */
    private static Edges square(long t0, int n) {
        return new Edges().cycles(t0, Edges.repeat(400, n), Edges.repeat(600, n));
    }

    @Test
    void everyCycleOfACleanWaveInOrderTheFirstStartingARun() {
        CycleMeter[] m = new CycleMeter[1];
        List<Cycle> got = run(square(0, 40), m);
        assertThat(got).hasSize(40);
        for (int i = 0; i < 40; i++) {
            assertThat(got.get(i)).isEqualTo(new Cycle(1000L * i, 400, 600, i == 0 ? CycleListener.NEW_RUN : 0));
        }
        assertThat(m[0].result().cycles()).isEqualTo(40);
    }

    @Test
    void theLongFirstCycleIsReportedAsSettling() {
        // Power-up: the first high lasts 700 ticks (the capacitor charges from 0 V), then 400/600.
        Edges e = new Edges().add(0, 0, EdgeSink.HIGH).add(700, 0, EdgeSink.LOW);
        e.cycles(1000, Edges.repeat(400, 39), Edges.repeat(600, 39));
        CycleMeter[] m = new CycleMeter[1];
        List<Cycle> got = run(e, m);
        assertThat(got.get(0)).isEqualTo(new Cycle(0, 700, 300, CycleListener.SETTLING | CycleListener.NEW_RUN));
        assertThat(got.get(1)).isEqualTo(new Cycle(1000, 400, 600, 0));
        assertThat(got).hasSize(40);
        assertThat(m[0].result().cycles()).isEqualTo(39);
        assertThat(m[0].result().irregularities().settlingCycles()).isEqualTo(1);
    }

    @Test
    void glitchesAreMergedAwayAndTheirCycleFlagged() {
        Edges e = new Edges();
        for (int i = 0; i < 40; i++) {
            long t = 1000L * i;
            e.add(t, 0, EdgeSink.HIGH);
            if (i == 10) { // a 10-tick dropout inside the high phase
                e.add(t + 200, 0, EdgeSink.LOW).add(t + 210, 0, EdgeSink.HIGH);
            }
            e.add(t + 400, 0, EdgeSink.LOW);
            if (i == 20) { // a 5-tick spike inside the low phase
                e.add(t + 700, 0, EdgeSink.HIGH).add(t + 705, 0, EdgeSink.LOW);
            }
        }
        e.add(40_000, 0, EdgeSink.HIGH);
        CycleMeter[] m = new CycleMeter[1];
        List<Cycle> got = run(e, m);
        assertThat(got).hasSize(40);
        assertThat(got.get(10)).isEqualTo(new Cycle(10_000, 400, 600, CycleListener.GLITCH_REMOVED));
        assertThat(got.get(20)).isEqualTo(new Cycle(20_000, 400, 600, CycleListener.GLITCH_REMOVED));
        assertThat(got).filteredOn(c -> c.flags() == 0).hasSize(37).allMatch(c -> c.high() == 400 && c.low() == 600);
        assertThat(m[0].result().irregularities().glitches()).isEqualTo(2);
    }

    @Test
    void noCycleSpansAGapOrALostEdge() {
        Edges e = square(0, 30);                          // rising edge at 30 000 ends cycle 29
        e.add(30_400, 0, EdgeSink.LOW).add(30_500, 0, EdgeSink.UNKNOWN); // cycle 30 is cut by the gap
        Edges after = square(31_000, 20);                 // 31 000 .. 51 000
        for (int k = 0; k < after.size; k++) {
            e.add(after.ticks[k], 0, after.levels[k]);
        }
        e.add(51_400, 0, EdgeSink.LOW).add(52_400, 0, EdgeSink.LOW); // a lost rising edge: 51 000 -> 52 000 is cut
        Edges tail = square(53_000, 5);
        for (int k = 0; k < tail.size; k++) {
            e.add(tail.ticks[k], 0, tail.levels[k]);
        }
        CycleMeter[] m = new CycleMeter[1];
        List<Cycle> got = run(e, m);
        assertThat(got).extracting(Cycle::start).doesNotContain(30_000L, 51_000L);
        assertThat(got).hasSize(30 + 20 + 5);
        assertThat(got).filteredOn(c -> (c.flags() & CycleListener.NEW_RUN) != 0).extracting(Cycle::start)
                .containsExactly(0L, 31_000L, 53_000L);
        assertThat(got).allMatch(c -> c.high() == 400 && c.low() == 600);
        assertThat(m[0].result().cycles()).isEqualTo(got.size());
    }
}
