package org.rcbench.measure;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.constraints.LongRange;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/** Invariants of the measurement that hold for any signal. */
class CycleMeterProperties {
    private static Edges signal(long seed, int cycles) {
        SplittableRandom r = new SplittableRandom(seed);
        Edges e = new Edges();
        long t = r.nextLong(0, 1_000_000);
        for (int k = 0; k < cycles; k++) {
            e.add(t, 0, EdgeSink.HIGH);
            long high = 5000 + r.nextInt(-50, 50);
            e.add(t + high, 0, EdgeSink.LOW);
            t += high + 4500 + r.nextInt(-50, 50);
            if (r.nextInt(200) == 0) {
                e.add(t - 10, 0, EdgeSink.UNKNOWN);
                t += r.nextInt(100_000);
            }
        }
        e.add(t, 0, EdgeSink.HIGH);
        return e;
    }

    @Property(tries = 50)
    void otherChannelsInterleavedAnywhereChangeNothing(@ForAll long seed, @ForAll @IntRange(min = 20, max = 400) int cycles,
            @ForAll long noiseSeed) {
        Edges e = signal(seed, cycles);
        CycleMeter alone = new CycleMeter(MeterConfig.of(0, Timebase.of(1e6)));
        e.feed(alone);
        CycleMeter mixed = new CycleMeter(MeterConfig.of(0, Timebase.of(1e6)));
        SplittableRandom r = new SplittableRandom(noiseSeed);
        for (int k = 0; k < e.size; k++) {
            while (r.nextInt(3) == 0) {
                int level = r.nextInt(3) - 1;
                mixed.onEdge(e.ticks[k], 1 + r.nextInt(8), level);
            }
            mixed.onEdge(e.ticks[k], 0, e.levels[k]);
        }
        mixed.onEnd(e.last());
        assertThat(mixed.result()).isEqualTo(alone.result());
    }

    @Property(tries = 30)
    void scalingTicksAndClockTogetherLeavesSecondsUnchanged(@ForAll long seed,
            @ForAll @IntRange(min = 20, max = 300) int cycles, @ForAll @LongRange(min = 2, max = 50) long scale) {
        Edges e = signal(seed, cycles);
        CycleMeter base = new CycleMeter(MeterConfig.of(0, Timebase.of(1e6)));
        e.feed(base);
        CycleMeter scaled = new CycleMeter(MeterConfig.of(0, Timebase.of(1e6 * scale)));
        for (int k = 0; k < e.size; k++) {
            scaled.onEdge(e.ticks[k] * scale, 0, e.levels[k]);
        }
        scaled.onEnd(e.last() * scale);
        Measurement a = base.result();
        Measurement b = scaled.result();
        assertThat(b.cycles()).isEqualTo(a.cycles());
        assertThat(b.irregularities()).isEqualTo(a.irregularities());
        assertThat(b.frequency().frequencyHz()).isCloseTo(a.frequency().frequencyHz(),
                org.assertj.core.api.Assertions.within(a.frequency().frequencyHz() * 1e-12));
        assertThat(b.high().meanSeconds()).isCloseTo(a.high().meanSeconds(),
                org.assertj.core.api.Assertions.within(a.high().meanSeconds() * 1e-12));
        assertThat(b.jitter().periodRmsSeconds()).isCloseTo(a.jitter().periodRmsSeconds(),
                org.assertj.core.api.Assertions.within(a.jitter().periodRmsSeconds() * 1e-9));
        assertThat(b.timeError().mtieSeconds()).isCloseTo(a.timeError().mtieSeconds(),
                org.assertj.core.api.Assertions.within(1e-12));
    }

    @Property(tries = 30)
    void snapshotAtTheEndEqualsResultWithoutWindows(@ForAll long seed, @ForAll @IntRange(min = 0, max = 200) int cycles) {
        Edges e = signal(seed, cycles);
        CycleMeter meter = new CycleMeter(MeterConfig.of(0, Timebase.of(1e6)));
        e.feed(meter);
        Measurement snap = meter.snapshot();
        Measurement full = meter.result();
        assertThat(snap.frequency()).isEqualTo(full.frequency());
        assertThat(snap.cycles()).isEqualTo(full.cycles());
        assertThat(Double.compare(snap.timeError().mtieSeconds(), full.timeError().mtieSeconds())).isZero();
    }
}
