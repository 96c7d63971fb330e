package org.rcbench.diagnose;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;

/**
 * Which explanation must win, from the signatures in check-values.md ("a pure capacitance change
 * scales high and low time by the same factor; a change of the charge-only resistor moves only the
 * high time; leakage lengthens high and shortens low; a loaded control pin moves only the high time
 * of the astable"), with the measured times taken from its worked values (first-order RC law) rather
 * than from rcbench's own model. The timer is ideal (exact thresholds, no saturation), as those
 * worked values assume.
 */
class SignatureTest {
    private static final double LN2 = Math.log(2);
    private static final double U = 1e-4;

    /** Ra = 1k, Rb = 10k, C = 10n: high (Ra+Rb) C ln 2 = 76.24619 us, low Rb C ln 2 = 69.31472 us (check-values.md). */
    private final Design astable = Boards.idealAstable("5%", "carbon-film", "10n", "5%", "film");

    @Test
    void nominalTimesAreTheWorkedValues() {
        // Guards the fixture: the design's model reproduces check-values.md before any fault is inferred.
        var t = org.rcbench.circuit.TimerModels.build(astable.circuit()).evaluateNominal();
        assertThat(t.highSeconds()).isCloseTo(76.24619e-6, within(1e-11));
        assertThat(t.lowSeconds()).isCloseTo(69.31472e-6, within(1e-11));
    }

    @Test
    void capacitanceLossScalingBothTimesEquallyBlamesTheCapacitor() {
        // C lost 30 %: both worked times times 0.7 (a pure capacitance change scales high and low alike).
        Diagnosis d = Diagnoser.of(astable).diagnose(Boards.given(U, TimingQuantity.HIGH, 0.7 * 76.24619e-6,
                TimingQuantity.LOW, 0.7 * 69.31472e-6));
        assertThat(d.topSuspect().name()).isEqualTo("C1");
        assertThat(d.topSuspect().probability()).isGreaterThan(0.9);
        assertThat(d.topSuspect().value()).isCloseTo(7e-9, within(0.03 * 7e-9));
        assertThat(d.topSuspect().low()).isLessThan(7e-9);
        assertThat(d.topSuspect().high()).isGreaterThan(7e-9);
        assertThat(d.topSuspect().toleranceMultiple()).isCloseTo(6, within(0.4));
        assertThat(d.ambiguous()).as(d.summary()).isFalse();
    }

    @Test
    void highTimeAloneLongerBlamesTheChargeResistorAndNamesMildLeakageAsTheRival() {
        // R1 = 1.5k: high (1.5k + 10k) 10n ln 2 = 79.71 us, low unchanged (a charge-only resistor moves only the high time).
        Diagnosis d = Diagnoser.of(astable).diagnose(Boards.given(U, TimingQuantity.HIGH, 11.5e3 * 10e-9 * LN2,
                TimingQuantity.LOW, 69.31472e-6));
        assertThat(d.topSuspect().name()).as(d.summary()).isEqualTo("R1");
        assertThat(d.topSuspect().value()).isCloseTo(1500, within(150.0));
        // Mild leakage lengthens high and shortens low; with C1 a little high it fits as well: the classic confusion.
        assertThat(d.ambiguities()).anySatisfy(a -> assertThat(a.between()).anyMatch(s -> s.startsWith("leakage")));
    }

    @Test
    void longerHighShorterLowBlamesLeakage() {
        // check-values.md, leakage R_L across C: Ra = 1k, Rb = 10k, C = 10u, 5 V, R_L = 100k: 87.70649 / 63.01338 ms.
        Design d10u = Boards.idealAstable("5%", "carbon-film", "10u", "20%", "aluminium-electrolytic");
        Diagnosis d = Diagnoser.of(d10u).diagnose(Boards.given(U, TimingQuantity.HIGH, 87.70649e-3,
                TimingQuantity.LOW, 63.01338e-3));
        assertThat(d.topSuspect().name()).as(d.summary()).isEqualTo("leak");
        assertThat(d.topSuspect().kind()).isEqualTo(FaultKind.LEAKAGE);
        assertThat(d.topSuspect().low()).isLessThan(100e3);
        assertThat(d.topSuspect().high()).isGreaterThan(100e3);
    }

    @Test
    void shorterHighWithTheLowUnchangedBlamesAControlPinLoad() {
        // check-values.md: control pin loaded to 2.5 V (Rx = 10k at 5 V): high (Ra+Rb) C ln((Vcc - Vc/2)/(Vcc - Vc))
        // = 44.60116 us, low stays Rb C ln 2. No charge resistor can do this: it would need R1 < 0.
        Diagnosis d = Diagnoser.of(astable).diagnose(Boards.given(U, TimingQuantity.HIGH, 44.60116e-6,
                TimingQuantity.LOW, 69.31472e-6));
        assertThat(d.topSuspect().name()).as(d.summary()).isEqualTo("control.ohms");
        assertThat(d.topSuspect().low()).isLessThan(10e3);
        assertThat(d.topSuspect().high()).isGreaterThan(10e3);
    }

    @Test
    void everyPartInsideItsBandNeedsNoFault() {
        Diagnosis d = Diagnoser.of(astable).diagnose(Boards.given(U, TimingQuantity.HIGH, 1.02 * 76.24619e-6,
                TimingQuantity.LOW, 1.02 * 69.31472e-6));
        assertThat(d.best().isNoFault()).as(d.summary()).isTrue();
        assertThat(d.noFaultProbability()).isGreaterThan(0.8);
        assertThat(d.summary()).startsWith("No part needs to be outside its band");
    }

    @Test
    void backSolvedValuesOfAHealthyBoardLieNearNominal() {
        Diagnosis d = Diagnoser.of(astable).diagnose(Boards.given(U, TimingQuantity.HIGH, 76.24619e-6,
                TimingQuantity.LOW, 69.31472e-6));
        for (String p : new String[] {"R1", "R2", "C1"}) {
            Estimate e = d.estimate(p);
            assertThat(e.covers(e.nominal())).as(p).isTrue();
            assertThat(e.high() / e.low()).as(p).isLessThan(1.2);
        }
    }
}
