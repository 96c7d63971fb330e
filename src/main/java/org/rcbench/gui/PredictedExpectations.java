package org.rcbench.gui;

import java.util.EnumMap;
import java.util.Locale;
import java.util.Map;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.tolerance.Band;
import org.rcbench.tolerance.Prediction;
import org.rcbench.tolerance.Predictor;

/**
 * Expectations from the tolerance stage ({@link Predictor}): nominal values, the Monte Carlo
 * 95 % coverage interval as the statistical band (JCGM 101) and the worst case over the tolerance
 * box. The window re-predicts on every accepted edit, so the draws are fewer than the command
 * line's default; the basis line says how many. Thread-safe.
 */
public final class PredictedExpectations implements ExpectationSource {
    /** Draws per prediction in the window: enough for a stable 95 % interval, quick enough to follow typing. */
    public static final int DRAWS = 20_000;

    private final Predictor predictor;
    private final int draws;

    public PredictedExpectations() {
        this(DRAWS);
    }

    public PredictedExpectations(int draws) {
        this.predictor = new Predictor().withDraws(draws);
        this.draws = draws;
    }

    @Override
    public Expectation expect(Design design) {
        Prediction p = predictor.predict(design);
        Map<TimingQuantity, Expected> values = new EnumMap<>(TimingQuantity.class);
        for (TimingQuantity q : p.quantities()) {
            if (!NominalExpectations.SHOWN.contains(q)) {
                continue;
            }
            Band stat = p.statistical(q);
            Band worst = p.worstCase(q);
            values.put(q, new Expected(p.nominal(q), stat.low(), stat.high(), worst.low(), worst.high()));
        }
        String basis = String.format(Locale.ROOT, "band: Monte Carlo 95 %% of %,d draws; worst case over the "
                + "tolerances", draws);
        return new Expectation(values, p.runs(), p.reason() == null ? "" : p.reason(), basis, p.warnings());
    }
}
