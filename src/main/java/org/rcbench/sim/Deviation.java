package org.rcbench.sim;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalInt;
import org.rcbench.circuit.ParameterKind;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.common.BadInputException;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * One chosen deviation of a simulated board from its design: a part fault ({@code C1=-35%},
 * {@code R2=12k}, {@code C1=68n}) or a latent condition ({@code leak=1M}, {@code control=4k7},
 * {@code supply=7.2V}). Immutable.
 *
 * <p>Syntax: {@code NAME=VALUE}, spaces allowed around {@code =}.
 * <ul>
 * <li>{@code NAME} is a designator of the design ({@code C1}, {@code R2}, {@code VR1}), a
 * potentiometer's wiper ({@code VR1.wiper}, a fraction 0..1), or a latent parameter of the circuit
 * model: {@code leak} (leakage resistance across the timing capacitor), {@code control} (a load
 * from the control pin to ground; same as {@code control.ohms}), {@code control.volts},
 * {@code supply}, and the timer family's {@code family.*} parameters.</li>
 * <li>{@code VALUE} is either a signed change in percent ({@code -35%}, {@code +10%}: the nominal
 * value times {@code 1 + p/100}), or a value in the parameter's own unit in IEC 60062 code or SI
 * text ({@code 68n}, {@code 12k}, {@code 4k7}, {@code 1M}, {@code 7.2V}, {@code 7.2}), or
 * {@code open} for "not connected" (infinite resistance: {@code leak=open} removes leakage).</li>
 * </ul>
 * Parsing ({@link #parse}) checks the syntax; {@link #resolve} checks the name and the value against
 * one model's parameters, because the unit depends on the parameter. Every failure is a one-line
 * {@link BadInputException} quoting the text.
 *
 * @param name      the parameter name as typed ({@code control} is kept, and resolved to {@code control.ohms})
 * @param valueText the value as typed
 * @param relative  the relative change as a fraction ({@code -0.35}), or NaN for an absolute value
 */
public record Deviation(String name, String valueText, double relative) {
    /** Latent names accepted besides designators and the model's own parameter names. */
    public static final String CONTROL_ALIAS = "control";

    public Deviation {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("name is blank");
        }
        if (valueText == null) {
            throw new IllegalArgumentException("valueText is null");
        }
    }

    /** A relative change of {@code name} by {@code fraction} ({@code -0.35} for -35 %). */
    public static Deviation relative(String name, double fraction) {
        if (!(fraction > -1) || Double.isInfinite(fraction)) {
            throw new IllegalArgumentException("fraction out of (-1, inf): " + fraction);
        }
        return new Deviation(name, String.format(Locale.ROOT, "%+g%%", fraction * 100), fraction);
    }

    /** An absolute value of {@code name} in its SI unit (ohms, farads, volts, a wiper fraction). */
    public static Deviation absolute(String name, double value) {
        return new Deviation(name, Double.isInfinite(value) ? "open" : repr(value), Double.NaN);
    }

    /** True for a change in percent, false for an absolute value. */
    public boolean isRelative() {
        return !Double.isNaN(relative);
    }

    /** The deviation as typed, {@code NAME=VALUE}. */
    @Override
    public String toString() {
        return name + "=" + valueText;
    }

    /** Parses {@code NAME=VALUE}; see the class comment. Throws a one-line error quoting the text. */
    public static Deviation parse(String text) {
        if (text == null) {
            throw new BadInputException("--fault", "missing NAME=VALUE");
        }
        int eq = text.indexOf('=');
        if (eq < 0 || eq != text.lastIndexOf('=')) {
            throw bad(text, "is not NAME=VALUE (e.g. C1=-35%, R2=12k, leak=1M)");
        }
        String name = text.substring(0, eq).strip();
        String value = text.substring(eq + 1).strip().replace('\u2212', '-');
        if (name.isEmpty()) {
            throw bad(text, "names no part or parameter before '='");
        }
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            if (!(Character.isLetterOrDigit(c) || c == '.' || c == '_' || c == '-')) {
                throw bad(text, "\"" + name + "\" is not a part designator or parameter name");
            }
        }
        if (value.isEmpty()) {
            throw bad(text, "gives no value after '='");
        }
        if (value.endsWith("%")) {
            return new Deviation(name, value, percent(text, value));
        }
        return new Deviation(name, value, Double.NaN);
    }

    /** Parses several deviations. */
    public static List<Deviation> parseAll(List<String> texts) {
        List<Deviation> out = new ArrayList<>();
        for (String t : texts) {
            out.add(parse(t));
        }
        return out;
    }

    private static double percent(String text, String value) {
        char sign = value.charAt(0);
        if (sign != '+' && sign != '-') {
            throw bad(text, "write a change with its sign, e.g. -35% or +10%");
        }
        String number = value.substring(1, value.length() - 1).strip();
        if (number.isEmpty()) {
            throw bad(text, "\"" + value + "\" is not a percentage");
        }
        for (int i = 0; i < number.length(); i++) {
            char c = number.charAt(i);
            if (!(c >= '0' && c <= '9') && c != '.') {
                throw bad(text, "\"" + value + "\" is not a percentage");
            }
        }
        double f;
        try {
            f = new BigDecimal(number).movePointLeft(2).doubleValue();
        } catch (NumberFormatException e) {
            throw bad(text, "\"" + value + "\" is not a percentage");
        }
        f = sign == '-' ? -f : f;
        if (!(f > -1)) {
            throw bad(text, "a change of " + value + " leaves nothing of the part");
        }
        if (!Double.isFinite(f)) {
            throw bad(text, "\"" + value + "\" is out of range");
        }
        return f;
    }

    /**
     * The index into {@code table} this deviation changes and the value it sets, given the nominal
     * vector {@code nominal}; {@code boardTitle} names the design in messages.
     */
    public Resolved resolve(ParameterTable table, double[] nominal, String boardTitle) {
        String key = name.equals(CONTROL_ALIAS) ? ParameterTable.CONTROL_OHMS : name;
        OptionalInt found = table.find(key);
        if (found.isEmpty()) {
            throw bad(toString(), boardTitle + " has no part or parameter \"" + name + "\" (" + choices(table) + ")");
        }
        int i = found.getAsInt();
        Unit unit = table.unit(i);
        double value;
        if (isRelative()) {
            if (!Double.isFinite(nominal[i])) {
                throw bad(toString(), name + " is not connected in " + boardTitle
                        + "; give a value (e.g. " + name + "=1M) instead of a percentage");
            }
            value = nominal[i] * (1 + relative);
        } else if (valueText.strip().equalsIgnoreCase("open") || valueText.strip().equalsIgnoreCase("inf")) {
            if (unit != Unit.OHM) {
                throw bad(toString(), "only a resistance can be open");
            }
            value = Double.POSITIVE_INFINITY;
        } else {
            try {
                value = ValueCode.parseValue(valueText, unit);
            } catch (BadInputException e) {
                throw bad(toString(), e.what());
            }
        }
        check(table, i, value);
        return new Resolved(i, value);
    }

    private void check(ParameterTable table, int i, double value) {
        ParameterKind kind = table.kind(i);
        String n = table.name(i);
        if (kind == ParameterKind.WIPER) {
            if (!(value >= 0 && value <= 1)) {
                throw bad(toString(), "a wiper position is a fraction from 0 to 1");
            }
        } else if (n.equals(ParameterTable.CONTROL_VOLTS)) {
            if (!Double.isFinite(value)) {
                throw bad(toString(), "not a finite voltage");
            }
        } else if (n.equals(ParameterTable.CONTROL_OHMS) || n.equals(ParameterTable.LEAK)) {
            if (!(value > 0)) {
                throw bad(toString(), "a resistance must be above zero (use \"open\" for none)");
            }
        } else if (kind == ParameterKind.PART || n.equals(ParameterTable.SUPPLY)) {
            if (!(value > 0) || Double.isInfinite(value)) {
                throw bad(toString(), "the value must be above zero");
            }
        } else if (!(value >= 0) || Double.isInfinite(value)) {
            throw bad(toString(), "the value must be zero or more");
        }
    }

    private static String choices(ParameterTable table) {
        StringBuilder parts = new StringBuilder("parts:");
        for (int i = 0; i < table.size(); i++) {
            if (table.kind(i) == ParameterKind.PART) {
                parts.append(parts.length() > 6 ? ", " : " ").append(table.name(i));
            }
        }
        return parts + "; also leak, control, supply, family.*";
    }

    private static String repr(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    private static BadInputException bad(String text, String what) {
        return new BadInputException("--fault", "\"" + text + "\": " + what);
    }

    /** A deviation checked against one model: parameter {@code index} takes {@code value}. */
    public record Resolved(int index, double value) {
        /** Writes the value into parameter vector {@code p}. */
        public void applyTo(double[] p) {
            p[index] = value;
        }
    }
}
