package org.rcbench.stability;

/**
 * Allan deviations from phase data {@code x} (seconds) sampled every {@code tau0} seconds, at
 * averaging time {@code tau = m * tau0}. Every method returns a {@link StabilityPoint} whose
 * deviation is {@code NaN} (with zero terms) when the data are too short for {@code m}. Stateless
 * and thread-safe.
 *
 * <p>Formulas are those of NIST SP 1065 (Riley 2008), section 5.2; section numbers are quoted from
 * memory and the formulas are checked against that publication's test data sets in the tests.
 */
public final class AllanDeviation {
    private AllanDeviation() {
    }

    /**
     * Non-overlapping Allan deviation (NIST SP 1065 section 5.2.2):
     * {@code sigma^2 = 1/(2 tau^2 (K-2)) * sum_{j} (x[(j+2)m] - 2 x[(j+1)m] + x[jm])^2} over the
     * {@code K = floor((N-1)/m) + 1} decimated points.
     */
    public static StabilityPoint nonOverlapping(double[] x, double tau0Seconds, int m) {
        return strided(x, tau0Seconds, m, m);
    }

    /**
     * Fully overlapping Allan deviation (NIST SP 1065 section 5.2.4):
     * {@code sigma^2 = 1/(2 tau^2 (N-2m)) * sum_{i=0}^{N-2m-1} (x[i+2m] - 2 x[i+m] + x[i])^2}.
     */
    public static StabilityPoint overlapping(double[] x, double tau0Seconds, int m) {
        return strided(x, tau0Seconds, m, 1);
    }

    /**
     * Allan deviation with second differences taken every {@code stride} samples: the mean of
     * {@code (x[i+2m] - 2 x[i+m] + x[i])^2} over {@code i = 0, stride, 2 stride, ...} divided by
     * {@code 2 tau^2}. Stride 1 is the overlapping estimator, stride {@code m} the non-overlapping
     * one; in between it trades a little statistical confidence for work, which is what the
     * streaming measurement does for large {@code m}.
     */
    public static StabilityPoint strided(double[] x, double tau0Seconds, int m, int stride) {
        PhaseData.requireTau0(tau0Seconds);
        PhaseData.requireFactor(m);
        if (stride < 1) {
            throw new IllegalArgumentException("stride < 1: " + stride);
        }
        double tau = m * tau0Seconds;
        double sum = 0;
        long terms = 0;
        for (long i = 0; i + 2L * m < x.length; i += stride) {
            int k = (int) i;
            double d = x[k + 2 * m] - 2 * x[k + m] + x[k];
            sum += d * d;
            terms++;
        }
        return point(tau, terms == 0 ? Double.NaN : Math.sqrt(sum / (2 * tau * tau * terms)), terms);
    }

    /**
     * Modified Allan deviation (NIST SP 1065 section 5.2.5):
     * {@code Mod sigma^2 = 1/(2 m^2 tau^2 (N-3m+1)) * sum_{j=0}^{N-3m} (sum_{i=j}^{j+m-1} (x[i+2m] - 2 x[i+m] + x[i]))^2}.
     * The inner sum is kept as a running sum, so the cost is O(N).
     */
    public static StabilityPoint modified(double[] x, double tau0Seconds, int m) {
        PhaseData.requireTau0(tau0Seconds);
        PhaseData.requireFactor(m);
        double tau = m * tau0Seconds;
        int outer = x.length - 3 * m + 1;
        if (outer < 1) {
            return point(tau, Double.NaN, 0);
        }
        double inner = 0;
        for (int i = 0; i < m; i++) {
            inner += secondDifference(x, i, m);
        }
        double sum = inner * inner;
        for (int j = 1; j < outer; j++) {
            inner += secondDifference(x, j + m - 1, m) - secondDifference(x, j - 1, m);
            sum += inner * inner;
        }
        double var = sum / (2.0 * m * m * tau * tau * outer);
        return point(tau, Math.sqrt(var), outer);
    }

    /**
     * Time deviation in seconds (NIST SP 1065 section 5.2.6): {@code TDEV = tau / sqrt(3) * ModADEV(tau)}.
     */
    public static StabilityPoint time(double[] x, double tau0Seconds, int m) {
        StabilityPoint mod = modified(x, tau0Seconds, m);
        return point(mod.tauSeconds(), mod.tauSeconds() / Math.sqrt(3) * mod.deviation(), mod.terms());
    }

    private static double secondDifference(double[] x, int i, int m) {
        return x[i + 2 * m] - 2 * x[i + m] + x[i];
    }

    static StabilityPoint point(double tau, double deviation, long terms) {
        return new StabilityPoint(tau, deviation, terms);
    }
}
