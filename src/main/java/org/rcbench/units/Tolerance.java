package org.rcbench.units;

import java.math.BigDecimal;
import java.util.Locale;
import org.rcbench.common.BadInputException;

/**
 * A tolerance band as fractions below and above the nominal value: {@code ±5 %} is
 * {@code (0.05, 0.05)}, a Y5V capacitor's {@code +22/−82 %} is {@code (0.82, 0.22)}.
 *
 * <p>Accepted text (see {@link #parse}): {@code 5%}, {@code ±0.5 %}, {@code +-1%},
 * {@code +22/-82%}, {@code +22%/-82%}, {@code -82/+22 %}, and the IEC 60062 letters.
 *
 * @param minusFraction how far below nominal the band reaches, as a fraction, in [0, 1]
 * @param plusFraction  how far above nominal the band reaches, as a fraction, in [0, 1]
 */
public record Tolerance(double minusFraction, double plusFraction) {
    /** No tolerance: the value is exact. */
    public static final Tolerance NONE = new Tolerance(0, 0);

    public Tolerance {
        if (!(minusFraction >= 0 && minusFraction <= 1)) {
            throw new IllegalArgumentException("minusFraction outside [0, 1]: " + minusFraction);
        }
        if (!(plusFraction >= 0 && plusFraction <= 1)) {
            throw new IllegalArgumentException("plusFraction outside [0, 1]: " + plusFraction);
        }
    }

    /** A symmetric band of ± {@code fraction}. */
    public static Tolerance symmetric(double fraction) {
        return new Tolerance(fraction, fraction);
    }

    /** Whether the band is the same on both sides. */
    public boolean isSymmetric() {
        return minusFraction == plusFraction;
    }

    /** The lowest value of the band around {@code nominal}. */
    public double low(double nominal) {
        return nominal * (1 - minusFraction);
    }

    /** The highest value of the band around {@code nominal}. */
    public double high(double nominal) {
        return nominal * (1 + plusFraction);
    }

    /**
     * The IEC 60062 tolerance letter for a symmetric band, or {@code 0} when none matches.
     * F ±1 %, G ±2 %, J ±5 %, K ±10 %, M ±20 % (IEC 60062); B ±0.1 %, C ±0.25 %, D ±0.5 % (from memory).
     */
    public static double letterFraction(char letter) {
        switch (letter) {
            case 'B': return 0.001;
            case 'C': return 0.0025;
            case 'D': return 0.005;
            case 'F': return 0.01;
            case 'G': return 0.02;
            case 'J': return 0.05;
            case 'K': return 0.10;
            case 'M': return 0.20;
            default: return Double.NaN;
        }
    }

    /**
     * Parses a tolerance: a percentage ({@code 5%}, {@code ±5 %}, {@code +-5%}), an asymmetric pair
     * ({@code +22/-82%}, {@code -82%/+22%}) or one IEC 60062 letter ({@code J}).
     *
     * @throws BadInputException with an empty place and a message quoting the text, when the text is
     *                           not a tolerance, is negative, or exceeds 100 %
     */
    public static Tolerance parse(String text) {
        String t = text.strip().replace('\u2212', '-');
        if (t.length() == 1) {
            double f = letterFraction(t.charAt(0));
            if (!Double.isNaN(f)) {
                return symmetric(f);
            }
        }
        if (t.startsWith("±") || t.startsWith("+-") || t.startsWith("+/-")) {
            String rest = t.startsWith("±") ? t.substring(1) : t.substring(t.indexOf('-') + 1);
            double f = percent(text, rest);
            return checked(text, f, f);
        }
        int slash = t.indexOf('/');
        if (slash > 0) {
            String a = t.substring(0, slash).strip();
            String b = t.substring(slash + 1).strip();
            boolean aPlus = a.startsWith("+");
            boolean bPlus = b.startsWith("+");
            boolean aMinus = a.startsWith("-");
            boolean bMinus = b.startsWith("-");
            if (!((aPlus && bMinus) || (aMinus && bPlus))) {
                throw bad(text, "write an asymmetric band as +22/-82%");
            }
            // "+22/-82%": the percent sign may stand on the last number only.
            if (!a.endsWith("%") && b.endsWith("%")) {
                a = a + "%";
            }
            double fa = percent(text, a.substring(1));
            double fb = percent(text, b.substring(1));
            return aPlus ? checked(text, fb, fa) : checked(text, fa, fb);
        }
        if (t.startsWith("-")) {
            throw bad(text, "a tolerance cannot be negative; write ±5% or +0/-10%");
        }
        if (t.startsWith("+")) {
            throw bad(text, "write a symmetric band as ±5% and an asymmetric one as +22/-82%");
        }
        double f = percent(text, t);
        return checked(text, f, f);
    }

    private static double percent(String original, String text) {
        String t = text.strip();
        if (!t.endsWith("%")) {
            throw bad(original, "write a tolerance as a percentage (5%) or a letter (F G J K M)");
        }
        String number = t.substring(0, t.length() - 1).strip();
        if (number.isEmpty() || number.startsWith("+") || number.startsWith("-")) {
            throw bad(original, "is not a tolerance");
        }
        for (int i = 0; i < number.length(); i++) {
            char c = number.charAt(i);
            if (!(c >= '0' && c <= '9') && c != '.') {
                throw bad(original, "is not a tolerance");
            }
        }
        try {
            return new BigDecimal(number).movePointLeft(2).doubleValue();
        } catch (NumberFormatException e) {
            throw bad(original, "is not a tolerance");
        }
    }

    private static Tolerance checked(String text, double minus, double plus) {
        if (minus > 1 || plus > 1) {
            throw bad(text, "tolerance over 100 %");
        }
        return new Tolerance(minus, plus);
    }

    private static BadInputException bad(String text, String what) {
        return new BadInputException("", "\"" + text + "\": " + what);
    }

    /** {@code ±5 %}, {@code +22/−82 %}, with up to three decimals and {@link Locale#ROOT}. */
    @Override
    public String toString() {
        if (isSymmetric()) {
            return "±" + pct(plusFraction) + " %";
        }
        return "+" + pct(plusFraction) + "/-" + pct(minusFraction) + " %";
    }

    private static String pct(double fraction) {
        return BigDecimal.valueOf(fraction * 100).setScale(3, java.math.RoundingMode.HALF_UP)
                .stripTrailingZeros().toPlainString();
    }
}
