package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.NonPositiveDefiniteMatrixException;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.Timing;

/**
 * Solves one hypothesis: the maximum a-posteriori parameters and the Laplace approximation of its
 * evidence. Stateless; each call owns its buffers, so calls may run on any threads.
 *
 * <p>The objective is {@code sum r_i^2} over the whitened log-quantity residuals ({@link Target})
 * and one prior residual per free coordinate ({@link Prior}), minimised by Commons Math's
 * Levenberg–Marquardt. The Jacobian of the data residuals is by forward differences in the
 * coordinates (step 1e-6, i.e. one part per million of each value); the prior rows are exact.
 *
 * <p>Laplace approximation (MacKay, Information Theory, Inference and Learning Algorithms, 2003,
 * ch. 27): with {@code A = J^T J} at the optimum (the Gauss–Newton Hessian of half the objective),
 * {@code ln Z = -chi2/2 - sum ln N_j + (k/2) ln 2 pi - (1/2) ln det A - ln det L + ln prior odds},
 * where {@code N_j} are the priors' normalizers and {@code L} the data whitening; terms common to all
 * hypotheses are dropped. The posterior of the coordinates is approximately normal with covariance
 * {@code A^-1}.
 */
final class MapSolver {
    static final double STEP = 1e-6;
    /** Residual of each quantity when the trial circuit does not run: far worse than any fit. */
    static final double STOPPED = 30;
    private static final double LN_2PI = Math.log(2 * Math.PI);

    private MapSolver() {
    }

    /** The free coordinates of {@code h}: every healthy one (faulty parts with their fault prior), then latent ones. */
    static List<Coordinate> coordinates(DiagnosisModel dm, Hypothesis h) {
        List<Coordinate> out = new ArrayList<>(dm.healthy.size() + 2);
        for (Coordinate c : dm.healthy) {
            Fault f = h.faultOn(c.name());
            out.add(f == null ? c : c.withPrior(f.prior()));
        }
        for (Fault f : h.faults()) {
            if (f.kind() == FaultKind.LEAKAGE || f.kind() == FaultKind.CONTROL_LOAD) {
                out.add(dm.latentCoordinate(f));
            }
        }
        return out;
    }

    /**
     * Solves {@code h} starting from {@code start} (coordinates in the order of {@link #coordinates});
     * returns a fit marked not {@code ok} when the optimizer fails.
     */
    static Fit solve(DiagnosisModel dm, Hypothesis h, Target target, List<Coordinate> coords, double[] start) {
        boolean other = h.otherFamily();
        Residuals fn = new Residuals(dm.model, other ? dm.otherBase : dm.base, coords, target,
                other ? target.whitenOther : target.whiten);
        LeastSquaresOptimizer.Optimum opt;
        try {
            opt = new LevenbergMarquardtOptimizer()
                    .withCostRelativeTolerance(1e-10)
                    .withParameterRelativeTolerance(1e-10)
                    .optimize(new LeastSquaresBuilder()
                            .start(start)
                            .model(fn)
                            .target(new double[target.size() + coords.size()])
                            .maxEvaluations(2000)
                            .maxIterations(400)
                            .build());
        } catch (MathIllegalStateException e) {
            return Fit.failed(h, coords);
        }
        double[] z = opt.getPoint().toArray();
        Pair<RealVector, RealMatrix> at = fn.value(new ArrayRealVector(z, false));
        double[] r = at.getFirst().toArray();
        RealMatrix j = at.getSecond();
        int n = target.size();
        int k = coords.size();
        double chi2 = 0;
        double dataChi2 = 0;
        double misfit = 0;
        for (int i = 0; i < r.length; i++) {
            double s = r[i] * r[i];
            chi2 += s;
            if (i < n) {
                dataChi2 += s;
                misfit += s;
            } else if (!isFaultCoordinate(h, coords.get(i - n))) {
                misfit += s;
            }
        }
        if (fn.stopped) {
            return Fit.failed(h, coords);
        }
        RealMatrix a = j.transpose().multiply(j);
        CholeskyDecomposition chol;
        try {
            chol = new CholeskyDecomposition(a, 1e-14, 1e-300);
        } catch (NonPositiveDefiniteMatrixException e) {
            return Fit.failed(h, coords);
        }
        double logNorm = 0;
        for (Coordinate c : coords) {
            logNorm += c.prior().logNormalizer();
        }
        double logDetA = Math.log(chol.getDeterminant());
        double logDetL = other ? target.logDetLOther : target.logDetL;
        double logZ = -0.5 * chi2 - logNorm + 0.5 * k * LN_2PI - 0.5 * logDetA - logDetL + h.logPriorOdds();
        double[][] cov = chol.getSolver().getInverse().getData();
        return new Fit(h, coords, z, cov, logZ, dataChi2, misfit, true, opt.getEvaluations());
    }

