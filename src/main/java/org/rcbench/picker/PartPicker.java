package org.rcbench.picker;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.ControlPin;
import org.rcbench.circuit.DiodeLaw;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.PracticalRange;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.circuit.Trigger;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.PartSpread;
import org.rcbench.tolerance.InputSpace;
import org.rcbench.tolerance.LinearPropagation;
import org.rcbench.tolerance.Predictor;
import org.rcbench.units.PreferredSeries;
import org.rcbench.units.Tolerance;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * Proposes part sets from preferred series for a target frequency and duty, pulse width or PWM
 * duty range.
 *
 * <p>For every capacitor of the capacitor series in range, the free resistances are first solved
 * exactly with the full circuit model (Newton's method on the logarithms, numeric Jacobian, Commons
 * Math LU), so the family's non-idealities and the diodes' current-dependent drops are included; each
 * is then rounded down and up to its series, every combination is evaluated, and the candidates are
 * ranked by {@code worst relative target error + 2 × relative standard uncertainty} of the main
 * quantity under the chosen tolerances (GUM linear, plus 0 to 10 pF of stray capacitance, which
 * penalises very small capacitors). The best {@code count} get a full prediction.
 * Resistors outside [minOhms, maxOhms] are not used. Potentiometers come from the values commonly
 * sold: 1, 2, 2.2, 2.5, 4.7 and 5 per decade (common practice, no source). Thread-safe.
 */
public final class PartPicker {
    private static final double[] POT_MANTISSAS = {1.0, 2.0, 2.2, 2.5, 4.7, 5.0};
    /** Width of the stray-capacitance band (F): 0 to 10 pF (common practice, no source). */
    private static final double STRAY_FARADS = 10e-12;

    private PartPicker() {
    }

    /** The ranked candidates and any notes about the request. */
    public record Result(List<Candidate> candidates, List<String> notes) {
    }

    private record Target(String name, TimingQuantity quantity, double value, double wiper) {
    }

    public static Result pick(PickRequest r) {
        List<String> notes = new ArrayList<>();
        List<Target> targets = targets(r, notes);
        double maxOhms = Double.isNaN(r.maxOhms()) ? maxOhms(r) : r.maxOhms();
        List<Candidate> all = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (double c : r.capacitorSeries().between(r.minFarads(), r.maxFarads())) {
            CircuitSpec template = template(r, c, guess(r, c));
            TimerModel model = TimerModels.build(template);
            String[] free = freeParts(r);
            int[] idx = new int[free.length];
            for (int i = 0; i < free.length; i++) {
                idx[i] = model.parameters().index(free[i]);
            }
            double[] p = model.nominal();
            double[] solved = solve(model, p, idx, targets);
            if (solved == null) {
                continue;
            }
            boolean inRange = true;
            for (int i = 0; i < free.length; i++) {
                inRange &= solved[i] >= r.minOhms() / 1.5 && solved[i] <= maxOhms * 1.5;
            }
            if (!inRange) {
                continue;
            }
            double[][] options = new double[free.length][];
            for (int i = 0; i < free.length; i++) {
                options[i] = snap(solved[i], isPot(free[i]) ? null : r.resistorSeries());
            }
            int combos = 1;
            for (double[] o : options) {
                combos *= o.length;
            }
            for (int k = 0; k < combos; k++) {
                double[] values = new double[free.length];
                int rest = k;
                boolean ok = true;
                for (int i = 0; i < free.length; i++) {
                    values[i] = options[i][rest % options[i].length];
                    rest /= options[i].length;
                    ok &= values[i] >= r.minOhms() * (1 - 1e-9) && values[i] <= maxOhms * (1 + 1e-9);
                }
                if (!ok) {
                    continue;
                }
                String key = c + ":" + java.util.Arrays.toString(values);
                if (!seen.add(key)) {
                    continue;
                }
                Candidate cand = evaluate(r, c, free, values, targets);
                if (cand != null) {
                    all.add(cand);
                }
            }
        }
        all.sort(Comparator.comparingDouble(Candidate::score));
        List<Candidate> best = new ArrayList<>();
        Predictor predictor = new Predictor(r.draws(), 1);
        for (Candidate c : all) {
            if (best.size() == r.count()) {
                break;
            }
            best.add(new Candidate(c.design(), c.errors(), c.worstError(), c.spread(), c.score(),
                    predictor.predict(c.design())));
        }
        if (best.isEmpty()) {
            notes.add("no part set within the limits reaches the target; widen the capacitor or resistor range");
        }
        return new Result(best, notes);
    }

    private static double maxOhms(PickRequest r) {
        double iMax = r.family().defaults().maxInputCurrentAmps();
        double limit = iMax > 0 ? r.supplyVolts() / (3 * iMax) : PracticalRange.MAX_TIMING_OHMS;
        return Math.min(limit, PracticalRange.MAX_TIMING_OHMS);
    }

