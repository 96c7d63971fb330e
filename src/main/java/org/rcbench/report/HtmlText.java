package org.rcbench.report;

import java.util.Locale;
import org.rcbench.units.SiFormat;
import org.rcbench.units.Tolerance;

/** Escaping and number wording for the report. Stateless and thread-safe. */
final class HtmlText {
    private HtmlText() {
    }

    /** {@code text} safe inside HTML or XML element content and quoted attributes. */
    static String escape(String text) {
        if (text == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(text.length() + 16);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&#39;");
                default -> {
                    if (c < 0x20 && c != '\n' && c != '\t') {
                        sb.append(' '); // control characters are not allowed in XML 1.0
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.toString();
    }

    /** A value in {@code unit} for people: SI prefix, 4 significant digits; ratios as percent; counts whole. */
    static String value(double v, String unit) {
        if (!Double.isFinite(v)) {
            return "—";
        }
        return switch (unit == null ? "" : unit) {
            case "1", "" -> number(v, 6, false);
            case "count" -> String.format(Locale.ROOT, "%d", Math.round(v));
            case "ppm", "ppm/s" -> String.format(Locale.ROOT, "%.4g %s", v, unit);
            // The check JSON spells the ohm out ("ohm") to stay ASCII; people read the symbol.
            case "ohm" -> SiFormat.format(v, "Ω", 4);
            default -> SiFormat.format(v, unit, 4);
        };
    }

    /** The unit of a measure or prediction key, from its suffix ({@code frequency_hz} is Hz). */
    static String unitOfKey(String key) {
        if (key.endsWith("_hz")) {
            return "Hz";
        }
        if (key.endsWith("_s") && !key.endsWith("_per_s")) {
            return "s";
        }
        return key.equals("duty") ? "ratio" : "1";
    }

    /** A measure or prediction value by its key: duty as percent, others with their unit. */
    static String byKey(String key, double v) {
        if (!Double.isFinite(v)) {
            return "—";
        }
        String unit = unitOfKey(key);
        if (unit.equals("ratio")) {
            return SiFormat.percent(v, 2);
        }
        return value(v, unit);
    }

    /** Readable name of a measure or prediction key. */
    static String label(String key) {
        return switch (key) {
            case "frequency_hz" -> "frequency";
            case "period_s" -> "period";
            case "high_s" -> "high time";
            case "low_s" -> "low time";
            case "duty" -> "duty cycle";
            case "pulse_width_s" -> "pulse width";
            case "delay_s" -> "trigger-to-output delay";
            case "first_high_s" -> "first high time after power-up";
            default -> key.replace('_', ' ');
        };
    }

    /** A tolerance band as {@code ±5 %} or {@code +50/-20 %}; {@code —} when unknown. */
    static String tolerance(Tolerance t) {
        if (t == null) {
            return "—";
        }
        if (t.isSymmetric()) {
            return "±" + trimmed(t.plusFraction() * 100) + " %";
        }
        return "+" + trimmed(t.plusFraction() * 100) + "/-" + trimmed(t.minusFraction() * 100) + " %";
    }

    /** {@code -0.052} as {@code -5.2 %}. */
    static String signedPercent(double ratio) {
        return Double.isFinite(ratio) ? String.format(Locale.ROOT, "%+.1f %%", ratio * 100) : "—";
    }

    /** {@code v} with {@code significant} digits, trailing zeros dropped, optionally signed: {@code +12.5}. */
    static String number(double v, int significant, boolean signed) {
        if (!Double.isFinite(v)) {
            return "—";
        }
        String s = String.format(Locale.ROOT, signed ? "%+." + significant + "g" : "%." + significant + "g", v);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        String exponent = e < 0 ? "" : s.substring(e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "");
            if (mantissa.endsWith(".")) {
                mantissa = mantissa.substring(0, mantissa.length() - 1);
            }
        }
        return mantissa + exponent;
    }

    private static String trimmed(double v) {
        String s = String.format(Locale.ROOT, "%.3f", v);
        s = s.replaceAll("0+$", "");
        return s.endsWith(".") ? s.substring(0, s.length() - 1) : s;
    }
}
