package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;

/**
 * Finds where the measurement cannot decide between explanations, and says so.
 *
 * <p>Rule. Two explanations of the same size (one fault each, or two each) are <em>not separated
 * by the data</em> when their misfits ({@link Fit#misfit()}: the fit with the faulty parameters
 * free, so prior beliefs about faulty values do not enter) differ by less than the 95 % point of a
 * chi-square with one degree of freedom, 3.841 (likelihood-ratio test; Wilks 1938), and the weaker
 * has at least 1 % of the stronger's posterior probability. Their ranking then comes from prior
 * knowledge (which kinds of part fail how often), never from the measurement, and the output says
 * so. The pair is <em>structurally</em> inseparable when the two faults change the measured log
 * quantities in proportional ways (cosine of the effect vectors above 0.9995): a monostable's R
 * against its C, an astable's charge resistor against a loaded control pin. Then no precision helps
 * and only another kind of measurement separates them ({@link #separatingMeasurements}).
 *
 * <p>"No fault" competes too: when it fits within the same margin as the leading fault, the
 * measurement is also explained with every part inside its band. Stateless.
 */
final class Identifiability {
    /** chi-square(1) 95 % point, from Commons Math. */
    static final double MARGIN = new ChiSquaredDistribution(1).inverseCumulativeProbability(0.95);
    /** Competitors weaker than this fraction of the leader are not worth a statement. */
    static final double MIN_RATIO = 0.01;
    /** Effect vectors closer than this cosine are proportional. */
    static final double PARALLEL = 0.9995;
    /** At most this many rival explanations are named. */
    static final int MAX_RIVALS = 4;
    /** When "no fault" fits as well, rivals are named only if the leading fault has at least this probability. */
    static final double WORTH_NAMING = 0.05;

    private Identifiability() {
    }

    /**
     * The ambiguities of a solved diagnosis. {@code fits} and {@code weights} are sorted by weight,
     * heaviest first. The question asked is whether the top suspect (the fault with the largest
     * summed probability) could be innocent: its strongest explanation is compared with every
     * explanation that leaves it out.
     */
    static List<Ambiguity> analyse(DiagnosisModel dm, Target target, List<Fit> fits, double[] weights) {
        List<Ambiguity> out = new ArrayList<>();
        Fault top = topSuspect(dm, fits, weights);
        if (top == null) {
            return out;
        }
        int leadIndex = -1;
        for (int i = 0; i < fits.size() && leadIndex < 0; i++) {
            if (fits.get(i).hypothesis().faults().contains(top)) {
                leadIndex = i;
            }
        }
        Fit lead = fits.get(leadIndex);
        List<Fit> rivals = new ArrayList<>();
        for (int i = 0; i < fits.size() && rivals.size() < MAX_RIVALS; i++) {
            Fit f = fits.get(i);
            if (f.hypothesis().faults().isEmpty() || f.hypothesis().faults().contains(top)
                    || weights[i] < MIN_RATIO * weights[leadIndex]) {
                continue;
            }
            if (f.misfit() - lead.misfit() < MARGIN) {
                rivals.add(f);
            }
        }
        String determined = determined(dm, target);
        Fit none = noFault(fits);
        boolean noFaultFits = none != null && none.misfit() - lead.misfit() < MARGIN;
        if (!rivals.isEmpty() && (!noFaultFits || weights[leadIndex] >= WORTH_NAMING)) {
            List<String> names = new ArrayList<>();
            names.add(lead.hypothesis().label());
            List<Fault> involved = new ArrayList<>(lead.hypothesis().faults());
            boolean structural = true;
            double[] e0 = effect(dm, lead);
            for (Fit r : rivals) {
                names.add(r.hypothesis().label());
                structural &= cosine(e0, effect(dm, r)) > PARALLEL;
                for (Fault b : r.hypothesis().faults()) {
                    if (!involved.contains(b)) {
                        involved.add(b);
                    }
                }
            }
            String separate = separatingMeasurements(dm.design.circuit(), involved);
            String text = "The measurement cannot tell these apart: " + String.join("; ", names) + ". "
                    + capital(structural ? "they change the timing in the same proportions, so no precision would separate them"
                            : "each explains it within the measurement's uncertainty and the other parts' tolerances")
                    + ". " + capital(determined) + ". The order of the suspects comes from how often such parts fail,"
                    + " not from this measurement. To separate them: " + separate + ".";
            out.add(new Ambiguity(names, structural, determined, separate, text));
        }
        if (noFaultFits) {
            boolean wiper = false;
            for (Coordinate c : dm.healthy) {
                wiper |= c.logit();
            }
            out.add(new Ambiguity(List.of(lead.hypothesis().label(), none.hypothesis().label()), false, determined,
                    "a longer capture, or the parts measured out of circuit",
                    "The measurement is also explained with every part inside its band"
                            + (wiper ? " (and the wiper where the fit puts it)" : ": " + determined
                                    + ", which the tolerances allow")
                            + ". Treat the suspects as leads, not findings."));
        }
        return out;
    }

