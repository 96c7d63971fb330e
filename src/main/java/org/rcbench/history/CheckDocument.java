package org.rcbench.history;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.rcbench.common.BadInputException;
import org.rcbench.history.CheckContent.Estimate;
import org.rcbench.history.CheckContent.FrequencyPoint;
import org.rcbench.history.CheckContent.Measured;
import org.rcbench.history.CheckContent.PeriodHistogram;
import org.rcbench.history.CheckContent.Predicted;
import org.rcbench.history.CheckContent.QuantityCheck;
import org.rcbench.history.CheckContent.Suspect;
import org.rcbench.units.Tolerance;

/**
 * Reads the rows the history keeps from a check result document ({@code rcbench check --json}).
 *
 * <p>Keys read (issues 2, 3 and 4): {@code verdict} (required); every top-level number is a
 * measurement (the {@code measure} keys {@code frequency_hz}, {@code period_s}, {@code high_s} ...;
 * unit from the key's suffix), with its expanded uncertainty (k = 2) from {@code NAME_u_UNIT}
 * ({@code frequency_u_hz}), from a standard uncertainty {@code NAME_u} or {@code NAME.u_s} times 2,
 * or for {@code period_s} from the relative uncertainty of the frequency; {@code allan} points as
 * {@code adev_tau_<tau>_s}; {@code prediction} {@code nominal}, {@code worst_case},
 * {@code statistical} ({@code [low, high]}), {@code oscillates}, {@code reason}; {@code checks}
 * (object by quantity or array with {@code quantity}) with {@code measured}, {@code band}
 * ({@code [low, high]} or {@code {low, high}}) and {@code status}; {@code estimates} (object by
 * designator or array with {@code part}) with {@code value}, {@code unit}, {@code nominal},
 * {@code low}, {@code high} and optionally {@code tolerance} (a fraction or a text such as
 * {@code "+50/-20%"}), {@code tolerance_pct}, or {@code tolerance_minus} and {@code tolerance_plus};
 * {@code suspects} (array, in rank order) with {@code part}, {@code value}, {@code nominal},
 * {@code deviation}, {@code probability}; {@code ambiguities} (strings); and the plot data
 * {@code histogram} {@code {edges_s, counts}} (both empty: none) and {@code trend} {@code [{t_s, frequency_hz}]}.
 * Unknown keys are ignored; missing numbers and {@code null} are NaN. Plot data is made compact: at
 * most {@value #MAX_BINS} bins (neighbours merged) and {@value #MAX_TREND_POINTS} trend points
 * (averaged in equal runs). Stateless and thread-safe.
 */
public final class CheckDocument {
    /** Most histogram bins kept per run. */
    public static final int MAX_BINS = 256;
    /** Most frequency-trend points kept per run. */
    public static final int MAX_TREND_POINTS = 500;

    private static final String WHERE = "check result";
    private static final Set<String> NOT_MEASUREMENTS = Set.of("channel", "verdict", "coverage_factor", "clock_hz",
            "clock_offset_ppm");
    private static final Set<String> COUNTS = Set.of("cycles", "glitches", "gaps", "settling_cycles", "edges",
            "stalls", "missed_edges", "segments", "mtie_resolution_cycles");

    private CheckDocument() {
    }

    /**
     * The rows of {@code doc}.
     *
     * @throws BadInputException {@code check result: what} when the document is not an object, has
     *                           no known verdict, or a known key has the wrong shape
     */
    public static CheckContent parse(JsonNode doc) {
        if (doc == null || !doc.isObject()) {
            throw new BadInputException(WHERE, "is not a JSON object");
        }
        JsonNode v = doc.get("verdict");
        String verdict = v == null || !v.isTextual() ? null : v.asText().strip().toLowerCase(Locale.ROOT);
        if (verdict == null || !CheckContent.VERDICTS.contains(verdict)) {
            throw new BadInputException(WHERE, "verdict must be one of " + String.join(", ", CheckContent.VERDICTS)
                    + ", found " + (v == null ? "none" : v.toString()));
        }
        JsonNode prediction = doc.path("prediction");
        JsonNode osc = prediction.get("oscillates");
        return new CheckContent(verdict, measurements(doc), predictions(prediction),
                osc != null && osc.isBoolean() ? osc.booleanValue() : null, text(prediction, "reason"),
                checks(doc.get("checks")), estimates(doc.get("estimates")), suspects(doc.get("suspects")),
                strings(doc.get("ambiguities"), "ambiguities"), histogram(doc.get("histogram")),
                trend(doc.get("trend")));
    }

