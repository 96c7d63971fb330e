package org.rcbench.circuit;

/**
 * The constant-frequency PWM: supply, R1 ({@code charge}) to the discharge pin and the wiper of a
 * potentiometer P ({@code split-pot}); the track's charge-side end feeds the capacitor through D1,
 * the other end takes the discharge current through D2, with an optional end-stop resistor
 * ({@code discharge}) in that path. Wiper position w is the fraction of the track on the charge
 * side: charge resistance {@code R1 + w P}, discharge resistance {@code (1 - w) P + R2}. With ideal
 * diodes of equal drop the period {@code (R1 + P + R2) C k} does not depend on w (check-values.md:
 * R1 = 1k, P = 100k, C = 10n, 5 V, Vd 0.6 gives 950.3932 µs and duty 0.0099, 0.2574, 0.5050, 1.0000 at
 * w = 0, 0.25, 0.5, 1); see {@link SteeredCycle}.
 */
public final class PotPwmModel extends TimerModel {
    private final Group charge;
    private final Group discharge;
    private final int iPot;
    private final int iWiper;
    private final int iD1;
    private final int iD2;
    private final DiodeLaw law1;
    private final DiodeLaw law2;

    PotPwmModel(CircuitSpec spec) {
        super(spec);
        charge = group(Role.CHARGE);
        discharge = group(Role.DISCHARGE);
        String pot = spec.withRole(Role.SPLIT_POT).get(0).designator();
        iPot = table.index(pot);
        iWiper = table.index(pot + ParameterTable.WIPER_SUFFIX);
        iD1 = diodeIndex(Role.CHARGE_DIODE);
        iD2 = diodeIndex(Role.DISCHARGE_DIODE);
        law1 = diodeLaw(Role.CHARGE_DIODE);
        law2 = diodeLaw(Role.DISCHARGE_DIODE);
    }

    @Override
    public void evaluate(double[] p, Timing out) {
        out.clear();
        double w = p[iWiper];
        if (!(w >= 0 && w <= 1)) {
            out.stop("wiper position outside 0..1");
            return;
        }
        double track = p[iPot];
        SteeredCycle.evaluate(this, p, out, charge.series(p), w * track, (1 - w) * track + discharge.series(p),
                law1, p[iD1], law2, p[iD2]);
    }
}