    /** The fault with the largest summed probability over the explanations that include it, or null. */
    static Fault topSuspect(DiagnosisModel dm, List<Fit> fits, double[] weights) {
        Fault best = null;
        double bestP = -1;
        for (Fault f : dm.faults) {
            double p = 0;
            for (int i = 0; i < fits.size(); i++) {
                if (fits.get(i).hypothesis().faults().contains(f)) {
                    p += weights[i];
                }
            }
            if (p > bestP) {
                bestP = p;
                best = f;
            }
        }
        return best;
    }

    /** {@code "a, or b, or c"}. */
    static String alternatives(List<String> names) {
        return String.join(", or ", names);
    }

    private static Fit noFault(List<Fit> fits) {
        for (Fit f : fits) {
            if (f.hypothesis().faults().isEmpty()) {
                return f.ok() ? f : null;
            }
        }
        return null;
    }

    /**
     * The effect of a fit's faults on the log quantities: {@code ln q} at its MAP minus {@code ln q}
     * with the faulty parameters back at nominal (and the design's own family).
     */
    static double[] effect(DiagnosisModel dm, Fit fit) {
        double[] with = dm.base.clone();
        boolean other = fit.hypothesis().otherFamily();
        if (other) {
            System.arraycopy(dm.otherBase, 0, with, 0, with.length);
        }
        for (int i = 0; i < fit.coords().size(); i++) {
            Coordinate c = fit.coords().get(i);
            with[c.index()] = c.value(fit.z()[i]);
        }
        double[] without = with.clone();
        if (other) {
            System.arraycopy(dm.base, 0, without, 0, without.length);
            for (int i = 0; i < fit.coords().size(); i++) {
                Coordinate c = fit.coords().get(i);
                without[c.index()] = c.value(fit.z()[i]);
            }
        }
        for (Fault f : fit.hypothesis().faults()) {
            if (f.kind() != FaultKind.FAMILY) {
                int i = dm.table.index(f.name());
                without[i] = dm.base[i];
            }
        }
        Timing a = dm.model.evaluate(with);
        Timing b = dm.model.evaluate(without);
        double[] e = new double[dm.quantities.size()];
        for (int k = 0; k < e.length; k++) {
            TimingQuantity q = dm.quantities.get(k);
            e[k] = a.runs() && b.runs() ? Math.log(a.value(q) / b.value(q)) : 0;
        }
        return e;
    }

    static double cosine(double[] a, double[] b) {
        double ab = 0;
        double aa = 0;
        double bb = 0;
        for (int i = 0; i < a.length; i++) {
            ab += a[i] * b[i];
            aa += a[i] * a[i];
            bb += b[i] * b[i];
        }
        return aa == 0 || bb == 0 ? 1 : Math.abs(ab) / Math.sqrt(aa * bb);
    }

