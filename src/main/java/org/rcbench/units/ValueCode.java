package org.rcbench.units;

import java.math.BigDecimal;
import java.math.RoundingMode;
import org.rcbench.common.BadInputException;

/**
 * Reads and writes component values: the IEC 60062 letter-and-digit code ({@code 4k7}, {@code R47},
 * {@code 2M2}, {@code 4n7}, {@code 1u0}), plain SI text ({@code 4.7 kΩ}, {@code 10 µF},
 * {@code 1.2 kHz}, {@code 1e-6}) and a trailing IEC 60062 tolerance letter ({@code 4K7K}).
 *
 * <p>Rules (IEC 60062, letter-and-digit code): the multiplier letter stands where the decimal point
 * goes; {@code R} is the ohm's point, {@code p n u µ m k K M G T} are the SI prefixes. Case matters
 * for {@code m} (milli) against {@code M} (mega); {@code k} and {@code K} are both kilo. Position
 * decides a letter's meaning: the first letter after digits is the multiplier, an upper-case
 * {@code B C D F G J K M} after the multiplier (and its digits) is a tolerance, so {@code 4K7K} is
 * 4.7 kΩ ±10 % while {@code 4k7k} is rejected. A code carries no unit symbol; SI text may.
 *
 * <p>Every failure is a {@link BadInputException} with an empty place and a message that quotes the
 * text; nothing else is thrown for any input string. Thread-safe (no state).
 */
public final class ValueCode {
    private ValueCode() {
    }

    /** Parses {@code text} as a value of {@code unit}; see the class comment for the grammar. */
    public static CodedValue parse(String text, Unit unit) {
        if (text == null) {
            throw new BadInputException("", "missing " + unit.quantityName());
        }
        String t = normalise(text.strip());
        if (t.isEmpty()) {
            throw bad(text, unit, "is empty");
        }
        int i = 0;
        boolean negative = false;
        if (t.charAt(0) == '-' || t.charAt(0) == '+') {
            negative = t.charAt(0) == '-';
            i = 1;
        }
        int intStart = i;
        while (i < t.length() && isDigit(t.charAt(i))) {
            i++;
        }
        String intDigits = t.substring(intStart, i);
        if (i < t.length() && t.charAt(i) == '.') {
            return parseDecimal(text, t, intStart, negative, unit);
        }
        if (i < t.length() && (t.charAt(i) == 'e' || t.charAt(i) == 'E') && !intDigits.isEmpty()
                && i + 1 < t.length() && (isDigit(t.charAt(i + 1)) || t.charAt(i + 1) == '-' || t.charAt(i + 1) == '+')) {
            return parseDecimal(text, t, intStart, negative, unit);
        }
        if (i == t.length()) {
            if (intDigits.isEmpty()) {
                throw bad(text, unit, "is not a " + unit.quantityName());
            }
            return new CodedValue(signed(negative, finite(text, unit, decimal(intDigits, "", 0))), null);
        }
        char letter = t.charAt(i);
        int exponent = multiplierExponent(letter, unit);
        if (exponent == Integer.MIN_VALUE) {
            if (intDigits.isEmpty()) {
                throw bad(text, unit, "is not a " + unit.quantityName());
            }
            // Digits then a space or a unit: SI text such as "470 Ω" or "10 nF".
            return parseDecimal(text, t, intStart, negative, unit);
        }
        int fracStart = i + 1;
        int j = fracStart;
        while (j < t.length() && isDigit(t.charAt(j))) {
            j++;
        }
        String fracDigits = t.substring(fracStart, j);
        if (intDigits.isEmpty() && fracDigits.isEmpty()) {
            throw bad(text, unit, "is not a " + unit.quantityName());
        }
        String after = t.substring(j);
        boolean toleranceOnly = after.length() == 1 && isToleranceLetter(after.charAt(0));
        if (fracDigits.isEmpty() && !after.isEmpty() && (!toleranceOnly || unit.isSpelledBy(after))) {
            // "10 nF", "10nF", "1 kHz": a prefix followed by a unit is SI text, not a code; the unit
            // symbol wins over a tolerance letter ("10nF" is 10 nF, not 10 nF ±1 %).
            if (intDigits.isEmpty()) {
                throw bad(text, unit, "is not a " + unit.quantityName());
            }
            return parseDecimal(text, t, intStart, negative, unit);
        }
        Tolerance tolerance = null;
        if (j < t.length()) {
            char last = t.charAt(j);
            if (j != t.length() - 1 || !isToleranceLetter(last)) {
                throw bad(text, unit, "is not a " + unit.quantityName() + " (letter-and-digit codes"
                        + " look like 4k7, R47, 10n, 4K7J)");
            }
            tolerance = Tolerance.symmetric(Tolerance.letterFraction(last));
        }
        return new CodedValue(signed(negative, finite(text, unit, decimal(intDigits, fracDigits, exponent))), tolerance);
    }

