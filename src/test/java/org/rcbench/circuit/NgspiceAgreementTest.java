package org.rcbench.circuit;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.rcbench.testing.ExternalTool;

/**
 * Cross-check against ngspice (Debian package ngspice; netlists from {@link SpiceNetlist}, built from the
 * same specs and parameter vectors). Every topology at supplies 5, 9, 12 and 15 V, plain, with
 * leakage across the timing capacitor and with a control-pin load, for the bipolar family and
 * (plain) the CMOS family: predicted high and low times agree within 0.5 % with ideal fixed-drop
 * diodes, and within 2 % with SPICE's junction diode using the parts' Shockley parameters. The
 * latch in SPICE has no delay, so the family's delay is set to 0 except in the cases that check it
 * (2 µs through an ideal delay line in SPICE).
 */
class NgspiceAgreementTest {
    private static final double[] SUPPLIES = {5, 9, 12, 15};

    private record Case(String name, TimerModel model, double[] p, boolean real, double tolerance) {
    }

    private record Outcome(Case c, String failure, double worstError) {
    }

    @Test
    void modelsAgreeWithNgspice() throws Exception {
        Path ngspice = ExternalTool.require("ngspice", "ngspice");
        List<Case> cases = cases();
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(2, Runtime.getRuntime().availableProcessors()));
        List<Future<Outcome>> futures = new ArrayList<>();
        for (Case c : cases) {
            futures.add(pool.submit(() -> check(ngspice, c)));
        }
        List<String> failures = new ArrayList<>();
        double worstIdeal = 0;
        double worstReal = 0;
        for (Future<Outcome> f : futures) {
            Outcome o = f.get();
            if (o.failure != null) {
                failures.add(o.failure);
            }
            if (o.c.real) {
                worstReal = Math.max(worstReal, o.worstError);
            } else {
                worstIdeal = Math.max(worstIdeal, o.worstError);
            }
        }
        pool.shutdown();
        System.out.printf(Locale.ROOT, "ngspice cross-check: %d cases, worst error %.4f %% (ideal diodes), %.4f %% (real)%n",
                cases.size(), worstIdeal * 100, worstReal * 100);
        assertThat(failures).isEmpty();
    }

    private static Outcome check(Path ngspice, Case c) throws Exception {
        Timing t = c.model.evaluate(c.p);
        if (!t.runs()) {
            return checkStops(ngspice, c, t);
        }
        if (c.model.topology() == Topology.BISTABLE) {
            Map<String, Double> v = NgspiceRun.run(ngspice, SpiceNetlist.bistable(c.model, c.p));
            return compare(c, new String[] {"vset", "vclr"}, new double[] {t.lowerVolts(), t.upperVolts()}, v);
        }
        String body = SpiceNetlist.astableFamily(c.model, c.p, c.real);
        if (c.model.topology() == Topology.MONOSTABLE) {
            double width = t.pulseWidthSeconds();
            double first = t.firstHighSeconds();
            double at = first * 1.5;
            double step = width / 1000;
            String net = body + SpiceNetlist.monostableTrigger(c.p[c.model.parameters().index(ParameterTable.SUPPLY)],
                    at, width / 100, at + width * 1.5, step);
            Map<String, Double> v = NgspiceRun.run(ngspice, net);
            return compare(c, new String[] {"pulse", "first"}, new double[] {width, first}, v);
        }
        double period = t.periodSeconds();
        double stop = t.firstHighSeconds() + 3.3 * period;
        double step = Math.min(t.highSeconds(), t.lowSeconds()) / 500;
        Map<String, Double> v = NgspiceRun.run(ngspice, body + SpiceNetlist.astableControl(stop, step));
        return compare(c, new String[] {"high", "low", "first"},
                new double[] {t.highSeconds(), t.lowSeconds(), t.firstHighSeconds()}, v);
    }

    /**
     * The model says the circuit stops: ngspice, run for ten of the periods it would have without
     * leakage, must show no second cycle.
     */
    private static Outcome checkStops(Path ngspice, Case c, Timing t) throws Exception {
        double[] healthy = c.p.clone();
        healthy[c.model.parameters().index(ParameterTable.LEAK)] = Double.POSITIVE_INFINITY;
        Timing h = c.model.evaluate(healthy);
        if (!h.runs() || c.model.topology() == Topology.MONOSTABLE) {
            return new Outcome(c, c.name + ": model says it does not run: " + t.reasonText(), 1);
        }
        String body = SpiceNetlist.astableFamily(c.model, c.p, c.real);
        Map<String, Double> v = NgspiceRun.run(ngspice, body + SpiceNetlist.astableControl(
                h.firstHighSeconds() + 10 * h.periodSeconds(), Math.min(h.highSeconds(), h.lowSeconds()) / 500));
        return v.containsKey("high") ? new Outcome(c, c.name + ": model says it stops (" + t.reasonText()
                + ") but ngspice oscillates: " + v, 1) : new Outcome(c, null, 0);
    }

    private static Outcome compare(Case c, String[] names, double[] predicted, Map<String, Double> sim) {
        double worst = 0;
        StringBuilder bad = new StringBuilder();
        for (int i = 0; i < names.length; i++) {
            Double s = sim.get(names[i]);
            if (s == null) {
                return new Outcome(c, c.name + ": ngspice gave no " + names[i] + " " + sim, 1);
            }
            double err = Math.abs(predicted[i] / s - 1);
            worst = Math.max(worst, err);
            if (err > c.tolerance) {
                bad.append(String.format(Locale.ROOT, " %s predicted %.6g ngspice %.6g (%.3f %%)", names[i], predicted[i],
                        s, err * 100));
            }
        }
        return new Outcome(c, bad.length() == 0 ? null : c.name + ":" + bad, worst);
    }

    private static List<Case> cases() {
        List<Case> out = new ArrayList<>();
        FamilyParameters bipolar = TimerFamily.BIPOLAR.defaults().withDelaySeconds(0);
        FamilyParameters cmos = TimerFamily.CMOS.defaults().withDelaySeconds(0);
        for (double vs : SUPPLIES) {
            for (CircuitSpec s : topologies(vs, bipolar, false)) {
                addVariants(out, s, true);
            }
            // Propagation delay of 2 us on cycles of about 100 us: a 2 % effect, checked to 0.5 %.
            for (CircuitSpec s : topologies(vs, bipolar.withDelaySeconds(2e-6), false)) {
                if (s.topology() == Topology.ASTABLE || s.topology() == Topology.MONOSTABLE
                        || s.topology() == Topology.OUTPUT_FED || s.topology() == Topology.ASTABLE_TWO_DIODE) {
                    add(out, s, "delay 2 us", null, 0, false, 0.005);
                }
            }
            if (vs == 5 || vs == 15) {
                for (CircuitSpec s : topologies(vs, cmos, false)) {
                    add(out, s, "plain", null, 0, false, 0.005);
                }
            }
            for (CircuitSpec s : topologies(vs, bipolar, true)) {
                if (s.withRole(Role.CHARGE_DIODE).isEmpty()) {
                    continue;
                }
                add(out, s, "real-diode", null, 0, true, 0.02);
                if (vs == 9) {
                    add(out, s, "real-diode leak", ParameterTable.LEAK, 150e3, true, 0.02);
                }
                add(out, withControlLoad(s, 22e3), "real-diode control-load", null, 0, true, 0.02);
            }
        }
        return out;
    }

    private static void addVariants(List<Case> out, CircuitSpec s, boolean withLeak) {
        add(out, s, "plain", null, 0, false, 0.005);
        add(out, withControlLoad(s, 10e3), "control-load 10k", null, 0, false, 0.005);
        if (s.topology() != Topology.BISTABLE && withLeak) {
            double leak = s.topology() == Topology.MONOSTABLE ? 1e6 : 150e3;
            add(out, s, "leak", ParameterTable.LEAK, leak, false, 0.005);
        }
        if (s.topology() == Topology.OUTPUT_FED) {
            List<Element> parts = new ArrayList<>(s.elements());
            parts.add(Element.resistor("RL", Role.OUTPUT_LOAD, 470));
            add(out, s.withElements(parts), "output-load 470R", null, 0, false, 0.005);
        }
    }

    private static CircuitSpec withControlLoad(CircuitSpec s, double ohms) {
        List<Element> parts = new ArrayList<>(s.elements());
        parts.add(Element.resistor("RX", Role.CONTROL_LOAD, ohms));
        return s.withElements(parts).withControl(ControlPin.loaded());
    }

    private static void add(List<Case> out, CircuitSpec s, String variant, String param, double value, boolean real,
            double tol) {
        TimerModel m = TimerModels.build(s);
        double[] p = m.nominal();
        if (param != null) {
            p[m.parameters().index(param)] = value;
        }
        String name = String.format(Locale.ROOT, "%s %s %.0f V %s", s.topology().fileName(),
                s.familyParameters().dividerOhms() > 10e3 ? "cmos" : "bipolar", s.supplyVolts(), variant);
        out.add(new Case(name, m, p, real, tol));
    }

    private static List<CircuitSpec> topologies(double vs, FamilyParameters f, boolean realDiodes) {
        Element d1 = realDiodes ? Element.diode("D1", Role.CHARGE_DIODE, DiodeLaw.siliconDropVolts(), DiodeLaw.silicon(),
                PartKind.SILICON) : Element.diode("D1", Role.CHARGE_DIODE, 0.6);
        Element d2 = realDiodes ? Element.diode("D2", Role.DISCHARGE_DIODE, DiodeLaw.siliconDropVolts(), DiodeLaw.silicon(),
                PartKind.SILICON) : Element.diode("D2", Role.DISCHARGE_DIODE, 0.6);
        List<CircuitSpec> l = new ArrayList<>();
        l.add(Specs.spec(Topology.ASTABLE, vs, f, Element.resistor("R1", Role.CHARGE, 4.7e3),
                Element.resistor("R2", Role.SHARED, 10e3), Element.capacitor("C1", Role.TIMING, 10e-9)));
        l.add(Specs.spec(Topology.MONOSTABLE, vs, f, Element.resistor("R1", Role.CHARGE, 100e3),
                Element.capacitor("C1", Role.TIMING, 10e-9)));
        l.add(Specs.spec(Topology.ASTABLE_ONE_DIODE, vs, f, Element.resistor("R1", Role.CHARGE, 4.7e3),
                Element.resistor("R2", Role.SHARED, 10e3), d1, Element.capacitor("C1", Role.TIMING, 10e-9)));
        // Diode stops conducting part-way up at some supplies (Vx = Vs - Vd (1 + Ra/Rb)).
        l.add(Specs.spec(Topology.ASTABLE_ONE_DIODE, vs, f, Element.resistor("R1", Role.CHARGE, 22e3),
                Element.resistor("R2", Role.SHARED, 4.7e3), d1, Element.capacitor("C1", Role.TIMING, 10e-9)));
        l.add(Specs.spec(Topology.ASTABLE_TWO_DIODE, vs, f, Element.resistor("R1", Role.CHARGE, 4.7e3),
                Element.resistor("R2", Role.DISCHARGE, 10e3), d1, d2, Element.capacitor("C1", Role.TIMING, 10e-9)));
        l.add(Specs.spec(Topology.PWM_POT, vs, f, Element.resistor("R1", Role.CHARGE, 1e3),
                Element.pot("VR1", Role.SPLIT_POT, 100e3, 0.3), d1, d2, Element.capacitor("C1", Role.TIMING, 10e-9)));
        if (!realDiodes) {
            l.add(Specs.spec(Topology.OUTPUT_FED, vs, f, Element.resistor("R1", Role.FEEDBACK, 10e3),
                    Element.capacitor("C1", Role.TIMING, 10e-9)));
            l.add(Specs.spec(Topology.BISTABLE, vs, f));
        }
        return l;
    }
}
