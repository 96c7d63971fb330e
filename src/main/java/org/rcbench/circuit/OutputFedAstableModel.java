package org.rcbench.circuit;

/**
 * The output-fed astable: one resistor R (role {@code feedback}) from the output to the capacitor;
 * threshold and trigger on the capacitor; the discharge pin unused.
 *
 * <p>The output is a Thevenin source: high {@code Vs - family.high_drop} behind
 * {@code family.high_ohms}, low {@code family.low} behind {@code family.low_ohms}, each combined with
 * any {@code output-load} resistors to ground. The capacitor charges toward the high level and
 * discharges toward the low level through R plus the output resistance: high
 * {@code R C ln((Voh - Vcc/3)/(Voh - 2Vcc/3))}, low {@code R C ln((2Vcc/3 - Vol)/(Vcc/3 - Vol))}, both
 * {@code R C ln 2} rail to rail (RC law; check-values.md). It stops when the high level does not
 * exceed the upper threshold.
 */
public final class OutputFedAstableModel extends TimerModel {
    private final Group feedback;

    OutputFedAstableModel(CircuitSpec spec) {
        super(spec);
        feedback = group(Role.FEEDBACK);
    }

    @Override
    public void evaluate(double[] p, Timing out) {
        out.clear();
        double vs = p[iSupply];
        double c = timing.sum(p);
        double r = feedback.series(p);
        if (!(c > 0) || !(r > 0) || !(vs > 0)) {
            out.stop("no timing capacitance, feedback resistance or supply");
            return;
        }
        if (!thresholds(p, vs, out)) {
            return;
        }
        double gLoad = outputLoad.parallelConductance(p);
        double gLeak = conductance(p[iLeak]);
        double iIn = p[iInputCurrent];

        double rh = p[iHighOhms];
        double vHighOpen = Math.max(0, vs - p[iHighDrop]);
        double vHigh = rh == 0 ? vHighOpen : vHighOpen / (1 + rh * gLoad);
        double rHigh = rh == 0 ? 0 : 1 / (1 / rh + gLoad);
        double rl = p[iLowOhms];
        double vLow = rl == 0 ? p[iLowVolts] : p[iLowVolts] / (1 + rl * gLoad);
        double rLow = rl == 0 ? 0 : 1 / (1 / rl + gLoad);

        double rc = r + rHigh;
        double gC = 1 / rc + gLeak;
        double vInfC = (vHigh / rc - iIn) / gC;
        if (!(vInfC > out.upperVolts)) {
            if (!(vHigh > out.upperVolts)) {
                out.stop(StopReason.OUTPUT_HIGH_TOO_LOW, vHigh, out.upperVolts);
            } else {
                stopCharging(out, vHigh, rc, iIn, vInfC, out.upperVolts);
            }
            return;
        }
        double rd = r + rLow;
        double gD = 1 / rd + gLeak;
        double vInfD = (vLow / rd - iIn) / gD;
        if (!(vInfD < out.lowerVolts)) {
            out.stop(StopReason.DISCHARGE_STALLS, vInfD, out.lowerVolts);
            return;
        }
        cycle(out, c / gC, vInfC, c / gD, vInfD, p[iDelay]);
    }
}