    /**
     * What the measurement fixes, in words: each measured quantity against its nominal prediction,
     * named by the part combination it is proportional to ("R1·C1 (the pulse width) is 31 % low"). When
     * high and low time moved together, the period's combination is given with the duty.
     */
    static String determined(DiagnosisModel dm, Target target) {
        CircuitSpec spec = dm.design.circuit();
        Timing nominal = dm.model.evaluate(dm.base);
        if (!nominal.runs()) {
            return "the design as given would not run";
        }
        double[] ratio = new double[target.size()];
        for (int i = 0; i < target.size(); i++) {
            ratio[i] = Math.exp(target.logObserved[i]) / nominal.value(target.quantities[i]) - 1;
        }
        if (target.size() == 2 && target.quantities[0] == TimingQuantity.HIGH
                && target.quantities[1] == TimingQuantity.LOW && together(ratio[0], ratio[1])) {
            double high = Math.exp(target.logObserved[0]);
            double low = Math.exp(target.logObserved[1]);
            double period = (high + low) / nominal.periodSeconds() - 1;
            double duty = high / (high + low) - nominal.duty();
            return phrase(Combinations.of(spec, TimingQuantity.PERIOD), "the period", period)
                    + String.format(Locale.ROOT, " with the duty %s", Math.abs(duty) < 0.005 ? "unchanged"
                            : String.format(Locale.ROOT, "%+.1f points", duty * 100));
        }
        List<String> parts = new ArrayList<>();
        for (int i = 0; i < target.size(); i++) {
            TimingQuantity q = target.quantities[i];
            parts.add(phrase(Combinations.of(spec, q), "the " + words(q), ratio[i]));
        }
        return String.join("; ", parts);
    }

    private static boolean together(double a, double b) {
        if (Math.abs(a) < 0.005 || Math.abs(b) < 0.005 || Math.signum(a) != Math.signum(b)) {
            return false;
        }
        double r = a / b;
        return r > 0.8 && r < 1.25;
    }

    private static String phrase(String combination, String what, double ratio) {
        String name = combination == null ? capital(what) : combination + " (" + what + ")";
        if (Math.abs(ratio) < 0.0005) {
            return name + " is as designed";
        }
        return name + String.format(Locale.ROOT, " is %.1f %% %s", Math.abs(ratio) * 100, ratio < 0 ? "low" : "high");
    }

    private static String words(TimingQuantity q) {
        switch (q) {
            case HIGH: return "high time";
            case LOW: return "low time";
            case PULSE_WIDTH: return "pulse width";
            default: return q.jsonKey();
        }
    }

    /**
     * The extra measurements that separate the given faults, in words: the parts out of circuit with
     * the right meter, the capacitor's voltage for leakage, the control-pin voltage for a load on it,
     * a second supply voltage for a diode drop, the chip's marking for the family.
     */
    static String separatingMeasurements(CircuitSpec spec, List<Fault> faults) {
        List<String> ohms = new ArrayList<>();
        List<String> farads = new ArrayList<>();
        Set<String> other = new LinkedHashSet<>();
        for (Fault f : faults) {
            switch (f.kind()) {
                case PART:
                    var e = spec.element(f.name());
                    (e != null && e.type() == ElementType.CAPACITOR ? farads : ohms).add(f.name());
                    break;
                case DIODE:
                    other.add("repeat the capture at a second supply voltage (a diode drop's share of the timing changes"
                            + " with the supply, a resistor's or capacitor's does not)");
                    break;
                case LEAKAGE:
                    other.add("capture the timing capacitor's voltage on an analog channel (leakage makes it charge"
                            + " toward a level below the supply), or measure its leakage current out of circuit");
                    break;
                case CONTROL_LOAD:
                    other.add("measure the control-pin voltage to ground (about two thirds of the supply when nothing"
                            + " loads it)");
                    break;
                default:
                    other.add("read the marking on the timer chip (bipolar or CMOS family)");
                    break;
            }
        }
        List<String> all = new ArrayList<>();
        if (!ohms.isEmpty() || !farads.isEmpty()) {
            List<String> meters = new ArrayList<>();
            if (!ohms.isEmpty()) {
                meters.add(orList(ohms) + " with an ohmmeter");
            }
            if (!farads.isEmpty()) {
                meters.add(orList(farads) + " with a capacitance meter");
            }
            all.add("measure " + String.join(" and ", meters)
                    + " out of circuit (power off, capacitors discharged, one lead lifted)");
        }
        all.addAll(other);
        return String.join("; or ", all);
    }

    static String orList(List<String> names) {
        if (names.size() == 1) {
            return names.get(0);
        }
        return String.join(", ", names.subList(0, names.size() - 1)) + " and " + names.get(names.size() - 1);
    }

    static String capital(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
