package org.rcbench.circuit;

import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;

/**
 * The timer circuits rcbench models, with the roles each one needs and allows.
 * The design file spells them {@code monostable}, {@code bistable}, {@code astable},
 * {@code astable-one-diode}, {@code astable-two-diode}, {@code astable-output-fed}, {@code pwm-pot}.
 */
public enum Topology {
    /** One pulse per trigger: R from supply to the capacitor, threshold and discharge on the capacitor. */
    MONOSTABLE("monostable", EnumSet.of(Role.CHARGE, Role.TIMING), EnumSet.noneOf(Role.class)),
    /** A latch: set by the trigger, cleared by the threshold input; no timing parts. */
    BISTABLE("bistable", EnumSet.noneOf(Role.class), EnumSet.noneOf(Role.class)),
    /** Free-running: upper resistor (charge), lower resistor (shared), capacitor. */
    ASTABLE("astable", EnumSet.of(Role.CHARGE, Role.SHARED, Role.TIMING), EnumSet.noneOf(Role.class)),
    /** The astable with one diode across the lower resistor, conducting while charging. */
    ASTABLE_ONE_DIODE("astable-one-diode", EnumSet.of(Role.CHARGE, Role.SHARED, Role.CHARGE_DIODE, Role.TIMING),
            EnumSet.noneOf(Role.class)),
    /** Separate charge and discharge resistors steered by two diodes. */
    ASTABLE_TWO_DIODE("astable-two-diode",
            EnumSet.of(Role.CHARGE, Role.DISCHARGE, Role.CHARGE_DIODE, Role.DISCHARGE_DIODE, Role.TIMING),
            EnumSet.noneOf(Role.class)),
    /** One resistor from the output to the capacitor; about 50 % duty with a rail-to-rail output. */
    OUTPUT_FED("astable-output-fed", EnumSet.of(Role.FEEDBACK, Role.TIMING), EnumSet.noneOf(Role.class)),
    /** Constant-frequency PWM: resistor to the wiper of a pot whose ends feed two diodes. */
    PWM_POT("pwm-pot", EnumSet.of(Role.CHARGE, Role.SPLIT_POT, Role.CHARGE_DIODE, Role.DISCHARGE_DIODE, Role.TIMING),
            EnumSet.of(Role.DISCHARGE));

    private final String fileName;
    private final Set<Role> required;
    private final Set<Role> allowed;

    Topology(String fileName, Set<Role> required, Set<Role> optional) {
        this.fileName = fileName;
        this.required = required;
        EnumSet<Role> a = EnumSet.of(Role.CONTROL_LOAD, Role.CONTROL_BYPASS, Role.OUTPUT_LOAD, Role.OTHER);
        a.addAll(required);
        a.addAll(optional);
        this.allowed = a;
    }

    public String fileName() {
        return fileName;
    }

    /** Roles that must have at least one part. */
    public Set<Role> requiredRoles() {
        EnumSet<Role> r = EnumSet.noneOf(Role.class);
        r.addAll(required);
        return r;
    }

    /** Roles a part may take in this topology. */
    public boolean allows(Role role) {
        return allowed.contains(role);
    }

    /** Whether the circuit runs by itself (every astable and the pot PWM). */
    public boolean isFreeRunning() {
        return this != MONOSTABLE && this != BISTABLE;
    }

    public static Topology fromFileName(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        for (Topology top : values()) {
            if (top.fileName.equals(t)) {
                return top;
            }
        }
        return null;
    }

    public static String spellings() {
        StringBuilder sb = new StringBuilder();
        for (Topology t : values()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(t.fileName);
        }
        return sb.toString();
    }
}
