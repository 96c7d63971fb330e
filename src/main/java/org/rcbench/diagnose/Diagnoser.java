package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.design.Design;
import org.rcbench.measure.Measurement;

/**
 * Back-solves a board's actual part values from a measurement of its timing and names the part
 * (or latent fault) most likely to be off: {@code Diagnosis d = Diagnoser.of(design).diagnose(m)}.
 *
 * <p>Method. Every explanation tested is a hypothesis about which faults are present: none; each
 * part (and diode) out of its band; leakage across the timing capacitor; a load on the control pin;
 * the other timer family fitted; and, when at least two quantities are measured, pairs of part and
 * latent faults (among the {@link #PAIRED} most probable single faults). Under each, the maximum a-posteriori part values are found in
 * log-parameter space (healthy parts with {@link KindModel} band priors, faulty ones with broad
 * fault priors) by Levenberg–Marquardt ({@link MapSolver}), and the hypothesis's evidence by the
 * Laplace approximation. Posterior probabilities follow from evidence times prior odds.
 * {@link Identifiability} then states where the data cannot decide.
 *
 * <p>Cost: one solve per hypothesis (17 for a plain astable), each a few dozen circuit
 * evaluations; see {@code DiagnoserBenchmark} for figures. Thread-safe: a diagnoser is
 * immutable and {@link #diagnose} allocates its own working state, so one instance may serve a
 * live view and a report at once.
 */
public final class Diagnoser {
    private final DiagnosisModel dm;
    /** Pairs are formed among this many of the most probable single faults (part and latent faults only). */
    static final int PAIRED = 5;
    private final Hypothesis none;
    private final List<Hypothesis> singles;

    private Diagnoser(Design design) {
        this.dm = DiagnosisModel.of(design);
        this.none = Hypothesis.of(List.of());
        List<Hypothesis> hs = new ArrayList<>();
        for (Fault f : dm.faults) {
            hs.add(Hypothesis.of(List.of(f)));
        }
        this.singles = List.copyOf(hs);
    }

    /** A diagnoser for {@code design} (builds the model once; reuse it for every update). */
    public static Diagnoser of(Design design) {
        return new Diagnoser(design);
    }

    public Design design() {
        return dm.design;
    }

    /** The faults this diagnoser considers, in the design's part order, then latent faults. */
    public List<Fault> faults() {
        return dm.faults;
    }

    DiagnosisModel model() {
        return dm;
    }

    /**
     * The most explanations tested per diagnosis: no fault, each single fault and, with two or more
     * measured quantities, the pairs among the {@link #PAIRED} most probable single faults.
     */
    public int explanationCount() {
        int pairable = 0;
        for (Fault f : dm.faults) {
            pairable += f.kind() == FaultKind.FAMILY ? 0 : 1;
        }
        int k = Math.min(PAIRED, pairable);
        return 1 + singles.size() + (dm.quantities.size() >= 2 ? k * (k - 1) / 2 : 0);
    }

    /** Diagnoses a cycle measurement (see {@link Observations#of(Measurement, org.rcbench.circuit.Topology)}). */
    public Diagnosis diagnose(Measurement m) {
        Observations o = Observations.of(m, dm.design.circuit().topology());
        if (o.isEmpty()) {
            return Diagnosis.unsolved(o, m.cycles() == 0 ? "no complete cycle was measured, so there is no timing to"
                    + " back-solve" : "this circuit has no timing to back-solve");
        }
        return diagnose(o);
    }

    /** Diagnoses the given observations. */
    public Diagnosis diagnose(Observations o) {
        Target target = Target.of(dm, o);
        if (target == null) {
            return Diagnosis.unsolved(o, dm.quantities.isEmpty() ? "a " + dm.design.circuit().topology().fileName()
                    + " has no timing to back-solve" : "none of the measured quantities is one this circuit is solved on");
        }
        return Assembly.of(dm, target, o, solveAll(target));
    }

    /**
     * Solves every hypothesis against {@code target}: "no fault" first; then each single fault,
     * warm-started from it with the faulty coordinate placed by a coarse scan; then, with two or more
     * measured quantities, the pairs among the {@link #PAIRED} single faults of highest evidence
     * (a pair of faults that each explain nothing alone is not worth its cost), started with each
     * faulty coordinate where its single fault put it.
     */
    List<Fit> solveAll(Target target) {
        List<Fit> fits = new ArrayList<>(1 + singles.size() + PAIRED * (PAIRED - 1) / 2);
        List<Coordinate> c0 = MapSolver.coordinates(dm, none);
        double[] start = new double[c0.size()];
        for (int i = 0; i < start.length; i++) {
            start[i] = c0.get(i).prior().mode();
        }
        Fit base = MapSolver.solve(dm, none, target, c0, start);
        fits.add(base);
        List<Fit> single = new ArrayList<>();
        for (Hypothesis h : singles) {
            List<Coordinate> c = MapSolver.coordinates(dm, h);
            double[] s = warmStart(base, c);
            int i = faultCoordinate(h.faults().get(0), c);
            if (i >= 0) {
                MapSolver.scan(dm, h, target, c, s, i);
            }
            Fit fit = MapSolver.solve(dm, h, target, c, s);
            fits.add(fit);
            if (fit.ok() && h.faults().get(0).kind() != FaultKind.FAMILY) {
                single.add(fit);
            }
        }
        if (dm.quantities.size() < 2 || target.size() < 2) {
            return fits;
        }
        single.sort(java.util.Comparator.comparingDouble(Fit::logEvidence).reversed());
        List<Fit> lead = single.subList(0, Math.min(PAIRED, single.size()));
        for (int a = 0; a < lead.size(); a++) {
            for (int b = a + 1; b < lead.size(); b++) {
                Fit fa = lead.get(a);
                Fit fb = lead.get(b);
                Hypothesis h = Hypothesis.of(List.of(fa.hypothesis().faults().get(0), fb.hypothesis().faults().get(0)));
                List<Coordinate> c = MapSolver.coordinates(dm, h);
                double[] s = warmStart(base, c);
                for (Fit f : List.of(fa, fb)) {
                    String name = f.hypothesis().faults().get(0).name();
                    s[faultCoordinate(f.hypothesis().faults().get(0), c)] = f.z()[f.indexOf(name)];
                }
                fits.add(MapSolver.solve(dm, h, target, c, s));
            }
        }
        return fits;
    }

    private static int faultCoordinate(Fault f, List<Coordinate> coords) {
        for (int i = 0; i < coords.size(); i++) {
            if (coords.get(i).name().equals(f.name())) {
                return i;
            }
        }
        return -1;
    }

    /** Starting point: the no-fault MAP for shared coordinates, the prior's mode for latent ones. */
    private static double[] warmStart(Fit base, List<Coordinate> coords) {
        double[] s = new double[coords.size()];
        for (int i = 0; i < s.length; i++) {
            Coordinate c = coords.get(i);
            int j = base.ok() ? base.indexOf(c.name()) : -1;
            s[i] = j >= 0 ? base.z()[j] : c.prior().mode();
        }
        return s;
    }
}