    /**
     * Improves {@code start} along coordinate {@code c} by a coarse scan: the prior's mode ±3 of its
     * larger standard deviation in 25 steps, others held, keeping the lowest objective. A faulty part
     * far from nominal is then started near its value instead of being left to a local minimum.
     */
    static void scan(DiagnosisModel dm, Hypothesis h, Target target, List<Coordinate> coords, double[] start, int c) {
        boolean other = h.otherFamily();
        Residuals fn = new Residuals(dm.model, other ? dm.otherBase : dm.base, coords, target,
                other ? target.whitenOther : target.whiten);
        Prior prior = coords.get(c).prior();
        double width = 3 * Math.max(prior.sdBelow(), prior.sdAbove());
        double bestZ = start[c];
        double best = fn.cost(start);
        for (int k = 0; k <= 24; k++) {
            start[c] = prior.mode() - width + 2 * width * k / 24;
            double cost = fn.cost(start);
            if (cost < best) {
                best = cost;
                bestZ = start[c];
            }
        }
        start[c] = bestZ;
    }

    private static boolean isFaultCoordinate(Hypothesis h, Coordinate c) {
        return h.faultOn(c.name()) != null;
    }

    /** Whitened data residuals and prior residuals, with their Jacobian. Confined to one solve. */
    static final class Residuals implements MultivariateJacobianFunction {
        private final TimerModel model;
        private final double[] base;
        private final Coordinate[] coords;
        private final Target target;
        private final double[][] whiten;
        private final double[] p;
        private final double[] raw;
        private final double[] r0;
        private final double[] r1;
        private final Timing timing = new Timing();
        boolean stopped;

        Residuals(TimerModel model, double[] base, List<Coordinate> coords, Target target, double[][] whiten) {
            this.model = model;
            this.base = base;
            this.coords = coords.toArray(new Coordinate[0]);
            this.target = target;
            this.whiten = whiten;
            this.p = base.clone();
            int n = target.size();
            this.raw = new double[n];
            this.r0 = new double[n];
            this.r1 = new double[n];
        }

        @Override
        public Pair<RealVector, RealMatrix> value(RealVector point) {
            double[] z = point.toArray();
            int n = target.size();
            int k = coords.length;
            double[] r = new double[n + k];
            double[][] jac = new double[n + k][k];
            stopped = !data(z, r0);
            System.arraycopy(r0, 0, r, 0, n);
            for (int c = 0; c < k; c++) {
                double keep = z[c];
                z[c] = keep + STEP;
                data(z, r1);
                z[c] = keep;
                for (int i = 0; i < n; i++) {
                    jac[i][c] = (r1[i] - r0[i]) / STEP;
                }
                Prior prior = coords[c].prior();
                r[n + c] = prior.residual(keep);
                jac[n + c][c] = prior.slope(keep);
            }
            return new Pair<>(new ArrayRealVector(r, false), new Array2DRowRealMatrix(jac, false));
        }

        /** The objective {@code sum r^2} at {@code z} (data and priors), one circuit evaluation. */
        double cost(double[] z) {
            boolean runs = data(z, r0);
            double s = 0;
            for (double r : r0) {
                s += r * r;
            }
            for (int c = 0; c < coords.length; c++) {
                double r = coords[c].prior().residual(z[c]);
                s += r * r;
            }
            return runs ? s : Double.POSITIVE_INFINITY;
        }

        /** Whitened data residuals at {@code z} into {@code out}; false when the circuit does not run there. */
        private boolean data(double[] z, double[] out) {
            System.arraycopy(base, 0, p, 0, base.length);
            for (int c = 0; c < coords.length; c++) {
                p[coords[c].index()] = coords[c].value(z[c]);
            }
            model.evaluate(p, timing);
            int n = raw.length;
            boolean runs = timing.runs();
            for (int i = 0; i < n; i++) {
                double q = timing.value(target.quantities[i]);
                if (!(q > 0) || !runs) {
                    runs = false;
                    break;
                }
                raw[i] = Math.log(q) - target.logObserved[i];
            }
            if (!runs) {
                for (int i = 0; i < n; i++) {
                    raw[i] = STOPPED;
                }
            }
            for (int i = 0; i < n; i++) {
                double s = 0;
                for (int j = 0; j <= i; j++) {
                    s += whiten[i][j] * raw[j];
                }
                out[i] = s;
            }
            return runs;
        }
    }
}
