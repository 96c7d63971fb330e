package org.rcbench.circuit;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Practical-range warnings; the limits are common practice (see {@link PracticalRange}) except where named. */
class PracticalRangeTest {
    private static final FamilyParameters BIPOLAR = TimerFamily.BIPOLAR.defaults();

    private static List<String> warnings(CircuitSpec s) {
        return PracticalRange.check(s, Specs.eval(s));
    }

    @Test
    void aCleanDesignHasNoWarnings() {
        assertThat(warnings(Specs.astable(1e3, 10e3, 100e-9, 9, BIPOLAR))).isEmpty();
    }

    @Test
    void smallChargeResistor() {
        assertThat(warnings(Specs.astable(680, 10e3, 100e-9, 9, BIPOLAR)))
                .anyMatch(w -> w.startsWith("charge resistance 680 Ω is under about 1 kΩ")
                        && w.contains("sinks 13.2 mA"));
    }

    @Test
    void bipolarAboveAHundredKilohertz() {
        assertThat(warnings(Specs.astable(1e3, 1e3, 2.2e-9, 9, BIPOLAR)))
                .anyMatch(w -> w.contains("above about 100 kHz") && w.contains("bipolar"));
    }

    @Test
    void supplyOutsideTheFamilyRange() {
        assertThat(warnings(Specs.astable(1e3, 10e3, 100e-9, 18, BIPOLAR)))
                .anyMatch(w -> w.equals("supply 18 V is outside the bipolar family's range 4.5 V to 16 V"));
    }

    // check-values.md: max practical resistance (bipolar) Vcc / (3 I_th) with I_th about 0.25 uA:
    // 12 MΩ at 9 V.
    @Test
    void resistanceAboveTheThresholdCurrentLimit() {
        assertThat(warnings(Specs.monostable(15e6, 1e-6, 9, BIPOLAR)))
                .anyMatch(w -> w.startsWith("timing resistance 15 MΩ exceeds about 12 MΩ"));
    }

    @Test
    void classTwoCeramicTimingCapacitor() {
        CircuitSpec s = Specs.spec(Topology.ASTABLE, 9, BIPOLAR, Element.resistor("R1", Role.CHARGE, 1e3),
                Element.resistor("R2", Role.SHARED, 10e3),
                Element.capacitor("C1", Role.TIMING, 100e-9).withKind(PartKind.X7R));
        assertThat(warnings(s)).anyMatch(w -> w.startsWith("C1 is a class-2 ceramic (X7R)") && w.contains("±15 %"));
    }
}
