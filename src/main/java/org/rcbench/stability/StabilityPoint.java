package org.rcbench.stability;

/**
 * One point of a stability curve.
 *
 * @param tauSeconds averaging time {@code m * tau0}, in seconds
 * @param deviation  the deviation (dimensionless for the frequency statistics, seconds for TDEV);
 *                   {@code NaN} when there were no terms
 * @param terms      number of squared terms that went into the estimate
 */
public record StabilityPoint(double tauSeconds, double deviation, long terms) {
    public StabilityPoint {
        if (!(tauSeconds > 0)) {
            throw new IllegalArgumentException("tauSeconds <= 0: " + tauSeconds);
        }
        if (terms < 0) {
            throw new IllegalArgumentException("terms < 0: " + terms);
        }
    }
}
