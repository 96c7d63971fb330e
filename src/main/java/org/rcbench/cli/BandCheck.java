package org.rcbench.cli;

import java.util.Locale;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.tolerance.Band;
import org.rcbench.tolerance.Prediction;

/**
 * A live reading against the design's prediction, per quantity, and a potentiometer hint: the
 * provisional judgement of {@code watch} until the diagnosis stage ({@code org.rcbench.diagnose})
 * supplies verdicts, suspects and tuning. Stateless.
 */
final class BandCheck {
    private BandCheck() {
    }

    /** Where a measured value sits against the design's bands. */
    enum Verdict {
        IN_BAND("ok, in the 95 % band"),
        WITHIN_WORST_CASE("ok, within worst case"),
        AT_LIMIT("at the worst-case limit"),
        OUT("OUT of worst case"),
        NONE("");

        final String words;

        Verdict(String words) {
            this.words = words;
        }

        boolean fails() {
            return this == OUT;
        }
    }

    /**
     * Judges {@code value} with expanded uncertainty {@code u} (k = 2): in the 95 % band when the
     * whole interval {@code value ± u} lies in the statistical band, within worst case when it lies in
     * the worst-case band, at the limit when it straddles a worst-case edge, out otherwise.
     */
    static Verdict judge(double value, double u, Band statistical, Band worstCase) {
        if (Double.isNaN(value) || !worstCase.isDefined()) {
            return Verdict.NONE;
        }
        double lo = value - (Double.isNaN(u) ? 0 : u);
        double hi = value + (Double.isNaN(u) ? 0 : u);
        if (statistical.isDefined() && lo >= statistical.low() && hi <= statistical.high()) {
            return Verdict.IN_BAND;
        }
        if (lo >= worstCase.low() && hi <= worstCase.high()) {
            return Verdict.WITHIN_WORST_CASE;
        }
        if (hi < worstCase.low() || lo > worstCase.high()) {
            return Verdict.OUT;
        }
        return Verdict.AT_LIMIT;
    }

    /** The deviation from nominal, e.g. {@code +33.4 %} (duty: {@code +1.20 % pts}). */
    static String offset(double value, double nominal, TimingQuantity q) {
        if (Double.isNaN(value) || Double.isNaN(nominal) || nominal == 0) {
            return "";
        }
        if (q == TimingQuantity.DUTY) {
            return String.format(Locale.ROOT, "%+.2f %% pts", (value - nominal) * 100);
        }
        return String.format(Locale.ROOT, "%+.1f %%", (value / nominal - 1) * 100);
    }

    /**
     * A hint for the design's first potentiometer: how far to move its wiper to bring the quantity it
     * sets (the duty for a split pot, else the frequency) from {@code measured} to the design's
     * nominal, from the model's slope at the design's wiper position (a linear step: repeat as the
     * reading follows). Null when the design has no potentiometer or the reading is missing.
     */
    static String tuning(Design design, Prediction p, double measuredFrequency, double measuredDuty) {
        Element pot = null;
        for (Element e : design.circuit().elements()) {
            if (e.type() == ElementType.POTENTIOMETER) {
                pot = e;
                break;
            }
        }
        if (pot == null) {
            return null;
        }
        boolean split = pot.role() == Role.SPLIT_POT;
        TimingQuantity q = split ? TimingQuantity.DUTY : TimingQuantity.FREQUENCY;
        double measured = split ? measuredDuty : measuredFrequency;
        double nominal = p.nominal(q);
        if (Double.isNaN(measured) || Double.isNaN(nominal)) {
            return null;
        }
        TimerModel model = TimerModels.build(design.circuit());
        double[] x = model.nominal();
        int iw = model.parameters().index(pot.designator() + ParameterTable.WIPER_SUFFIX);
        double w0 = x[iw];
        double step = w0 > 0.5 ? -0.01 : 0.01;
        x[iw] = w0 + step;
        Timing t = model.evaluate(x);
        double slope = (t.value(q) - nominal) / step;
        String name = split ? "duty" : "frequency";
        if (!(Math.abs(slope) > 0) || Double.isNaN(slope)) {
            return pot.designator() + " does not move the " + name + " here";
        }
        double dw = (nominal - measured) / slope;
        if (Math.abs(dw) < 0.005) {
            return String.format(Locale.ROOT, "%s is on target (%s within 0.5 %% of its travel)", pot.designator(),
                    name);
        }
        return String.format(Locale.ROOT, "turn %s about %.0f %% of its travel toward its wiper=%d end to bring the %s"
                + " to nominal", pot.designator(), Math.abs(dw) * 100, dw > 0 ? 1 : 0, name);
    }
}
