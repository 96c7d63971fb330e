package org.rcbench.measure;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.junit.jupiter.api.Test;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.stability.AllanDeviation;
import org.rcbench.stability.StabilityPoint;

/** Figures against published definitions and against Commons Math on the same data. */
class CycleMeterReferenceTest {
    private static MeterConfig config(double clockHz) {
        // Settling tolerance wide open: these vectors are not power-up transients.
        return MeterConfig.of(0, Timebase.of(clockHz)).withSettleTolerance(0.99);
    }

    @Test
    void jedecStyleJitterVector() {
        // Check values: JEDEC JESD65B definitions, vector from check-values.md (derived): periods
        // 1.0 1.1 0.8 1.1 1.05 s -> sd(N-1) 0.1244990, pk-pk 0.30, c2c max 0.30, c2c RMS 0.2193741.
        long[] periods = {1000, 1100, 800, 1100, 1050};
        long[] high = new long[5];
        long[] low = new long[5];
        for (int k = 0; k < 5; k++) {
            high[k] = periods[k] / 2;
            low[k] = periods[k] - high[k];
        }
        CycleMeter meter = new CycleMeter(config(1000));
        new Edges().cycles(100, high, low).feed(meter);
        Measurement m = meter.result();
        assertThat(m.cycles()).isEqualTo(5);
        assertThat(m.jitter().periodRmsSeconds()).isCloseTo(0.1244990, within(1e-7));
        assertThat(m.jitter().periodPeakToPeakSeconds()).isCloseTo(0.30, within(1e-12));
        assertThat(m.jitter().cycleToCycleMaxSeconds()).isCloseTo(0.30, within(1e-12));
        assertThat(m.jitter().cycleToCycleRmsSeconds()).isCloseTo(0.2193741, within(1e-7));
        assertThat(m.period().meanSeconds()).isCloseTo(1.01, within(1e-12));
    }

    @Test
    void ituG810TimeErrorVector() {
        // Check values: ITU-T G.810 TIE/MTIE definitions, vector from check-values.md (derived):
        // edges 0 1.0 2.1 2.9 4.0 5.05 with T0 = 1 -> TIE 0 0 0.1 -0.1 0 0.05, MTIE = 0.2 for n = 1..5.
        TimeErrorRecord record = new TimeErrorRecord(16, 100);
        long[] edges = {0, 100, 210, 290, 400, 505};
        for (int i = 0; i < edges.length; i++) {
            record.add(0, i, edges[i], () -> 100);
        }
        double[] mtie = record.windowMtie(100, new long[] {1, 2, 3, 4, 5});
        assertThat(mtie).containsExactly(new double[] {20, 20, 20, 20, 20}, within(1e-9));
        assertThat(record.wholeMtie(100)).isCloseTo(20, within(1e-9));
    }

    @Test
    void statisticsAgreeWithCommonsMath() {
        SplittableRandom random = new SplittableRandom(7);
        int n = 3000;
        long[] high = new long[n];
        long[] low = new long[n];
        for (int k = 0; k < n; k++) {
            high[k] = 52_000 + random.nextInt(-400, 400);
            low[k] = 48_000 + random.nextInt(-400, 400);
        }
        Edges edges = new Edges().cycles(12_345, high, low);
        CycleMeter meter = new CycleMeter(config(16e6));
        edges.feed(meter);
        Measurement m = meter.result();

        // Reference: Apache Commons Math 3.6.1 DescriptiveStatistics and SimpleRegression.
        DescriptiveStatistics periods = new DescriptiveStatistics();
        DescriptiveStatistics highs = new DescriptiveStatistics();
        SimpleRegression fit = new SimpleRegression();
        long t = 12_345;
        fit.addData(0, t);
        for (int k = 0; k < n; k++) {
            periods.addValue(high[k] + low[k]);
            highs.addValue(high[k]);
            t += high[k] + low[k];
            fit.addData(k + 1, t);
        }
        double tick = 1 / 16e6;
        assertThat(m.cycles()).isEqualTo(n);
        assertThat(m.period().meanSeconds()).isCloseTo(periods.getMean() * tick, within(1e-15));
        assertThat(m.period().stdDevSeconds()).isCloseTo(periods.getStandardDeviation() * tick, within(1e-15));
        assertThat(m.high().stdDevSeconds()).isCloseTo(highs.getStandardDeviation() * tick, within(1e-15));
        assertThat(m.frequency().periodSeconds()).isCloseTo(fit.getSlope() * tick, within(1e-15));
        double tieRms = Math.sqrt(fit.getSumSquaredErrors() / fit.getN()) * tick;
        assertThat(m.timeError().tieRmsSeconds()).isCloseTo(tieRms, within(tieRms * 1e-6));
        assertThat(m.duty()).isCloseTo(highs.getMean() / periods.getMean(), within(1e-12));
    }

