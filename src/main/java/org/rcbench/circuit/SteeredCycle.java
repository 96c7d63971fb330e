package org.rcbench.circuit;

/**
 * The diode-steered cycle shared by the two-diode astable and the pot PWM.
 *
 * <p>Charge: supply, {@code rTop} to the discharge pin, {@code rChargeExtra}, diode D1, capacitor:
 * the capacitor heads for {@code Vs - Vd1} through {@code rTop + rChargeExtra}. Discharge: the
 * discharge pin is the Thevenin equivalent of the supply through {@code rTop} and the saturated
 * transistor; the capacitor discharges through D2 and {@code rDischarge} toward one drop above it.
 * With ideal thresholds and no saturation both phases have the factor
 * {@code k = ln((2/3 Vcc - Vd)/(1/3 Vcc - Vd))} (check-values.md). Current-dependent diodes use
 * {@link Diodes#effectiveSeriesDrop}, separately for the first charge from 0 V.
 */
final class SteeredCycle {
    private SteeredCycle() {
    }

    static void evaluate(TimerModel m, double[] p, Timing out, double rTop, double rChargeExtra, double rDischarge,
            DiodeLaw law1, double d1, DiodeLaw law2, double d2) {
        double vs = p[m.iSupply];
        double c = m.timing.sum(p);
        if (!(c > 0) || !(rTop > 0) || !(vs > 0) || !(rDischarge >= 0) || !(rChargeExtra >= 0)) {
            out.stop("no timing capacitance, charge resistance or supply");
            return;
        }
        if (!m.thresholds(p, vs, out)) {
            return;
        }
        double upper = out.upperVolts;
        double lower = out.lowerVolts;
        double gLeak = TimerModel.conductance(p[m.iLeak]);
        double iIn = p[m.iInputCurrent];
        double delay = p[m.iDelay];

        double rCharge = rTop + rChargeExtra;
        // Current-dependent D1: drops at the charge segment's ends (from the lower threshold, and from
        // 0 V for the first cycle, both to the upper threshold), each path solved once.
        double vd1;
        double vd1First = Double.NaN;
        double rCalc = Math.max(rCharge, 1e-3);
        if (law1.currentDependent()) {
            double nvt = Diodes.nvt(law1);
            double is = law1.saturationAmps(d1);
            double rs = law1.seriesOhms();
            double uLow = vs - lower;
            double uHigh = vs - upper;
            double atUpper = Diodes.solve(nvt, is, rs, Math.max(uHigh, 0) / rCalc, 1 / rCalc);
            vd1 = Diodes.effective(nvt, is, rs, rCalc, uLow, Diodes.solve(nvt, is, rs, uLow / rCalc, 1 / rCalc),
                    uHigh, atUpper);
            vd1First = Diodes.effective(nvt, is, rs, rCalc, vs, Diodes.solve(nvt, is, rs, vs / rCalc, 1 / rCalc),
                    uHigh, atUpper);
        } else {
            vd1 = d1;
        }
        double rC = rCharge + law1.seriesOhms();
        double gC = 1 / rC + gLeak;
        double vInfC = ((vs - vd1) / rC - iIn) / gC;
        if (!(vInfC > upper)) {
            TimerModel.stopCharging(out, vs - vd1, rC, iIn, vInfC, upper);
            return;
        }

        double ron = p[m.iDischargeOhms];
        double vPin;
        double rPin;
        if (ron == 0) {
            vPin = p[m.iSat];
            rPin = 0;
        } else {
            rPin = 1 / (1 / rTop + 1 / ron);
            vPin = rPin * (vs / rTop + p[m.iSat] / ron);
        }
        double rDis = rDischarge + rPin;
        // A path with no resistance outside the diode (wiper at the end of its track) is limited by the
        // diode's own series resistance; a milliohm floor keeps the drop calculation finite.
        double vd2 = Diodes.effectiveSeriesDrop(law2, d2, Math.max(rDis, 1e-3), upper - vPin, lower - vPin);
        if (Double.isNaN(vd2)) {
            vd2 = d2;
        }
        double rD = rDis + law2.seriesOhms();
        double vInfD;
        double tauD;
        if (rD == 0) {
            vInfD = vPin + vd2;
            tauD = 0;
        } else {
            double gD = 1 / rD + gLeak;
            vInfD = ((vPin + vd2) / rD - iIn) / gD;
            tauD = c / gD;
        }
        if (!(vInfD < lower)) {
            out.stop(StopReason.DISCHARGE_STALLS, Double.isNaN(vInfD) ? vPin + d2 : vInfD, lower);
            return;
        }
        TimerModel.cycle(out, c / gC, vInfC, tauD, vInfD, delay);
        if (law1.currentDependent()) {
            double vInfFirst = ((vs - vd1First) / rC - iIn) / gC;
            out.firstHighSeconds = delay + RcSegment.time(c / gC, vInfFirst, 0, upper);
        }
    }
}
