package org.rcbench.diagnose;

/**
 * One free parameter as the solver sees it: the model parameter at {@code index}, written as
 * {@code value = reference * exp(z)} (positive quantities: part values, leakage and control-pin
 * resistance) or {@code value = 1 / (1 + exp(-z))} (a wiper position in (0, 1)), with its prior on
 * {@code z}. Immutable.
 *
 * @param name      the model parameter's name
 * @param index     its index in the model's parameter vector
 * @param logit     true for a wiper position, false for a log ratio
 * @param reference the value at {@code z = 0} for a log ratio (the nominal value of a part)
 * @param prior     the prior on {@code z}
 */
record Coordinate(String name, int index, boolean logit, double reference, Prior prior) {

    static Coordinate log(String name, int index, double reference, Prior prior) {
        return new Coordinate(name, index, false, reference, prior);
    }

    static Coordinate wiper(String name, int index, Prior prior) {
        return new Coordinate(name, index, true, Double.NaN, prior);
    }

    /** The parameter value at coordinate {@code z}. */
    double value(double z) {
        return logit ? 1 / (1 + Math.exp(-z)) : reference * Math.exp(z);
    }

    /** The coordinate of parameter value {@code v}. */
    double coordinate(double v) {
        return logit ? logit(v) : Math.log(v / reference);
    }

    /** {@code ln(w / (1 - w))}, with {@code w} kept inside (0, 1). */
    static double logit(double w) {
        double c = Math.min(1 - 1e-9, Math.max(1e-9, w));
        return Math.log(c / (1 - c));
    }

    Coordinate withPrior(Prior p) {
        return new Coordinate(name, index, logit, reference, p);
    }
}
