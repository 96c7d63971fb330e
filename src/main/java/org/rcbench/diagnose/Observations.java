package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.measure.Measurement;

/**
 * What the back-solver fits: measured quantities with their standard uncertainties, and the probe
 * clock's relative standard uncertainty, which scales every time alike and so is shared
 * (fully correlated) between them. Immutable.
 *
 * @param items                    the quantities, no two the same
 * @param clockRelativeUncertainty the probe clock's relative standard uncertainty (e.g. 2.9e-5 for ±50 ppm rectangular)
 */
public record Observations(List<Observation> items, double clockRelativeUncertainty) {
    public Observations {
        items = List.copyOf(items);
        for (int i = 0; i < items.size(); i++) {
            for (int j = 0; j < i; j++) {
                if (items.get(i).quantity() == items.get(j).quantity()) {
                    throw new IllegalArgumentException("quantity twice: " + items.get(i).quantity());
                }
            }
        }
        if (!(clockRelativeUncertainty >= 0) || Double.isInfinite(clockRelativeUncertainty)) {
            throw new IllegalArgumentException("clockRelativeUncertainty not >= 0: " + clockRelativeUncertainty);
        }
    }

    /**
     * The quantities a {@code topology} is fitted on, read from a cycle measurement: high and low
     * time for the free-running circuits, the high time as the pulse width for a monostable (one
     * output pulse per cycle of the trigger), nothing for a bistable or when no cycle was measured.
     * Each standard uncertainty is the measurement's, with the probe clock's share taken out (it is
     * {@code mean * clock}, added in quadrature by the measurement core).
     */
    public static Observations of(Measurement m, Topology topology) {
        double clock = clockShare(m);
        List<Observation> out = new ArrayList<>();
        if (m.cycles() > 0) {
            if (topology == Topology.MONOSTABLE) {
                add(out, TimingQuantity.PULSE_WIDTH, m.high(), clock);
            } else if (topology.isFreeRunning()) {
                add(out, TimingQuantity.HIGH, m.high(), clock);
                add(out, TimingQuantity.LOW, m.low(), clock);
            }
        }
        return new Observations(out, clock);
    }

    /** A monostable's pulse width from a two-channel measurement (trigger and output). */
    public static Observations pulseWidth(Measurement.TimeStats width, double clockRelativeUncertainty) {
        List<Observation> out = new ArrayList<>();
        add(out, TimingQuantity.PULSE_WIDTH, width, clockRelativeUncertainty);
        return new Observations(out, clockRelativeUncertainty);
    }

    /** Observations given directly (what-ifs, tests, a live source that measures differently). */
    public static Observations of(double clockRelativeUncertainty, Observation... items) {
        return new Observations(List.of(items), clockRelativeUncertainty);
    }

    /** The probe clock's relative standard uncertainty in a measurement: its share of the frequency budget. */
    public static double clockShare(Measurement m) {
        Measurement.FrequencyEstimate f = m.frequency();
        double c = f.clockHz() / f.frequencyHz();
        return Double.isFinite(c) && c >= 0 ? c : 0;
    }

    private static void add(List<Observation> out, TimingQuantity q, Measurement.TimeStats s, double clock) {
        double mean = s.meanSeconds();
        if (!(mean > 0) || s.count() == 0 || Double.isInfinite(mean)) {
            return;
        }
        double rel = s.standardUncertaintySeconds() / mean;
        double stat = Double.isFinite(rel) ? Math.sqrt(Math.max(0, rel * rel - clock * clock)) : 0;
        out.add(new Observation(q, mean, stat));
    }

    /** Whether nothing was measured that could be fitted. */
    public boolean isEmpty() {
        return items.isEmpty();
    }

    public int size() {
        return items.size();
    }

    public Observation get(int i) {
        return items.get(i);
    }

    /** The observation of {@code q}, or null. */
    public Observation find(TimingQuantity q) {
        for (Observation o : items) {
            if (o.quantity() == q) {
                return o;
            }
        }
        return null;
    }
}
