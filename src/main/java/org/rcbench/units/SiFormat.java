package org.rcbench.units;

import java.util.Locale;

/**
 * Formats a quantity with an SI prefix chosen for its magnitude: {@code 6.870 kHz}, {@code 76.25 µs}.
 *
 * <p>The prefix is the largest power of 1000 not above the magnitude (from pico to giga), so the
 * mantissa lies in [1, 1000). Zero prints without a prefix; {@code NaN} and infinities print as
 * {@code "—"} followed by the unit. Always formatted with {@link Locale#ROOT}. Thread-safe.
 */
public final class SiFormat {
    private static final String[] PREFIXES = {"p", "n", "µ", "m", "", "k", "M", "G"};
    private static final int UNIT_INDEX = 4;

    private SiFormat() {
    }

    /**
     * Formats {@code value} in {@code unit} with {@code significant} significant digits.
     *
     * @param value       the value in the base unit (seconds, hertz, ohms ...)
     * @param unit        the base unit symbol, e.g. {@code "s"}, {@code "Hz"}, {@code "Ω"}
     * @param significant significant digits, 1..15
     */
    public static String format(double value, String unit, int significant) {
        if (significant < 1 || significant > 15) {
            throw new IllegalArgumentException("significant out of 1..15: " + significant);
        }
        if (!Double.isFinite(value)) {
            return "—" + (unit.isEmpty() ? "" : " " + unit);
        }
        if (value == 0) {
            return String.format(Locale.ROOT, "%." + (significant - 1) + "f %s", 0.0, unit).trim();
        }
        double magnitude = Math.abs(value);
        int exponent3 = (int) Math.floor(Math.log10(magnitude) / 3.0);
        exponent3 = Math.max(-UNIT_INDEX, Math.min(PREFIXES.length - 1 - UNIT_INDEX, exponent3));
        double mantissa = value / Math.pow(1000, exponent3);
        // Rounding may carry the mantissa to 1000 (999.96 -> "1000.0"): move to the next prefix.
        int intDigits = digitsBeforePoint(Math.abs(mantissa));
        int decimals = Math.max(0, significant - intDigits);
        double rounded = roundTo(mantissa, decimals);
        if (Math.abs(rounded) >= 1000 && exponent3 < PREFIXES.length - 1 - UNIT_INDEX) {
            exponent3++;
            mantissa = value / Math.pow(1000, exponent3);
            decimals = Math.max(0, significant - digitsBeforePoint(Math.abs(mantissa)));
        }
        String number = String.format(Locale.ROOT, "%." + decimals + "f", mantissa);
        return number + " " + PREFIXES[exponent3 + UNIT_INDEX] + unit;
    }

    /** Formats with four significant digits. */
    public static String format(double value, String unit) {
        return format(value, unit, 4);
    }

    /** Formats a ratio (0.5238) as a percentage with the given decimals: {@code 52.38 %}. */
    public static String percent(double ratio, int decimals) {
        if (!Double.isFinite(ratio)) {
            return "— %";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f %%", ratio * 100);
    }

    private static int digitsBeforePoint(double magnitude) {
        if (magnitude < 1) {
            return 1;
        }
        return (int) Math.floor(Math.log10(magnitude)) + 1;
    }

    private static double roundTo(double v, int decimals) {
        double scale = Math.pow(10, decimals);
        return Math.round(v * scale) / scale;
    }
}
