package org.rcbench.circuit;

import java.util.Objects;

/**
 * One part of the timing circuit at its nominal value.
 *
 * @param designator the board's name for it: {@code R3}, {@code C7}, {@code VR1}, {@code D2}
 * @param role       what it does in the topology
 * @param type       resistor, capacitor, potentiometer or diode
 * @param value      ohms, farads, ohms end to end (potentiometer), or volts of forward drop (diode;
 *                   at 1 mA for a current-dependent diode)
 * @param wiper      potentiometer wiper position in [0, 1] (fraction of the track on the charge
 *                   side for a split pot; fraction in circuit for a rheostat); NaN for other types
 * @param kind       construction (metal film, X7R, silicon ...)
 * @param diode      the diode's law; null for other types
 */
public record Element(String designator, Role role, ElementType type, double value, double wiper, PartKind kind,
        DiodeLaw diode) {
    public Element {
        Objects.requireNonNull(designator, "designator");
        Objects.requireNonNull(role, "role");
        Objects.requireNonNull(type, "type");
        Objects.requireNonNull(kind, "kind");
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(designator + ": value not finite and >= 0: " + value);
        }
        if (type == ElementType.POTENTIOMETER && !(wiper >= 0 && wiper <= 1)) {
            throw new IllegalArgumentException(designator + ": wiper outside [0, 1]: " + wiper);
        }
        if (type == ElementType.DIODE && diode == null) {
            throw new IllegalArgumentException(designator + ": diode without a law");
        }
    }

    public static Element resistor(String designator, Role role, double ohms) {
        return new Element(designator, role, ElementType.RESISTOR, ohms, Double.NaN, PartKind.UNSPECIFIED, null);
    }

    public static Element capacitor(String designator, Role role, double farads) {
        return new Element(designator, role, ElementType.CAPACITOR, farads, Double.NaN, PartKind.UNSPECIFIED, null);
    }

    public static Element pot(String designator, Role role, double ohms, double wiper) {
        return new Element(designator, role, ElementType.POTENTIOMETER, ohms, wiper, PartKind.UNSPECIFIED, null);
    }

    /** A diode with a constant drop. */
    public static Element diode(String designator, Role role, double dropVolts) {
        return new Element(designator, role, ElementType.DIODE, dropVolts, Double.NaN, PartKind.UNSPECIFIED,
                DiodeLaw.fixed());
    }

    /** A diode following {@code law}, with {@code dropAt1mA} volts at 1 mA. */
    public static Element diode(String designator, Role role, double dropAt1mA, DiodeLaw law, PartKind kind) {
        return new Element(designator, role, ElementType.DIODE, dropAt1mA, Double.NaN, kind, law);
    }

    public Element withValue(double v) {
        return new Element(designator, role, type, v, wiper, kind, diode);
    }

    public Element withWiper(double w) {
        return new Element(designator, role, type, value, w, kind, diode);
    }

    public Element withKind(PartKind k) {
        return new Element(designator, role, type, value, wiper, k, diode);
    }
}
