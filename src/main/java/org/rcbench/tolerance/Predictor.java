package org.rcbench.tolerance;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.rcbench.circuit.PracticalRange;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;

/**
 * Predicts a design: nominal evaluation, worst case over the tolerance box, GUM linear
 * propagation and Monte Carlo, and practical-range warnings. Thread-safe (each call builds its own
 * evaluators).
 */
public final class Predictor {
    private final int draws;
    private final long seed;

    /** With {@link MonteCarlo#DEFAULT_DRAWS} draws and {@link MonteCarlo#DEFAULT_SEED}. */
    public Predictor() {
        this(MonteCarlo.DEFAULT_DRAWS, MonteCarlo.DEFAULT_SEED);
    }

    public Predictor(int draws, long seed) {
        this.draws = draws;
        this.seed = seed;
    }

    public Predictor withDraws(int d) {
        return new Predictor(d, seed);
    }

    public Predictor withSeed(long s) {
        return new Predictor(draws, s);
    }

    /** Predicts {@code design}. */
    public Prediction predict(Design design) {
        TimerModel model = TimerModels.build(design.circuit());
        return predict(design, model, InputSpace.of(design, model));
    }

    /** Predicts with an explicit input space (e.g. one that also sweeps a wiper). */
    public Prediction predict(Design design, TimerModel model, InputSpace space) {
        List<TimingQuantity> qs = Quantities.of(design.circuit());
        Timing nominal = model.evaluateNominal();
        Map<TimingQuantity, Double> nom = new EnumMap<>(TimingQuantity.class);
        for (TimingQuantity q : qs) {
            nom.put(q, nominal.value(q));
        }
        WorstCase.Result wc = new WorstCase(space, qs).run();
        Map<TimingQuantity, LinearPropagation.Estimate> gum = new LinearPropagation(space, qs).run();
        MonteCarlo.Result mc = new MonteCarlo(space, qs, draws, seed).run();
        Map<TimingQuantity, Band> stat = new EnumMap<>(TimingQuantity.class);
        Map<TimingQuantity, Double> u = new EnumMap<>(TimingQuantity.class);
        for (TimingQuantity q : qs) {
            stat.put(q, mc.statistics().get(q).coverage95());
            u.put(q, gum.get(q).standardUncertainty());
        }
        List<String> warnings = new ArrayList<>(PracticalRange.check(design.circuit(), nominal));
        if (wc.mayStop() && nominal.runs()) {
            warnings.add("within the tolerances the circuit can stop: " + wc.stopReason());
        }
        if (mc.stopped() > 0 && nominal.runs()) {
            warnings.add(String.format(Locale.ROOT, "%.2f %% of Monte Carlo draws do not run (%s)",
                    100.0 * mc.stoppedFraction(), mc.stopReason()));
        }
        return new Prediction(design, qs, nom, nominal.upperVolts(), nominal.lowerVolts(), nominal.runs(),
                nominal.oscillates(), nominal.reasonText(), wc.bands(), stat, u, wc.mayStop(), mc, warnings);
    }
}
