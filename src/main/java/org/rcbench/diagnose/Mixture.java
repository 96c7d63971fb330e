package org.rcbench.diagnose;

import java.util.List;
import org.apache.commons.math3.special.Erf;

/**
 * Quantiles of a mixture of normals, {@code F(z) = sum w_h Phi((z - m_h) / s_h) / sum w_h}: the
 * posterior of one coordinate over all explanations (each a Laplace normal). Bisection on the CDF
 * (Phi from Commons Math's {@link Erf}). Stateless.
 */
final class Mixture {
    /** Explanations lighter than this (relative to the total) are left out of a mixture: they cannot move a 2.5 % point. */
    static final double MIN_WEIGHT = 1e-4;

    private Mixture() {
    }

    /**
     * The {@code p}-quantiles of the mixture of coordinate {@code name} over {@code fits} weighted by
     * {@code weights}, written into {@code out}; NaN when no fit frees it.
     */
    static void quantiles(List<Fit> fits, double[] weights, String name, double[] p, double[] out) {
        int n = fits.size();
        double[] m = new double[n];
        double[] s = new double[n];
        double[] w = new double[n];
        double total = 0;
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int h = 0; h < n; h++) {
            Fit f = fits.get(h);
            int i = f.indexOf(name);
            if (i < 0 || !f.ok() || !(weights[h] > MIN_WEIGHT)) {
                continue;
            }
            m[h] = f.z()[i];
            s[h] = Math.max(1e-9, Math.sqrt(Math.max(0, f.covariance()[i][i])));
            w[h] = weights[h];
            total += w[h];
            lo = Math.min(lo, m[h] - 10 * s[h]);
            hi = Math.max(hi, m[h] + 10 * s[h]);
        }
        for (int k = 0; k < p.length; k++) {
            out[k] = total > 0 ? quantile(m, s, w, total, p[k], lo, hi) : Double.NaN;
        }
    }

    private static double quantile(double[] m, double[] s, double[] w, double total, double p, double lo, double hi) {
        double a = lo;
        double b = hi;
        for (int it = 0; it < 60 && b - a > 1e-6; it++) {
            double mid = 0.5 * (a + b);
            if (cdf(m, s, w, total, mid) < p) {
                a = mid;
            } else {
                b = mid;
            }
        }
        return 0.5 * (a + b);
    }

    private static double cdf(double[] m, double[] s, double[] w, double total, double z) {
        double c = 0;
        for (int h = 0; h < m.length; h++) {
            if (w[h] > 0) {
                c += w[h] * 0.5 * Erf.erfc(-(z - m[h]) / (s[h] * Math.sqrt(2)));
            }
        }
        return c / total;
    }
}
