package org.rcbench.circuit;

/**
 * The bistable latch: the trigger input sets it when pulled below the lower threshold (half the
 * control-pin voltage), the threshold input clears it when pulled above the upper threshold (the
 * control-pin voltage). No timing; the response is the propagation delay. The thresholds follow
 * the same control-pin model as every other topology.
 */
public final class BistableModel extends TimerModel {
    BistableModel(CircuitSpec spec) {
        super(spec);
    }

    @Override
    public void evaluate(double[] p, Timing out) {
        out.clear();
        double vs = p[iSupply];
        if (!(vs > 0)) {
            out.stop("no supply");
            return;
        }
        if (!thresholds(p, vs, out)) {
            return;
        }
        out.responseSeconds = p[iDelay];
        out.runs = true;
        out.oscillates = false;
        out.reason = StopReason.BISTABLE;
        out.reasonA = out.lowerVolts;
        out.reasonB = out.upperVolts;
    }
}
