package org.rcbench.json;

import static org.rcbench.json.JsonNumbers.band;
import static org.rcbench.json.JsonNumbers.number;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.rcbench.diagnose.Ambiguity;
import org.rcbench.diagnose.CheckResult;
import org.rcbench.diagnose.Diagnosis;
import org.rcbench.diagnose.Estimate;
import org.rcbench.diagnose.Explanation;
import org.rcbench.diagnose.PeriodHistogram;
import org.rcbench.diagnose.QuantityCheck;
import org.rcbench.diagnose.Suspect;
import org.rcbench.diagnose.TuneResult;
import org.rcbench.measure.FrequencyTrend;
import org.rcbench.units.Tolerance;
import org.rcbench.units.Unit;

/**
 * The {@code check --json} object: the {@code measure} keys at top level ({@link MeasurementJson}),
 * then
 * <ul>
 * <li>{@code prediction}: the {@code predict} object ({@link PredictionJson});</li>
 * <li>{@code verdict}: {@code pass}, {@code marginal}, {@code fail} or {@code stopped}, and
 * {@code verdict_reason};</li>
 * <li>{@code checks}: per quantity key ({@code frequency_hz}, {@code high_s} ...) an object with
 * {@code measured}, {@code measured_u} (expanded, k = 2), {@code nominal}, {@code band} (the 95 %
 * statistical band as {@code [low, high]}), {@code worst_case} and {@code status};</li>
 * <li>{@code estimates}: per designator (and {@code VR1.wiper}) {@code value}, {@code unit},
 * {@code nominal}, {@code low}, {@code high} (95 %), and for parts the design's
 * {@code tolerance_minus} and {@code tolerance_plus} (fractions);</li>
 * <li>{@code suspects}: ordered, each {@code part}, {@code kind}, {@code label}, {@code value},
 * {@code unit}, {@code nominal}, {@code deviation} (fraction), {@code deviation_tolerances},
 * {@code probability}, {@code low}, {@code high};</li>
 * <li>{@code ambiguities}: array of plain-language strings; {@code diagnosis}: an object with
 * {@code summary} (the one-line finding), {@code no_fault_probability}, {@code fits_well} and
 * {@code explanations} (label, probability, misfit), nested so that every top-level number stays a
 * measurement;</li>
 * <li>{@code histogram}: {@code edges_s} and {@code counts}; {@code trend}: array of {@code t_s},
 * {@code frequency_hz}.</li>
 * </ul>
 * Units: SI; {@code unit} is {@code "ohm"}, {@code "F"}, {@code "V"} or {@code ""} (a fraction).
 * Numbers that are not finite (a leakage's nominal, none intended) are {@code null}. Stable names.
 * Stateless and thread-safe.
 */
public final class CheckJson {
    private static final JsonNodeFactory F = JsonNodeFactory.instance;

    private CheckJson() {
    }

    /** The whole check as one object. */
    public static ObjectNode of(CheckResult r) {
        ObjectNode o = MeasurementJson.of(r.measurement());
        o.put("design", r.design().source());
        o.put("board", r.design().title());
        o.set("prediction", PredictionJson.toJson(r.prediction()));
        o.put("verdict", r.verdict().fileName());
        o.put("verdict_reason", r.reason());
        ObjectNode checks = o.putObject("checks");
        for (QuantityCheck c : r.checks()) {
            ObjectNode q = checks.putObject(c.quantity().jsonKey());
            number(q, "measured", c.measured());
            number(q, "measured_u", c.uncertainty());
            number(q, "nominal", c.nominal());
            band(q, "band", c.statistical());
            band(q, "worst_case", c.worstCase());
            q.put("status", c.status().fileName());
        }
        addDiagnosis(o, r.diagnosis());
        for (Estimate e : r.diagnosis().estimates()) {
            if (r.design().part(e.name()) != null) {
                ObjectNode x = (ObjectNode) o.get("estimates").get(e.name());
                Tolerance t = r.design().spread(e.name()).tolerance();
                x.put("tolerance_minus", t.minusFraction());
                x.put("tolerance_plus", t.plusFraction());
            }
        }
        histogram(o, r.histogram());
        trend(o, r.trend());
        return o;
    }

