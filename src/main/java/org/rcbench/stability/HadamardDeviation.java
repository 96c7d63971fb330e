package org.rcbench.stability;

/**
 * Overlapping Hadamard deviation from phase data (NIST SP 1065 section 5.2.9, section number from
 * memory): {@code H sigma^2 = 1/(6 tau^2 (N-3m)) * sum_{i=0}^{N-3m-1} (x[i+3m] - 3 x[i+2m] + 3 x[i+m] - x[i])^2}.
 * Insensitive to a linear frequency drift. {@code NaN} with zero terms when {@code N <= 3m}.
 * Stateless and thread-safe.
 */
public final class HadamardDeviation {
    private HadamardDeviation() {
    }

    /** The overlapping Hadamard deviation at {@code tau = m * tau0}. */
    public static StabilityPoint overlapping(double[] x, double tau0Seconds, int m) {
        PhaseData.requireTau0(tau0Seconds);
        PhaseData.requireFactor(m);
        double tau = m * tau0Seconds;
        double sum = 0;
        long terms = 0;
        for (int i = 0; i + 3 * m < x.length; i++) {
            double d = x[i + 3 * m] - 3 * x[i + 2 * m] + 3 * x[i + m] - x[i];
            sum += d * d;
            terms++;
        }
        double dev = terms == 0 ? Double.NaN : Math.sqrt(sum / (6 * tau * tau * terms));
        return AllanDeviation.point(tau, dev, terms);
    }
}
