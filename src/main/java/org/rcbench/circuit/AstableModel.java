package org.rcbench.circuit;

/**
 * The astable: supply, upper resistor Ra (role {@code charge}) to the discharge pin, lower resistor Rb
 * (role {@code shared}) to the capacitor; threshold and trigger on the capacitor.
 *
 * <p>Charge: the capacitor heads for the supply through Ra + Rb. Discharge: the discharge pin is
 * held at the Thevenin equivalent of the supply through Ra and the saturated transistor
 * ({@code family.sat} behind {@code family.discharge_ohms}), and the capacitor discharges toward it
 * through Rb. With ideal thresholds this is high {@code (Ra+Rb) C ln 2}, low {@code Rb C ln 2}, first
 * high {@code (Ra+Rb) C ln 3}; with a saturation voltage the low factor is
 * {@code ln((2/3 Vcc - Vsat)/(1/3 Vcc - Vsat))} (RC law; check-values.md).
 */
public final class AstableModel extends TimerModel {
    private final Group charge;
    private final Group shared;

    AstableModel(CircuitSpec spec) {
        super(spec);
        charge = group(Role.CHARGE);
        shared = group(Role.SHARED);
    }

    @Override
    public void evaluate(double[] p, Timing out) {
        out.clear();
        double vs = p[iSupply];
        double c = timing.sum(p);
        double ra = charge.series(p);
        double rb = shared.series(p);
        if (!(c > 0) || !(ra + rb > 0) || !(vs > 0)) {
            out.stop("no timing capacitance, timing resistance or supply");
            return;
        }
        if (!thresholds(p, vs, out)) {
            return;
        }
        double gLeak = conductance(p[iLeak]);
        double iIn = p[iInputCurrent];
        double rc = ra + rb;
        double gC = 1 / rc + gLeak;
        double vInfC = (vs / rc - iIn) / gC;
        if (!(vInfC > out.upperVolts)) {
            stopCharging(out, vs, rc, iIn, vInfC, out.upperVolts);
            return;
        }
        // Discharge pin: supply through Ra in parallel with the saturation source behind its on-resistance.
        double ron = p[iDischargeOhms];
        double vPin;
        double rPin;
        if (ron == 0 || ra == 0) {
            vPin = ra == 0 ? vs : p[iSat];
            rPin = 0;
        } else {
            rPin = 1 / (1 / ra + 1 / ron);
            vPin = rPin * (vs / ra + p[iSat] / ron);
        }
        double rd = rb + rPin;
        double vInfD;
        double tauD;
        if (rd == 0) {
            vInfD = vPin;
            tauD = 0;
        } else {
            double gD = 1 / rd + gLeak;
            vInfD = (vPin / rd - iIn) / gD;
            tauD = c / gD;
        }
        if (!(vInfD < out.lowerVolts)) {
            out.stop(StopReason.DISCHARGE_STALLS, vInfD, out.lowerVolts);
            return;
        }
        cycle(out, c / gC, vInfC, tauD, vInfD, p[iDelay]);
    }
}
