package org.rcbench.circuit;

import java.util.Locale;

/** What a part does in its circuit. The design file spells each role in lower case with hyphens. */
public enum Role {
    /** Resistance in the charge path only (the astable's upper resistor, the monostable's resistor). */
    CHARGE("charge", ElementType.RESISTOR),
    /** Resistance in both the charge and the discharge path (the astable's lower resistor). */
    SHARED("shared", ElementType.RESISTOR),
    /** Resistance in the discharge path only (two-diode astable, pot PWM end stop). */
    DISCHARGE("discharge", ElementType.RESISTOR),
    /** The resistor from the output to the capacitor of the output-fed astable. */
    FEEDBACK("feedback", ElementType.RESISTOR),
    /** The timing capacitor; several are in parallel. */
    TIMING("timing", ElementType.CAPACITOR),
    /** A diode that conducts while the capacitor charges. */
    CHARGE_DIODE("charge-diode", ElementType.DIODE),
    /** A diode that conducts while the capacitor discharges. */
    DISCHARGE_DIODE("discharge-diode", ElementType.DIODE),
    /** The potentiometer of the pot PWM: wiper to the discharge pin, one end to each diode. */
    SPLIT_POT("split-pot", ElementType.POTENTIOMETER),
    /** A resistor from the control pin to ground; several are in parallel. */
    CONTROL_LOAD("control-load", ElementType.RESISTOR),
    /** A capacitor from the control pin to ground (no effect on DC thresholds). */
    CONTROL_BYPASS("control-bypass", ElementType.CAPACITOR),
    /** A resistor from the output to ground (loads the output stage). */
    OUTPUT_LOAD("output-load", ElementType.RESISTOR),
    /** A part on the board with no part in the timing (listed for completeness, ignored). */
    OTHER("other", null);

    private final String fileName;
    private final ElementType usualType;

    Role(String fileName, ElementType usualType) {
        this.fileName = fileName;
        this.usualType = usualType;
    }

    /** The spelling in design files, e.g. {@code "charge-diode"}. */
    public String fileName() {
        return fileName;
    }

    /** The kind of element this role takes (resistors may also be potentiometers wired as rheostats); null for OTHER. */
    public ElementType usualType() {
        return usualType;
    }

    /** The role spelled {@code text} in a design file, or null. */
    public static Role fromFileName(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        for (Role r : values()) {
            if (r.fileName.equals(t)) {
                return r;
            }
        }
        return null;
    }

    /** All spellings, comma-separated, for error messages. */
    public static String spellings() {
        StringBuilder sb = new StringBuilder();
        for (Role r : values()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(r.fileName);
        }
        return sb.toString();
    }
}