    private static List<Target> targets(PickRequest r, List<String> notes) {
        List<Target> t = new ArrayList<>();
        switch (r.topology()) {
            case MONOSTABLE:
                need(r.pulseSeconds(), "--pulse", "a monostable needs a pulse width");
                t.add(new Target("pulse width", TimingQuantity.PULSE_WIDTH, r.pulseSeconds(), Double.NaN));
                break;
            case ASTABLE:
            case ASTABLE_ONE_DIODE:
            case ASTABLE_TWO_DIODE: {
                need(r.frequencyHz(), "--frequency", "an astable needs a frequency");
                need(r.duty(), "--duty", "an astable needs a duty cycle");
                if (r.topology() == Topology.ASTABLE && !(r.duty() > 0.5)) {
                    throw new BadInputException("--duty", String.format(Locale.ROOT, "a plain astable runs above 50 %%"
                            + " duty; for %.1f %% use astable-two-diode or astable-one-diode", r.duty() * 100));
                }
                double period = 1 / r.frequencyHz();
                t.add(new Target("high", TimingQuantity.HIGH, r.duty() * period, Double.NaN));
                t.add(new Target("low", TimingQuantity.LOW, (1 - r.duty()) * period, Double.NaN));
                break;
            }
            case OUTPUT_FED:
                need(r.frequencyHz(), "--frequency", "an astable needs a frequency");
                t.add(new Target("frequency", TimingQuantity.FREQUENCY, r.frequencyHz(), Double.NaN));
                if (!Double.isNaN(r.duty())) {
                    notes.add("the output-fed astable's duty is set by the output levels, not by the parts;"
                            + " --duty is not used");
                }
                break;
            case PWM_POT:
                need(r.frequencyHz(), "--frequency", "a PWM needs a frequency");
                if (!(r.dutyMin() > 0 && r.dutyMin() < r.dutyMax() && r.dutyMax() < 1)) {
                    throw new BadInputException("--duty-min", "the duty range must satisfy 0 < min < max < 1");
                }
                t.add(new Target("frequency", TimingQuantity.FREQUENCY, r.frequencyHz(), 0.5));
                t.add(new Target("duty at wiper 0", TimingQuantity.DUTY, r.dutyMin(), 0));
                if (r.dutyMax() < 0.99) {
                    t.add(new Target("duty at wiper 1", TimingQuantity.DUTY, r.dutyMax(), 1));
                } else {
                    notes.add("duty up to " + Math.round(r.dutyMax() * 100) + " %: no end-stop resistor in the"
                            + " discharge path (the duty approaches 100 % at the wiper's end)");
                }
                break;
            default:
                throw new BadInputException("--topology", "a " + r.topology().fileName() + " has no timing parts to pick");
        }
        return t;
    }

    private static void need(double v, String option, String what) {
        if (Double.isNaN(v)) {
            throw new BadInputException(option, "missing: " + what);
        }
    }

    private static String[] freeParts(PickRequest r) {
        switch (r.topology()) {
            case MONOSTABLE:
            case OUTPUT_FED:
                return new String[] {"R1"};
            case PWM_POT:
                return r.dutyMax() < 0.99 ? new String[] {"R1", "VR1", "R2"} : new String[] {"R1", "VR1"};
            default:
                return new String[] {"R1", "R2"};
        }
    }

    private static boolean isPot(String designator) {
        return designator.startsWith("VR");
    }

    /** Starting values for the free parts from the ideal closed forms (check-values.md). */
    private static double[] guess(PickRequest r, double c) {
        double vs = r.supplyVolts();
        double vd = r.diode() == PartKind.SCHOTTKY ? DiodeLaw.schottkyDropVolts() : DiodeLaw.siliconDropVolts();
        double ln2 = Math.log(2);
        double k = Math.log((2 * vs / 3 - vd) / (vs / 3 - vd));
        switch (r.topology()) {
            case MONOSTABLE:
                return new double[] {r.pulseSeconds() / (c * Math.log(3))};
            case OUTPUT_FED:
                return new double[] {1 / (r.frequencyHz() * 2 * c * ln2)};
            case ASTABLE: {
                double t = 1 / r.frequencyHz();
                double rb = (1 - r.duty()) * t / (c * ln2);
                return new double[] {Math.max(r.duty() * t / (c * ln2) - rb, rb * 0.01), rb};
            }
            case ASTABLE_ONE_DIODE: {
                double t = 1 / r.frequencyHz();
                double k1 = Math.log((vs - vd - vs / 3) / (vs - vd - 2 * vs / 3));
                return new double[] {r.duty() * t / (c * k1), (1 - r.duty()) * t / (c * ln2)};
            }
            case ASTABLE_TWO_DIODE: {
                double t = 1 / r.frequencyHz();
                return new double[] {r.duty() * t / (c * k), (1 - r.duty()) * t / (c * k)};
            }
            case PWM_POT: {
                double total = 1 / (r.frequencyHz() * c * k);
                double r1 = r.dutyMin() * total;
                double r2 = r.dutyMax() < 0.99 ? (1 - r.dutyMax()) * total : 0;
                double pot = total - r1 - r2;
                return r.dutyMax() < 0.99 ? new double[] {r1, pot, r2} : new double[] {r1, pot};
            }
            default:
                throw new IllegalArgumentException(r.topology().name());
        }
    }

