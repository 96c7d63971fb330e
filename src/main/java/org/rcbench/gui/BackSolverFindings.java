package org.rcbench.gui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.rcbench.circuit.Topology;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.diagnose.Ambiguity;
import org.rcbench.diagnose.Diagnoser;
import org.rcbench.diagnose.Diagnosis;
import org.rcbench.diagnose.Observation;
import org.rcbench.diagnose.Observations;
import org.rcbench.units.ValueCode;

/**
 * The suspects panel's findings from the diagnosis stage ({@link Diagnoser}): the window's high and
 * low times over its averaging window become the back-solver's observations, and its ranked
 * suspects, intervals and ambiguity statements become {@link Findings}. A diagnoser is built once
 * per design and reused while the design stays the same. Thread-safe.
 */
public final class BackSolverFindings implements DiagnosisSource {
    /** Suspects listed; the rest are far less probable. */
    static final int SHOWN = 6;

    private volatile Diagnoser cached;
    private volatile Design cachedFor;

    @Override
    public Findings diagnose(Design design, Observed observed) {
        Diagnosis d = diagnoser(design).diagnose(observations(design, observed));
        List<Suspect> suspects = new ArrayList<>();
        for (org.rcbench.diagnose.Suspect s : d.suspects()) {
            if (suspects.size() == SHOWN) {
                break;
            }
            suspects.add(new Suspect(s.label(), value(s.value(), s), interval(s), deviation(s), s.probability()));
        }
        List<String> ambiguities = new ArrayList<>();
        List<String> resolvers = new ArrayList<>();
        for (Ambiguity a : d.ambiguities()) {
            // The statement ends with what would separate the rivals; the panel shows that on its own line.
            String tail = " To separate them: " + a.separate() + ".";
            String text = a.text();
            ambiguities.add(!a.separate().isEmpty() && text.endsWith(tail)
                    ? text.substring(0, text.length() - tail.length()) : text);
            if (!a.separate().isEmpty()) {
                resolvers.add("To tell them apart: " + a.separate() + ".");
            }
        }
        return new Findings(d.summary(), suspects, ambiguities, resolvers);
    }

    /** The back-solver's observations: high and low time (a monostable's pulse width), clock shared. */
    static Observations observations(Design design, Observed o) {
        Topology t = design.circuit().topology();
        if (t == Topology.MONOSTABLE) {
            return Observations.of(o.clockRelative(), observation(TimingQuantity.PULSE_WIDTH, o.highSeconds(), o.highU()));
        }
        return Observations.of(o.clockRelative(), observation(TimingQuantity.HIGH, o.highSeconds(), o.highU()),
                observation(TimingQuantity.LOW, o.lowSeconds(), o.lowU()));
    }

    private static Observation observation(TimingQuantity q, double seconds, double u) {
        return new Observation(q, seconds, Double.isFinite(u) && u >= 0 ? u / seconds : 0);
    }

    private Diagnoser diagnoser(Design design) {
        Diagnoser d = cached;
        if (d == null || cachedFor != design) {
            d = Diagnoser.of(design);
            cached = d;
            cachedFor = design;
        }
        return d;
    }

    private static String value(double v, org.rcbench.diagnose.Suspect s) {
        if (!Double.isFinite(v)) {
            return "";
        }
        return ValueCode.formatSi(v, s.unit(), 3);
    }

    private static String interval(org.rcbench.diagnose.Suspect s) {
        if (!Double.isFinite(s.low()) || !Double.isFinite(s.high())) {
            return "";
        }
        return value(s.low(), s) + " – " + value(s.high(), s);
    }

    private static String deviation(org.rcbench.diagnose.Suspect s) {
        if (!Double.isFinite(s.deviation())) {
            return "";
        }
        String d = String.format(Locale.ROOT, "%+.1f %% from nominal", s.deviation() * 100);
        return Double.isFinite(s.toleranceMultiple())
                ? d + String.format(Locale.ROOT, ", %.1f× its tolerance", Math.abs(s.toleranceMultiple())) : d;
    }
}
