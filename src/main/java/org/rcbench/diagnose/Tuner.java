package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.Timing;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.PotTravel;
import org.rcbench.measure.Measurement;

/**
 * Potentiometer tuning: where the wiper is now, judged from the measurement, and where it must go
 * to reach a target frequency, duty or pulse width: {@code Tuner.of(design).tune(m,
 * TuneTarget.of(TimingQuantity.DUTY, 0.3))}.
 *
 * <p>Method. The board is back-solved as in {@link Diagnoser} with the wiper free; the present
 * position is the posterior of the wiper coordinate. The wanted position solves
 * {@code q(w) = target} with every other parameter at the most probable explanation's MAP (a
 * 201-point scan of the travel brackets the root nearest the present position, Commons Math's
 * {@link BrentSolver} refines it to 1e-6 of the travel). Out of reach, the nearest end is given with
 * the range the pot covers. The turn is stated in degrees or turns too when the target gives the
 * pot's travel, else when the design file does ({@code travel = "270 deg"}). Thread-safe and immutable.
 */
public final class Tuner {
    private static final int SCAN = 200;
    private final Diagnoser diagnoser;
    private final DiagnosisModel dm;
    private final List<String> pots;

    private Tuner(Design design) {
        this.diagnoser = Diagnoser.of(design);
        this.dm = diagnoser.model();
        List<String> p = new ArrayList<>();
        for (Coordinate c : dm.healthy) {
            if (c.logit()) {
                p.add(c.name().substring(0, c.name().length() - ParameterTable.WIPER_SUFFIX.length()));
            }
        }
        if (p.isEmpty()) {
            throw new BadInputException(design.source(), "has no potentiometer whose wiper sets the timing");
        }
        this.pots = List.copyOf(p);
    }

    /** A tuner for {@code design}; a one-line {@link BadInputException} when it has no timing potentiometer. */
    public static Tuner of(Design design) {
        return new Tuner(design);
    }

    /** The designators of the potentiometers that can be tuned. */
    public List<String> pots() {
        return pots;
    }

    public TuneResult tune(Measurement m, TuneTarget t) {
        return tune(Observations.of(m, dm.design.circuit().topology()), t);
    }

