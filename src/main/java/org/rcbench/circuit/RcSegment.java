package org.rcbench.circuit;

/**
 * The first-order RC law every model shares: a capacitor heading for asymptote {@code vInf} with
 * time constant {@code tau} has {@code v(t) = vInf + (v0 - vInf) e^(-t/tau)}, so it goes from
 * {@code v0} to {@code v1} in {@code t = tau ln((vInf - v0)/(vInf - v1))} (any circuits textbook; the
 * linear network's Thevenin equivalent seen from the capacitor gives vInf and tau). Pure functions,
 * thread-safe.
 */
public final class RcSegment {
    private RcSegment() {
    }

    /**
     * The time (s) to go from {@code v0} to {@code v1}, or {@code +∞} when the asymptote does not lie
     * beyond {@code v1} (the capacitor never gets there). 0 when {@code v0 == v1}. A zero {@code tau}
     * (no resistance) gives 0 whenever {@code v1} is reachable.
     *
     * <p>Computed as {@code tau * ln(1 + (v1 - v0) / (vInf - v1))}, which equals the law above, with
     * {@code log1p} for small steps to keep precision.
     */
    public static double time(double tau, double vInf, double v0, double v1) {
        if (v0 == v1) {
            return 0;
        }
        double step = v1 - v0;
        double remaining = vInf - v1;
        // Reachable only when the asymptote lies strictly beyond v1 in the direction of travel.
        if (!(step > 0 ? remaining > 0 : remaining < 0)) {
            return Double.POSITIVE_INFINITY;
        }
        if (tau == 0) {
            return 0;
        }
        double x = step / remaining;
        // log1p keeps precision for small steps; Math.log of the ratio is much faster otherwise.
        return tau * (Math.abs(x) < 1e-3 ? Math.log1p(x) : Math.log(1 + x));
    }

    /** The voltage after {@code t} seconds starting from {@code v0}. A zero {@code tau} jumps to {@code vInf}. */
    public static double voltageAfter(double tau, double vInf, double v0, double t) {
        if (t == 0) {
            return v0;
        }
        if (tau == 0) {
            return vInf;
        }
        return vInf + (v0 - vInf) * Math.exp(-t / tau);
    }
}
