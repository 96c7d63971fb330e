package org.rcbench.circuit;

import java.util.Locale;

/**
 * What is connected to the control pin besides parts with role {@code control-load} or
 * {@code control-bypass}.
 *
 * @param mode        open, bypassed, loaded (by control-load parts) or driven
 * @param driveVolts  the driving source's voltage when {@code mode} is DRIVEN (V), else 0
 * @param driveOhms   the driving source's resistance when DRIVEN (Ω; 0 is an ideal source), else infinite
 */
public record ControlPin(Mode mode, double driveVolts, double driveOhms) {
    /** How the control pin is wired. */
    public enum Mode {
        OPEN, BYPASSED, LOADED, DRIVEN;

        public String fileName() {
            return name().toLowerCase(Locale.ROOT);
        }

        public static Mode fromFileName(String text) {
            for (Mode m : values()) {
                if (m.fileName().equals(text.strip().toLowerCase(Locale.ROOT))) {
                    return m;
                }
            }
            return null;
        }
    }

    public ControlPin {
        if (mode == Mode.DRIVEN && !(driveOhms >= 0)) {
            throw new IllegalArgumentException("driveOhms < 0: " + driveOhms);
        }
    }

    public static ControlPin open() {
        return new ControlPin(Mode.OPEN, 0, Double.POSITIVE_INFINITY);
    }

    public static ControlPin bypassed() {
        return new ControlPin(Mode.BYPASSED, 0, Double.POSITIVE_INFINITY);
    }

    public static ControlPin loaded() {
        return new ControlPin(Mode.LOADED, 0, Double.POSITIVE_INFINITY);
    }

    public static ControlPin driven(double volts, double ohms) {
        return new ControlPin(Mode.DRIVEN, volts, ohms);
    }
}
