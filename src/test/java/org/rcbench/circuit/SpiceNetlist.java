package org.rcbench.circuit;

import java.util.List;
import java.util.Locale;

/**
 * Writes an ngspice netlist for a circuit spec and parameter vector, built from the same objects the
 * models evaluate, so that ngspice can check the models independently.
 *
 * <p>What is modelled in SPICE, element by element (nothing is taken from the rcbench models):
 * the internal divider as three resistors, control-pin loads and drive as resistors and sources,
 * the comparators and latch as a behavioural control voltage driving a hysteretic switch (on above
 * the control-pin voltage, off below the lower divider tap, held in between), the discharge
 * transistor as a switch to a saturation source, the output as a behavioural Thevenin source, leakage
 * as a resistor, the input current as a current source, and diodes either as an ideal fixed-drop
 * behavioural element ({@code I = max(V - Vd, 0) / 0.1 Ω}) or as SPICE's junction diode with the
 * Shockley parameters of the part's {@link DiodeLaw}. The latch itself has no propagation delay, so specs
 * checked here use a zero delay unless they test the delay, which is then an ideal delay line between
 * the latch and the discharge switch and output. Measurements: edges of the latch state {@code st} (high = discharging),
 * one full cycle after the first, on the delayed state {@code sd} (the output).
 */
final class SpiceNetlist {
    /** Ideal-diode on-resistance in the fixed-drop model (Ω); 0.5 mA through it is 50 µV. */
    private static final double IDEAL_DIODE_OHMS = 0.1;

    private SpiceNetlist() {
    }

    /** Tiny resistance standing in for zero (Ω). */
    private static double r(double ohms) {
        return Math.max(ohms, 1e-6);
    }

    static String astableFamily(TimerModel m, double[] p, boolean realDiodes) {
        StringBuilder sb = header(m, p);
        ParameterTable t = m.parameters();
        CircuitSpec spec = m.spec();
        double leak = p[t.index(ParameterTable.LEAK)];
        String thr = "cap";
        switch (spec.topology()) {
            case ASTABLE:
                line(sb, "RA vcc dis %s", num(r(m.group(Role.CHARGE).series(p))));
                line(sb, "RB dis cap %s", num(r(m.group(Role.SHARED).series(p))));
                discharge(sb, m, p, "dis");
                break;
            case ASTABLE_ONE_DIODE:
                line(sb, "RA vcc dis %s", num(r(m.group(Role.CHARGE).series(p))));
                line(sb, "RB dis cap %s", num(r(m.group(Role.SHARED).series(p))));
                diode(sb, m, p, Role.CHARGE_DIODE, "dis", "cap", realDiodes);
                discharge(sb, m, p, "dis");
                break;
            case ASTABLE_TWO_DIODE:
                line(sb, "RA vcc dis %s", num(r(m.group(Role.CHARGE).series(p))));
                diode(sb, m, p, Role.CHARGE_DIODE, "dis", "cap", realDiodes);
                diode(sb, m, p, Role.DISCHARGE_DIODE, "cap", "n2", realDiodes);
                line(sb, "RB n2 dis %s", num(r(m.group(Role.DISCHARGE).series(p))));
                discharge(sb, m, p, "dis");
                break;
            case PWM_POT: {
                Element pot = spec.withRole(Role.SPLIT_POT).get(0);
                double track = p[t.index(pot.designator())];
                double w = p[t.index(pot.designator() + ParameterTable.WIPER_SUFFIX)];
                line(sb, "R1 vcc dis %s", num(r(m.group(Role.CHARGE).series(p))));
                line(sb, "RPA dis na %s", num(r(w * track)));
                line(sb, "RPB dis nb %s", num(r((1 - w) * track + m.group(Role.DISCHARGE).series(p))));
                diode(sb, m, p, Role.CHARGE_DIODE, "na", "cap", realDiodes);
                diode(sb, m, p, Role.DISCHARGE_DIODE, "cap", "nb", realDiodes);
                discharge(sb, m, p, "dis");
                break;
            }
            case OUTPUT_FED:
                line(sb, "RF out cap %s", num(r(m.group(Role.FEEDBACK).series(p))));
                break;
            case MONOSTABLE:
                line(sb, "RA vcc cap %s", num(r(m.group(Role.CHARGE).series(p))));
                discharge(sb, m, p, "cap");
                break;
            default:
                throw new IllegalArgumentException(spec.topology().name());
        }
        line(sb, "C1 cap 0 %s IC=0", num(m.timing.sum(p)));
        if (leak != Double.POSITIVE_INFINITY) {
            line(sb, "RLEAK cap 0 %s", num(leak));
        }
        double iIn = p[t.index(ParameterTable.INPUT_CURRENT)];
        if (iIn > 0) {
            line(sb, "ITH cap 0 DC %s", num(iIn));
        }
        String trg = spec.topology() == Topology.MONOSTABLE ? "trg" : "cap";
        latch(sb, thr, trg, p[t.index(ParameterTable.DELAY)]);
        output(sb, m, p);
        return sb.toString();
    }

