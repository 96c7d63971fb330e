package org.rcbench.diagnose;

import java.util.Objects;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.tolerance.Band;

/**
 * One measured quantity against its prediction. Immutable.
 *
 * @param quantity    which quantity
 * @param measured    the measured value (SI)
 * @param uncertainty its expanded uncertainty (k = 2), SI; NaN when not stated
 * @param nominal     the design's nominal value
 * @param statistical the predicted 95 % band (Monte Carlo)
 * @param worstCase   the predicted worst-case band
 * @param status      pass, marginal or fail
 */
public record QuantityCheck(TimingQuantity quantity, double measured, double uncertainty, double nominal,
        Band statistical, Band worstCase, Verdict status) {
    public QuantityCheck {
        Objects.requireNonNull(quantity, "quantity");
        Objects.requireNonNull(statistical, "statistical");
        Objects.requireNonNull(worstCase, "worstCase");
        Objects.requireNonNull(status, "status");
    }

    /**
     * The status of {@code measured} against the bands: inside the statistical band is a pass, inside
     * the worst case a marginal, anything else a fail. A band that is not defined (the prediction has
     * none) never contains a value, so with neither band the quantity fails.
     */
    public static Verdict status(double measured, Band statistical, Band worstCase) {
        if (statistical.isDefined() && statistical.contains(measured)) {
            return Verdict.PASS;
        }
        if (worstCase.isDefined() && worstCase.contains(measured)) {
            return Verdict.MARGINAL;
        }
        return Verdict.FAIL;
    }

    /** {@code measured / nominal - 1}; NaN without a nominal. */
    public double deviation() {
        return measured / nominal - 1;
    }
}
