package org.rcbench.gui;

import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.rcbench.circuit.TimingQuantity;

/**
 * One large live reading: the measured value, what the design expects, the band, the deviation and
 * the state. Read-only properties for the view; written by {@link ReadingsModel} on the window's
 * thread only.
 */
public final class Reading {
    private final TimingQuantity quantity;
    private final String label;
    private final ReadOnlyStringWrapper value = new ReadOnlyStringWrapper(this, "value", "—");
    private final ReadOnlyStringWrapper detail = new ReadOnlyStringWrapper(this, "detail", "");
    private final ReadOnlyStringWrapper expected = new ReadOnlyStringWrapper(this, "expected", "");
    private final ReadOnlyStringWrapper band = new ReadOnlyStringWrapper(this, "band", "");
    private final ReadOnlyStringWrapper deviation = new ReadOnlyStringWrapper(this, "deviation", "");
    private final ReadOnlyObjectWrapper<ReadingState> state =
            new ReadOnlyObjectWrapper<>(this, "state", ReadingState.WAITING);
    private double measured = Double.NaN;

    Reading(TimingQuantity quantity, String label) {
        this.quantity = quantity;
        this.label = label;
    }

    public TimingQuantity quantity() {
        return quantity;
    }

    /** The reading's name, e.g. {@code Frequency}. */
    public String label() {
        return label;
    }

    /** The measured value as shown, e.g. {@code 690.12 Hz}; {@code —} before any. */
    public ReadOnlyStringProperty valueProperty() {
        return value.getReadOnlyProperty();
    }

    /** The uncertainty or averaging, e.g. {@code ± 0.08 Hz (k = 2), whole run}. */
    public ReadOnlyStringProperty detailProperty() {
        return detail.getReadOnlyProperty();
    }

    /** What the design expects, e.g. {@code expected 688.9 Hz}; "" without a design. */
    public ReadOnlyStringProperty expectedProperty() {
        return expected.getReadOnlyProperty();
    }

    /** The band in words, e.g. {@code band 662.0 Hz – 716.4 Hz}; "" when none is known. */
    public ReadOnlyStringProperty bandProperty() {
        return band.getReadOnlyProperty();
    }

    /** Deviation from nominal, e.g. {@code +1.8 % from nominal}. */
    public ReadOnlyStringProperty deviationProperty() {
        return deviation.getReadOnlyProperty();
    }

    public ReadOnlyObjectProperty<ReadingState> stateProperty() {
        return state.getReadOnlyProperty();
    }

    /** The measured value in its unit (NaN before any); for tests and for the diagnosis. */
    public double measured() {
        return measured;
    }

    void show(double v, String valueText, String detailText, String expectedText, String bandText,
            String deviationText, ReadingState s) {
        measured = v;
        value.set(valueText);
        detail.set(detailText);
        expected.set(expectedText);
        band.set(bandText);
        deviation.set(deviationText);
        state.set(s);
    }
}