    static StringBuilder header(TimerModel m, double[] p) {
        ParameterTable t = m.parameters();
        StringBuilder sb = new StringBuilder();
        line(sb, "rcbench cross-check %s", m.topology().fileName());
        line(sb, ".options reltol=1e-6 abstol=1e-13 vntol=1e-9 chgtol=1e-18 temp=25 tnom=25 method=gear");
        double vs = p[t.index(ParameterTable.SUPPLY)];
        line(sb, "VS vcc 0 DC %s", num(vs));
        double div = p[t.index(ParameterTable.DIVIDER)];
        line(sb, "RD1 vcc ctl %s", num(div));
        line(sb, "RD2 ctl tref %s", num(div));
        line(sb, "RD3 tref 0 %s", num(div));
        int k = 0;
        for (Element e : m.spec().withRole(Role.CONTROL_LOAD)) {
            line(sb, "RCL%d ctl 0 %s", k++, num(p[t.index(e.designator())]));
        }
        double cOhms = p[t.index(ParameterTable.CONTROL_OHMS)];
        double cVolts = p[t.index(ParameterTable.CONTROL_VOLTS)];
        if (cOhms != Double.POSITIVE_INFINITY) {
            line(sb, "VCX cx 0 DC %s", num(cVolts));
            line(sb, "RCX cx ctl %s", num(r(cOhms)));
        }
        return sb;
    }

    /**
     * The latch as an integrator: node {@code st} on a 1 pF capacitor is driven toward 1 (discharging)
     * while the threshold input is above the control pin and toward 0 while the trigger input is below
     * the lower divider tap, with a 1 ns time constant; otherwise no current flows and the capacitor
     * holds the state. There is no algebraic feedback loop, so ngspice's Newton iteration cannot pick
     * the wrong state (a switch with hysteresis did, when a step was redone). The comparator terms
     * rise from 0 to 1 over ±0.05 mV around each crossing.
     */
    static void latch(StringBuilder sb, String thr, String trg, double delay) {
        line(sb, "CST st 0 1p IC=0");
        line(sb, "BST 0 st I = 1e-3*(min(max(1e4*(v(%s)-v(ctl))+0.5,0),1)*(1-v(st))"
                + " - min(max(1e4*(v(tref)-v(%s))+0.5,0),1)*v(st))", thr, trg);
        // The state reaches the discharge switch and the output as node sd: through an ideal delay line
        // (a matched lossless transmission line) when the family has a propagation delay.
        if (delay > 0) {
            line(sb, "EBUF sti 0 st 0 2");
            line(sb, "RSRC sti stl 50");
            line(sb, "TDLY stl 0 sd 0 Z0=50 TD=%s", num(delay));
            line(sb, "RTRM sd 0 50");
        } else {
            line(sb, "EBUF sd 0 st 0 1");
        }
    }

    private static void discharge(StringBuilder sb, TimerModel m, double[] p, String node) {
        ParameterTable t = m.parameters();
        line(sb, "VSAT dsat 0 DC %s", num(p[t.index(ParameterTable.SAT)]));
        line(sb, "S2 %s dsat sd 0 SDIS", node);
        // Directly on the capacitor (monostable) an on-resistance under 1 Ω makes ngspice's switches chatter;
        // 1 Ω against the 100 kΩ timing resistor moves the idle voltage by under 0.1 mV.
        double floor = node.equals("cap") ? 1 : 1e-3;
        line(sb, ".model SDIS sw(vt=0.5 vh=0.1 ron=%s roff=1e12)", num(Math.max(p[t.index(ParameterTable.DISCHARGE_OHMS)], floor)));
    }

    private static void output(StringBuilder sb, TimerModel m, double[] p) {
        ParameterTable t = m.parameters();
        double vs = p[t.index(ParameterTable.SUPPLY)];
        double vh = Math.max(0, vs - p[t.index(ParameterTable.HIGH_DROP)]);
        double rh = Math.max(p[t.index(ParameterTable.HIGH_OHMS)], 1e-3);
        double vl = p[t.index(ParameterTable.LOW_VOLTS)];
        double rl = Math.max(p[t.index(ParameterTable.LOW_OHMS)], 1e-3);
        line(sb, "BOUT 0 out I = v(sd) > 0.5 ? (%s - v(out))/%s : (%s - v(out))/%s", num(vl), num(rl), num(vh), num(rh));
        int k = 0;
        for (Element e : m.spec().withRole(Role.OUTPUT_LOAD)) {
            line(sb, "RLD%d out 0 %s", k++, num(p[t.index(e.designator())]));
        }
        line(sb, "RLDMIN out 0 1e12");
    }