    private static CircuitSpec template(PickRequest r, double c, double[] v) {
        List<Element> e = new ArrayList<>();
        switch (r.topology()) {
            case MONOSTABLE:
                e.add(Element.resistor("R1", Role.CHARGE, v[0]));
                break;
            case OUTPUT_FED:
                e.add(Element.resistor("R1", Role.FEEDBACK, v[0]));
                break;
            case ASTABLE:
                e.add(Element.resistor("R1", Role.CHARGE, v[0]));
                e.add(Element.resistor("R2", Role.SHARED, v[1]));
                break;
            case ASTABLE_ONE_DIODE:
                e.add(Element.resistor("R1", Role.CHARGE, v[0]));
                e.add(Element.resistor("R2", Role.SHARED, v[1]));
                e.add(diode(r, "D1", Role.CHARGE_DIODE));
                break;
            case ASTABLE_TWO_DIODE:
                e.add(Element.resistor("R1", Role.CHARGE, v[0]));
                e.add(Element.resistor("R2", Role.DISCHARGE, v[1]));
                e.add(diode(r, "D1", Role.CHARGE_DIODE));
                e.add(diode(r, "D2", Role.DISCHARGE_DIODE));
                break;
            case PWM_POT:
                e.add(Element.resistor("R1", Role.CHARGE, v[0]));
                e.add(Element.pot("VR1", Role.SPLIT_POT, v[1], 0.5));
                if (v.length > 2) {
                    e.add(Element.resistor("R2", Role.DISCHARGE, v[2]));
                }
                e.add(diode(r, "D1", Role.CHARGE_DIODE));
                e.add(diode(r, "D2", Role.DISCHARGE_DIODE));
                break;
            default:
                throw new IllegalArgumentException(r.topology().name());
        }
        e.add(Element.capacitor("C1", Role.TIMING, c));
        return new CircuitSpec(r.topology(), r.family(), r.family().defaults(), r.supplyVolts(), e, ControlPin.bypassed(),
                Trigger.UNSPECIFIED);
    }

    private static Element diode(PickRequest r, String name, Role role) {
        return r.diode() == PartKind.SCHOTTKY
                ? Element.diode(name, role, DiodeLaw.schottkyDropVolts(), DiodeLaw.schottky(), PartKind.SCHOTTKY)
                : Element.diode(name, role, DiodeLaw.siliconDropVolts(), DiodeLaw.silicon(), PartKind.SILICON);
    }

    /** Residuals ln(q / target) for the values in p; null when the circuit does not run for some target. */
    private static double[] residuals(TimerModel m, double[] p, List<Target> targets, Timing t) {
        double[] res = new double[targets.size()];
        int iw = m.parameters().find("VR1.wiper").orElse(-1);
        for (int i = 0; i < res.length; i++) {
            Target tg = targets.get(i);
            if (iw >= 0) {
                p[iw] = Double.isNaN(tg.wiper()) ? 0.5 : tg.wiper();
            }
            m.evaluate(p, t);
            double v = t.value(tg.quantity());
            if (!t.runs() || !(v > 0)) {
                return null;
            }
            res[i] = Math.log(v / tg.value());
        }
        if (iw >= 0) {
            p[iw] = 0.5;
        }
        return res;
    }

    /** Newton's method on the logarithms of the free values; null when it does not converge. */
    private static double[] solve(TimerModel m, double[] p, int[] idx, List<Target> targets) {
        int n = idx.length;
        Timing t = new Timing();
        double[] z = new double[n];
        for (int i = 0; i < n; i++) {
            z[i] = Math.log(p[idx[i]]);
        }
        for (int iter = 0; iter < 40; iter++) {
            set(p, idx, z);
            double[] r0 = residuals(m, p, targets, t);
            if (r0 == null) {
                return null;
            }
            double worst = 0;
            for (double v : r0) {
                worst = Math.max(worst, Math.abs(v));
            }
            if (worst < 1e-10) {
                double[] out = new double[n];
                for (int i = 0; i < n; i++) {
                    out[i] = Math.exp(z[i]);
                }
                return out;
            }
            double[][] jac = new double[n][n];
            for (int j = 0; j < n; j++) {
                double h = 1e-6;
                z[j] += h;
                set(p, idx, z);
                double[] r1 = residuals(m, p, targets, t);
                z[j] -= h;
                if (r1 == null) {
                    return null;
                }
                for (int i = 0; i < n; i++) {
                    jac[i][j] = (r1[i] - r0[i]) / h;
                }
            }
            RealVector step;
            try {
                step = new LUDecomposition(new Array2DRowRealMatrix(jac, false)).getSolver()
                        .solve(new ArrayRealVector(r0).mapMultiply(-1));
            } catch (SingularMatrixException e) {
                return null;
            }
            double size = step.getLInfNorm();
            double scale = size > 1 ? 1 / size : 1;
            for (int i = 0; i < n; i++) {
                z[i] += scale * step.getEntry(i);
            }
        }
        return null;
    }

