package org.rcbench.tolerance;

/**
 * A closed interval [low, high] of one predicted quantity, in its unit.
 * {@code NaN} ends mean the quantity has no band (not defined for the topology, or nothing ran).
 */
public record Band(double low, double high) {
    public static final Band NONE = new Band(Double.NaN, Double.NaN);

    public Band {
        if (low > high) {
            throw new IllegalArgumentException("low > high: " + low + " > " + high);
        }
    }

    /** Whether {@code v} lies in the band (false for a band without ends). */
    public boolean contains(double v) {
        return v >= low && v <= high;
    }

    public boolean isDefined() {
        return !Double.isNaN(low) && !Double.isNaN(high);
    }

    /** high - low. */
    public double width() {
        return high - low;
    }
}
