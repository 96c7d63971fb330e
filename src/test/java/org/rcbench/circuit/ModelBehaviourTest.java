package org.rcbench.circuit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.lang.management.ManagementFactory;
import java.util.List;
import org.junit.jupiter.api.Test;

class ModelBehaviourTest {
    private static final FamilyParameters IDEAL = FamilyParameters.ideal();

    // The monostable is not retriggerable and the trigger wins over the threshold input (555-family data
    // sheets, from memory): a trigger held low past the charge time sets the pulse width.
    @Test
    void aLongTriggerStretchesTheMonostablePulse() {
        CircuitSpec s = Specs.monostable(100e3, 1e-6, 5, IDEAL);
        double rc = 100e3 * 1e-6 * Math.log(3);
        assertThat(Specs.eval(s.withTrigger(new Trigger(1e-3, Double.NaN))).pulseWidthSeconds()).isCloseTo(rc, within(1e-12));
        Timing held = Specs.eval(s.withTrigger(new Trigger(0.2, Double.NaN)));
        assertThat(held.pulseWidthSeconds()).isEqualTo(0.2);
        List<String> w = PracticalRange.check(s.withTrigger(new Trigger(0.2, Double.NaN)), held);
        assertThat(w).anyMatch(x -> x.contains("trigger is held low"));
    }

    // Triggers arriving during the pulse are ignored: with triggers every 40 ms and a 109.9 ms pulse the
    // output repeats every third trigger, 120 ms.
    @Test
    void triggersDuringThePulseAreIgnored() {
        CircuitSpec s = Specs.monostable(100e3, 1e-6, 5, IDEAL).withTrigger(new Trigger(Double.NaN, 40e-3));
        Timing t = Specs.eval(s);
        assertThat(t.periodSeconds()).isCloseTo(0.120, within(1e-12));
        assertThat(t.duty()).isCloseTo(100e3 * 1e-6 * Math.log(3) / 0.120, within(1e-12));
    }

    // The bistable's levels are the thresholds of the same control-pin model: 1/3 and 2/3 of the supply
    // (check-values.md) and, with a 10k load, 2.5 V and 1.25 V at 5 V.
    @Test
    void bistableLevels() {
        Timing t = Specs.eval(Specs.spec(Topology.BISTABLE, 9, IDEAL.withDelaySeconds(150e-9)));
        assertThat(t.runs()).isTrue();
        assertThat(t.oscillates()).isFalse();
        assertThat(t.lowerVolts()).isCloseTo(3, within(1e-12));
        assertThat(t.upperVolts()).isCloseTo(6, within(1e-12));
        assertThat(t.responseSeconds()).isEqualTo(150e-9);
        assertThat(t.reasonText()).contains("set below the trigger level 3.000 V");
        Timing loaded = Specs.eval(Specs.spec(Topology.BISTABLE, 5, IDEAL), ParameterTable.CONTROL_OHMS, 10e3);
        assertThat(loaded.upperVolts()).isCloseTo(2.5, within(1e-12));
    }

    // Shockley diode law: the drop at 1 mA of the 1N4148-class card (IS = 2.52 nA, N = 1.752, RS = 0.568 Ω,
    // from memory) is n Vt ln(1 + 1 mA / IS) + 1 mA × RS ≈ 0.581 V at 25 °C; and the law returns it.
    @Test
    void siliconDiodeDrop() {
        DiodeLaw si = DiodeLaw.silicon();
        double v = DiodeLaw.siliconDropVolts();
        assertThat(v).isCloseTo(0.5808, within(0.0005));
        assertThat(si.saturationAmps(v)).isCloseTo(2.52e-9, within(1e-15));
        assertThat(si.dropAt(1e-3, v)).isCloseTo(v, within(1e-12));
        // 60 mV per decade times n: ten times the current adds n Vt ln 10 plus the extra Rs drop.
        assertThat(si.dropAt(10e-3, v) - v).isCloseTo(1.752 * DiodeLaw.THERMAL_VOLTS * Math.log(10) + 9e-3 * 0.568,
                within(1e-6));
    }

