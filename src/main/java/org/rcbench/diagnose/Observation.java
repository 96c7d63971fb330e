package org.rcbench.diagnose;

import java.util.Objects;
import org.rcbench.circuit.TimingQuantity;

/**
 * One measured timing quantity the back-solver fits.
 *
 * @param quantity            which one ({@link TimingQuantity#HIGH}, {@link TimingQuantity#LOW} or
 *                            {@link TimingQuantity#PULSE_WIDTH})
 * @param seconds             the measured mean (s), > 0
 * @param relativeUncertainty its standard uncertainty relative to the value, without the probe clock's
 *                            share (that is common to all quantities: {@link Observations#clockRelativeUncertainty()})
 */
public record Observation(TimingQuantity quantity, double seconds, double relativeUncertainty) {
    public Observation {
        Objects.requireNonNull(quantity, "quantity");
        if (!(seconds > 0) || Double.isInfinite(seconds)) {
            throw new IllegalArgumentException("seconds not positive: " + seconds);
        }
        if (!(relativeUncertainty >= 0) || Double.isInfinite(relativeUncertainty)) {
            throw new IllegalArgumentException("relativeUncertainty not >= 0: " + relativeUncertainty);
        }
    }
}