    /** Parses a value that must carry no tolerance letter. */
    public static double parseValue(String text, Unit unit) {
        CodedValue v = parse(text, unit);
        if (v.tolerance() != null) {
            throw bad(text, unit, "carries a tolerance letter where only a value belongs");
        }
        return v.value();
    }

    /** Parses a value that must be above zero and carry no tolerance letter. */
    public static double parsePositive(String text, Unit unit) {
        double v = parseValue(text, unit);
        if (!(v > 0)) {
            throw bad(text, unit, v < 0 ? "is negative: a " + unit.quantityName() + " must be above zero"
                    : "is zero: a " + unit.quantityName() + " must be above zero");
        }
        return v;
    }

    private static CodedValue parseDecimal(String original, String t, int numberStart, boolean negative, Unit unit) {
        int i = numberStart;
        StringBuilder number = new StringBuilder();
        boolean digits = false;
        while (i < t.length() && (isDigit(t.charAt(i)) || t.charAt(i) == '.')) {
            digits |= isDigit(t.charAt(i));
            number.append(t.charAt(i));
            i++;
        }
        if (!digits || number.indexOf(".") != number.lastIndexOf(".")) {
            throw bad(original, unit, "is not a " + unit.quantityName());
        }
        if (i < t.length() && (t.charAt(i) == 'e' || t.charAt(i) == 'E')) {
            int expStart = i;
            number.append('E');
            i++;
            if (i < t.length() && (t.charAt(i) == '-' || t.charAt(i) == '+')) {
                number.append(t.charAt(i));
                i++;
            }
            int expDigits = i;
            while (i < t.length() && isDigit(t.charAt(i))) {
                number.append(t.charAt(i));
                i++;
            }
            if (i == expDigits || i - expDigits > 3) {
                throw bad(original, unit, "is not a " + unit.quantityName());
            }
            if (expStart == numberStart) {
                throw bad(original, unit, "is not a " + unit.quantityName());
            }
        }
        while (i < t.length() && t.charAt(i) == ' ') {
            i++;
        }
        int exponent = 0;
        String rest = t.substring(i);
        if (!rest.isEmpty() && !unit.isSpelledBy(rest)) {
            int e = prefixExponent(rest.charAt(0));
            String afterPrefix = rest.substring(1).strip();
            if (e == Integer.MIN_VALUE || !(afterPrefix.isEmpty() || unit.isSpelledBy(afterPrefix))) {
                throw bad(original, unit, "is not a " + unit.quantityName()
                        + (unit.symbol().isEmpty() ? "" : " (expected a number with an SI prefix and "
                        + unit.symbol() + ", e.g. 4.7 k" + unit.symbol() + ")"));
            }
            exponent = e;
        }
        double v;
        try {
            v = new BigDecimal(number.toString()).movePointRight(exponent).doubleValue();
        } catch (NumberFormatException | ArithmeticException e) {
            throw bad(original, unit, "is not a " + unit.quantityName());
        }
        if (!Double.isFinite(v)) {
            throw bad(original, unit, "is out of range");
        }
        return new CodedValue(signed(negative, v), null);
    }

    /**
     * Formats {@code value} as a letter-and-digit code with up to three significant digits:
     * {@code 4k7}, {@code 470R}, {@code R47}, {@code 1k0}, {@code 10n}, {@code 4n7}, {@code 1u0}.
     */
    public static String format(double value, Unit unit) {
        return format(value, unit, 3);
    }

