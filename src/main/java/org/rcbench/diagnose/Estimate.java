package org.rcbench.diagnose;

import org.rcbench.units.Unit;

/**
 * The back-solved value of one part (or a wiper position) with its interval. Immutable.
 *
 * <p>The posterior is a mixture over the explanations tested, each a normal in the log of the value
 * (Laplace approximation; a wiper's in its logit), weighted by the explanations' probabilities;
 * {@code value} is its median and {@code low}..{@code high} its central 95 % interval.
 *
 * @param name    designator, or {@code VR1.wiper}
 * @param unit    the value's unit ({@link Unit#NONE} for a wiper position, 0..1)
 * @param nominal the design's value
 * @param value   posterior median
 * @param low     2.5 % point
 * @param high    97.5 % point
 */
public record Estimate(String name, Unit unit, double nominal, double value, double low, double high) {
    /** The central probability of {@code low}..{@code high}. */
    public static final double COVERAGE = 0.95;

    /** Whether {@code v} lies in the interval. */
    public boolean covers(double v) {
        return v >= low && v <= high;
    }
}
