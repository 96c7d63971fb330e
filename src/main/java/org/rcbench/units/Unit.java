package org.rcbench.units;

/**
 * The base units rcbench reads and writes, each with its symbol, the spellings accepted after a
 * number, and the name used in messages ("is not a resistance").
 */
public enum Unit {
    OHM("Ω", "resistance", "Ω", "ohm", "ohms", "Ohm", "Ohms"),
    FARAD("F", "capacitance", "F"),
    HERTZ("Hz", "frequency", "Hz", "hz"),
    SECOND("s", "time", "s", "sec"),
    VOLT("V", "voltage", "V"),
    AMPERE("A", "current", "A"),
    /** A plain number (a ratio such as a duty cycle or a wiper position). */
    NONE("", "number");

    private final String symbol;
    private final String quantityName;
    private final String[] spellings;

    Unit(String symbol, String quantityName, String... spellings) {
        this.symbol = symbol;
        this.quantityName = quantityName;
        this.spellings = spellings;
    }

    /** The SI symbol, e.g. {@code "Ω"}; empty for {@link #NONE}. */
    public String symbol() {
        return symbol;
    }

    /** The quantity in words, e.g. {@code "resistance"}. */
    public String quantityName() {
        return quantityName;
    }

    /** Whether {@code text} (already normalised to U+03A9 for ohm) spells this unit. */
    boolean isSpelledBy(String text) {
        for (String s : spellings) {
            if (s.equals(text)) {
                return true;
            }
        }
        return false;
    }
}
