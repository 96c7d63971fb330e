package org.rcbench.gui;

import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.design.Design;
import org.rcbench.units.Tolerance;
import org.rcbench.units.ValueCode;

/**
 * One row of the parts table: designator, role, kind, and the value, tolerance and wiper as the
 * user typed them (or as the design file gave them), with a problem line when the typed text does
 * not read. Window thread only; edited through {@link DesignModel#edit}.
 */
public final class PartRow {
    private final String designator;
    private final String role;
    private final ElementType type;
    private final ReadOnlyStringWrapper kind = new ReadOnlyStringWrapper(this, "kind", "");
    private final ReadOnlyStringWrapper value = new ReadOnlyStringWrapper(this, "value", "");
    private final ReadOnlyStringWrapper tolerance = new ReadOnlyStringWrapper(this, "tolerance", "");
    private final ReadOnlyStringWrapper wiper = new ReadOnlyStringWrapper(this, "wiper", "");
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper(this, "problem", "");

    PartRow(Design design, Element e) {
        designator = e.designator();
        role = e.role().fileName();
        type = e.type();
        kind.set(e.kind().fileName());
        value.set(ValueCode.formatSi(e.value(), type.unit(), type == ElementType.DIODE ? 3 : 4));
        tolerance.set(toleranceText(design.spread(designator).tolerance()));
        wiper.set(type == ElementType.POTENTIOMETER ? String.format(java.util.Locale.ROOT, "%.3f", e.wiper()) : "");
    }

    public String designator() {
        return designator;
    }

    /** The role as the design file spells it, e.g. {@code charge}. */
    public String role() {
        return role;
    }

    public ElementType type() {
        return type;
    }

    public boolean hasWiper() {
        return type == ElementType.POTENTIOMETER;
    }

    public ReadOnlyStringProperty kindProperty() {
        return kind.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty valueProperty() {
        return value.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty toleranceProperty() {
        return tolerance.getReadOnlyProperty();
    }

    public ReadOnlyStringProperty wiperProperty() {
        return wiper.getReadOnlyProperty();
    }

    /** Why the typed text does not read, or "". */
    public ReadOnlyStringProperty problemProperty() {
        return problem.getReadOnlyProperty();
    }

    void setText(DesignModel.Field field, String text) {
        switch (field) {
            case VALUE -> value.set(text);
            case TOLERANCE -> tolerance.set(text);
            case WIPER -> wiper.set(text);
            case KIND -> kind.set(text);
            default -> throw new IllegalArgumentException(field.name());
        }
    }

    void setProblem(String p) {
        problem.set(p);
    }

    /** {@code ±5%}, {@code +22/-82%}, or "" for an exact part. */
    static String toleranceText(Tolerance t) {
        if (t.minusFraction() == 0 && t.plusFraction() == 0) {
            return "";
        }
        if (t.isSymmetric()) {
            return "±" + percent(t.plusFraction()) + "%";
        }
        return "+" + percent(t.plusFraction()) + "/-" + percent(t.minusFraction()) + "%";
    }

    private static String percent(double fraction) {
        return new java.math.BigDecimal(fraction * 100).round(new java.math.MathContext(4)).stripTrailingZeros()
                .toPlainString();
    }
}
