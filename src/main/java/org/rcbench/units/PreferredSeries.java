package org.rcbench.units;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * The IEC 60063 preferred-number series E3 to E192: the mantissas of one decade and the values
 * they give in every decade.
 *
 * <p>E3 to E24 are tables (eight E24 values differ from rounding {@code 10^(i/24)}). E48, E96 and
 * E192 follow the formula {@code round(10^(i/n), 2)}, except that E192 holds 9.20 where the formula
 * gives 9.19 (IEC 60063). Values are exact decimal numbers converted to the nearest {@code double}.
 * Immutable and thread-safe.
 */
public enum PreferredSeries {
    E3(3, Double.NaN, 10, 22, 47),
    E6(6, 0.20, 10, 15, 22, 33, 47, 68),
    E12(12, 0.10, 10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82),
    E24(24, 0.05, 10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68,
            75, 82, 91),
    E48(48, 0.02),
    E96(96, 0.01),
    E192(192, 0.005);

    private final int steps;
    private final double usualTolerance;
    /** Mantissas of one decade in hundredths (1.0 -> 100, 9.20 -> 920), ascending. */
    private final int[] hundredths;

    PreferredSeries(int steps, double usualTolerance, int... tenths) {
        this.steps = steps;
        this.usualTolerance = usualTolerance;
        this.hundredths = tenths.length > 0 ? scale(tenths) : formula(steps);
    }

    private static int[] scale(int[] tenths) {
        int[] h = new int[tenths.length];
        for (int i = 0; i < tenths.length; i++) {
            h[i] = tenths[i] * 10;
        }
        return h;
    }

    private static int[] formula(int steps) {
        int[] h = new int[steps];
        for (int i = 0; i < steps; i++) {
            h[i] = new BigDecimal(Math.pow(10, (double) i / steps)).setScale(2, RoundingMode.HALF_UP)
                    .movePointRight(2).intValueExact();
        }
        if (steps == 192) {
            // IEC 60063: E192 holds 9.20 where round(10^(185/192), 2) gives 9.19.
            h[185] = 920;
        }
        return h;
    }

    /** The number of values per decade (3, 6, ... 192). */
    public int steps() {
        return steps;
    }

    /**
     * The tolerance usually paired with this series, as a fraction: E6 ±20 %, E12 ±10 %, E24 ±5 %,
     * E48 ±2 %, E96 ±1 %, E192 ±0.5 % (common pairing, IEC 60063); {@code NaN} for E3.
     */
    public double usualTolerance() {
        return usualTolerance;
    }

    /** The mantissas of one decade, ascending, in [1, 10). A fresh copy. */
    public double[] mantissas() {
        double[] m = new double[hundredths.length];
        for (int i = 0; i < m.length; i++) {
            m[i] = value(i, 0);
        }
        return m;
    }

    /** The series value with mantissa index {@code index} in decade {@code decade} (10^decade). */
    public double value(int index, int decade) {
        int carry = Math.floorDiv(index, hundredths.length);
        int i = Math.floorMod(index, hundredths.length);
        return BigDecimal.valueOf(hundredths[i], 2 - decade - carry).doubleValue();
    }

    /** Whether {@code value} is a member of the series (in any decade), to 1e-9 relative. */
    public boolean contains(double value) {
        return value > 0 && Math.abs(nearest(value) / value - 1) < 1e-9;
    }

    /** The series value nearest to {@code value} on a logarithmic scale; {@code value} must be above zero. */
    public double nearest(double value) {
        double below = atOrBelow(value);
        double above = atOrAbove(value);
        return Math.log(value / below) <= Math.log(above / value) ? below : above;
    }

    /** The largest series value at or below {@code value} (to 1e-9 relative). */
    public double atOrBelow(double value) {
        requirePositive(value);
        int decade = (int) Math.floor(Math.log10(value));
        for (int d = decade + 1; d >= decade - 1; d--) {
            for (int i = hundredths.length - 1; i >= 0; i--) {
                double v = value(i, d);
                if (v <= value * (1 + 1e-9)) {
                    return v;
                }
            }
        }
        throw new IllegalStateException("no series value below " + value);
    }

    /** The smallest series value at or above {@code value} (to 1e-9 relative). */
    public double atOrAbove(double value) {
        requirePositive(value);
        int decade = (int) Math.floor(Math.log10(value));
        for (int d = decade - 1; d <= decade + 1; d++) {
            for (int i = 0; i < hundredths.length; i++) {
                double v = value(i, d);
                if (v >= value * (1 - 1e-9)) {
                    return v;
                }
            }
        }
        throw new IllegalStateException("no series value above " + value);
    }

    /** The next series value strictly above {@code value}. */
    public double next(double value) {
        return atOrAbove(value * (1 + 1e-6));
    }

    /** The next series value strictly below {@code value}. */
    public double previous(double value) {
        return atOrBelow(value * (1 - 1e-6));
    }

    /** All series values in [min, max], ascending; empty when none. */
    public double[] between(double min, double max) {
        requirePositive(min);
        if (max < min) {
            return new double[0];
        }
        int count = 0;
        for (double v = atOrAbove(min); v <= max * (1 + 1e-9); v = next(v)) {
            count++;
        }
        double[] out = new double[count];
        int k = 0;
        for (double v = atOrAbove(min); k < count; v = next(v)) {
            out[k++] = v;
        }
        return out;
    }

    private static void requirePositive(double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException("value not positive and finite: " + value);
        }
    }

    /** Parses {@code E24}, {@code e96} ...; throws {@link org.rcbench.common.BadInputException} quoting the text. */
    public static PreferredSeries parse(String text) {
        for (PreferredSeries s : values()) {
            if (s.name().equalsIgnoreCase(text.strip())) {
                return s;
            }
        }
        throw new org.rcbench.common.BadInputException("", "\"" + text + "\" is not a preferred series (E3, E6, E12, E24, E48, E96 or E192)");
    }
}