    /** Adds {@code estimates}, {@code suspects}, {@code ambiguities} and the {@code diagnosis} object to {@code o}. */
    public static ObjectNode addDiagnosis(ObjectNode o, Diagnosis d) {
        ObjectNode est = o.putObject("estimates");
        for (Estimate e : d.estimates()) {
            ObjectNode x = est.putObject(e.name());
            number(x, "value", e.value());
            x.put("unit", unit(e.unit()));
            number(x, "nominal", e.nominal());
            number(x, "low", e.low());
            number(x, "high", e.high());
        }
        ArrayNode sus = o.putArray("suspects");
        for (Suspect s : d.suspects()) {
            ObjectNode x = sus.addObject();
            x.put("part", s.name());
            x.put("kind", s.kind().fileName());
            x.put("label", s.label());
            number(x, "value", s.value());
            x.put("unit", unit(s.unit()));
            number(x, "nominal", s.nominal());
            number(x, "deviation", s.deviation());
            number(x, "deviation_tolerances", s.toleranceMultiple());
            number(x, "probability", s.probability());
            number(x, "low", s.low());
            number(x, "high", s.high());
        }
        ArrayNode amb = o.putArray("ambiguities");
        for (Ambiguity a : d.ambiguities()) {
            amb.add(a.text());
        }
        ObjectNode dx = o.putObject("diagnosis");
        dx.put("summary", d.summary());
        number(dx, "no_fault_probability", d.noFaultProbability());
        dx.put("fits_well", d.fitsWell());
        ArrayNode ex = dx.putArray("explanations");
        for (Explanation e : d.explanations()) {
            ObjectNode x = ex.addObject();
            x.put("label", e.label());
            number(x, "probability", e.probability());
            number(x, "misfit", e.misfit());
        }
        return o;
    }

    /** The {@code tune --json} object: the wiper now, where it should go, and the advice (also as one short {@code step}). */
    public static ObjectNode of(TuneResult t) {
        ObjectNode o = F.objectNode();
        o.put("pot", t.pot());
        o.put("target_quantity", t.target().quantity().jsonKey());
        number(o, "target", t.target().value());
        number(o, "wiper", t.present());
        number(o, "wiper_low", t.presentLow());
        number(o, "wiper_high", t.presentHigh());
        number(o, "wanted_wiper", t.wanted());
        o.put("reachable", t.reachable());
        number(o, "reached", t.reached());
        ArrayNode range = o.putArray("range");
        range.add(t.rangeLow());
        range.add(t.rangeHigh());
        number(o, "change", t.change());
        number(o, "travel_degrees", t.target().travelDegrees());
        number(o, "turns", t.target().turns());
        o.put("advice", t.advice());
        o.put("step", t.step());
        return o;
    }

    private static void histogram(ObjectNode o, PeriodHistogram h) {
        ObjectNode x = o.putObject("histogram");
        ArrayNode edges = x.putArray("edges_s");
        for (double e : h.edgesSeconds()) {
            edges.add(e);
        }
        ArrayNode counts = x.putArray("counts");
        for (long c : h.counts()) {
            counts.add(c);
        }
    }

    private static void trend(ObjectNode o, FrequencyTrend t) {
        ArrayNode a = o.putArray("trend");
        if (t == null) {
            return;
        }
        for (int i = 0; i < t.size(); i++) {
            ObjectNode p = a.addObject();
            number(p, "t_s", t.timeSeconds()[i]);
            number(p, "frequency_hz", t.frequencyHz()[i]);
        }
    }

    /** The unit's JSON spelling: ASCII for machines. */
    static String unit(Unit u) {
        switch (u) {
            case OHM: return "ohm";
            case NONE: return "";
            default: return u.symbol();
        }
    }
}
