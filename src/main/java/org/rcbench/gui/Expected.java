package org.rcbench.gui;

/**
 * What the design says one quantity should read, in its unit (seconds, hertz, or a fraction for
 * duty). Ends of a band are {@code NaN} when that band is not known.
 *
 * @param nominal     the value at nominal part values
 * @param statLow     low end of the statistical band (most boards fall inside)
 * @param statHigh    high end of the statistical band
 * @param worstLow    low end of the worst case over the tolerance box
 * @param worstHigh   high end of the worst case
 */
public record Expected(double nominal, double statLow, double statHigh, double worstLow, double worstHigh) {

    /** Only the nominal value is known. */
    public static Expected nominalOnly(double nominal) {
        return new Expected(nominal, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
    }

    public boolean hasStatistical() {
        return !Double.isNaN(statLow) && !Double.isNaN(statHigh);
    }

    public boolean hasWorstCase() {
        return !Double.isNaN(worstLow) && !Double.isNaN(worstHigh);
    }

    public boolean inStatistical(double v) {
        return v >= statLow && v <= statHigh;
    }

    public boolean inWorstCase(double v) {
        return v >= worstLow && v <= worstHigh;
    }
}
