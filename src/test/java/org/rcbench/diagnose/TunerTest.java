package org.rcbench.diagnose;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;

/** Potentiometer tuning against closed forms of check-values.md. */
class TunerTest {
    /**
     * check-values.md, pot PWM: R1 = 1k, pot 100k, C = 10n, 5 V, Vd 0.6: period 950.3932 us at any
     * wiper; duty 0.0099 / 0.2574 / 0.5050 / 1.0000 at wiper 0 / 0.25 / 0.5 / 1 (ideal timer, fixed drops).
     */
    private static final Design PWM = Boards.parse("[timer]\ntopology = \"pwm-pot\"\nfamily = \"bipolar\"\n"
            + "supply = \"5 V\"\n" + Boards.IDEAL + Boards.part("R1", "charge", "1k0", "1%", "metal-film")
            + "[parts.VR1]\nrole = \"split-pot\"\nvalue = \"100k\"\ntolerance = \"20%\"\nkind = \"cermet\"\nwiper = 0.5\n"
            + Boards.part("C1", "timing", "10n", "5%", "film")
            + "[parts.D1]\nrole = \"charge-diode\"\ndrop = \"0.6 V\"\n[parts.D2]\nrole = \"discharge-diode\"\ndrop = \"0.6 V\"\n");
    private static final double PERIOD = 950.3932e-6;

    private static Observations pwmAt(double duty) {
        return Boards.given(1e-4, TimingQuantity.HIGH, duty * PERIOD, TimingQuantity.LOW, (1 - duty) * PERIOD);
    }

    @Test
    void findsTheWiperFromTheDutyAndWhereToTurnIt() {
        TuneResult r = Tuner.of(PWM).tune(pwmAt(0.2574), TuneTarget.of(TimingQuantity.DUTY, 0.5050).withTravelDegrees(270));
        assertThat(r.pot()).isEqualTo("VR1");
        assertThat(r.present()).isCloseTo(0.25, within(0.01));
        assertThat(r.presentLow()).isLessThan(0.25);
        assertThat(r.presentHigh()).isGreaterThan(0.25);
        assertThat(r.reachable()).isTrue();
        assertThat(r.wanted()).isCloseTo(0.5, within(0.01));
        assertThat(r.reached()).isCloseTo(0.5050, within(1e-4));
        assertThat(r.change()).isCloseTo(0.25, within(0.015));
        assertThat(r.advice()).contains("0.50").contains("charge side").contains("° of its 270° travel");
    }

    // The same tuning with the pot's travel in the design file instead of an option: a quarter of the
    // travel of a 270° pot is about 67°; of a 10-turn trimmer, 2.5 turns. An option wins over the file.
    @Test
    void theDesignsTravelStatesTheTurnWhenNoOptionDoes() {
        Design deg = PWM.withTravel("VR1", org.rcbench.design.PotTravel.ofDegrees(270));
        TuneResult r = Tuner.of(deg).tune(pwmAt(0.2574), TuneTarget.of(TimingQuantity.DUTY, 0.5050));
        assertThat(r.target().travelDegrees()).isEqualTo(270);
        assertThat(r.advice()).containsPattern("about (6[5-9])° of its 270° travel");
        Design turns = PWM.withTravel("VR1", org.rcbench.design.PotTravel.ofTurns(10));
        TuneResult t = Tuner.of(turns).tune(pwmAt(0.2574), TuneTarget.of(TimingQuantity.DUTY, 0.5050));
        assertThat(t.advice()).containsPattern("about 2\\.[4-6] of its 10 turns");
        TuneResult option = Tuner.of(turns).tune(pwmAt(0.2574),
                TuneTarget.of(TimingQuantity.DUTY, 0.5050).withTravelDegrees(300));
        assertThat(option.advice()).contains("of its 300° travel").doesNotContain("turns)");
        TuneResult none = Tuner.of(PWM).tune(pwmAt(0.2574), TuneTarget.of(TimingQuantity.DUTY, 0.5050));
        assertThat(none.advice()).doesNotContain("°").doesNotContain("turns");
    }

    @Test
    void theWiperDoesNotSetThePwmFrequency() {
        TuneResult r = Tuner.of(PWM).tune(pwmAt(0.2574), TuneTarget.of(TimingQuantity.FREQUENCY, 2000));
        assertThat(r.reachable()).isFalse();
        // Not exactly flat: the back-solved diode drops differ a little, so the two phases' factors differ.
        assertThat(r.rangeHigh() / r.rangeLow()).isCloseTo(1, within(1e-3));
        assertThat(r.advice()).contains("does not set the frequency");
    }

    @Test
    void rheostatInAMonostableReachesAPulseWidth() {
        // t = (R1 + w P) C ln 3 (RC law; check-values.md): R1 = 10k, P = 100k, C = 1u; w = 0.3 now, 0.6 wanted.
        Design mono = Boards.parse("[timer]\ntopology = \"monostable\"\nfamily = \"bipolar\"\nsupply = \"5 V\"\n"
                + Boards.IDEAL + Boards.part("R1", "charge", "10k", "1%", "metal-film")
                + "[parts.VR1]\nrole = \"charge\"\nvalue = \"100k\"\ntolerance = \"10%\"\nkind = \"cermet\"\nwiper = 0.5\n"
                + Boards.part("C1", "timing", "1u", "2%", "film"));
        double ln3 = Math.log(3);
        TuneResult r = Tuner.of(mono).tune(Boards.given(1e-4, TimingQuantity.PULSE_WIDTH, 40e3 * 1e-6 * ln3),
                TuneTarget.of(TimingQuantity.PULSE_WIDTH, 70e3 * 1e-6 * ln3).withTurns(25));
        assertThat(r.present()).isCloseTo(0.3, within(0.05));
        assertThat(r.reached()).isCloseTo(70e3 * 1e-6 * ln3, within(1e-6));
        assertThat(r.change()).isCloseTo(0.3, within(0.06));
        assertThat(r.advice()).contains("more of its track in circuit").contains("of its 25 turns");
    }

    @Test
    void designWithoutPotIsBadInput() {
        assertThatThrownBy(() -> Tuner.of(Boards.idealAstable("5%", "carbon-film", "10n", "5%", "film")))
                .isInstanceOf(BadInputException.class).hasMessageContaining("no potentiometer");
    }
}
