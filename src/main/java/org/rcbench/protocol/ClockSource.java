package org.rcbench.protocol;

import java.util.Locale;

/**
 * What sets the probe's timestamp clock, as declared in its hello frame. The typical offsets are
 * for the status line only (common practice, no source: crystals are specified to tens of ppm,
 * ceramic resonators to thousands); calibration measures the real one.
 */
public enum ClockSource {
    UNKNOWN(0, "unknown"),
    CRYSTAL(1, "crystal"),
    RESONATOR(2, "resonator"),
    INTERNAL_RC(3, "rc"),
    REFERENCE(4, "reference");

    private final int code;
    private final String word;

    ClockSource(int code, String word) {
        this.code = code;
        this.word = word;
    }

    /** The byte sent in the hello frame. */
    public int code() {
        return code;
    }

    /** The word used in the text-mode hello line ({@code clock_source=crystal}). */
    public String word() {
        return word;
    }

    /** The source for a hello byte; unknown codes give {@link #UNKNOWN}. */
    public static ClockSource ofCode(int code) {
        for (ClockSource s : values()) {
            if (s.code == code) {
                return s;
            }
        }
        return UNKNOWN;
    }

    /** The source for a text-mode word (case-insensitive); unknown words give {@link #UNKNOWN}. */
    public static ClockSource ofWord(String word) {
        String w = word.toLowerCase(Locale.ROOT);
        for (ClockSource s : values()) {
            if (s.word.equals(w)) {
                return s;
            }
        }
        return UNKNOWN;
    }
}
