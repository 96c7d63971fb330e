package org.rcbench.tolerance;

import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Distribution;

/**
 * Propagation of distributions by Monte Carlo (JCGM 101:2008): draw every input from its
 * distribution, evaluate the model, and report per quantity the mean, standard deviation and the
 * probabilistically symmetric 95 % coverage interval (JCGM 101, 7.7.2), i.e. the 2.5 % and 97.5 %
 * points of the sorted results. Seeded (Commons Math {@code Well19937c}) and so reproducible. Draws
 * where the circuit stops are counted and left out of the statistics.
 *
 * <p>Distributions: rectangular over the band; triangular over the band (the mean of two uniforms);
 * normal with the band as ±3σ about its middle. Not thread-safe; one instance per use.
 */
public final class MonteCarlo {
    /** The default number of draws (JCGM 101 suggests 10^6 for two significant digits; 10^5 is ample for bands). */
    public static final int DEFAULT_DRAWS = 100_000;
    public static final long DEFAULT_SEED = 1L;

    private final InputSpace space;
    private final List<TimingQuantity> quantities;
    private final int draws;
    private final long seed;

    public MonteCarlo(InputSpace space, List<TimingQuantity> quantities, int draws, long seed) {
        if (draws < 1) {
            throw new IllegalArgumentException("draws < 1: " + draws);
        }
        this.space = space;
        this.quantities = List.copyOf(quantities);
        this.draws = draws;
        this.seed = seed;
    }

    /** Per quantity statistics over the running draws. */
    public record Statistics(double mean, double standardDeviation, Band coverage95) {
    }

    /** The outcome: statistics per quantity, how many draws ran, and one reason a draw stopped. */
    public record Result(Map<TimingQuantity, Statistics> statistics, int draws, int stopped, String stopReason, long seed) {
        /** The fraction of draws in which the circuit did not run. */
        public double stoppedFraction() {
            return draws == 0 ? 0 : (double) stopped / draws;
        }
    }

    public Result run() {
        RandomGenerator rng = new Well19937c(seed);
        int n = space.size();
        int nq = quantities.size();
        double[] lo = new double[n];
        double[] width = new double[n];
        int[] kind = new int[n];
        for (int i = 0; i < n; i++) {
            UncertainInput in = space.input(i);
            lo[i] = in.low();
            width[i] = in.high() - in.low();
            kind[i] = in.distribution().ordinal();
        }
        double[] x = new double[n];
        double[] params = space.baseParameters();
        Timing t = new Timing();
        double[][] values = new double[nq][draws];
        int ran = 0;
        String reason = null;
        final int rect = Distribution.RECTANGULAR.ordinal();
        final int tri = Distribution.TRIANGULAR.ordinal();
        for (int d = 0; d < draws; d++) {
            for (int i = 0; i < n; i++) {
                if (kind[i] == rect) {
                    x[i] = lo[i] + width[i] * rng.nextDouble();
                } else if (kind[i] == tri) {
                    x[i] = lo[i] + width[i] * 0.5 * (rng.nextDouble() + rng.nextDouble());
                } else {
                    x[i] = lo[i] + width[i] * (0.5 + rng.nextGaussian() / 6);
                }
            }
            space.apply(x, params);
            space.model().evaluate(params, t);
            if (!t.runs()) {
                if (reason == null) {
                    reason = t.reasonText();
                }
                continue;
            }
            for (int q = 0; q < nq; q++) {
                values[q][ran] = t.value(quantities.get(q));
            }
            ran++;
        }
        Map<TimingQuantity, Statistics> stats = new EnumMap<>(TimingQuantity.class);
        for (int q = 0; q < nq; q++) {
            stats.put(quantities.get(q), statistics(values[q], ran));
        }
        return new Result(stats, draws, draws - ran, reason, seed);
    }

    /**
     * Mean, standard deviation (M - 1 in the denominator) and the probabilistically symmetric 95 %
     * interval of the first {@code m} values (sorted in place), per JCGM 101:2008, 7.7.2: with
     * {@code q = p M} (rounded to the nearest integer when not whole) and {@code r = (M - q)/2}
     * (rounded up by a half when not whole), the interval is {@code [y(r), y(r+q)]} in 1-based order.
     */
    static Statistics statistics(double[] v, int m) {
        if (m == 0) {
            return new Statistics(Double.NaN, Double.NaN, Band.NONE);
        }
        double sum = 0;
        for (int i = 0; i < m; i++) {
            sum += v[i];
        }
        double mean = sum / m;
        double ss = 0;
        for (int i = 0; i < m; i++) {
            double d = v[i] - mean;
            ss += d * d;
        }
        double sd = m > 1 ? Math.sqrt(ss / (m - 1)) : 0;
        if (Double.isNaN(mean)) {
            return new Statistics(Double.NaN, Double.NaN, Band.NONE);
        }
        Arrays.sort(v, 0, m);
        long q = Math.round(0.95 * m);
        long r = (m - q) % 2 == 0 ? (m - q) / 2 : (m - q + 1) / 2;
        int lowIndex = (int) Math.max(0, r - 1);
        int highIndex = (int) Math.min(m - 1, r + q - 1);
        return new Statistics(mean, sd, new Band(v[lowIndex], v[highIndex]));
    }
}
