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
 * the other timer family fitted; and, when at least two quantities are measured, every pair of the
 * part and latent faults. Under each, the maximum a-posteriori part values are found in
 * log-parameter space (healthy parts with {@link KindModel} band priors, faulty ones with broad
 * fault priors) by Levenberg–Marquardt ({@link MapSolver}), and the hypothesis's evidence by the
 * Laplace approximation. Posterior probabilities follow from evidence times prior odds.
 * {@link Identifiability} then states where the data cannot decide.
 *
 * <p>Cost: one solve per hypothesis (17 for a plain astable), each a few dozen circuit
 * evaluations; see the {@code DiagnoserBenchmark} for figures. Thread-safe: a diagnoser is
 * immutable and {@link #diagnose} allocates its own working state, so one instance may serve a
 * live view and a report at once.
 */
public final class Diagnoser {
    private final DiagnosisModel dm;
    private final Hypothesis none;
    private final List<Hypothesis> others;

    private Diagnoser(Design design) {
        this.dm = DiagnosisModel.of(design);
        this.none = Hypothesis.of(List.of());
        List<Hypothesis> hs = new ArrayList<>();
        for (Fault f : dm.faults) {
            hs.add(Hypothesis.of(List.of(f)));
        }
        if (dm.quantities.size() >= 2) {
            List<Fault> pairable = new ArrayList<>();
            for (Fault f : dm.faults) {
                if (f.kind() != FaultKind.FAMILY) {
                    pairable.add(f);
                }
            }
            for (int i = 0; i < pairable.size(); i++) {
                for (int j = i + 1; j < pairable.size(); j++) {
                    hs.add(Hypothesis.of(List.of(pairable.get(i), pairable.get(j))));
                }
            }
        }
        this.others = List.copyOf(hs);
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

    /** The number of explanations tested per diagnosis. */
    public int explanationCount() {
        return 1 + others.size();
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
        List<Fit> fits = new ArrayList<>(1 + others.size());
        List<Coordinate> c0 = MapSolver.coordinates(dm, none);
        double[] start = new double[c0.size()];
        for (int i = 0; i < start.length; i++) {
            start[i] = c0.get(i).prior().mode();
        }
        Fit base = MapSolver.solve(dm, none, target, c0, start);
        fits.add(base);
        for (Hypothesis h : others) {
            List<Coordinate> c = MapSolver.coordinates(dm, h);
            fits.add(MapSolver.solve(dm, h, target, c, warmStart(base, c)));
        }
        return Assembly.of(dm, target, o, fits);
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
