package org.rcbench.tolerance;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;

/**
 * What a design should do: nominal values, worst-case and statistical bands, and whether and why it
 * runs. Immutable.
 *
 * @param design              the design predicted
 * @param quantities          the quantities this topology has, in report order
 * @param nominal             nominal value per quantity (NaN where undefined)
 * @param upperVolts          upper threshold at nominal (V)
 * @param lowerVolts          lower threshold at nominal (V)
 * @param runs                whether the circuit does its job at nominal
 * @param oscillates          whether it oscillates by itself at nominal
 * @param reason              why it does not run or oscillate, or null
 * @param worstCase           extremes over the tolerance box per quantity
 * @param statistical         Monte Carlo 2.5 %–97.5 % interval per quantity
 * @param standardUncertainty GUM linear combined standard uncertainty per quantity
 * @param worstCaseMayStop    whether some point of the tolerance box stops the circuit
 * @param monteCarlo          the Monte Carlo run's counts and seed
 * @param warnings            plain-language warnings
 */
public record Prediction(Design design, List<TimingQuantity> quantities, Map<TimingQuantity, Double> nominal,
        double upperVolts, double lowerVolts, boolean runs, boolean oscillates, String reason,
        Map<TimingQuantity, Band> worstCase, Map<TimingQuantity, Band> statistical,
        Map<TimingQuantity, Double> standardUncertainty, boolean worstCaseMayStop, MonteCarlo.Result monteCarlo,
        List<String> warnings) {
    public Prediction {
        Objects.requireNonNull(design, "design");
        quantities = List.copyOf(quantities);
        nominal = Map.copyOf(nominal);
        worstCase = Map.copyOf(worstCase);
        statistical = Map.copyOf(statistical);
        standardUncertainty = Map.copyOf(standardUncertainty);
        warnings = List.copyOf(warnings);
    }

    /** The nominal value of {@code q}, NaN when the topology lacks it. */
    public double nominal(TimingQuantity q) {
        Double v = nominal.get(q);
        return v == null ? Double.NaN : v;
    }

    public Band worstCase(TimingQuantity q) {
        Band b = worstCase.get(q);
        return b == null ? Band.NONE : b;
    }

    public Band statistical(TimingQuantity q) {
        Band b = statistical.get(q);
        return b == null ? Band.NONE : b;
    }
}