    /**
     * The effective drop of a series path reproduces the time from a direct numerical integration of
     * C dv/dt = I with I solving I R + n Vt ln(1 + I/Is) + I Rs = Vs - v (RK4, 20 000 steps; derived, an
     * independent check of the closed form in {@link Diodes}).
     */
    @Test
    void effectiveDropMatchesNumericalIntegration() {
        DiodeLaw law = DiodeLaw.silicon();
        double drop = DiodeLaw.siliconDropVolts();
        double r = 4.7e3;
        double c = 10e-9;
        double vs = 9;
        double v0 = 3;
        double v1 = 6;
        int steps = 20000;
        double h = (v1 - v0) / steps;
        // Integrate dt/dv = C / I(v) over v with Simpson's rule.
        double sum = 0;
        for (int k = 0; k <= steps; k++) {
            double v = v0 + k * h;
            double weight = k == 0 || k == steps ? 1 : (k % 2 == 1 ? 4 : 2);
            double vd = Diodes.dropForLinearCurrent(law, drop, (vs - v) / r, 1 / r);
            double current = (vs - v - vd) / r;
            assertThat(law.dropAt(current, drop)).isCloseTo(vd, within(1e-9));
            sum += weight * c / current;
        }
        double exact = sum * h / 3;
        double x = Diodes.effectiveSeriesDrop(law, drop, r, vs - v0, vs - v1);
        double model = (r + law.seriesOhms()) * c * Math.log((vs - x - v0) / (vs - x - v1));
        assertThat(model).isCloseTo(exact, within(exact * 1e-6));
    }

    /** Evaluation allocates nothing once warm (measured with the JVM's per-thread allocation counter). */
    @Test
    void evaluationDoesNotAllocate() {
        com.sun.management.ThreadMXBean mx = (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        Element si1 = Element.diode("D1", Role.CHARGE_DIODE, DiodeLaw.siliconDropVolts(), DiodeLaw.silicon(), PartKind.SILICON);
        Element si2 = Element.diode("D2", Role.DISCHARGE_DIODE, DiodeLaw.siliconDropVolts(), DiodeLaw.silicon(), PartKind.SILICON);
        FamilyParameters f = TimerFamily.BIPOLAR.defaults();
        List<CircuitSpec> specs = List.of(Specs.astable(1e3, 10e3, 10e-9, 9, f), Specs.monostable(100e3, 1e-6, 9, f),
                Specs.oneDiode(4.7e3, 10e3, 10e-9, 9, 0.6, f), Specs.outputFed(10e3, 10e-9, 9, f),
                Specs.spec(Topology.PWM_POT, 9, f, Element.resistor("R1", Role.CHARGE, 1e3),
                        Element.pot("VR1", Role.SPLIT_POT, 100e3, 0.3), si1, si2, Element.capacitor("C1", Role.TIMING, 10e-9)),
                Specs.spec(Topology.BISTABLE, 9, f));
        for (CircuitSpec s : specs) {
            TimerModel m = TimerModels.build(s);
            double[] p = m.nominal();
            Timing t = new Timing();
            int ic = m.parameters().find("C1").orElse(m.parameters().index(ParameterTable.SUPPLY));
            for (int i = 0; i < 20000; i++) {
                p[ic] *= i % 2 == 0 ? 1.001 : 1 / 1.001;
                m.evaluate(p, t);
            }
            long before = mx.getThreadAllocatedBytes(Thread.currentThread().getId());
            for (int i = 0; i < 20000; i++) {
                p[ic] *= i % 2 == 0 ? 1.001 : 1 / 1.001;
                m.evaluate(p, t);
            }
            long after = mx.getThreadAllocatedBytes(Thread.currentThread().getId());
            assertThat(t.runs()).isTrue();
            // A few hundred bytes of slack for the counter's own bookkeeping; 20 000 evaluations that
            // allocated even one small object each would show hundreds of kilobytes.
            assertThat(after - before).as(s.topology().fileName()).isLessThan(2048);
        }
    }
}