    /**
     * The measured quantities of a {@code measure --json} or {@code check --json} document (the rules
     * above), without requiring a verdict.
     *
     * @throws BadInputException when {@code doc} is not a JSON object
     */
    public static List<Measured> measurementsOf(JsonNode doc) {
        if (doc == null || !doc.isObject()) {
            throw new BadInputException(WHERE, "is not a JSON object");
        }
        return measurements(doc);
    }

    static List<Measured> measurements(JsonNode doc) {
        List<Measured> out = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = doc.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            String key = e.getKey();
            if (!e.getValue().isNumber() || NOT_MEASUREMENTS.contains(key) || isUncertaintyKey(key)) {
                continue;
            }
            double value = e.getValue().doubleValue();
            double u = expandedUncertainty(doc, key, value);
            out.add(new Measured(key, value, u, Double.isNaN(u) ? Double.NaN : 2, unitOf(key)));
        }
        JsonNode allan = doc.get("allan");
        if (allan != null && allan.isArray()) {
            for (JsonNode p : allan) {
                double tau = number(p, "tau_s");
                double adev = number(p, "adev");
                if (Double.isFinite(tau) && !Double.isNaN(adev)) {
                    out.add(new Measured("adev_tau_" + Double.toString(tau) + "_s", adev, Double.NaN, Double.NaN, "1"));
                }
            }
        }
        return out;
    }

    private static boolean isUncertaintyKey(String key) {
        return key.endsWith("_u") || key.contains("_u_");
    }

    /** Expanded (k = 2) uncertainty of measure key {@code key}, or NaN when the document gives none. */
    private static double expandedUncertainty(JsonNode doc, String key, double value) {
        int cut = key.lastIndexOf('_');
        if (cut > 0) {
            double expanded = number(doc, key.substring(0, cut) + "_u" + key.substring(cut));
            if (!Double.isNaN(expanded)) {
                return expanded; // NAME_u_UNIT: expanded, k = 2 (issue 2's frequency_u_hz)
            }
        }
        double standard = number(doc, key + "_u");
        if (Double.isNaN(standard) && key.endsWith("_s")) {
            String base = key.substring(0, key.length() - 2);
            standard = number(doc.path(base), "u_s");
            if (Double.isNaN(standard)) {
                standard = number(doc.path("monostable").path(base), "u_s");
            }
        }
        if (!Double.isNaN(standard)) {
            return 2 * standard;
        }
        if (key.equals("period_s")) {
            // T = 1/f, so U(T)/T = U(f)/f to first order (GUM, JCGM 100:2008, 5.1.2).
            double f = number(doc, "frequency_hz");
            double uf = number(doc, "frequency_u_hz");
            if (f > 0 && uf >= 0) {
                return Math.abs(value) * uf / f;
            }
        }
        return Double.NaN;
    }

    /** The unit of measure key {@code key}, from its suffix. */
    static String unitOf(String key) {
        if (COUNTS.contains(key)) {
            return "count";
        }
        if (key.endsWith("_ppm_per_s")) {
            return "ppm/s";
        }
        if (key.endsWith("_hz")) {
            return "Hz";
        }
        if (key.endsWith("_ppm")) {
            return "ppm";
        }
        if (key.endsWith("_s")) {
            return "s";
        }
        if (key.endsWith("_v")) {
            return "V";
        }
        return "1";
    }

    private static List<Predicted> predictions(JsonNode prediction) {
        List<Predicted> out = new ArrayList<>();
        JsonNode nominal = prediction.path("nominal");
        JsonNode worst = prediction.path("worst_case");
        JsonNode stat = prediction.path("statistical");
        List<String> keys = new ArrayList<>();
        for (JsonNode group : List.of(nominal, worst, stat)) {
            group.fieldNames().forEachRemaining(k -> {
                if (!keys.contains(k)) {
                    keys.add(k);
                }
            });
        }
        for (String k : keys) {
            double[] w = band(worst.get(k), "prediction.worst_case." + k);
            double[] s = band(stat.get(k), "prediction.statistical." + k);
            out.add(new Predicted(k, number(nominal, k), w[0], w[1], s[0], s[1]));
        }
        return out;
    }

    private static List<QuantityCheck> checks(JsonNode checks) {
        List<QuantityCheck> out = new ArrayList<>();
        for (Map.Entry<String, JsonNode> e : entries(checks, "checks", "quantity")) {
            JsonNode c = e.getValue();
            double[] b = band(c.get("band"), "checks." + e.getKey() + ".band");
            String status = text(c, "status");
            out.add(new QuantityCheck(e.getKey(), number(c, "measured"), b[0], b[1], status == null ? "" : status));
        }
        return out;
    }

    private static List<Estimate> estimates(JsonNode estimates) {
        List<Estimate> out = new ArrayList<>();
        for (Map.Entry<String, JsonNode> e : entries(estimates, "estimates", "part")) {
            JsonNode x = e.getValue();
            Tolerance tol = tolerance(x, e.getKey());
            String unit = text(x, "unit");
            out.add(new Estimate(e.getKey(), number(x, "value"), unit == null ? "" : unit, number(x, "nominal"),
                    number(x, "low"), number(x, "high"), tol));
        }
        return out;
    }

    /**
     * The tolerance an estimate states: {@code tolerance} as a fraction (0.05) or as text ({@code "5%"},
     * {@code "+50/-20%"}), {@code tolerance_pct}, or {@code tolerance_minus} with {@code tolerance_plus}
     * (fractions); null when none is given.
     */
    private static Tolerance tolerance(JsonNode x, String part) {
        try {
            JsonNode t = x.get("tolerance");
            if (t != null && t.isNumber()) {
                return Tolerance.symmetric(t.doubleValue());
            }
            if (t != null && t.isTextual()) {
                return Tolerance.parse(t.asText());
            }
            double pct = number(x, "tolerance_pct");
            if (!Double.isNaN(pct)) {
                return Tolerance.symmetric(pct / 100);
            }
            double minus = number(x, "tolerance_minus");
            double plus = number(x, "tolerance_plus");
            if (!Double.isNaN(minus) && !Double.isNaN(plus)) {
                return new Tolerance(minus, plus);
            }
            return null;
        } catch (IllegalArgumentException | BadInputException e) {
            throw new BadInputException(WHERE, "estimates." + part + ": bad tolerance (" + e.getMessage() + ")", e);
        }
    }

    private static List<Suspect> suspects(JsonNode suspects) {
        List<Suspect> out = new ArrayList<>();
        if (suspects == null || suspects.isNull()) {
            return out;
        }
        if (!suspects.isArray()) {
            throw new BadInputException(WHERE, "suspects must be an array");
        }
        int rank = 1;
        for (JsonNode s : suspects) {
            String part = text(s, "part");
            if (part == null) {
                throw new BadInputException(WHERE, "suspects[" + (rank - 1) + "] has no part");
            }
            out.add(new Suspect(rank++, part, number(s, "value"), number(s, "nominal"), number(s, "deviation"),
                    number(s, "probability")));
        }
        return out;
    }

    private static PeriodHistogram histogram(JsonNode h) {
        if (h == null || h.isNull()) {
            return null;
        }
        JsonNode edges = h.get("edges_s");
        JsonNode counts = h.get("counts");
        if (edges != null && counts != null && edges.isArray() && counts.isArray() && edges.isEmpty() && counts.isEmpty()) {
            return null; // a check that measured no cycle (a stopped board) has no histogram
        }
        if (edges == null || counts == null || !edges.isArray() || !counts.isArray()
                || edges.size() != counts.size() + 1 || counts.isEmpty()) {
            throw new BadInputException(WHERE, "histogram needs edges_s (n+1 numbers) and counts (n numbers)");
        }
        double[] e = new double[edges.size()];
        for (int i = 0; i < e.length; i++) {
            e[i] = edges.get(i).asDouble(Double.NaN);
        }
        long[] c = new long[counts.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = counts.get(i).asLong(-1);
        }
        try {
            return compact(new PeriodHistogram(e, c, Math.max(0, h.path("below").asLong(0)),
                    Math.max(0, h.path("above").asLong(0))));
        } catch (IllegalArgumentException ex) {
            throw new BadInputException(WHERE, "histogram: " + ex.getMessage(), ex);
        }
    }

    /** {@code h} with neighbouring bins merged until at most {@link #MAX_BINS} remain. */
    static PeriodHistogram compact(PeriodHistogram h) {
        long[] counts = h.counts();
        double[] edges = h.edgesSeconds();
        if (counts.length <= MAX_BINS) {
            return h;
        }
        int factor = (counts.length + MAX_BINS - 1) / MAX_BINS;
        int n = (counts.length + factor - 1) / factor;
        long[] c = new long[n];
        double[] e = new double[n + 1];
        for (int i = 0; i < counts.length; i++) {
            c[i / factor] += counts[i];
        }
        for (int j = 0; j < n; j++) {
            e[j] = edges[j * factor];
        }
        e[n] = edges[edges.length - 1];
        return new PeriodHistogram(e, c, h.below(), h.above());
    }

    private static List<FrequencyPoint> trend(JsonNode t) {
        List<FrequencyPoint> points = new ArrayList<>();
        if (t == null || t.isNull()) {
            return points;
        }
        if (!t.isArray()) {
            throw new BadInputException(WHERE, "trend must be an array of {t_s, frequency_hz}");
        }
        for (JsonNode p : t) {
            double ts = number(p, "t_s");
            double f = number(p, "frequency_hz");
            if (Double.isFinite(ts) && Double.isFinite(f)) {
                points.add(new FrequencyPoint(ts, f));
            }
        }
        return decimate(points);
    }

    /**
     * At most {@link #MAX_TREND_POINTS} points: consecutive runs of equal length (the last may be
     * shorter) replaced by their mean time and mean frequency.
     */
    static List<FrequencyPoint> decimate(List<FrequencyPoint> points) {
        if (points.size() <= MAX_TREND_POINTS) {
            return points;
        }
        int per = (points.size() + MAX_TREND_POINTS - 1) / MAX_TREND_POINTS;
        List<FrequencyPoint> out = new ArrayList<>();
        for (int start = 0; start < points.size(); start += per) {
            int end = Math.min(points.size(), start + per);
            double st = 0;
            double sf = 0;
            for (int i = start; i < end; i++) {
                st += points.get(i).tSeconds();
                sf += points.get(i).frequencyHz();
            }
            out.add(new FrequencyPoint(st / (end - start), sf / (end - start)));
        }
        return out;
    }

    /** Entries of an object keyed by name, or of an array of objects naming themselves by {@code nameKey}. */
    private static List<Map.Entry<String, JsonNode>> entries(JsonNode node, String what, String nameKey) {
        List<Map.Entry<String, JsonNode>> out = new ArrayList<>();
        if (node == null || node.isNull()) {
            return out;
        }
        if (node.isObject()) {
            node.fields().forEachRemaining(e -> {
                if (e.getValue().isObject()) {
                    out.add(e);
                }
            });
        } else if (node.isArray()) {
            int i = 0;
            for (JsonNode x : node) {
                String name = text(x, nameKey);
                if (name == null) {
                    name = text(x, "designator");
                }
                if (name == null) {
                    throw new BadInputException(WHERE, what + "[" + i + "] has no " + nameKey);
                }
                out.add(Map.entry(name, x));
                i++;
            }
        } else {
            throw new BadInputException(WHERE, what + " must be an object or an array");
        }
        return out;
    }

    /** {@code [low, high]} from an array of two numbers or an object with {@code low}/{@code high}. */
    private static double[] band(JsonNode b, String where) {
        if (b == null || b.isNull()) {
            return new double[] {Double.NaN, Double.NaN};
        }
        if (b.isArray() && b.size() == 2) {
            return new double[] {b.get(0).asDouble(Double.NaN), b.get(1).asDouble(Double.NaN)};
        }
        if (b.isObject() && (b.has("low") || b.has("high"))) {
            return new double[] {number(b, "low"), number(b, "high")};
        }
        throw new BadInputException(WHERE, where + " must be [low, high]");
    }

    private static List<String> strings(JsonNode a, String what) {
        List<String> out = new ArrayList<>();
        if (a == null || a.isNull()) {
            return out;
        }
        if (!a.isArray()) {
            throw new BadInputException(WHERE, what + " must be an array of strings");
        }
        a.forEach(s -> out.add(s.isTextual() ? s.asText() : s.toString()));
        return out;
    }

    static double number(JsonNode node, String key) {
        JsonNode n = node == null ? null : node.get(key);
        return n != null && n.isNumber() ? n.doubleValue() : Double.NaN;
    }

    static String text(JsonNode node, String key) {
        JsonNode n = node == null ? null : node.get(key);
        return n != null && n.isValueNode() && !n.isNull() ? n.asText() : null;
    }
}
