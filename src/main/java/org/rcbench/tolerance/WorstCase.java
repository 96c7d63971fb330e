package org.rcbench.tolerance;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.optim.InitialGuess;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.SimpleBounds;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.nonlinear.scalar.ObjectiveFunction;
import org.apache.commons.math3.optim.nonlinear.scalar.noderiv.BOBYQAOptimizer;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;

/**
 * The true extremes of each predicted quantity over the box of all input bands, not only its
 * corners: a quantity that is not monotonic in an input (the pot PWM's period over its wiper travel
 * with real diodes, for example) can peak inside the box.
 *
 * <p>Method: evaluate the centre, every corner (all 2^n for n <= 12 inputs, else 4096 random corners)
 * and 64 n random interior points; then, unless the best point found for a quantity and direction
 * is a corner from which every step into the box is worse, refine from it with a bounded optimiser (Commons Math BOBYQA, Powell 2009, for n >= 2;
 * Brent's method for n = 1). Points where the circuit stops are recorded (the box "may stop") and
 * excluded from the bands. Deterministic (fixed seed). Not thread-safe; one instance per use.
 */
public final class WorstCase {
    private static final int MAX_FULL_CORNERS = 12;
    private static final int SAMPLED_CORNERS = 4096;

    private final InputSpace space;
    private final List<TimingQuantity> quantities;
    private final double[] params;
    private final Timing timing = new Timing();
    private final double[] x;
    private final int[] varying;
    private String stopReason;

    public WorstCase(InputSpace space, List<TimingQuantity> quantities) {
        this.space = space;
        this.quantities = List.copyOf(quantities);
        this.params = space.baseParameters();
        this.x = space.expectationInputs();
        int n = 0;
        for (UncertainInput in : space.inputs()) {
            n += in.high() > in.low() ? 1 : 0;
        }
        varying = new int[n];
        int k = 0;
        for (int i = 0; i < space.size(); i++) {
            if (space.input(i).high() > space.input(i).low()) {
                varying[k++] = i;
            }
        }
    }

    /** The result: a band per quantity and whether some point of the box stops the circuit. */
    public record Result(Map<TimingQuantity, Band> bands, boolean mayStop, String stopReason, long evaluations) {
    }

    private long evaluations;

