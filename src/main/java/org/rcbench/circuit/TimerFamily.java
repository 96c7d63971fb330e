package org.rcbench.circuit;

import java.util.Locale;

/**
 * Timer chip families and their typical parameters.
 *
 * <p>Every default below is a typical data-sheet figure recalled from memory (marked so), not a
 * measured or sourced value; a design file overrides any of them for a particular part.
 */
public enum TimerFamily {
    /**
     * Bipolar 555-class timers. From memory (typical data-sheet figures): divider 3 × 5 kΩ; output high
     * about 1.5 V below the supply at light load with a few ohms of output resistance; output low
     * about 0.1 V; discharge saturation about 0.1 V; threshold input current about 0.1 µA typical,
     * 0.25 µA maximum (check-values.md uses 0.25 µA for the resistance limit); about 100 ns
     * propagation delay; supply 4.5 V to 16 V. Above about 100 kHz timing accuracy suffers (common
     * practice, no source).
     */
    BIPOLAR("bipolar", new FamilyParameters(5000, 1.5, 5, 0.1, 5, 0.1, 0, 0.1e-6, 100e-9, 4.5, 16, 0.25e-6, 100e3)),
    /**
     * CMOS 555-class timers. From memory (typical data-sheet figures, order of magnitude): the
     * internal divider is also three equal resistors, taken here as 3 × 100 kΩ (data sheets rarely
     * state it: override {@code divider} if a part's is known); rail-to-rail output with roughly
     * 150 Ω high-side and 50 Ω low-side output resistance; discharge on-resistance about 15 Ω with no
     * saturation offset; input current about 10 pA; about 100 ns propagation delay; supply 2 V to 15 V;
     * usable to about 1 MHz.
     */
    CMOS("cmos", new FamilyParameters(100e3, 0, 150, 0, 50, 0, 15, 10e-12, 100e-9, 2, 15, 1e-9, 1e6));

    private final String fileName;
    private final FamilyParameters defaults;

    TimerFamily(String fileName, FamilyParameters defaults) {
        this.fileName = fileName;
        this.defaults = defaults;
    }

    public String fileName() {
        return fileName;
    }

    /** The family's typical parameters (from memory; see the constant's comment). */
    public FamilyParameters defaults() {
        return defaults;
    }

    public static TimerFamily fromFileName(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        for (TimerFamily f : values()) {
            if (f.fileName.equals(t)) {
                return f;
            }
        }
        return null;
    }
}
