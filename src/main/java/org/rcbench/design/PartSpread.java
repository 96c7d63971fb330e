package org.rcbench.design;

import java.util.Objects;
import org.rcbench.units.Tolerance;

/**
 * How far a part's value may lie from nominal: its tolerance band, the distribution within it, and
 * its temperature coefficient (null when none is given and the kind implies none).
 */
public record PartSpread(Tolerance tolerance, Distribution distribution, Tempco tempco) {
    public PartSpread {
        Objects.requireNonNull(tolerance, "tolerance");
        Objects.requireNonNull(distribution, "distribution");
    }

    public static PartSpread rectangular(Tolerance t) {
        return new PartSpread(t, Distribution.RECTANGULAR, null);
    }
}
