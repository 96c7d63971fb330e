package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.circuit.ControlPin;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * The latent faults that would stop a design, found on the circuit model: the largest leakage
 * resistance across the timing capacitor and the largest control-pin load at which it no longer
 * runs (bisection on the log of each, others at nominal). For the plain astable
 * the leakage limit is the closed form {@code R_L <= 2 (Ra + Rb)} of check-values.md. Stateless.
 */
final class StopCauses {
    private StopCauses() {
    }

    /** The causes in one phrase, or empty when none is found within a factor of a million either way. */
    static String describe(DiagnosisModel dm) {
        if (!dm.model.evaluate(dm.base).runs()) {
            return "";
        }
        List<String> out = new ArrayList<>();
        double leak = limit(dm, ParameterTable.LEAK, dm.leakReference);
        if (Double.isFinite(leak)) {
            out.add("leakage of about " + ValueCode.formatSi(leak, Unit.OHM, 2) + " or less across the timing capacitor");
        }
        if (dm.design.circuit().control().mode() != ControlPin.Mode.DRIVEN) {
            double load = limit(dm, ParameterTable.CONTROL_OHMS, dm.controlReference);
            if (Double.isFinite(load)) {
                out.add("a control-pin load of about " + ValueCode.formatSi(load, Unit.OHM, 2) + " or less");
            }
        }
        String supply = "check the supply at the timer (this family needs at least "
                + ValueCode.formatSi(dm.design.circuit().familyParameters().minSupplyVolts(), Unit.VOLT, 2)
                + "), the reset pin and the output wiring";
        if (out.isEmpty()) {
            return supply;
        }
        return "the model stops with " + Identifiability.orList(out).replace(" and ", " or ") + "; " + supply;
    }

    /**
     * The value of {@code name} (searched downward from {@code start}) below which the circuit stops,
     * to about 1 %; NaN when it still runs at a millionth of {@code start}.
     */
    static double limit(DiagnosisModel dm, String name, double start) {
        int i = dm.table.index(name);
        double[] p = dm.base.clone();
        double hi = Math.log(start * 1e6);
        double lo = Math.log(start * 1e-6);
        p[i] = Math.exp(lo);
        if (dm.model.evaluate(p).runs()) {
            return Double.NaN;
        }
        p[i] = Math.exp(hi);
        if (!dm.model.evaluate(p).runs()) {
            return Double.NaN;
        }
        while (hi - lo > 0.01) {
            double mid = 0.5 * (lo + hi);
            p[i] = Math.exp(mid);
            if (dm.model.evaluate(p).runs()) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return Math.exp(0.5 * (lo + hi));
    }
}
