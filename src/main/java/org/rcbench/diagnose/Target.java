package org.rcbench.diagnose;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.MatrixUtils;
import org.apache.commons.math3.linear.RealMatrix;
import org.rcbench.circuit.TimingQuantity;

/**
 * The measured log quantities and the whitening that turns model-minus-measurement into
 * independent unit-variance residuals: {@code r = L^-1 (ln q_model - ln q_measured)}, with
 * {@code L L^T = C} the covariance of the difference: each quantity's own variance, the probe
 * clock's (shared by all, so fully correlated) and the model's ({@link DiagnosisModel}). One
 * whitening per family (the design's and the other). Immutable.
 */
final class Target {
    final TimingQuantity[] quantities;
    final double[] logObserved;
    final double[][] whiten;
    final double[][] whitenOther;
    /** {@code ln det L}, the data normalizer that differs between the two families. */
    final double logDetL;
    final double logDetLOther;

    private Target(TimingQuantity[] quantities, double[] logObserved, double[][] whiten, double[][] whitenOther,
            double logDetL, double logDetLOther) {
        this.quantities = quantities;
        this.logObserved = logObserved;
        this.whiten = whiten;
        this.whitenOther = whitenOther;
        this.logDetL = logDetL;
        this.logDetLOther = logDetLOther;
    }

    /** The target for the observations the model can fit (others are ignored); null when none is left. */
    static Target of(DiagnosisModel dm, Observations o) {
        int n = 0;
        int[] rows = new int[o.size()];
        TimingQuantity[] q = new TimingQuantity[o.size()];
        double[] y = new double[o.size()];
        double[] u = new double[o.size()];
        for (Observation ob : o.items()) {
            int row = dm.quantities.indexOf(ob.quantity());
            if (row >= 0) {
                rows[n] = row;
                q[n] = ob.quantity();
                y[n] = Math.log(ob.seconds());
                u[n] = ob.relativeUncertainty();
                n++;
            }
        }
        if (n == 0) {
            return null;
        }
        double c = o.clockRelativeUncertainty();
        double[][] w = new double[n][];
        double[][] wo = new double[n][];
        double[] det = new double[1];
        double[] detOther = new double[1];
        w = whitening(covariance(n, rows, u, c, dm.modelCovariance), det);
        wo = whitening(covariance(n, rows, u, c, dm.otherModelCovariance), detOther);
        return new Target(java.util.Arrays.copyOf(q, n), java.util.Arrays.copyOf(y, n), w, wo, det[0], detOther[0]);
    }

    private static double[][] covariance(int n, int[] rows, double[] u, double clock, double[][] model) {
        double[][] cov = new double[n][n];
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < n; b++) {
                cov[a][b] = clock * clock + model[rows[a]][rows[b]] + (a == b ? u[a] * u[a] : 0);
            }
            // A floor of 1e-6 relative keeps a noiseless what-if well conditioned.
            cov[a][a] += 1e-12;
        }
        return cov;
    }

    private static double[][] whitening(double[][] cov, double[] logDet) {
        RealMatrix l = new CholeskyDecomposition(new Array2DRowRealMatrix(cov, false), 1e-12, 1e-300).getL();
        double s = 0;
        for (int i = 0; i < cov.length; i++) {
            s += Math.log(l.getEntry(i, i));
        }
        logDet[0] = s;
        return MatrixUtils.inverse(l).getData();
    }

    int size() {
        return quantities.length;
    }
}
