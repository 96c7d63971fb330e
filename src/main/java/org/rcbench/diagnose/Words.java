package org.rcbench.diagnose;

import java.util.Locale;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.tolerance.Band;
import org.rcbench.units.SiFormat;

/** Quantities in plain words for verdicts and summaries ({@link Locale#ROOT}). Stateless. */
public final class Words {
    private Words() {
    }

    /** The quantity's name: {@code frequency}, {@code high time}, {@code pulse width} ... */
    public static String name(TimingQuantity q) {
        switch (q) {
            case FREQUENCY: return "frequency";
            case PERIOD: return "period";
            case HIGH: return "high time";
            case LOW: return "low time";
            case DUTY: return "duty";
            case FIRST_HIGH: return "first high time";
            case PULSE_WIDTH: return "pulse width";
            default: return q.jsonKey();
        }
    }

    /** A value with its unit chosen for the magnitude: {@code 6.870 kHz}, {@code 76.25 µs}, {@code 52.38 %}. */
    public static String value(TimingQuantity q, double v) {
        if (!Double.isFinite(v)) {
            return "—";
        }
        return q == TimingQuantity.DUTY ? String.format(Locale.ROOT, "%.2f %%", v * 100) : SiFormat.format(v, q.unit().symbol(), 4);
    }

    /** A band as {@code low .. high}, or a dash. */
    public static String band(TimingQuantity q, Band b) {
        return b.isDefined() ? value(q, b.low()) + " .. " + value(q, b.high()) : "—";
    }
}
