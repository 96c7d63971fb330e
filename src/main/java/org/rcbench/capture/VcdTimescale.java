package org.rcbench.capture;

import java.util.Locale;
import org.rcbench.edge.Timebase;

/**
 * A value-change-dump time unit, {@code 10^exponent} seconds: 1, 10 or 100 of s, ms, us, ns, ps or
 * fs (IEEE Std 1364-2005 section 18.2, {@code $timescale}), so {@code exponent} is -15..2.
 *
 * <p>Read as a {@link Timebase}, one VCD time unit is one tick: {@code clockHz = 10^-exponent}
 * (1 ns gives 1e9 Hz). Immutable.
 */
public record VcdTimescale(int exponent) {
    private static final String[] UNITS = {"fs", "ps", "ns", "us", "ms", "s"};

    public VcdTimescale {
        if (exponent < -15 || exponent > 2) {
            throw new IllegalArgumentException("VCD timescale exponent outside -15..2: " + exponent);
        }
    }

    public static final VcdTimescale NANOSECOND = new VcdTimescale(-9);
    public static final VcdTimescale PICOSECOND = new VcdTimescale(-12);

    /**
     * Parses {@code 1 ns}, {@code 10us}, {@code 100 ps} and the like.
     *
     * @throws IllegalArgumentException quoting the text when it is not 1/10/100 followed by a unit
     */
    public static VcdTimescale parse(String text) {
        String s = text.strip();
        int i = 0;
        while (i < s.length() && s.charAt(i) >= '0' && s.charAt(i) <= '9') {
            i++;
        }
        String number = s.substring(0, i);
        String unit = s.substring(i).strip();
        int magnitude = switch (number) {
            case "1" -> 0;
            case "10" -> 1;
            case "100" -> 2;
            default -> -1;
        };
        int unitIndex = -1;
        for (int u = 0; u < UNITS.length; u++) {
            if (UNITS[u].equals(unit)) {
                unitIndex = u;
            }
        }
        if (magnitude < 0 || unitIndex < 0) {
            throw new IllegalArgumentException("timescale " + Snippet.quote(text)
                    + " must be 1, 10 or 100 followed by s, ms, us, ns, ps or fs");
        }
        return new VcdTimescale(-15 + 3 * unitIndex + magnitude);
    }

    /** The text VCD writes, e.g. {@code 10 ns}. */
    public String text() {
        int unitIndex = Math.floorDiv(exponent + 15, 3);
        int magnitude = exponent + 15 - 3 * unitIndex;
        return (magnitude == 0 ? "1" : magnitude == 1 ? "10" : "100") + " " + UNITS[unitIndex];
    }

    /** VCD time units per second, {@code 10^-exponent}: the clock of a VCD read as ticks. */
    public double clockHz() {
        return Double.parseDouble(String.format(Locale.ROOT, "1e%d", -exponent));
    }

    /** The timebase of a VCD file in this unit: one unit per tick, no offset, no stated uncertainty. */
    public Timebase timebase() {
        return Timebase.of(clockHz());
    }

    /**
     * The coarsest timescale in which one tick of a {@code clockHz} clock is a whole number of units
     * (16 MHz, 62.5 ns per tick, gives 100 ps), or 1 ps when there is none (times then round to
     * the nearest picosecond).
     */
    public static VcdTimescale coarsestExactFor(double clockHz) {
        for (int e = 2; e >= -15; e--) {
            double unitsPerTick = new VcdTimescale(e).clockHz() / clockHz;
            double whole = Math.rint(unitsPerTick);
            if (whole >= 1 && Math.abs(unitsPerTick - whole) <= 1e-6) {
                return new VcdTimescale(e);
            }
        }
        return PICOSECOND;
    }

    @Override
    public String toString() {
        return text();
    }
}
