package org.rcbench.picker;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimerFamily;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.units.PreferredSeries;

class PartPickerTest {
    // Every proposed part is a member of its IEC 60063 series and within the practical resistance floor.
    private static void partsAreSeriesValues(Candidate c, PreferredSeries rs, PreferredSeries cs) {
        for (Element e : c.design().circuit().elements()) {
            if (e.type() == ElementType.RESISTOR) {
                assertThat(rs.contains(e.value())).as(e.toString()).isTrue();
                assertThat(e.value()).isGreaterThanOrEqualTo(1e3);
            } else if (e.type() == ElementType.CAPACITOR) {
                assertThat(cs.contains(e.value())).as(e.toString()).isTrue();
            }
        }
    }

    // The reported errors are the model's own prediction for the picked parts (evaluated independently
    // here), and rounding to E24 (steps of about 10 %) keeps each within a few per cent.
    @Test
    void astableCandidatesHitTheTarget() {
        PickRequest r = PickRequest.of(Topology.ASTABLE, TimerFamily.BIPOLAR, 9).withFrequencyHz(1000).withDuty(0.6);
        PartPicker.Result res = PartPicker.pick(r);
        assertThat(res.candidates()).hasSize(5);
        for (Candidate c : res.candidates()) {
            partsAreSeriesValues(c, PreferredSeries.E24, PreferredSeries.E6);
            TimerModel m = TimerModels.build(c.design().circuit());
            Timing t = m.evaluateNominal();
            assertThat(c.errors().get("frequency")).isEqualTo(t.frequencyHz() / 1000 - 1);
            assertThat(Math.abs(t.frequencyHz() / 1000 - 1)).isLessThan(0.05);
            assertThat(Math.abs(t.duty() / 0.6 - 1)).isLessThan(0.05);
            assertThat(c.prediction().worstCase(TimingQuantity.FREQUENCY).contains(t.frequencyHz())).isTrue();
        }
        for (int i = 1; i < res.candidates().size(); i++) {
            assertThat(res.candidates().get(i).score()).isGreaterThanOrEqualTo(res.candidates().get(i - 1).score());
        }
    }

    @Test
    void monostableCandidatesHitThePulseWidth() {
        PickRequest r = PickRequest.of(Topology.MONOSTABLE, TimerFamily.CMOS, 5).withPulseSeconds(1.0)
                .withSeries(PreferredSeries.E96, PreferredSeries.E12);
        Candidate best = PartPicker.pick(r).candidates().get(0);
        partsAreSeriesValues(best, PreferredSeries.E96, PreferredSeries.E12);
        assertThat(Math.abs(best.errors().get("pulse width"))).isLessThan(0.01);
        assertThat(best.prediction().nominal(TimingQuantity.PULSE_WIDTH)).isBetween(0.99, 1.01);
    }

    @Test
    void pwmCandidatesSpanTheDutyRange() {
        PickRequest r = PickRequest.of(Topology.PWM_POT, TimerFamily.CMOS, 12).withFrequencyHz(1000).withDutyRange(0.1, 0.9);
        Candidate best = PartPicker.pick(r).candidates().get(0);
        TimerModel m = TimerModels.build(best.design().circuit());
        double[] p = m.nominal();
        int w = m.parameters().index("VR1.wiper");
        p[w] = 0;
        double dMin = m.evaluate(p).duty();
        p[w] = 1;
        double dMax = m.evaluate(p).duty();
        assertThat(dMin).isBetween(0.07, 0.13);
        assertThat(dMax).isBetween(0.87, 0.93);
        assertThat(best.design().part("R2")).isNotNull();
    }

    @Test
    void twoDiodeAstableReachesLowDuty() {
        PickRequest r = PickRequest.of(Topology.ASTABLE_TWO_DIODE, TimerFamily.BIPOLAR, 9).withFrequencyHz(10)
                .withDuty(0.2);
        Candidate best = PartPicker.pick(r).candidates().get(0);
        assertThat(Math.abs(best.errors().get("duty"))).isLessThan(0.05);
    }

    @Test
    void aPlainAstableCannotGoBelowHalfDuty() {
        PickRequest r = PickRequest.of(Topology.ASTABLE, TimerFamily.BIPOLAR, 9).withFrequencyHz(1000).withDuty(0.4);
        assertThatThrownBy(() -> PartPicker.pick(r)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("astable-two-diode");
    }
}
