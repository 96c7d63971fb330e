package org.rcbench.circuit;

/**
 * The astable with one diode across the lower resistor: supply, Ra (role {@code charge}) to the
 * discharge pin, Rb (role {@code shared}) to the capacitor, and a diode (role {@code charge-diode})
 * from the discharge pin to the capacitor in parallel with Rb.
 *
 * <p>Charge is piecewise. While the diode conducts the discharge pin sits one drop above the
 * capacitor, so Rb carries a constant {@code Vd/Rb} and all of Ra's current reaches the capacitor:
 * source {@code Vs - Vd} through Ra. The diode's current {@code (Vs - Vd - v)/Ra - Vd/Rb} falls to zero
 * at {@code Vx = Vs - Vd (1 + Ra/Rb)}; above that the capacitor charges through Ra + Rb toward the
 * supply. With the diode conducting throughout, high {@code Ra C ln((Vcc - Vd - Vcc/3)/(Vcc - Vd - 2Vcc/3))}
 * (check-values.md). Discharge goes through Rb alone, as in the plain astable. A current-dependent
 * diode takes its drop at the diode current at the middle of the conducting part of the swing.
 */
public final class OneDiodeAstableModel extends TimerModel {
    private final Group charge;
    private final Group shared;
    private final int iDiode;
    private final DiodeLaw law;

    OneDiodeAstableModel(CircuitSpec spec) {
        super(spec);
        charge = group(Role.CHARGE);
        shared = group(Role.SHARED);
        iDiode = diodeIndex(Role.CHARGE_DIODE);
        law = diodeLaw(Role.CHARGE_DIODE);
    }

    @Override
    public void evaluate(double[] p, Timing out) {
        out.clear();
        double vs = p[iSupply];
        double c = timing.sum(p);
        double ra = charge.series(p);
        double rb = shared.series(p);
        if (!(c > 0) || !(ra > 0) || !(rb > 0) || !(vs > 0)) {
            out.stop("no timing capacitance, charge or shared resistance, or supply");
            return;
        }
        if (!thresholds(p, vs, out)) {
            return;
        }
        double upper = out.upperVolts;
        double lower = out.lowerVolts;
        double gLeak = conductance(p[iLeak]);
        double iIn = p[iInputCurrent];
        double delay = p[iDelay];

        double vMid = 0.5 * (lower + upper);
        double vd = Diodes.dropForLinearCurrent(law, p[iDiode], (vs - vMid) / ra, 1 / ra + 1 / rb);
        double gOn = 1 / ra + gLeak;
        double vInfOn = ((vs - vd) / ra - iIn) / gOn;
        double tauOn = c / gOn;
        double vx = vs - vd * (1 + ra / rb);
        double rOff = ra + rb;
        double gOff = 1 / rOff + gLeak;
        double vInfOff = (vs / rOff - iIn) / gOff;
        double tauOff = c / gOff;
        if (upper <= vx ? !(vInfOn > upper) : !(vInfOn > vx || lower >= vx)) {
            stopCharging(out, vs - vd, ra, iIn, vInfOn, upper);
            return;
        }
        if (upper > vx && !(vInfOff > upper)) {
            stopCharging(out, vs, rOff, iIn, vInfOff, upper);
            return;
        }

        double ron = p[iDischargeOhms];
        double vPin;
        double rPin;
        if (ron == 0) {
            vPin = p[iSat];
            rPin = 0;
        } else {
            rPin = 1 / (1 / ra + 1 / ron);
            vPin = rPin * (vs / ra + p[iSat] / ron);
        }
        double rd = rb + rPin;
        double gD = 1 / rd + gLeak;
        double vInfD = (vPin / rd - iIn) / gD;
        double tauD = c / gD;
        if (!(vInfD < lower)) {
            out.stop(StopReason.DISCHARGE_STALLS, vInfD, lower);
            return;
        }
        boolean onAtUpper = upper <= vx;
        double vOver = onAtUpper ? RcSegment.voltageAfter(tauOn, vInfOn, upper, delay)
                : RcSegment.voltageAfter(tauOff, vInfOff, upper, delay);
        double vUnder = RcSegment.voltageAfter(tauD, vInfD, lower, delay);
        double high = delay + chargeTime(Math.min(vUnder, lower), upper, vx, tauOn, vInfOn, tauOff, vInfOff);
        double low = delay + RcSegment.time(tauD, vInfD, Math.max(vOver, upper), lower);
        double first = delay + chargeTime(0, upper, vx, tauOn, vInfOn, tauOff, vInfOff);
        out.cycle(high, low, first);
    }

    /** Time from {@code v0} to {@code v1} with the diode conducting below {@code vx} and blocking above. */
    private static double chargeTime(double v0, double v1, double vx, double tauOn, double vInfOn, double tauOff,
            double vInfOff) {
        if (v1 <= vx) {
            return RcSegment.time(tauOn, vInfOn, v0, v1);
        }
        if (v0 >= vx) {
            return RcSegment.time(tauOff, vInfOff, v0, v1);
        }
        return RcSegment.time(tauOn, vInfOn, v0, vx) + RcSegment.time(tauOff, vInfOff, vx, v1);
    }
}
