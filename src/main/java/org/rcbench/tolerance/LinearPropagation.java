package org.rcbench.tolerance;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;

/**
 * GUM linear propagation (JCGM 100:2008, 5.1.2): {@code u_c^2 = Σ (∂f/∂x_i)^2 u^2(x_i)} for independent
 * inputs, evaluated at the inputs' expectations, with sensitivity coefficients from central
 * differences (step 1e-5 of each band's width) and each input's standard uncertainty from its
 * distribution (rectangular: width/√12; JCGM 100, 4.3.7). Not thread-safe; one instance per use.
 */
public final class LinearPropagation {
    private final InputSpace space;
    private final List<TimingQuantity> quantities;

    public LinearPropagation(InputSpace space, List<TimingQuantity> quantities) {
        this.space = space;
        this.quantities = List.copyOf(quantities);
    }

    /**
     * Per quantity: the estimate at the expectations, the combined standard uncertainty and each
     * input's contribution {@code |c_i| u(x_i)} (same order as {@link InputSpace#inputs()}).
     */
    public record Estimate(double value, double standardUncertainty, double[] contributions) {
    }

    /** Propagates; a quantity that is undefined or does not run at the expectation gets NaN. */
    public Map<TimingQuantity, Estimate> run() {
        double[] params = space.baseParameters();
        Timing t = new Timing();
        double[] x = space.expectationInputs();
        int n = x.length;
        int nq = quantities.size();
        double[] centre = new double[nq];
        space.apply(x, params);
        space.model().evaluate(params, t);
        boolean runs = t.runs();
        for (int q = 0; q < nq; q++) {
            centre[q] = runs ? t.value(quantities.get(q)) : Double.NaN;
        }
        double[][] contrib = new double[nq][n];
        double[] up = new double[nq];
        double[] down = new double[nq];
        for (int i = 0; i < n; i++) {
            UncertainInput in = space.input(i);
            double u = in.standardUncertainty();
            if (u == 0) {
                continue;
            }
            double h = 1e-5 * (in.high() - in.low());
            double xi = x[i];
            x[i] = xi + h;
            space.apply(x, params);
            space.model().evaluate(params, t);
            boolean okUp = t.runs();
            for (int q = 0; q < nq; q++) {
                up[q] = t.value(quantities.get(q));
            }
            x[i] = xi - h;
            space.apply(x, params);
            space.model().evaluate(params, t);
            boolean okDown = t.runs();
            for (int q = 0; q < nq; q++) {
                down[q] = t.value(quantities.get(q));
            }
            x[i] = xi;
            for (int q = 0; q < nq; q++) {
                double c = okUp && okDown ? (up[q] - down[q]) / (2 * h) : Double.NaN;
                contrib[q][i] = Math.abs(c) * u;
            }
        }
        space.apply(x, params);
        Map<TimingQuantity, Estimate> out = new EnumMap<>(TimingQuantity.class);
        for (int q = 0; q < nq; q++) {
            double sum = 0;
            for (int i = 0; i < n; i++) {
                sum += contrib[q][i] * contrib[q][i];
            }
            out.put(quantities.get(q), new Estimate(centre[q], Double.isNaN(centre[q]) ? Double.NaN : Math.sqrt(sum),
                    contrib[q]));
        }
        return out;
    }
}