    private static void set(double[] p, int[] idx, double[] z) {
        for (int i = 0; i < idx.length; i++) {
            p[idx[i]] = Math.exp(z[i]);
        }
    }

    /** The neighbouring values at or below and at or above v in the series (or the pot values when series is null). */
    private static double[] snap(double v, PreferredSeries series) {
        double below;
        double above;
        if (series != null) {
            below = series.atOrBelow(v);
            above = series.atOrAbove(v);
        } else {
            below = Double.NaN;
            above = Double.NaN;
            int decade = (int) Math.floor(Math.log10(v)) - 1;
            for (int d = decade; d <= decade + 2; d++) {
                for (double m : POT_MANTISSAS) {
                    double x = new java.math.BigDecimal(Double.toString(m)).movePointRight(d).doubleValue();
                    if (x <= v * (1 + 1e-9)) {
                        below = x;
                    }
                    if (x >= v * (1 - 1e-9) && Double.isNaN(above)) {
                        above = x;
                    }
                }
            }
        }
        return below == above || Double.isNaN(below) ? new double[] {above} : Double.isNaN(above)
                ? new double[] {below} : new double[] {below, above};
    }

    private static Candidate evaluate(PickRequest r, double c, String[] free, double[] values, List<Target> targets) {
        CircuitSpec spec = template(r, c, values);
        TimerModel m = TimerModels.build(spec);
        double[] p = m.nominal();
        Timing t = new Timing();
        double[] res = residuals(m, p, targets, t);
        if (res == null) {
            return null;
        }
        Map<String, Double> errors = new LinkedHashMap<>();
        double worst = 0;
        m.evaluate(p, t);
        if (r.topology() == Topology.ASTABLE || r.topology() == Topology.ASTABLE_ONE_DIODE
                || r.topology() == Topology.ASTABLE_TWO_DIODE) {
            errors.put("frequency", t.frequencyHz() / r.frequencyHz() - 1);
            errors.put("duty", t.duty() / r.duty() - 1);
        } else {
            for (int i = 0; i < targets.size(); i++) {
                errors.put(targets.get(i).name(), Math.expm1(res[i]));
            }
        }
        for (double e : errors.values()) {
            worst = Math.max(worst, Math.abs(e));
        }
        Map<String, PartSpread> spreads = new LinkedHashMap<>();
        for (Element e : spec.elements()) {
            Tolerance tol = e.type() == ElementType.CAPACITOR ? r.capacitorTolerance()
                    : e.type() == ElementType.POTENTIOMETER ? r.potTolerance()
                    : e.type() == ElementType.RESISTOR ? r.resistorTolerance() : Tolerance.NONE;
            spreads.put(e.designator(), PartSpread.rectangular(tol));
        }
        StringBuilder name = new StringBuilder();
        for (Element e : spec.elements()) {
            if (e.type() != ElementType.DIODE) {
                name.append(name.length() == 0 ? "" : " ").append(e.designator()).append('=')
                        .append(ValueCode.format(e.value(), e.type() == ElementType.CAPACITOR ? Unit.FARAD : Unit.OHM));
            }
        }
        Design d = new Design("design command", "candidate", "", name.toString(), spec, spreads, Tolerance.NONE, null);
        TimingQuantity main = r.topology() == Topology.MONOSTABLE ? TimingQuantity.PULSE_WIDTH : TimingQuantity.FREQUENCY;
        LinearPropagation.Estimate est = new LinearPropagation(InputSpace.of(d, m), List.of(main)).run().get(main);
        // A few picofarads of stray capacitance (taken as 0 to 10 pF, rectangular; common practice, no
        // source) add to the spread of small capacitors; the main quantity moves roughly in proportion.
        double stray = STRAY_FARADS / Math.sqrt(12) / c;
        double spread = Math.hypot(est.standardUncertainty() / est.value(), stray);
        if (Double.isNaN(spread)) {
            return null;
        }
        return new Candidate(d, errors, worst, spread, worst + 2 * spread, null);
    }
}
