package org.rcbench.measure;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.rcbench.edge.Timebase;

/**
 * Calibration of the stated uncertainty: with a known true frequency, the expanded uncertainty
 * (k = 2) must cover the truth in about 95 % of seeded trials (GUM, JCGM 100:2008, section 6:
 * k = 2 gives roughly 95 % coverage for a near-normal result).
 */
class UncertaintyCoverageTest {
    private static final double CLOCK_HZ = 16e6;

    private static MeterConfig config() {
        return MeterConfig.of(0, Timebase.of(CLOCK_HZ));
    }

    @Test
    void jitteredTimerIsCoveredAboutNinetyFivePercent() {
        // White frequency noise of 2 ticks per period (a 555's threshold noise) plus quantization.
        SplittableRandom random = new SplittableRandom(20240601);
        int trials = 400;
        int covered = 0;
        for (int trial = 0; trial < trials; trial++) {
            double period = 23_000 + random.nextDouble() * 1000;
            CycleMeter meter = new CycleMeter(config());
            Synth.astable(meter, 0, 2000, period, 0.52, 2.0, 0.2, random.nextDouble() * period, random);
            Measurement.FrequencyEstimate f = meter.result().frequency();
            double truth = CLOCK_HZ / period;
            assertThat(f.quantizationDecorrelated()).isTrue();
            if (Math.abs(f.frequencyHz() - truth) <= f.expandedHz()) {
                covered++;
            }
        }
        assertThat(covered / (double) trials).isBetween(0.90, 0.99);
    }

    @Test
    void cleanPeriodAtWholeTicksUsesTheFloorAndIsCoveredAboutNinetyFivePercent() {
        // A clean period within 2/N tick of a whole number reads the same every cycle for most
        // start phases. Keeping only those trials, a flat prior on the true period gives a
        // triangular posterior of half-width q/N; the floor q/(sqrt(6) N) is its standard deviation,
        // so k = 2 covers 1 - (1 - 2/sqrt(6))^2 = 96.6 % (derived). A claim that averages the
        // quantization down (q / N^1.5 for the least-squares slope) would cover far less.
        SplittableRandom random = new SplittableRandom(99);
        int cycles = 1000;
        int kept = 0;
        int covered = 0;
        int coveredByAveragingClaim = 0;
        for (int trial = 0; trial < 1500 && kept < 400; trial++) {
            double period = 20_000 + (random.nextDouble() * 4 - 2) / cycles;
            CycleMeter meter = new CycleMeter(config());
            Synth.astable(meter, 0, cycles, period, 0.5, 0, 0, random.nextDouble(), random);
            Measurement m = meter.result();
            if (m.period().maxSeconds() != m.period().minSeconds()) {
                continue;
            }
            kept++;
            Measurement.FrequencyEstimate f = m.frequency();
            assertThat(f.quantizationDecorrelated()).isFalse();
            double truth = CLOCK_HZ / period;
            double error = Math.abs(f.frequencyHz() - truth);
            if (error <= f.expandedHz()) {
                covered++;
            }
            double averagingClaim = 2 * f.frequencyHz() / period * Math.sqrt(1.0 / (cycles * (double) cycles * cycles));
            if (error <= averagingClaim) {
                coveredByAveragingClaim++;
            }
        }
        assertThat(kept).isGreaterThanOrEqualTo(300);
        assertThat(covered / (double) kept).isBetween(0.90, 0.99);
        assertThat(coveredByAveragingClaim / (double) kept).isLessThan(0.5);
    }

    @Test
    void probeClockToleranceDominatesWhenLarge() {
        // GUM combination: a 50 ppm standard uncertainty on the clock gives 50 ppm of frequency.
        SplittableRandom random = new SplittableRandom(1);
        CycleMeter meter = new CycleMeter(MeterConfig.of(0, new Timebase(CLOCK_HZ, 0, 50)));
        Synth.astable(meter, 0, 500, 23_188.4, 0.52, 1.0, 0, 0, random);
        Measurement.FrequencyEstimate f = meter.result().frequency();
        assertThat(f.clockHz() / f.frequencyHz()).isCloseTo(50e-6, org.assertj.core.api.Assertions.within(1e-12));
        assertThat(f.combinedHz()).isGreaterThanOrEqualTo(f.clockHz());
        assertThat(f.expandedHz()).isEqualTo(2 * f.combinedHz());
    }

    @Test
    void knownClockOffsetMovesTheFrequency() {
        // Timebase definition: a probe clock running +100 ppm fast counts 100 ppm more ticks per second.
        CycleMeter plain = new CycleMeter(MeterConfig.of(0, Timebase.of(CLOCK_HZ)));
        CycleMeter offset = new CycleMeter(MeterConfig.of(0, new Timebase(CLOCK_HZ, 100, 0)));
        Synth.astable(plain, 0, 300, 23_188.4, 0.52, 1.0, 0, 0, new SplittableRandom(2));
        Synth.astable(offset, 0, 300, 23_188.4, 0.52, 1.0, 0, 0, new SplittableRandom(2));
        double ratio = offset.result().frequency().frequencyHz() / plain.result().frequency().frequencyHz();
        assertThat(ratio).isCloseTo(1 + 100e-6, org.assertj.core.api.Assertions.within(1e-12));
    }
}
