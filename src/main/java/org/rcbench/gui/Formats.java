package org.rcbench.gui;

import java.util.Locale;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.units.SiFormat;

/** How the window writes values: SI prefixes, duty as a percentage, bands as ranges. Stateless. */
public final class Formats {
    private Formats() {
    }

    /** {@code 690.12 Hz}, {@code 1.4493 ms}, {@code 52.38 %}; {@code —} for NaN. */
    public static String value(TimingQuantity q, double v) {
        if (q == TimingQuantity.DUTY) {
            return Double.isFinite(v) ? SiFormat.percent(v, 2) : "—";
        }
        return Double.isFinite(v) ? SiFormat.format(v, q.unit().symbol(), 5) : "—";
    }

    /** Like {@link #value} with four significant digits, for expected values and bands. */
    public static String shortValue(TimingQuantity q, double v) {
        if (q == TimingQuantity.DUTY) {
            return Double.isFinite(v) ? SiFormat.percent(v, 1) : "—";
        }
        return Double.isFinite(v) ? SiFormat.format(v, q.unit().symbol(), 4) : "—";
    }

    /** An uncertainty, {@code ± 0.083 Hz}; duty in percentage points. */
    public static String plusMinus(TimingQuantity q, double u) {
        if (!Double.isFinite(u)) {
            return "";
        }
        if (q == TimingQuantity.DUTY) {
            return String.format(Locale.ROOT, "± %.2f %%", u * 100);
        }
        return "± " + SiFormat.format(u, q.unit().symbol(), 2);
    }

    /** {@code 662.0 Hz – 716.4 Hz}. */
    public static String range(TimingQuantity q, double low, double high) {
        return shortValue(q, low) + " – " + shortValue(q, high);
    }

    /** {@code +1.8 %} deviation of {@code v} from {@code nominal}; "" when either is missing. */
    public static String deviation(double v, double nominal) {
        if (!Double.isFinite(v) || !Double.isFinite(nominal) || nominal == 0) {
            return "";
        }
        double percent = (v / nominal - 1) * 100;
        // Anything that rounds to zero is written without a sign ("-0.0 %" reads like a deviation).
        return Math.abs(percent) < 0.05 ? "0.0 %" : String.format(Locale.ROOT, "%+.1f %%", percent);
    }
}
