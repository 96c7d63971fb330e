package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;

/**
 * Test designs built from the worked values of check-values.md (not the demo boards), and
 * observations computed from the circuit model with chosen parts changed.
 */
final class Boards {
    private Boards() {
    }

    /**
     * A timer with exact 1/3 and 2/3 thresholds and no saturation, input current or delay, so that
     * the model gives check-values.md's closed forms exactly.
     */
    static final String IDEAL = "[family]\ndischarge_sat = \"0\"\ndischarge_ohms = \"0\"\ninput_current = \"0\"\n"
            + "delay = \"0\"\noutput_high_drop = \"0\"\noutput_high_ohms = \"0\"\noutput_low = \"0\"\n"
            + "output_low_ohms = \"0\"\n";

    /** The check-values astable Ra = 1k, Rb = 10k with capacitor {@code c}, ideal timer, 5 V. */
    static Design idealAstable(String rTol, String rKind, String c, String cTol, String cKind) {
        return parse("[timer]\ntopology = \"astable\"\nfamily = \"bipolar\"\nsupply = \"5 V\"\n" + IDEAL
                + part("R1", "charge", "1k0", rTol, rKind) + part("R2", "shared", "10k", rTol, rKind)
                + part("C1", "timing", c, cTol, cKind));
    }

    /** The check-values monostable R = 100k, C = 1u, ideal timer, 5 V. */
    static Design idealMonostable(String rTol, String rKind, String cTol, String cKind) {
        return parse("[timer]\ntopology = \"monostable\"\nfamily = \"bipolar\"\nsupply = \"5 V\"\n" + IDEAL
                + part("R1", "charge", "100k", rTol, rKind) + part("C1", "timing", "1u", cTol, cKind));
    }

    /** Observations given directly: {@code values} alternates quantities and seconds; relative uncertainty {@code u}. */
    static Observations given(double u, Object... values) {
        Observation[] o = new Observation[values.length / 2];
        for (int i = 0; i < o.length; i++) {
            o[i] = new Observation((TimingQuantity) values[2 * i], ((Number) values[2 * i + 1]).doubleValue(), u);
        }
        return Observations.of(0, o);
    }

    /** The check-values astable, Ra = 1k, Rb = 10k, C = 10n, on {@code supply}, with the given tolerances and kinds. */
    static Design astable(String family, String supply, String rTol, String rKind, String cTol, String cKind) {
        return DesignReader.parse("rcbench_design = 1\n[timer]\ntopology = \"astable\"\nfamily = \"" + family
                + "\"\nsupply = \"" + supply + "\"\n"
                + part("R1", "charge", "1k0", rTol, rKind) + part("R2", "shared", "10k", rTol, rKind)
                + part("C1", "timing", "10n", cTol, cKind), "astable.toml");
    }

    /** The check-values monostable, R = 100k, C = 1u. */
    static Design monostable(String rTol, String rKind, String cTol, String cKind) {
        return DesignReader.parse("rcbench_design = 1\n[timer]\ntopology = \"monostable\"\nfamily = \"bipolar\"\n"
                + "supply = \"5 V\"\n" + part("R1", "charge", "100k", rTol, rKind) + part("C1", "timing", "1u", cTol, cKind),
                "monostable.toml");
    }

    static Design parse(String body) {
        return DesignReader.parse("rcbench_design = 1\n" + body, "test.toml");
    }

    static String part(String name, String role, String value, String tol, String kind) {
        return "[parts." + name + "]\nrole = \"" + role + "\"\nvalue = \"" + value + "\"\ntolerance = \"" + tol
                + "\"\nkind = \"" + kind + "\"\n";
    }

    /**
     * Observations of the design's model with parameters changed: {@code changes} alternates names
     * and factors (parts: multiplied; {@code leak}/{@code control.ohms}: set to the value).
     */
    static Observations observe(Design d, double relative, Object... changes) {
        TimerModel m = TimerModels.build(d.circuit());
        double[] p = m.nominal();
        for (int i = 0; i < changes.length; i += 2) {
            String name = (String) changes[i];
            double v = ((Number) changes[i + 1]).doubleValue();
            int k = m.parameters().index(name);
            if (name.equals("leak") || name.equals("control.ohms") || name.endsWith(".wiper")) {
                p[k] = v;
            } else {
                p[k] *= v;
            }
        }
        Timing t = m.evaluate(p);
        List<Observation> obs = new ArrayList<>();
        for (TimingQuantity q : DiagnosisModel.quantities(d.circuit().topology())) {
            obs.add(new Observation(q, t.value(q), relative));
        }
        return Observations.of(0, obs.toArray(new Observation[0]));
    }
}
