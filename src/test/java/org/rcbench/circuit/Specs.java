package org.rcbench.circuit;

import java.util.List;

/** Small builders of circuit specs for tests. */
final class Specs {
    private Specs() {
    }

    static CircuitSpec spec(Topology t, double vs, FamilyParameters f, Element... parts) {
        return new CircuitSpec(t, TimerFamily.BIPOLAR, f, vs, List.of(parts), ControlPin.open(), Trigger.UNSPECIFIED);
    }

    static CircuitSpec astable(double ra, double rb, double c, double vs, FamilyParameters f) {
        return spec(Topology.ASTABLE, vs, f, Element.resistor("R1", Role.CHARGE, ra),
                Element.resistor("R2", Role.SHARED, rb), Element.capacitor("C1", Role.TIMING, c));
    }

    static CircuitSpec monostable(double r, double c, double vs, FamilyParameters f) {
        return spec(Topology.MONOSTABLE, vs, f, Element.resistor("R1", Role.CHARGE, r),
                Element.capacitor("C1", Role.TIMING, c));
    }

    static CircuitSpec twoDiode(double ra, double rb, double c, double vs, double vd, FamilyParameters f) {
        return spec(Topology.ASTABLE_TWO_DIODE, vs, f, Element.resistor("R1", Role.CHARGE, ra),
                Element.resistor("R2", Role.DISCHARGE, rb), Element.diode("D1", Role.CHARGE_DIODE, vd),
                Element.diode("D2", Role.DISCHARGE_DIODE, vd), Element.capacitor("C1", Role.TIMING, c));
    }

    static CircuitSpec oneDiode(double ra, double rb, double c, double vs, double vd, FamilyParameters f) {
        return spec(Topology.ASTABLE_ONE_DIODE, vs, f, Element.resistor("R1", Role.CHARGE, ra),
                Element.resistor("R2", Role.SHARED, rb), Element.diode("D1", Role.CHARGE_DIODE, vd),
                Element.capacitor("C1", Role.TIMING, c));
    }

    static CircuitSpec potPwm(double r1, double pot, double wiper, double c, double vs, double vd, FamilyParameters f) {
        return spec(Topology.PWM_POT, vs, f, Element.resistor("R1", Role.CHARGE, r1),
                Element.pot("VR1", Role.SPLIT_POT, pot, wiper), Element.diode("D1", Role.CHARGE_DIODE, vd),
                Element.diode("D2", Role.DISCHARGE_DIODE, vd), Element.capacitor("C1", Role.TIMING, c));
    }

    static CircuitSpec outputFed(double r, double c, double vs, FamilyParameters f) {
        return spec(Topology.OUTPUT_FED, vs, f, Element.resistor("R1", Role.FEEDBACK, r),
                Element.capacitor("C1", Role.TIMING, c));
    }

    static Timing eval(CircuitSpec s) {
        return TimerModels.build(s).evaluateNominal();
    }

    /** Evaluates with one parameter changed. */
    static Timing eval(CircuitSpec s, String name, double value) {
        TimerModel m = TimerModels.build(s);
        double[] p = m.nominal();
        p[m.parameters().index(name)] = value;
        return m.evaluate(p);
    }
}
