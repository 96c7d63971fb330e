package org.rcbench.circuit;

/**
 * The monostable: resistor R (role {@code charge}) from the supply to the capacitor, with threshold
 * and discharge on the capacitor and the trigger as an outside input.
 *
 * <p>Idle, the discharge transistor holds the capacitor at its saturation voltage (through its
 * on-resistance against R, leakage and input current). A trigger releases it and the capacitor
 * charges toward the supply until it reaches the upper threshold: pulse width
 * {@code R C ln((Vinf - V0)/(Vinf - Vc))}, {@code R C ln 3} ideally (RC law; check-values.md), plus the
 * propagation delay. It is not retriggerable: triggers during the pulse are ignored. A trigger held
 * low past the threshold crossing keeps the output high until the trigger is released (the trigger
 * wins over the threshold), so the width is {@code max(charge time, trigger width) + delay}. With a
 * trigger interval the output repeats every {@code ceil(width / interval)} intervals. The first
 * pulse after power-up starts from 0 V.
 */
public final class MonostableModel extends TimerModel {
    private final Group resistor;

    MonostableModel(CircuitSpec spec) {
        super(spec);
        resistor = group(Role.CHARGE);
    }

    @Override
    public void evaluate(double[] p, Timing out) {
        out.clear();
        double vs = p[iSupply];
        double c = timing.sum(p);
        double r = resistor.series(p);
        if (!(c > 0) || !(r > 0) || !(vs > 0)) {
            out.stop("no timing capacitance, timing resistance or supply");
            return;
        }
        if (!thresholds(p, vs, out)) {
            return;
        }
        double gLeak = conductance(p[iLeak]);
        double iIn = p[iInputCurrent];
        double g = 1 / r + gLeak;
        double vInf = (vs / r - iIn) / g;
        double upper = out.upperVolts;
        if (!(vInf > upper)) {
            stopCharging(out, vs, r, iIn, vInf, upper);
            return;
        }
        double ron = p[iDischargeOhms];
        double v0 = ron == 0 ? p[iSat] : (vs / r + p[iSat] / ron - iIn) / (g + 1 / ron);
        double tau = c / g;
        double delay = p[iDelay];
        double charge = RcSegment.time(tau, vInf, Math.min(v0, upper), upper);
        double width = delay + Math.max(charge, triggerWidth());
        out.pulseWidthSeconds = width;
        out.highSeconds = width;
        out.firstHighSeconds = delay + Math.max(RcSegment.time(tau, vInf, 0, upper), triggerWidth());
        double interval = spec.trigger().intervalSeconds();
        if (interval > 0) {
            double period = interval * Math.ceil(width / interval * (1 - 1e-12));
            out.periodSeconds = period;
            out.frequencyHz = 1 / period;
            out.lowSeconds = period - width;
            out.duty = width / period;
        }
        out.runs = true;
        out.oscillates = false;
        out.reason = StopReason.MONOSTABLE;
    }

    private double triggerWidth() {
        double w = spec.trigger().widthSeconds();
        return Double.isNaN(w) ? 0 : w;
    }
}