    /** Finds the extremes. */
    public Result run() {
        int n = varying.length;
        int nq = quantities.size();
        double[] min = new double[nq];
        double[] max = new double[nq];
        double[][] argMin = new double[nq][n];
        double[][] argMax = new double[nq][n];
        java.util.Arrays.fill(min, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(max, Double.NEGATIVE_INFINITY);
        double[] u = new double[n];
        java.util.Arrays.fill(u, 0.5);
        sample(u, min, max, argMin, argMax);
        SplittableRandom rnd = new SplittableRandom(20240501L);
        if (n <= MAX_FULL_CORNERS) {
            for (int c = 0; c < (1 << n); c++) {
                for (int i = 0; i < n; i++) {
                    u[i] = (c >> i & 1);
                }
                sample(u, min, max, argMin, argMax);
            }
        } else {
            for (int c = 0; c < SAMPLED_CORNERS; c++) {
                for (int i = 0; i < n; i++) {
                    u[i] = rnd.nextBoolean() ? 1 : 0;
                }
                sample(u, min, max, argMin, argMax);
            }
        }
        for (int s = 0; s < 64 * n; s++) {
            for (int i = 0; i < n; i++) {
                u[i] = rnd.nextDouble();
            }
            sample(u, min, max, argMin, argMax);
        }
        Map<TimingQuantity, Band> bands = new EnumMap<>(TimingQuantity.class);
        for (int q = 0; q < nq; q++) {
            if (n > 0 && Double.isFinite(min[q])) {
                if (!isCornerOptimum(q, argMin[q], min[q], false)) {
                    min[q] = Math.min(min[q], refine(q, argMin[q], false));
                }
                if (!isCornerOptimum(q, argMax[q], max[q], true)) {
                    max[q] = Math.max(max[q], refine(q, argMax[q], true));
                }
            }
            bands.put(quantities.get(q), Double.isFinite(min[q]) ? new Band(min[q], max[q]) : Band.NONE);
        }
        return new Result(bands, stopReason != null, stopReason, evaluations);
    }

    /** Evaluates at unit-cube point u; returns false when the circuit does not run there. */
    private boolean eval(double[] u) {
        for (int i = 0; i < varying.length; i++) {
            UncertainInput in = space.input(varying[i]);
            double ui = Math.min(1, Math.max(0, u[i]));
            x[varying[i]] = in.low() + ui * (in.high() - in.low());
        }
        space.apply(x, params);
        space.model().evaluate(params, timing);
        evaluations++;
        if (!timing.runs()) {
            if (stopReason == null) {
                stopReason = timing.reasonText();
            }
            return false;
        }
        return true;
    }

    private void sample(double[] u, double[] min, double[] max, double[][] argMin, double[][] argMax) {
        if (!eval(u)) {
            return;
        }
        for (int q = 0; q < quantities.size(); q++) {
            double v = timing.value(quantities.get(q));
            if (Double.isNaN(v)) {
                continue;
            }
            if (v < min[q]) {
                min[q] = v;
                System.arraycopy(u, 0, argMin[q], 0, u.length);
            }
            if (v > max[q]) {
                max[q] = v;
                System.arraycopy(u, 0, argMax[q], 0, u.length);
            }
        }
    }

    /**
     * Whether {@code u} is a corner from which every step into the box makes quantity {@code q} worse
     * (the first-order optimality condition at a vertex), so no local search is needed there.
     */
    private boolean isCornerOptimum(int q, double[] u, double value, boolean maximise) {
        double[] probe = u.clone();
        for (int i = 0; i < u.length; i++) {
            if (u[i] != 0 && u[i] != 1) {
                return false;
            }
        }
        for (int i = 0; i < u.length; i++) {
            probe[i] = u[i] == 0 ? 1e-4 : 1 - 1e-4;
            boolean ok = eval(probe);
            double v = ok ? timing.value(quantities.get(q)) : Double.NaN;
            probe[i] = u[i];
            if (!ok || Double.isNaN(v) || (maximise ? v >= value : v <= value)) {
                return false;
            }
        }
        return true;
    }

    /** The best value a bounded local search from {@code start} finds for quantity {@code q}. */
    private double refine(int q, double[] start, boolean maximise) {
        TimingQuantity quantity = quantities.get(q);
        double[] best = {Double.NaN};
        double[] probe = new double[varying.length];
        java.util.function.ToDoubleFunction<double[]> f = point -> {
            if (!eval(point)) {
                return Double.NaN;
            }
            double v = timing.value(quantity);
            if (!Double.isNaN(v) && (Double.isNaN(best[0]) || (maximise ? v > best[0] : v < best[0]))) {
                best[0] = v;
            }
            return v;
        };
        double startValue = f.applyAsDouble(start);
        if (Double.isNaN(startValue)) {
            return maximise ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY;
        }
        // A stopped point counts as the worst possible value in the search direction, so the optimiser
        // stays where the circuit runs.
        double penalty = maximise ? -1e300 : 1e300;
        try {
            if (varying.length == 1) {
                UnivariateFunction g = t -> {
                    probe[0] = t;
                    double v = f.applyAsDouble(probe);
                    return Double.isNaN(v) ? penalty : v;
                };
                new BrentOptimizer(1e-10, 1e-14).optimize(new MaxEval(200), new UnivariateObjectiveFunction(g),
                        maximise ? GoalType.MAXIMIZE : GoalType.MINIMIZE, new SearchInterval(0, 1, start[0]));
            } else {
                double[] lo = new double[varying.length];
                double[] hi = new double[varying.length];
                java.util.Arrays.fill(hi, 1);
                BOBYQAOptimizer opt = new BOBYQAOptimizer(2 * varying.length + 1, 0.25, 1e-7);
                opt.optimize(new MaxEval(200 + 40 * varying.length), new ObjectiveFunction(point -> {
                    double v = f.applyAsDouble(point);
                    return Double.isNaN(v) ? penalty : v;
                }), maximise ? GoalType.MAXIMIZE : GoalType.MINIMIZE, new InitialGuess(start.clone()),
                        new SimpleBounds(lo, hi));
            }
        } catch (MathIllegalStateException e) {
            // Evaluation budget reached: keep the best point seen so far.
        }
        return best[0];
    }
}
