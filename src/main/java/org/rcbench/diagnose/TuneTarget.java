package org.rcbench.diagnose;

import java.util.Objects;
import org.rcbench.circuit.TimingQuantity;

/**
 * What a potentiometer should be turned to reach. Immutable.
 *
 * @param quantity      frequency (Hz), period, high or low time, pulse width (s) or duty (0..1)
 * @param value         the wanted value in SI units
 * @param pot           the potentiometer's designator, or null for the design's only one
 * @param travelDegrees the pot's mechanical travel in degrees (e.g. 270 for a single-turn pot), or NaN
 * @param turns         its number of turns (a multi-turn trimmer), or NaN
 */
public record TuneTarget(TimingQuantity quantity, double value, String pot, double travelDegrees, double turns) {
    public TuneTarget {
        Objects.requireNonNull(quantity, "quantity");
        if (quantity == TimingQuantity.FIRST_HIGH) {
            throw new IllegalArgumentException("cannot tune the first high time");
        }
        if (!(value > 0) || Double.isInfinite(value) || (quantity == TimingQuantity.DUTY && !(value < 1))) {
            throw new IllegalArgumentException("target out of range: " + value);
        }
        if (!Double.isNaN(travelDegrees) && !(travelDegrees > 0)) {
            throw new IllegalArgumentException("travelDegrees <= 0: " + travelDegrees);
        }
        if (!Double.isNaN(turns) && !(turns > 0)) {
            throw new IllegalArgumentException("turns <= 0: " + turns);
        }
    }

    /** A target for the design's only potentiometer, travel unknown. */
    public static TuneTarget of(TimingQuantity quantity, double value) {
        return new TuneTarget(quantity, value, null, Double.NaN, Double.NaN);
    }

    public TuneTarget withPot(String designator) {
        return new TuneTarget(quantity, value, designator, travelDegrees, turns);
    }

    public TuneTarget withTravelDegrees(double degrees) {
        return new TuneTarget(quantity, value, pot, degrees, turns);
    }

    public TuneTarget withTurns(double n) {
        return new TuneTarget(quantity, value, pot, travelDegrees, n);
    }
}
