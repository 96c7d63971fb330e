package org.rcbench.tolerance;

import java.util.Objects;
import org.rcbench.design.Distribution;

/**
 * One quantity that varies in the tolerance analysis, with its band and distribution.
 *
 * @param name         for reports: a designator ({@code R1}), {@code R1.tempco}, {@code C1.temperature},
 *                     {@code supply}, {@code ambient}, or a model parameter name
 * @param nominal      the nominal value (what the design says)
 * @param low          the band's lower end
 * @param high         the band's upper end
 * @param distribution how values spread over the band
 */
public record UncertainInput(String name, double nominal, double low, double high, Distribution distribution) {
    public UncertainInput {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(distribution, "distribution");
        if (!(low <= high) || !Double.isFinite(low) || !Double.isFinite(high)) {
            throw new IllegalArgumentException(name + ": bad band " + low + " .. " + high);
        }
    }

    /** The expectation: the band's middle for all three distributions. */
    public double expectation() {
        return 0.5 * (low + high);
    }

    /** The standard uncertainty of this input (JCGM 100:2008, 4.3.7 and 4.3.9). */
    public double standardUncertainty() {
        return distribution.standardUncertainty(low, high);
    }
}
