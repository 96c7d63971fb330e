package org.rcbench.circuit;

/**
 * The two-diode astable: supply, Ra (role {@code charge}) to the discharge pin, D1
 * ({@code charge-diode}) from the pin to the capacitor; the capacitor discharges through D2
 * ({@code discharge-diode}) and Rb ({@code discharge}) into the pin. High {@code Ra C k}, low
 * {@code Rb C k} with {@code k = ln((2/3 Vcc - Vd)/(1/3 Vcc - Vd))} ideally; see {@link SteeredCycle}.
 */
public final class TwoDiodeAstableModel extends TimerModel {
    private final Group charge;
    private final Group discharge;
    private final int iD1;
    private final int iD2;
    private final DiodeLaw law1;
    private final DiodeLaw law2;

    TwoDiodeAstableModel(CircuitSpec spec) {
        super(spec);
        charge = group(Role.CHARGE);
        discharge = group(Role.DISCHARGE);
        iD1 = diodeIndex(Role.CHARGE_DIODE);
        iD2 = diodeIndex(Role.DISCHARGE_DIODE);
        law1 = diodeLaw(Role.CHARGE_DIODE);
        law2 = diodeLaw(Role.DISCHARGE_DIODE);
    }

    @Override
    public void evaluate(double[] p, Timing out) {
        out.clear();
        SteeredCycle.evaluate(this, p, out, charge.series(p), 0, discharge.series(p), law1, p[iD1], law2, p[iD2]);
    }
}
