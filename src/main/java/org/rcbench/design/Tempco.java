package org.rcbench.design;

import org.rcbench.common.BadInputException;

/**
 * A temperature coefficient as a band of ppm/K: {@code -200 ppm/K} is exact (half width 0),
 * {@code ±50 ppm/K} is any coefficient from -50 to +50, {@code 0 ±30 ppm/K} a C0G capacitor.
 *
 * @param centreppmPerKelvin the middle of the band (ppm/K)
 * @param halfWidthPpmPerKelvin half the band's width (ppm/K), >= 0
 */
public record Tempco(double centreppmPerKelvin, double halfWidthPpmPerKelvin) {
    /** C0G (NP0) class-1 ceramic: 0 ±30 ppm/K (EIA-198, check-values.md). */
    public static final Tempco C0G = new Tempco(0, 30);

    public Tempco {
        if (!Double.isFinite(centreppmPerKelvin) || !(halfWidthPpmPerKelvin >= 0) || Double.isInfinite(halfWidthPpmPerKelvin)) {
            throw new IllegalArgumentException("bad tempco " + centreppmPerKelvin + " ± " + halfWidthPpmPerKelvin);
        }
    }

    public double lowPpm() {
        return centreppmPerKelvin - halfWidthPpmPerKelvin;
    }

    public double highPpm() {
        return centreppmPerKelvin + halfWidthPpmPerKelvin;
    }

    /**
     * Parses {@code -200 ppm/K}, {@code ±50 ppm/K}, {@code +-50ppm/K}, {@code 0 ±30 ppm/K}; the unit may
     * also be written {@code ppm/°C} or {@code ppm/C}.
     *
     * @throws BadInputException with an empty place and a message quoting the text
     */
    public static Tempco parse(String text) {
        String t = text.strip().replace('\u2212', '-');
        String lower = t.toLowerCase(java.util.Locale.ROOT);
        int unit = lower.indexOf("ppm");
        if (unit < 0) {
            throw bad(text);
        }
        String tail = lower.substring(unit).replace(" ", "");
        if (!(tail.equals("ppm/k") || tail.equals("ppm/°c") || tail.equals("ppm/c"))) {
            throw bad(text);
        }
        String body = t.substring(0, unit).strip().replace("+-", "±").replace("+/-", "±");
        int pm = body.indexOf('±');
        try {
            if (pm < 0) {
                return new Tempco(number(text, body), 0);
            }
            double centre = pm == 0 ? 0 : number(text, body.substring(0, pm).strip());
            double half = number(text, body.substring(pm + 1).strip());
            if (half < 0) {
                throw bad(text);
            }
            return new Tempco(centre, half);
        } catch (IllegalArgumentException e) {
            throw bad(text);
        }
    }

    private static double number(String original, String s) {
        if (s.isEmpty()) {
            throw bad(original);
        }
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (!(c >= '0' && c <= '9') && c != '.' && !(i == 0 && (c == '-' || c == '+'))) {
                throw bad(original);
            }
        }
        return Double.parseDouble(s);
    }

    private static BadInputException bad(String text) {
        return new BadInputException("", "\"" + text + "\" is not a temperature coefficient (e.g. \"±50 ppm/K\", \"-200 ppm/K\")");
    }
}
