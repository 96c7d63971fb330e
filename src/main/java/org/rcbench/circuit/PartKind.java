package org.rcbench.circuit;

import java.util.Locale;
import org.rcbench.units.Tolerance;

/**
 * The construction of a part, as far as it matters for timing: which element it can be, whether it
 * is a class-2 ceramic (and its EIA-198 temperature band), and its default temperature coefficient.
 */
public enum PartKind {
    UNSPECIFIED("unspecified", null),
    METAL_FILM("metal-film", ElementType.RESISTOR),
    CARBON_FILM("carbon-film", ElementType.RESISTOR),
    CARBON_COMPOSITION("carbon-composition", ElementType.RESISTOR),
    THICK_FILM("thick-film", ElementType.RESISTOR),
    THIN_FILM("thin-film", ElementType.RESISTOR),
    WIREWOUND("wirewound", ElementType.RESISTOR),
    CERMET("cermet", ElementType.POTENTIOMETER),
    CARBON_TRACK("carbon-track", ElementType.POTENTIOMETER),
    C0G("c0g", ElementType.CAPACITOR),
    FILM("film", ElementType.CAPACITOR),
    POLYESTER("polyester", ElementType.CAPACITOR),
    POLYPROPYLENE("polypropylene", ElementType.CAPACITOR),
    X7R("x7r", ElementType.CAPACITOR),
    X5R("x5r", ElementType.CAPACITOR),
    Y5V("y5v", ElementType.CAPACITOR),
    Z5U("z5u", ElementType.CAPACITOR),
    ALUMINIUM_ELECTROLYTIC("aluminium-electrolytic", ElementType.CAPACITOR),
    TANTALUM("tantalum", ElementType.CAPACITOR),
    SILICON("silicon", ElementType.DIODE),
    SCHOTTKY("schottky", ElementType.DIODE);

    private final String fileName;
    private final ElementType element;

    PartKind(String fileName, ElementType element) {
        this.fileName = fileName;
        this.element = element;
    }

    public String fileName() {
        return fileName;
    }

    /** Whether a part of this kind can be an element of {@code type}. */
    public boolean fits(ElementType type) {
        return element == null || element == type
                || (type == ElementType.POTENTIOMETER && element == ElementType.RESISTOR)
                || (type == ElementType.RESISTOR && element == ElementType.POTENTIOMETER);
    }

    /** Class-2 ceramic dielectrics (EIA-198 codes X7R, X5R, Y5V, Z5U). */
    public boolean isClass2Ceramic() {
        return this == X7R || this == X5R || this == Y5V || this == Z5U;
    }

    /**
     * The EIA-198 capacitance change over the code's temperature range (check-values.md):
     * X7R −55…+125 °C ±15 %, X5R −55…+85 °C ±15 %, Y5V −30…+85 °C +22/−82 %, Z5U +10…+85 °C +22/−56 %;
     * {@code null} for other kinds.
     */
    public Tolerance temperatureBand() {
        switch (this) {
            case X7R:
            case X5R:
                return Tolerance.symmetric(0.15);
            case Y5V:
                return new Tolerance(0.82, 0.22);
            case Z5U:
                return new Tolerance(0.56, 0.22);
            default:
                return null;
        }
    }

    /** The temperature range of a class-2 code in °C as {min, max}, or null. Same source as {@link #temperatureBand()}. */
    public double[] temperatureRangeCelsius() {
        switch (this) {
            case X7R: return new double[] {-55, 125};
            case X5R: return new double[] {-55, 85};
            case Y5V: return new double[] {-30, 85};
            case Z5U: return new double[] {10, 85};
            default: return null;
        }
    }

    /** The kind spelled {@code text} in a design file (a few common spellings accepted), or null. */
    public static PartKind fromFileName(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT).replace(' ', '-').replace('_', '-');
        switch (t) {
            case "np0":
            case "c0g-np0":
            case "cog":
                return C0G;
            case "aluminum-electrolytic":
            case "electrolytic":
            case "aluminium":
                return ALUMINIUM_ELECTROLYTIC;
            case "metal-oxide":
                return METAL_FILM;
            default:
                break;
        }
        for (PartKind k : values()) {
            if (k.fileName.equals(t)) {
                return k;
            }
        }
        return null;
    }

    public static String spellings() {
        StringBuilder sb = new StringBuilder();
        for (PartKind k : values()) {
            if (k != UNSPECIFIED) {
                sb.append(sb.length() == 0 ? "" : ", ").append(k.fileName);
            }
        }
        return sb.toString();
    }
}
