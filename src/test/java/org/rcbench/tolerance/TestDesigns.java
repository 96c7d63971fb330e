package org.rcbench.tolerance;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.ControlPin;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.FamilyParameters;
import org.rcbench.circuit.TimerFamily;
import org.rcbench.circuit.Topology;
import org.rcbench.circuit.Trigger;
import org.rcbench.design.Ambient;
import org.rcbench.design.Design;
import org.rcbench.design.PartSpread;
import org.rcbench.units.Tolerance;

/** Designs built in code for tolerance tests. */
final class TestDesigns {
    private TestDesigns() {
    }

    static Design design(Topology t, FamilyParameters f, double vs, Tolerance supplyTol, Ambient ambient,
            Map<String, PartSpread> spreads, Element... parts) {
        CircuitSpec spec = new CircuitSpec(t, TimerFamily.BIPOLAR, f, vs, List.of(parts), ControlPin.open(),
                Trigger.UNSPECIFIED);
        return new Design("test", "test", "", "", spec, spreads, supplyTol, ambient);
    }

    static Map<String, PartSpread> spreads(Object... pairs) {
        Map<String, PartSpread> m = new HashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            Object v = pairs[i + 1];
            m.put((String) pairs[i], v instanceof PartSpread ps ? ps : PartSpread.rectangular((Tolerance) v));
        }
        return m;
    }
}
