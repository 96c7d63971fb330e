package org.rcbench.circuit;

import org.rcbench.units.Unit;

/** The predicted quantities, with their stable JSON keys and units. */
public enum TimingQuantity {
    FREQUENCY("frequency_hz", Unit.HERTZ),
    PERIOD("period_s", Unit.SECOND),
    HIGH("high_s", Unit.SECOND),
    LOW("low_s", Unit.SECOND),
    DUTY("duty", Unit.NONE),
    FIRST_HIGH("first_high_s", Unit.SECOND),
    PULSE_WIDTH("pulse_width_s", Unit.SECOND);

    private final String jsonKey;
    private final Unit unit;

    TimingQuantity(String jsonKey, Unit unit) {
        this.jsonKey = jsonKey;
        this.unit = unit;
    }

    /** The key used in {@code predict --json}; stable. */
    public String jsonKey() {
        return jsonKey;
    }

    public Unit unit() {
        return unit;
    }
}
