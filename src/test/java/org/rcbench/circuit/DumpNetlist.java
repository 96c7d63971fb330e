package org.rcbench.circuit;

import java.nio.file.Files;
import java.nio.file.Path;

/** Debug helper (not a test): writes netlists to /tmp/sp for running ngspice by hand. */
final class DumpNetlist {
    public static void main(String[] a) throws Exception {
        FamilyParameters f = TimerFamily.BIPOLAR.defaults().withDelaySeconds(0);
        CircuitSpec s = Specs.spec(Topology.ASTABLE, 9, f, Element.resistor("R1", Role.CHARGE, 4.7e3),
                Element.resistor("R2", Role.SHARED, 10e3), Element.capacitor("C1", Role.TIMING, 10e-9));
        TimerModel m = TimerModels.build(s);
        double[] p = m.nominal();
        Timing t = m.evaluate(p);
        for (int div : new int[] {4000, 1000, 250}) {
            String net = SpiceNetlist.astableFamily(m, p, false) + SpiceNetlist.astableControl(
                    t.firstHighSeconds() + 3.3 * t.periodSeconds(), Math.min(t.highSeconds(), t.lowSeconds()) / div);
            Files.writeString(Path.of("/tmp/sp/a" + div + ".cir"), net);
        }
        Files.writeString(Path.of("/tmp/sp/bi.cir"), SpiceNetlist.bistable(m, p));
        System.out.println(t);
    }
}