    /**
     * Formats {@code value} as a letter-and-digit code rounded to {@code significant} digits
     * (1..6), trailing zeros dropped. Resistance uses {@code R k M G T}; other units use the SI
     * prefixes {@code p n u m k M G} with {@code u} for micro. A single-digit whole mantissa keeps
     * one zero after the letter ({@code 1k0}, {@code 1u0}) so the code cannot be misread as a
     * value with a tolerance letter. Non-finite values give {@code "—"}.
     */
    public static String format(double value, Unit unit, int significant) {
        if (significant < 1 || significant > 6) {
            throw new IllegalArgumentException("significant out of 1..6: " + significant);
        }
        if (!Double.isFinite(value)) {
            return "—";
        }
        if (value == 0) {
            return unit == Unit.OHM ? "0R" : "0";
        }
        String sign = value < 0 ? "-" : "";
        BigDecimal m = new BigDecimal(Math.abs(value)).round(new java.math.MathContext(significant, RoundingMode.HALF_EVEN));
        int exp3 = Math.floorDiv(m.precision() - m.scale() - 1, 3) * 3;
        exp3 = Math.max(-12, Math.min(12, exp3));
        BigDecimal mantissa = m.movePointLeft(exp3).stripTrailingZeros();
        if (unit == Unit.OHM && exp3 < 0) {
            // Below one ohm the code writes R as the point: 0.47 Ω is R47.
            BigDecimal fraction = m.stripTrailingZeros();
            String digits = fraction.toPlainString();
            return sign + "R" + digits.substring(digits.indexOf('.') + 1);
        }
        String plain = mantissa.toPlainString();
        int dot = plain.indexOf('.');
        String intPart = dot < 0 ? plain : plain.substring(0, dot);
        String fracPart = dot < 0 ? "" : plain.substring(dot + 1);
        if (intPart.equals("0")) {
            intPart = "";
        }
        String letter = multiplierLetter(exp3, unit);
        if (letter.isEmpty()) {
            return sign + plain;
        }
        if (fracPart.isEmpty() && intPart.length() == 1) {
            fracPart = "0";
        }
        return sign + intPart + letter + fracPart;
    }

    /**
     * Formats as SI text with up to {@code significant} digits and no trailing zeros:
     * {@code 4.7 kΩ}, {@code 10 µF}, {@code 1.2 kHz}.
     */
    public static String formatSi(double value, Unit unit, int significant) {
        String s = SiFormat.format(value, unit.symbol(), significant);
        int space = s.indexOf(' ');
        if (space < 0 || s.indexOf('.') < 0 || s.indexOf('.') > space) {
            return s;
        }
        String number = s.substring(0, space);
        String tail = s.substring(space);
        int end = number.length();
        while (number.charAt(end - 1) == '0') {
            end--;
        }
        if (number.charAt(end - 1) == '.') {
            end--;
        }
        return number.substring(0, end) + tail;
    }

    private static String multiplierLetter(int exp3, Unit unit) {
        switch (exp3) {
            case -12: return "p";
            case -9: return "n";
            case -6: return "u";
            case -3: return "m";
            case 0: return unit == Unit.OHM ? "R" : "";
            case 3: return "k";
            case 6: return "M";
            case 9: return "G";
            default: return "T";
        }
    }

    private static int multiplierExponent(char c, Unit unit) {
        if (c == 'R' || c == 'r') {
            return unit == Unit.OHM ? 0 : Integer.MIN_VALUE;
        }
        return prefixExponent(c);
    }

    private static int prefixExponent(char c) {
        switch (c) {
            case 'p': return -12;
            case 'n': return -9;
            case 'u': case 'µ': return -6;
            case 'm': return -3;
            case 'k': case 'K': return 3;
            case 'M': return 6;
            case 'G': return 9;
            case 'T': return 12;
            default: return Integer.MIN_VALUE;
        }
    }

    private static boolean isToleranceLetter(char c) {
        return !Double.isNaN(Tolerance.letterFraction(c));
    }

    private static double decimal(String intDigits, String fracDigits, int exponent) {
        String digits = (intDigits.isEmpty() ? "0" : intDigits) + (fracDigits.isEmpty() ? "" : "." + fracDigits);
        return new BigDecimal(digits).movePointRight(exponent).doubleValue();
    }

    private static double finite(String text, Unit unit, double v) {
        if (!Double.isFinite(v)) {
            throw bad(text, unit, "is out of range");
        }
        return v;
    }

    private static double signed(boolean negative, double v) {
        return negative ? -v : v;
    }

    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    /** Ohm sign U+2126 to capital omega U+03A9, Greek mu U+03BC to micro sign U+00B5. */
    private static String normalise(String t) {
        return t.replace('\u2126', 'Ω').replace('\u03bc', 'µ').replace('\u2212', '-');
    }

    private static BadInputException bad(String text, Unit unit, String what) {
        return new BadInputException("", "\"" + text + "\" " + what);
    }
}
