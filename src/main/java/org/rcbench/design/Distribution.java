package org.rcbench.design;

import java.util.Locale;

/**
 * How a part's value is distributed within its tolerance band (JCGM 101:2008, 6.4).
 * Rectangular is the default for tolerance bands: nothing is known beyond the limits.
 */
public enum Distribution {
    /** Uniform over the band: standard uncertainty (high - low) / sqrt(12) (JCGM 100, 4.3.7). */
    RECTANGULAR,
    /** Triangular over the band, peak at its middle: (high - low) / sqrt(24) (JCGM 100, 4.3.9). */
    TRIANGULAR,
    /**
     * Normal, the band taken as ±3 standard deviations about its middle (common practice for
     * production spreads, no source): (high - low) / 6. Draws are not truncated.
     */
    NORMAL;

    public String fileName() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static Distribution fromFileName(String text) {
        for (Distribution d : values()) {
            if (d.fileName().equals(text.strip().toLowerCase(Locale.ROOT))) {
                return d;
            }
        }
        return null;
    }

    /** The standard uncertainty of a value spread over [low, high] with this distribution. */
    public double standardUncertainty(double low, double high) {
        double w = high - low;
        switch (this) {
            case RECTANGULAR: return w / Math.sqrt(12);
            case TRIANGULAR: return w / Math.sqrt(24);
            default: return w / 6;
        }
    }
}
