package org.rcbench.circuit;

import org.rcbench.units.Unit;

/** The physical kind of a part, which fixes the unit of its value. */
public enum ElementType {
    RESISTOR(Unit.OHM),
    CAPACITOR(Unit.FARAD),
    /** A potentiometer: value is the end-to-end resistance, plus a wiper position in [0, 1]. */
    POTENTIOMETER(Unit.OHM),
    /** A diode: value is its forward drop in volts (fixed, or at 1 mA for a current-dependent diode). */
    DIODE(Unit.VOLT);

    private final Unit unit;

    ElementType(Unit unit) {
        this.unit = unit;
    }

    public Unit unit() {
        return unit;
    }
}
