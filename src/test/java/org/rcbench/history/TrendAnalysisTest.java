package org.rcbench.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.rcbench.units.Tolerance;

class TrendAnalysisTest {
    private static final Instant T0 = Instant.parse("2020-01-01T00:00:00Z");

    /** A trend of values at whole years 0, 1, 2, ... after T0; nominal 100, tolerance ±10 %. */
    private static PartTrend trend(double tolerance, double... values) {
        List<PartTrend.Point> pts = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            pts.add(new PartTrend.Point(i + 1, TrendAnalysis.at(T0, i), values[i], Double.NaN, Double.NaN));
        }
        return new PartTrend("B", "SN", "C1", "nF", 100, Double.isNaN(tolerance) ? null : Tolerance.symmetric(tolerance), pts);
    }

    @Test
    void exactLineCrossesItsBandWhereArithmeticSays() {
        // 100, 98, 96, 94 per year: slope -2 a year; 90 (= 100 * (1 - 0.10)) is reached at year 5.
        TrendAnalysis a = trend(0.10, 100, 98, 96, 94).analyse(10);
        assertThat(a.slopePerYear()).isCloseTo(-2.0, within(1e-9));
        assertThat(a.relativeSlopePerYear()).isCloseTo(-0.02, within(1e-11));
        assertThat(a.projection().kind()).isEqualTo(Projection.Kind.LEAVES_BAND);
        assertThat(a.projection().edge()).isCloseTo(90, within(1e-12));
        assertThat(a.projection().yearsFromLastRun()).isCloseTo(2.0, within(1e-9));
        assertThat(a.projection().crossing()).isBetween(TrendAnalysis.at(T0, 5).minusSeconds(1),
                TrendAnalysis.at(T0, 5).plusSeconds(1));
        assertThat(a.projection().text("90 nF")).startsWith("leaves its band (90 nF) around 2024-12"); // 5 mean years of 365.2425 days end on 2024-12-31
    }

    @Test
    void slopeErrorAndPValueMatchTheClosedForms() {
        // x = 0..3, y = 100 97 96 92: by hand Sxx = 5, Sxy = -12.5, b = -2.5, fitted 100 97.5 95 92.5,
        // SSE = 1.5, s^2 = 0.75, se(b) = sqrt(0.15). Student t with 2 degrees of freedom has the closed
        // form two-sided p = 1 - |t| / sqrt(t^2 + 2) (any statistics handbook, t distribution, nu = 2).
        TrendAnalysis a = trend(0.10, 100, 97, 96, 92).analyse(10);
        double se = Math.sqrt(0.15);
        double t = 2.5 / se;
        assertThat(a.slopePerYear()).isCloseTo(-2.5, within(1e-9));
        assertThat(a.slopeStdErrPerYear()).isCloseTo(se, within(1e-9));
        assertThat(a.slopePValue()).isCloseTo(1 - t / Math.sqrt(t * t + 2), within(1e-9));
        assertThat(a.slopePValue()).isLessThan(0.05);
    }

    @Test
    void crossingRangeIsWhereTheLinesConfidenceBandHoldsTheEdge() {
        // Same data: crossing of 90 at x = 1.5 + (90 - 96.25) / -2.5 = 4.0 years.
        TrendAnalysis a = trend(0.10, 100, 97, 96, 92).analyse(50);
        Projection p = a.projection();
        assertThat(p.kind()).isEqualTo(Projection.Kind.LEAVES_BAND);
        assertThat(p.yearsFromLastRun()).isCloseTo(1.0, within(1e-9));
        // Independent check by search: the 95 % confidence band of the mean line,
        // yhat(x) +- t(0.975, 2) s sqrt(1/n + (x - xbar)^2 / Sxx), with the closed form
        // t(q, 2) = (2q - 1) / sqrt(2 q (1 - q)); its ends are the x where the band's edge meets 90.
        double tq = 0.95 / Math.sqrt(2 * 0.975 * 0.025);
        double earliest = bisect(x -> contains(x, tq), 1.0, 4.0);
        double latest = bisect(x -> !contains(x, tq), 4.0, 200.0);
        assertThat(TrendAnalysis.years(T0, p.earliest())).isCloseTo(earliest, within(1e-6));
        assertThat(TrendAnalysis.years(T0, p.latest())).isCloseTo(latest, within(1e-6));
        assertThat(earliest).isLessThan(4.0);
        assertThat(latest).isGreaterThan(4.0);
    }

    /** True when the band at x (data above) contains 90. */
    private static boolean contains(double x, double t) {
        double yhat = 100 - 2.5 * x;
        double half = t * Math.sqrt(0.75) * Math.sqrt(0.25 + (x - 1.5) * (x - 1.5) / 5);
        return Math.abs(90 - yhat) <= half;
    }

    /** The x in [lo, hi] where {@code test} turns from false to true. */
    private static double bisect(java.util.function.DoublePredicate test, double lo, double hi) {
        assertThat(test.test(lo)).isFalse();
        assertThat(test.test(hi)).isTrue();
        for (int i = 0; i < 200; i++) {
            double mid = (lo + hi) / 2;
            if (test.test(mid)) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return (lo + hi) / 2;
    }

    @Test
    void noProjectionFromAFlatNoisyTrend() {
        TrendAnalysis a = trend(0.10, 100, 101, 99, 100.5, 99.5).analyse(10);
        assertThat(a.slopePValue()).isGreaterThan(0.05);
        assertThat(a.projection().kind()).isEqualTo(Projection.Kind.NOT_SIGNIFICANT);
        assertThat(a.projection().crossing()).isNull();
    }

    @Test
    void noProjectionFromTwoRuns() {
        TrendAnalysis a = trend(0.10, 100, 97).analyse(10);
        assertThat(a.slopePerYear()).isCloseTo(-3, within(1e-9));
        assertThat(a.slopeStdErrPerYear()).isNaN();
        assertThat(a.projection().kind()).isEqualTo(Projection.Kind.TOO_FEW_RUNS);
    }

    @Test
    void latestEstimateOutsideTheBandIsAlreadyOutside() {
        assertThat(trend(0.10, 100, 95, 88).analyse(10).projection().kind()).isEqualTo(Projection.Kind.ALREADY_OUTSIDE);
        assertThat(trend(0.10, 111).analyse(10).projection().edge()).isCloseTo(110, within(1e-12));
    }

    @Test
    void slowDriftIsNotWithinTheHorizon() {
        // -0.1 a year from 100: reaches 90 after 100 years.
        TrendAnalysis a = trend(0.10, 100, 99.9, 99.8, 99.7).analyse(10);
        assertThat(a.projection().kind()).isEqualTo(Projection.Kind.NOT_WITHIN_HORIZON);
        assertThat(a.projection().text("90 nF")).isEqualTo("not projected to leave its band within the next 10 years");
    }

    @Test
    void anAsymmetricBandIsLeftAtTheEdgeTheDriftHeadsFor() {
        // +50/-20 % around 100: the low edge is 80; -4 a year from 100 reaches it at year 5.
        List<PartTrend.Point> pts = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            pts.add(new PartTrend.Point(i + 1, TrendAnalysis.at(T0, i), 100 - 4.0 * i, Double.NaN, Double.NaN));
        }
        Projection p = new PartTrend("B", "SN", "C9", "uF", 100, new Tolerance(0.2, 0.5), pts).analyse(10).projection();
        assertThat(p.edge()).isCloseTo(80, within(1e-12));
        assertThat(p.yearsFromLastRun()).isCloseTo(2.0, within(1e-9));
    }

    @Test
    void unknownToleranceGivesNoProjection() {
        assertThat(trend(Double.NaN, 100, 98, 96).analyse(10).projection().kind())
                .isEqualTo(Projection.Kind.NO_TOLERANCE);
    }
}
