package org.rcbench.diagnose;

import java.util.List;

/**
 * The solved form of one hypothesis: the MAP coordinates, their Laplace covariance, the log
 * evidence and the misfit. Immutable by convention (arrays are not handed out).
 *
 * @param hypothesis   what was assumed
 * @param coords       the free coordinates
 * @param z            their MAP values
 * @param covariance   the Laplace covariance of {@code z}, {@code (J^T J)^-1}
 * @param logEvidence  the Laplace log evidence including the prior odds (common terms dropped)
 * @param dataChiSquare the whitened data residuals' sum of squares at the MAP
 * @param misfit       {@code dataChiSquare} plus the healthy priors' squares: how badly the hypothesis
 *                     fits when its faulty coordinates may take any value (the profile cost used to
 *                     judge whether the data separate two hypotheses)
 * @param ok           false when the solver failed (the hypothesis is then left out)
 * @param evaluations  model evaluations the optimizer used (each is 1 + k circuit evaluations)
 */
record Fit(Hypothesis hypothesis, List<Coordinate> coords, double[] z, double[][] covariance, double logEvidence,
        double dataChiSquare, double misfit, boolean ok, int evaluations) {

    static Fit failed(Hypothesis h, List<Coordinate> coords) {
        return new Fit(h, coords, new double[coords.size()], new double[coords.size()][coords.size()],
                Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, Double.POSITIVE_INFINITY, false, 0);
    }

    /** The position of coordinate {@code name}, or -1. */
    int indexOf(String name) {
        for (int i = 0; i < coords.size(); i++) {
            if (coords.get(i).name().equals(name)) {
                return i;
            }
        }
        return -1;
    }

    /** The MAP value of parameter {@code name} in its own unit, or NaN when it is not free. */
    double value(String name) {
        int i = indexOf(name);
        return i < 0 ? Double.NaN : coords.get(i).value(z[i]);
    }

    /** The standard deviation of coordinate {@code name}'s {@code z}, or NaN. */
    double sd(String name) {
        int i = indexOf(name);
        return i < 0 ? Double.NaN : Math.sqrt(Math.max(0, covariance[i][i]));
    }
}
