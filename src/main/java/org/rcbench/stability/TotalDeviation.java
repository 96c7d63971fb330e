package org.rcbench.stability;

/**
 * Total deviation from phase data (NIST SP 1065 section 5.2.11, section number from memory).
 *
 * <p>The {@code N} phase points are extended at both ends by reflection about the end points,
 * {@code x*[-j] = 2 x[0] - x[j]} and {@code x*[N-1+j] = 2 x[N-1] - x[N-1-j]} for
 * {@code 1 <= j <= N-2}, and {@code Tot var(tau) = 1/(2 tau^2 (N-2)) * sum_{i=1}^{N-2} (x*[i-m] - 2 x*[i] + x*[i+m])^2}.
 * Defined for {@code 1 <= m <= N-2}; {@code NaN} with zero terms otherwise (fewer than 3 points or
 * {@code m} too large). Equals the overlapping Allan deviation at {@code m = 1}. Stateless and
 * thread-safe.
 */
public final class TotalDeviation {
    private TotalDeviation() {
    }

    /** The total deviation at {@code tau = m * tau0}. */
    public static StabilityPoint of(double[] x, double tau0Seconds, int m) {
        PhaseData.requireTau0(tau0Seconds);
        PhaseData.requireFactor(m);
        int n = x.length;
        double tau = m * tau0Seconds;
        if (n < 3 || m > n - 2) {
            return AllanDeviation.point(tau, Double.NaN, 0);
        }
        double sum = 0;
        for (int i = 1; i <= n - 2; i++) {
            double d = reflected(x, i - m) - 2 * x[i] + reflected(x, i + m);
            sum += d * d;
        }
        return AllanDeviation.point(tau, Math.sqrt(sum / (2 * tau * tau * (n - 2))), n - 2);
    }

    private static double reflected(double[] x, int i) {
        int last = x.length - 1;
        if (i < 0) {
            return 2 * x[0] - x[-i];
        }
        if (i > last) {
            return 2 * x[last] - x[2 * last - i];
        }
        return x[i];
    }
}