    private static void diode(StringBuilder sb, TimerModel m, double[] p, Role role, String anode, String cathode,
            boolean real) {
        List<Element> ds = m.spec().withRole(role);
        Element d = ds.get(0);
        double drop = p[m.parameters().index(d.designator())];
        String name = "D" + role.ordinal();
        if (real && d.diode().currentDependent()) {
            DiodeLaw law = d.diode();
            line(sb, "%s %s %s DM%s", name, anode, cathode, name);
            line(sb, ".model DM%s D(IS=%s N=%s RS=%s)", name, num(law.saturationAmps(drop)), num(law.emission()),
                    num(law.seriesOhms()));
        } else {
            line(sb, "B%s %s %s I = max(v(%s,%s) - %s, 0)/%s", name, anode, cathode, anode, cathode, num(drop),
                    num(IDEAL_DIODE_OHMS));
        }
    }

    /** The control block for an astable: transient, then high and low of the cycle after the first. */
    static String astableControl(double stopSeconds, double maxStep) {
        return String.format(Locale.ROOT, ".control%nset noaskquit%nset numdgt=12%n"
                + "tran %s %s 0 %s uic%n"
                + "meas tran ra when v(sd)=0.5 rise=2%n"
                + "meas tran fb when v(sd)=0.5 fall=2%n"
                + "meas tran rc when v(sd)=0.5 rise=3%n"
                + "meas tran fa when v(sd)=0.5 fall=1%n"
                + "meas tran r1 when v(sd)=0.5 rise=1%n"
                + "let high = rc - fb%nlet low = fb - ra%nlet first = r1%n"
                + "print high low first%nquit%n.endc%n.end%n", num(maxStep), num(stopSeconds), num(maxStep));
    }

    /**
     * A monostable: one trigger pulse of {@code widthSeconds} at {@code atSeconds}, with edges of a
     * thousandth of the width (instant edges make ngspice's switches chatter), measure the output pulse.
     */
    static String monostableTrigger(double vs, double atSeconds, double widthSeconds, double stopSeconds, double maxStep) {
        double edge = widthSeconds / 1000;
        return String.format(Locale.ROOT, "VTRG trg 0 PWL(0 %s %s %s %s 0 %s 0 %s %s)%n"
                + ".control%nset noaskquit%nset numdgt=12%n"
                + "tran %s %s 0 %s uic%n"
                + "meas tran fa when v(sd)=0.5 fall=1%n"
                + "meas tran rb when v(sd)=0.5 rise=2%n"
                + "meas tran r1 when v(sd)=0.5 rise=1%n"
                + "meas tran ta when v(trg)=v(tref) fall=1%n"
                + "let pulse = rb - fa%nlet first = r1%n"
                + "print pulse first%nquit%n.endc%n.end%n",
                num(vs), num(atSeconds), num(vs), num(atSeconds + edge), num(atSeconds + widthSeconds),
                num(atSeconds + widthSeconds + edge), num(vs), num(maxStep), num(stopSeconds), num(maxStep));
    }

    /**
     * A bistable: threshold input pulsed high (clear), then the trigger input ramped from the supply to 0
     * over 1 ms (set), then the threshold input ramped from 0 to the supply (clear); the inputs' voltages
     * at the two switching instants are the set and clear levels.
     */
    static String bistable(TimerModel m, double[] p) {
        StringBuilder sb = header(m, p);
        double vs = p[m.parameters().index(ParameterTable.SUPPLY)];
        latch(sb, "thr", "trg", 0);
        output(sb, m, p);
        line(sb, "VTHR thr 0 PWL(0 %s 0.1m %s 0.1001m 0 1.4m 0 2.4m %s)", num(vs), num(vs), num(vs));
        line(sb, "VTRG trg 0 PWL(0 %s 0.2m %s 1.2m 0 1.3m 0 1.3001m %s)", num(vs), num(vs), num(vs));
        sb.append(String.format(Locale.ROOT, ".control%nset noaskquit%nset numdgt=12%n"
                + "tran 100n 2.5m 0 100n uic%n"
                + "meas tran tset when v(sd)=0.5 fall=1%n"
                + "meas tran tclr when v(sd)=0.5 td=1.3m rise=1%n"
                + "meas tran vset find v(trg) at=tset%n"
                + "meas tran vclr find v(thr) at=tclr%n"
                + "print vset vclr%nquit%n.endc%n.end%n"));
        return sb.toString();
    }

    private static void line(StringBuilder sb, String format, Object... args) {
        sb.append(String.format(Locale.ROOT, format, args)).append('\n');
    }

    static String num(double v) {
        return String.format(Locale.ROOT, "%.12g", v);
    }
}
