package org.rcbench.design;

import java.util.Locale;

/**
 * A potentiometer's mechanical travel, from the design file's {@code travel} key: an angle for a
 * single-turn pot ({@code "270 deg"}) or a number of turns for a multi-turn trimmer
 * ({@code "25 turns"}); exactly one of the two is a number, the other NaN. Lets tuning advice say
 * how far to turn ({@code about 40° of its 270° travel}). Immutable.
 *
 * @param degrees the travel in degrees, or NaN
 * @param turns   the travel in turns, or NaN
 */
public record PotTravel(double degrees, double turns) {
    public PotTravel {
        if (Double.isNaN(degrees) == Double.isNaN(turns)) {
            throw new IllegalArgumentException("give degrees or turns, one of them: " + degrees + ", " + turns);
        }
        if (!Double.isNaN(degrees) && !(degrees > 0 && degrees < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("degrees <= 0: " + degrees);
        }
        if (!Double.isNaN(turns) && !(turns > 0 && turns < Double.POSITIVE_INFINITY)) {
            throw new IllegalArgumentException("turns <= 0: " + turns);
        }
    }

    public static PotTravel ofDegrees(double degrees) {
        return new PotTravel(degrees, Double.NaN);
    }

    public static PotTravel ofTurns(double turns) {
        return new PotTravel(Double.NaN, turns);
    }

    /** The text the design file holds: {@code 270 deg} or {@code 25 turns}. */
    public String text() {
        double v = Double.isNaN(degrees) ? turns : degrees;
        String n = java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
        return Double.isNaN(degrees) ? n + (v == 1 ? " turn" : " turns") : n + " deg";
    }

    /**
     * Parses {@code 270 deg}, {@code 270°}, {@code 270 degrees}, {@code 25 turns} or {@code 1 turn}
     * (spaces optional, case ignored); null for text that is none of these or a value not above zero.
     */
    public static PotTravel parse(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        String[][] units = {{"degrees", "d"}, {"degree", "d"}, {"deg", "d"}, {"°", "d"}, {"turns", "t"}, {"turn", "t"}};
        for (String[] u : units) {
            if (t.endsWith(u[0])) {
                String number = t.substring(0, t.length() - u[0].length()).strip();
                double v;
                try {
                    v = Double.parseDouble(number);
                } catch (NumberFormatException e) {
                    return null;
                }
                if (!(v > 0) || Double.isInfinite(v) || number.endsWith("d") || number.endsWith("f")) {
                    return null;
                }
                return u[1].equals("d") ? ofDegrees(v) : ofTurns(v);
            }
        }
        return null;
    }
}
