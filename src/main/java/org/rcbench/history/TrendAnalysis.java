package org.rcbench.history;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.rcbench.units.Tolerance;

/**
 * A part's drift over a unit's runs: the least-squares line of estimated value against time and
 * when that line leaves the part's tolerance band.
 *
 * <p>The line is an ordinary least-squares fit ({@link SimpleRegression}, Commons Math) of value
 * against years since the first run (a year is 365.2425 days). The slope's standard error and its
 * two-sided p-value against zero come from the same fit (Student t with n - 2 degrees of freedom).
 * The band is the part's tolerance band around nominal ({@code nominal * (1 - minus)} to
 * {@code nominal * (1 + plus)}).
 *
 * <p>Projection: none from fewer than {@value #MIN_RUNS} runs, none when the slope is not
 * significantly different from zero at the 5 % level, "already outside" when the latest estimate or
 * the fitted line at the latest run lies outside the band. Otherwise the crossing is where the
 * fitted line meets the band edge it heads for, and its 95 % range is the set of times at which the
 * line's 95 % confidence band contains that edge: the roots of
 * {@code (y0 - ȳ - b u)² = t² s² (1/n + u²/Sxx)}, {@code u = x - x̄} (Fieller's theorem applied to
 * inverse prediction from a straight line, as in the calibration problem of regression textbooks,
 * e.g. Draper &amp; Smith, Applied Regression Analysis; chapter from memory). With the slope
 * significant at the same 5 % level that set is a finite interval. It accounts for the scatter of the
 * estimates about the line, not for a drift that is not straight (a capacitor's ageing slows with
 * time): read it as "if it keeps going as it has".
 *
 * @param trend                the data
 * @param runs                 number of points fitted
 * @param spanYears            time from first to last run, years
 * @param slopePerYear         fitted slope, unit per year (NaN with fewer than 2 distinct times)
 * @param slopeStdErrPerYear   standard error of the slope, unit per year (NaN with fewer than 3 runs)
 * @param slopePValue          two-sided p-value of the slope against zero (NaN with fewer than 3 runs)
 * @param relativeSlopePerYear slope over nominal, per year (-0.02 for 2 % a year down)
 * @param projection           when it leaves the band, or why that is not said
 */
public record TrendAnalysis(PartTrend trend, int runs, double spanYears, double slopePerYear,
        double slopeStdErrPerYear, double slopePValue, double relativeSlopePerYear, Projection projection) {

    /** Fewest runs a projection is made from. */
    public static final int MIN_RUNS = 3;
    /** Significance level of the slope test and the crossing range (95 %). */
    public static final double ALPHA = 0.05;
    /** Seconds in a mean Gregorian year. */
    public static final double SECONDS_PER_YEAR = 365.2425 * 86400;

    /** Fits and projects {@code trend}, looking {@code horizonYears} (&gt; 0) past its last run. */
    public static TrendAnalysis of(PartTrend trend, double horizonYears) {
        if (!(horizonYears > 0)) {
            throw new IllegalArgumentException("horizonYears <= 0: " + horizonYears);
        }
        List<PartTrend.Point> pts = new ArrayList<>();
        for (PartTrend.Point p : trend.points()) {
            if (Double.isFinite(p.value())) {
                pts.add(p);
            }
        }
        int n = pts.size();
        if (n == 0) {
            return new TrendAnalysis(trend, 0, 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Projection.none(Projection.Kind.TOO_FEW_RUNS, horizonYears));
        }
        Instant first = pts.get(0).recordedAt();
        Instant last = pts.get(n - 1).recordedAt();
        SimpleRegression fit = new SimpleRegression();
        double sumX = 0;
        for (PartTrend.Point p : pts) {
            double x = years(first, p.recordedAt());
            fit.addData(x, p.value());
            sumX += x;
        }
        double xLast = years(first, last);
        double slope = fit.getSlope();
        double se = n >= 3 ? fit.getSlopeStdErr() : Double.NaN;
        double pValue = n >= 3 ? fit.getSignificance() : Double.NaN;
        double rel = slope / trend.nominal();
        Projection projection = project(trend, pts, fit, sumX / n, xLast, first, last, horizonYears);
        return new TrendAnalysis(trend, n, xLast, slope, se, pValue, rel, projection);
    }

    private static Projection project(PartTrend trend, List<PartTrend.Point> pts, SimpleRegression fit, double xMean,
            double xLast, Instant first, Instant last, double horizon) {
        Tolerance tol = trend.tolerance();
        double nominal = trend.nominal();
        if (tol == null || tol.equals(Tolerance.NONE) || !Double.isFinite(nominal)) {
            return Projection.none(Projection.Kind.NO_TOLERANCE, horizon);
        }
        double lowEdge = tol.low(nominal);
        double highEdge = tol.high(nominal);
        double latest = pts.get(pts.size() - 1).value();
        if (latest < Math.min(lowEdge, highEdge) || latest > Math.max(lowEdge, highEdge)) {
            return Projection.outside(latest < Math.min(lowEdge, highEdge) ? lowEdge : highEdge, horizon);
        }
        int n = pts.size();
        if (n < MIN_RUNS || fit.getXSumSquares() == 0) {
            return Projection.none(Projection.Kind.TOO_FEW_RUNS, horizon);
        }
        double b = fit.getSlope();
        if (!(fit.getSignificance() < ALPHA)) {
            return Projection.none(Projection.Kind.NOT_SIGNIFICANT, horizon);
        }
        double fittedNow = fit.predict(xLast);
        double lo = Math.min(lowEdge, highEdge);
        double hi = Math.max(lowEdge, highEdge);
        if (fittedNow < lo || fittedNow > hi) {
            return Projection.outside(fittedNow < lo ? lowEdge : highEdge, horizon);
        }
        double edge = b < 0 ? lo : hi;
        double yMean = fit.predict(xMean);
        double d = edge - yMean;
        double xCross = xMean + d / b;
        double t = new TDistribution(n - 2).inverseCumulativeProbability(1 - ALPHA / 2);
        double s2 = fit.getMeanSquareError();
        double seB2 = s2 / fit.getXSumSquares();
        double a = b * b - t * t * seB2; // > 0 because the slope passed the same t test
        double root = t * Math.sqrt(d * d * seB2 + a * s2 / n);
        double u1 = (b * d - root) / a;
        double u2 = (b * d + root) / a;
        double xEarliest = xMean + Math.min(u1, u2);
        double xLatest = xMean + Math.max(u1, u2);
        return Projection.crossing(edge, at(first, xCross), at(first, xEarliest), at(first, xLatest),
                xCross - xLast, xEarliest - xLast, xLatest - xLast, horizon);
    }

    /** Years from {@code from} to {@code to}. */
    public static double years(Instant from, Instant to) {
        return Duration.between(from, to).toMillis() / 1000.0 / SECONDS_PER_YEAR;
    }

    /** The instant {@code years} after {@code from}, clamped to ±10,000 years of it. */
    public static Instant at(Instant from, double years) {
        double y = Math.max(-1e4, Math.min(1e4, years));
        return from.plusMillis(Math.round(y * SECONDS_PER_YEAR * 1000));
    }
}
