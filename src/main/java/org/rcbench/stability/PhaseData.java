package org.rcbench.stability;

/**
 * Conversions between fractional-frequency and phase (time-error) data, and the usual octave
 * spacing of averaging factors. Stateless and thread-safe.
 */
public final class PhaseData {
    private PhaseData() {
    }

    /**
     * Phase data in seconds from fractional-frequency data: {@code x[0] = 0},
     * {@code x[i+1] = x[i] + y[i] * tau0} (NIST SP 1065 section 4, from memory). The result has
     * {@code y.length + 1} points.
     */
    public static double[] fromFrequency(double[] y, double tau0Seconds) {
        requireTau0(tau0Seconds);
        double[] x = new double[y.length + 1];
        for (int i = 0; i < y.length; i++) {
            x[i + 1] = x[i] + y[i] * tau0Seconds;
        }
        return x;
    }

    /** Fractional frequency {@code y[i] = (x[i+1] - x[i]) / tau0}; {@code x.length - 1} values (none for fewer than 2). */
    public static double[] toFrequency(double[] x, double tau0Seconds) {
        requireTau0(tau0Seconds);
        if (x.length < 2) {
            return new double[0];
        }
        double[] y = new double[x.length - 1];
        for (int i = 0; i < y.length; i++) {
            y[i] = (x[i + 1] - x[i]) / tau0Seconds;
        }
        return y;
    }

    /**
     * Octave-spaced averaging factors 1, 2, 4, ... up to the largest {@code m} with
     * {@code m * divisor <= phasePoints}; e.g. divisor 4 for the overlapping Allan deviation keeps at
     * least {@code 2m} second differences. Empty when {@code phasePoints < divisor}.
     */
    public static int[] octaves(int phasePoints, int divisor) {
        if (divisor < 1) {
            throw new IllegalArgumentException("divisor < 1: " + divisor);
        }
        int count = 0;
        for (long m = 1; m * divisor <= phasePoints; m *= 2) {
            count++;
        }
        int[] result = new int[count];
        for (int k = 0; k < count; k++) {
            result[k] = 1 << k;
        }
        return result;
    }

    static void requireTau0(double tau0Seconds) {
        if (!(tau0Seconds > 0) || Double.isInfinite(tau0Seconds)) {
            throw new IllegalArgumentException("tau0Seconds <= 0: " + tau0Seconds);
        }
    }

    static void requireFactor(int m) {
        if (m < 1) {
            throw new IllegalArgumentException("m < 1: " + m);
        }
    }
}
