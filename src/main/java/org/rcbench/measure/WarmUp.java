package org.rcbench.measure;

import java.util.Arrays;

/**
 * Warm-up from the decimated trend: has the period moved at the start and then stayed put?
 *
 * <p>The final level {@code F} is the cycle-weighted mean period of the last quarter of the trend
 * points. The band around it is the largest of: five robust standard deviations of the last half's
 * points about {@code F} (1.4826 times the median absolute deviation), one part per million of
 * {@code F}, and two ticks over a point's length (its quantization). Walking back from the end,
 * the period has settled at the earliest point after which every point stays inside the band. A
 * warm-up is reported when that point is not the first and lies in the first half of the capture.
 * (Thresholds are common practice, no source.) Stateless.
 */
final class WarmUp {
    private static final int MIN_POINTS = 8;

    private WarmUp() {
    }

    static Measurement.Drift analyse(TrendRecord trend, double driftPpmPerSecond, double ticksPerSecond) {
        int n = trend.size();
        if (n < MIN_POINTS) {
            return new Measurement.Drift(driftPpmPerSecond, false, 0, driftPpmPerSecond);
        }
        double weighted = 0;
        long cycles = 0;
        for (int k = n - n / 4; k < n; k++) {
            weighted += trend.meanPeriod(k) * trend.cycles(k);
            cycles += trend.cycles(k);
        }
        double level = weighted / cycles;
        double[] deviations = new double[n - n / 2];
        for (int k = n / 2; k < n; k++) {
            deviations[k - n / 2] = Math.abs(trend.meanPeriod(k) - level);
        }
        Arrays.sort(deviations);
        double mad = deviations[deviations.length / 2];
        double band = Math.max(Math.max(5 * 1.4826 * mad, 1e-6 * level), 2.0 / trend.blockLength());
        int settled = n;
        while (settled > 0 && Math.abs(trend.meanPeriod(settled - 1) - level) <= band) {
            settled--;
        }
        boolean warmUp = settled > 0 && settled <= n / 2;
        if (!warmUp) {
            return new Measurement.Drift(driftPpmPerSecond, false, 0, driftPpmPerSecond);
        }
        long before = 0;
        for (int k = 0; k < settled; k++) {
            before += trend.cycles(k);
        }
        return new Measurement.Drift(driftPpmPerSecond, true, before,
                slopePpmPerSecond(trend, settled, ticksPerSecond));
    }

    /** Cycle-weighted least-squares slope of the points from {@code from} on, ppm per second. */
    private static double slopePpmPerSecond(TrendRecord trend, int from, double ticksPerSecond) {
        double sw = 0;
        double st = 0;
        double sp = 0;
        for (int k = from; k < trend.size(); k++) {
            double w = trend.cycles(k);
            sw += w;
            st += w * trend.middleTick(k);
            sp += w * trend.meanPeriod(k);
        }
        double mt = st / sw;
        double mp = sp / sw;
        double stt = 0;
        double stp = 0;
        for (int k = from; k < trend.size(); k++) {
            double w = trend.cycles(k);
            double dt = trend.middleTick(k) - mt;
            stt += w * dt * dt;
            stp += w * dt * (trend.meanPeriod(k) - mp);
        }
        return stt > 0 ? stp / stt / mp * 1e6 * ticksPerSecond : Double.NaN;
    }
}