    public TuneResult tune(Observations o, TuneTarget t) {
        String pot = t.pot() == null ? pots.get(0) : t.pot();
        if (!pots.contains(pot)) {
            throw new BadInputException("--pot", "\"" + pot + "\" is not a timing potentiometer of the design (have "
                    + String.join(", ", pots) + ")");
        }
        if (t.pot() == null && pots.size() > 1) {
            throw new BadInputException("--pot", "the design has several potentiometers (" + String.join(", ", pots)
                    + "): name one");
        }
        t = withDesignTravel(t, pot);
        Target target = Target.of(dm, o);
        if (target == null) {
            throw new BadInputException("tune", "nothing was measured to tune from");
        }
        List<Fit> fits = diagnoser.solveAll(target);
        Diagnosis d = Assembly.of(dm, target, o, fits);
        Fit best = null;
        for (Fit f : fits) {
            if (f.ok() && (best == null || f.logEvidence() > best.logEvidence())) {
                best = f;
            }
        }
        if (best == null) {
            throw new BadInputException("tune", "the measurement cannot be explained by the design, so the wiper cannot be placed");
        }
        String wiperName = pot + ParameterTable.WIPER_SUFFIX;
        Estimate now = d.estimate(wiperName);
        double[] p = parameters(best);
        int iw = dm.table.index(wiperName);
        double[] w = new double[SCAN + 1];
        double[] g = new double[SCAN + 1];
        Timing tm = new Timing();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int k = 0; k <= SCAN; k++) {
            w[k] = (double) k / SCAN;
            g[k] = value(p, iw, w[k], t, tm);
            if (Double.isFinite(g[k])) {
                lo = Math.min(lo, g[k]);
                hi = Math.max(hi, g[k]);
            }
        }
        if (!Double.isFinite(lo)) {
            throw new BadInputException("tune", "this circuit has no " + Words.name(t.quantity()));
        }
        double wanted = solve(p, iw, t, w, g, now.value(), tm);
        boolean reachable = !Double.isNaN(wanted);
        if (!reachable) {
            wanted = nearest(w, g, t.value());
        }
        double reached = value(p, iw, wanted, t, tm);
        double change = wanted - now.value();
        String advice = advice(pot, t, now, wanted, change, reachable, reached, lo, hi);
        return new TuneResult(pot, t, now.value(), now.low(), now.high(), wanted, reachable, reached, lo, hi, change,
                advice, step(pot, t, now.value(), wanted, change, reachable, lo, hi));
    }

    /** {@code t} with the design's travel of {@code pot} ({@code travel} in the design file) when {@code t} states none. */
    private TuneTarget withDesignTravel(TuneTarget t, String pot) {
        PotTravel travel = dm.design.travel(pot);
        if (travel == null || !Double.isNaN(t.travelDegrees()) || !Double.isNaN(t.turns())) {
            return t;
        }
        return Double.isNaN(travel.turns()) ? t.withTravelDegrees(travel.degrees()) : t.withTurns(travel.turns());
    }

    private double[] parameters(Fit f) {
        double[] p = (f.hypothesis().otherFamily() ? dm.otherBase : dm.base).clone();
        for (int i = 0; i < f.coords().size(); i++) {
            Coordinate c = f.coords().get(i);
            p[c.index()] = c.value(f.z()[i]);
        }
        return p;
    }

    private double value(double[] p, int iw, double w, TuneTarget t, Timing tm) {
        p[iw] = w;
        dm.model.evaluate(p, tm);
        double v = tm.runs() ? tm.value(t.quantity()) : Double.NaN;
        return v > 0 ? v : Double.NaN;
    }

    /** The root of {@code q(w) - target} nearest {@code present}, or NaN when the scan finds none. */
    private double solve(double[] p, int iw, TuneTarget t, double[] w, double[] g, double present, Timing tm) {
        double best = Double.NaN;
        for (int k = 0; k < SCAN; k++) {
            double a = g[k] - t.value();
            double b = g[k + 1] - t.value();
            if (!Double.isFinite(a) || !Double.isFinite(b) || Math.signum(a) * Math.signum(b) > 0) {
                continue;
            }
            double root = a == 0 ? w[k] : b == 0 ? w[k + 1] : new BrentSolver(1e-9, 1e-6)
                    .solve(200, x -> value(p, iw, x, t, tm) - t.value(), w[k], w[k + 1]);
            if (Double.isNaN(best) || Math.abs(root - present) < Math.abs(best - present)) {
                best = root;
            }
        }
        return best;
    }

    private static double nearest(double[] w, double[] g, double target) {
        double best = Double.NaN;
        double gap = Double.POSITIVE_INFINITY;
        for (int k = 0; k < w.length; k++) {
            if (Double.isFinite(g[k]) && Math.abs(g[k] - target) < gap) {
                gap = Math.abs(g[k] - target);
                best = w[k];
            }
        }
        return best;
    }

    private String advice(String pot, TuneTarget t, Estimate now, double wanted, double change, boolean reachable,
            double reached, double lo, double hi) {
        StringBuilder sb = new StringBuilder();
        String q = Words.name(t.quantity());
        sb.append(String.format(Locale.ROOT, "%s's wiper is now at about %.2f of its travel (95 %%: %.2f to %.2f). ",
                pot, now.value(), now.low(), now.high()));
        if (!reachable) {
            sb.append(String.format(Locale.ROOT, "No position reaches %s %s: over its whole travel %s gives %s .. %s. ", q,
                    Words.value(t.quantity(), t.value()), pot, Words.value(t.quantity(), lo), Words.value(t.quantity(), hi)));
            if (hi - lo < 1e-3 * Math.abs(hi)) {
                sb.append(pot).append(" does not set the ").append(q).append(" in this circuit; change the fixed timing parts.");
                return sb.toString();
            }
            sb.append(String.format(Locale.ROOT, "The nearest is the end at %.2f (%s %s); change a fixed timing part to go further.",
                    wanted, q, Words.value(t.quantity(), reached)));
            return sb.toString();
        }
        if (Math.abs(change) < 0.005) {
            sb.append("That already gives ").append(q).append(' ').append(Words.value(t.quantity(), reached))
                    .append(": leave it.");
            return sb.toString();
        }
        sb.append(String.format(Locale.ROOT, "For %s %s move it to %.2f: %s by %.2f of the travel", q,
                Words.value(t.quantity(), t.value()), wanted, direction(pot, change), Math.abs(change)));
        if (!Double.isNaN(t.turns())) {
            sb.append(String.format(Locale.ROOT, " (about %.1f of its %s turns)", Math.abs(change) * t.turns(),
                    trim(t.turns())));
        } else if (!Double.isNaN(t.travelDegrees())) {
            sb.append(String.format(Locale.ROOT, " (about %.0f° of its %s° travel)", Math.abs(change) * t.travelDegrees(),
                    trim(t.travelDegrees())));
        }
        sb.append(". Which way that is depends on how ").append(pot)
                .append(" is wired: turn a little, re-measure, and follow the change.");
        return sb.toString();
    }

    /** {@link TuneResult#step}: the advice in one short line. */
    private String step(String pot, TuneTarget t, double present, double wanted, double change, boolean reachable,
            double lo, double hi) {
        String q = Words.name(t.quantity()) + " " + Words.value(t.quantity(), t.value());
        if (!reachable) {
            return String.format(Locale.ROOT, "no position of %s gives %s (its travel covers %s .. %s)", pot, q,
                    Words.value(t.quantity(), lo), Words.value(t.quantity(), hi));
        }
        if (Math.abs(change) < 0.005) {
            return String.format(Locale.ROOT, "%s is on target for %s: leave it", pot, q);
        }
        String turn = !Double.isNaN(t.turns())
                ? String.format(Locale.ROOT, " (about %.1f of %s turns)", Math.abs(change) * t.turns(), trim(t.turns()))
                : !Double.isNaN(t.travelDegrees()) ? String.format(Locale.ROOT, " (about %.0f° of %s°)",
                        Math.abs(change) * t.travelDegrees(), trim(t.travelDegrees())) : "";
        String way = direction(pot, change);
        return String.format(Locale.ROOT, "%s %.2f → %.2f of its travel%s for %s: %s", pot, present, wanted, turn, q,
                way.contains(" (") ? way.substring(0, way.indexOf(" (")) : way);
    }

    /** The direction in terms of the circuit, not the knob: which part of the track the move puts where. */
    private String direction(String pot, double change) {
        var e = dm.design.part(pot);
        if (e != null && e.role() == Role.SPLIT_POT) {
            return change > 0 ? "more of the track on the charge side (longer high time)"
                    : "more of the track on the discharge side (longer low time)";
        }
        String more = e != null && e.type() == ElementType.POTENTIOMETER ? "more of its track in circuit" : "up";
        return change > 0 ? more + " (more resistance)" : "less of its track in circuit (less resistance)";
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? String.valueOf((long) v) : String.format(Locale.ROOT, "%.1f", v);
    }
}
