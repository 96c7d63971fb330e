package org.rcbench.gui;

import java.util.Objects;

/**
 * Which source the window reads. Immutable.
 *
 * @param kind   simulated board, serial port or capture file
 * @param target the design file the simulated board is built from ("" for the default board), the
 *               port (device path or USB id), or the capture file
 * @param fault  simulated board only: the deviations to build in, e.g. {@code C1=-35%}; "" for none
 * @param speed  capture file only: replay speed relative to real time (infinity: as fast as it reads)
 */
public record SourceChoice(Kind kind, String target, String fault, double speed) {
    /** The three kinds of source. */
    public enum Kind {
        SIMULATED("simulated board"),
        PORT("serial port"),
        FILE("capture file");

        private final String words;

        Kind(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    public SourceChoice {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(target, "target");
        Objects.requireNonNull(fault, "fault");
        if (!(speed > 0)) {
            throw new IllegalArgumentException("speed <= 0: " + speed);
        }
    }

    /** The simulated board built from {@code design} ("" for the default) with {@code fault} ("" for none). */
    public static SourceChoice simulated(String design, String fault) {
        return new SourceChoice(Kind.SIMULATED, design, fault, 1);
    }

    public static SourceChoice port(String port) {
        return new SourceChoice(Kind.PORT, port, "", 1);
    }

    /** A capture file replayed in real time. */
    public static SourceChoice file(String file) {
        return new SourceChoice(Kind.FILE, file, "", 1);
    }

    public SourceChoice withSpeed(double s) {
        return new SourceChoice(kind, target, fault, s);
    }

    public SourceChoice withFault(String f) {
        return new SourceChoice(kind, target, f, speed);
    }

    /** For the status line: {@code simulated board piper-mk2.toml, fault C1=-35%}. */
    public String describe() {
        String t = target.isEmpty() ? "(default board)" : target;
        return kind.words() + " " + t + (fault.isEmpty() ? "" : ", fault " + fault);
    }
}
