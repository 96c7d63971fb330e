package org.rcbench.gui;

import java.util.Objects;
import org.rcbench.source.SourceSpec;

/**
 * Which source the window reads, as the source strip shows it. Immutable.
 *
 * @param kind   simulated board, serial port or capture file
 * @param target the simulated board's design (a file or {@code demo:NAME}; "" for the default
 *               board), the port (device path or USB id), or the capture file
 * @param fault  simulated board only: the deviations to build in, e.g. {@code C1=-35%}; "" for none
 * @param fast   capture file only: replay as fast as it reads instead of in real time
 * @param exact  the source exactly as the command line gave it (every simulation and probe option),
 *               or null to build one from the fields
 */
public record SourceChoice(Kind kind, String target, String fault, boolean fast, SourceSpec exact) {
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
    }

    /** The simulated board built from {@code design} ("" for the default) with {@code fault} ("" for none). */
    public static SourceChoice simulated(String design, String fault) {
        return new SourceChoice(Kind.SIMULATED, design, fault, false, null);
    }

    public static SourceChoice port(String port) {
        return new SourceChoice(Kind.PORT, port, "", false, null);
    }

    /** A capture file replayed in real time. */
    public static SourceChoice file(String file) {
        return new SourceChoice(Kind.FILE, file, "", false, null);
    }

    public SourceChoice withFast(boolean f) {
        return new SourceChoice(kind, target, fault, f, exact);
    }

    public SourceChoice withExact(SourceSpec s) {
        return new SourceChoice(kind, target, fault, fast, s);
    }

    /** For the status line: {@code simulated board demo:piper-mk2, fault C1=-35%}. */
    public String describe() {
        String t = target.isEmpty() ? "(default board)" : target;
        return kind.words() + " " + t + (fault.isEmpty() ? "" : ", fault " + fault);
    }
}
