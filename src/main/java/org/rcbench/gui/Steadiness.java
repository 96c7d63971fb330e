package org.rcbench.gui;

/**
 * Whether a live signal has stopped moving: the mean period of the newest {@code n} cycles agrees
 * with the mean of the {@code n} cycles before them. They agree when they differ by no more than
 * three standard uncertainties of that difference ({@code 3 · s · sqrt(2 / n)}, {@code s} the
 * sample standard deviation of the {@code 2n} periods) or by no more than 100 ppm of the period,
 * whichever is larger. Used to show "settling" while a board warms up. (Three sigma and 100 ppm
 * are common practice, no source.) Stateless.
 */
public final class Steadiness {
    /** Fewest cycles per half for a judgement; with fewer the signal counts as not yet steady. */
    public static final int MIN_CYCLES = 16;
    private static final double FLOOR = 100e-6;

    private Steadiness() {
    }

    /**
     * Judges the newest {@code 2n} of the {@code count} cycles in the arrays (ticks, oldest first),
     * {@code n = min(window, count / 2)}. False when {@code n < MIN_CYCLES}.
     */
    public static boolean steady(long[] highTicks, long[] lowTicks, int count, int window) {
        int n = Math.min(window, count / 2);
        if (n < MIN_CYCLES) {
            return false;
        }
        double older = 0;
        double newer = 0;
        for (int k = count - 2 * n; k < count - n; k++) {
            older += highTicks[k] + lowTicks[k];
        }
        for (int k = count - n; k < count; k++) {
            newer += highTicks[k] + lowTicks[k];
        }
        double mean = (older + newer) / (2 * n);
        double ss = 0;
        for (int k = count - 2 * n; k < count; k++) {
            double d = highTicks[k] + lowTicks[k] - mean;
            ss += d * d;
        }
        double s = Math.sqrt(ss / (2 * n - 1));
        double diff = Math.abs(newer - older) / n;
        return diff <= Math.max(3 * s * Math.sqrt(2.0 / n), FLOOR * mean);
    }
}