    @Test
    void streamingAllanMatchesStridedEstimatorOnSamePhase() {
        // Reference: NIST SP 1065 section 5.2.4 estimator as implemented (and checked) in stability;
        // the stream uses stride max(1, m/8), which is exact for the same terms.
        SplittableRandom random = new SplittableRandom(3);
        int n = 5000;
        long[] high = new long[n];
        long[] low = new long[n];
        for (int k = 0; k < n; k++) {
            high[k] = 10_000 + random.nextInt(-30, 30);
            low[k] = 9_000 + random.nextInt(-30, 30);
        }
        Edges edges = new Edges().cycles(0, high, low);
        CycleMeter meter = new CycleMeter(config(1e6));
        edges.feed(meter);
        Measurement m = meter.result();
        double[] phase = new double[n + 1];
        for (int k = 0; k < n; k++) {
            phase[k + 1] = phase[k] + (high[k] + low[k]) / 1e6;
        }
        double tau0 = m.frequency().periodSeconds();
        assertThat(m.allan()).isNotEmpty();
        for (int k = 0; k < m.allan().size(); k++) {
            int mm = 1 << k;
            StabilityPoint expected = AllanDeviation.strided(phase, tau0, mm, Math.max(1, mm / 8));
            StabilityPoint actual = m.allan().get(k);
            assertThat(actual.terms()).isEqualTo(expected.terms());
            assertThat(actual.deviation()).isCloseTo(expected.deviation(), within(expected.deviation() * 1e-9));
            assertThat(actual.tauSeconds()).isCloseTo(mm * tau0, within(1e-15));
        }
    }

    @Test
    void mtieAgainstBruteForceOverFittedResiduals() {
        // Reference: ITU-T G.810 definition evaluated directly on the residuals of the
        // Commons Math regression of edge time on cycle index.
        SplittableRandom random = new SplittableRandom(5);
        CycleMeter meter = new CycleMeter(config(1e6).withMtieWindowsCycles(java.util.List.of(1L, 7L, 50L)));
        Edges edges = new Edges();
        double t = 0;
        int n = 400;
        long[] rising = new long[n + 1];
        for (int k = 0; k <= n; k++) {
            rising[k] = (long) Math.floor(t);
            edges.add(rising[k], 0, EdgeSink.HIGH);
            if (k < n) {
                double p = 2000 + 3 * Synth.gauss(random);
                edges.add((long) Math.floor(t + p / 2), 0, EdgeSink.LOW);
                t += p;
            }
        }
        edges.feed(meter);
        Measurement m = meter.result();
        SimpleRegression fit = new SimpleRegression();
        for (int k = 0; k <= n; k++) {
            fit.addData(k, rising[k]);
        }
        double[] residual = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            residual[k] = rising[k] - fit.predict(k);
        }
        long[] windows = {1, 7, 50};
        for (int w = 0; w < windows.length; w++) {
            double best = 0;
            for (int s = 0; s + windows[w] <= n; s++) {
                double lo = Double.POSITIVE_INFINITY;
                double hi = Double.NEGATIVE_INFINITY;
                for (int k = s; k <= s + windows[w]; k++) {
                    lo = Math.min(lo, residual[k]);
                    hi = Math.max(hi, residual[k]);
                }
                best = Math.max(best, hi - lo);
            }
            assertThat(m.timeError().windows().get(w).mtieSeconds()).isCloseTo(best / 1e6, within(1e-12));
        }
        assertThat(m.timeError().resolutionCycles()).isEqualTo(1);
    }
}
