package org.rcbench.report;

import static org.rcbench.report.HtmlText.escape;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import org.rcbench.history.CheckContent;
import org.rcbench.history.CheckContent.Estimate;
import org.rcbench.history.CheckContent.Measured;
import org.rcbench.history.CheckContent.Predicted;
import org.rcbench.history.CheckContent.QuantityCheck;
import org.rcbench.history.CheckContent.Suspect;
import org.rcbench.history.ProbeCalibration;
import org.rcbench.history.ProbeInfo;
import org.rcbench.history.RunContext;
import org.rcbench.history.TrendAnalysis;

/**
 * A printable test record of one stored run as one self-contained HTML5 document: no scripts, no
 * external style sheets, fonts or images; plots are inline SVG. Sections (each a {@code <section>}
 * with the id in brackets): verdict [{@code verdict}], board and design [{@code board}], measured
 * against predicted [{@code comparison}], suspects and part estimates [{@code suspects}], uncertainty
 * budget [{@code uncertainty}], probe and calibration [{@code probe}], plots [{@code plots}],
 * capture and note [{@code capture}], working safely [{@code safety}]. Print layout in
 * {@link ReportStyle}. Stateless and thread-safe.
 */
public final class HtmlReport {
    private static final DateTimeFormatter WHEN =
            DateTimeFormatter.ofPattern("uuuu-MM-dd HH:mm:ss 'UTC'", Locale.ROOT).withZone(ZoneOffset.UTC);
    private static final List<String> MAIN_KEYS =
            List.of("frequency_hz", "period_s", "high_s", "low_s", "duty", "pulse_width_s", "delay_s", "first_high_s");

    private HtmlReport() {
    }

    /** The report as HTML text. */
    public static String render(ReportInput in) {
        RunContext x = in.run().context();
        CheckContent k = in.run().content();
        String unit = x.board() + (x.serial() == null ? "" : " " + x.serial());
        StringBuilder h = new StringBuilder(32_768);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<title>Test record: ").append(escape(unit)).append(", run ").append(in.run().id())
                .append("</title>\n<style>\n").append(ReportStyle.CSS).append("</style>\n</head>\n<body>\n");
        h.append("<header><h1>Test record: ").append(escape(unit)).append("</h1>\n<p class=\"sub\">Run ")
                .append(in.run().id()).append(" of the bench history, checked ").append(WHEN.format(x.recordedAt()))
                .append("</p></header>\n");
        verdict(h, k);
        board(h, x);
        comparison(h, in.run().content());
        suspects(h, k);
        uncertainty(h, in);
        probe(h, x.probe(), in.calibration());
        plots(h, in);
        capture(h, x);
        safety(h);
        h.append("<footer>Made by rcbench ").append(escape(in.version())).append(" on ")
                .append(WHEN.format(in.generatedAt())).append(" from the stored run ").append(in.run().id())
                .append(". Measured values carry expanded uncertainties U with coverage factor k = 2 (about 95 %).")
                .append("</footer>\n</body>\n</html>\n");
        return h.toString();
    }

    private static void verdict(StringBuilder h, CheckContent k) {
        h.append("<section id=\"verdict\">\n<h2>Verdict</h2>\n<div class=\"verdict\"><div class=\"mark\">")
                .append(SvgCharts.verdictMark(k.verdict())).append("</div><div><div class=\"word\">")
                .append(escape(k.verdict())).append("</div><div>").append(escape(ReportStyle.meaning(k.verdict())))
                .append("</div>");
        if (k.reason() != null && (k.verdict().equals("stopped") || Boolean.FALSE.equals(k.oscillates()))) {
            h.append("<div>Prediction: ").append(escape(k.reason())).append("</div>");
        }
        h.append("</div></div>\n");
        List<QuantityCheck> off = new ArrayList<>();
        for (QuantityCheck q : k.checks()) {
            if (!q.status().equalsIgnoreCase("pass")) {
                off.add(q);
            }
        }
        if (!off.isEmpty()) {
            h.append("<p>Quantities not passing: ");
            for (int i = 0; i < off.size(); i++) {
                h.append(i == 0 ? "" : "; ").append(escape(HtmlText.label(off.get(i).quantity()))).append(" (")
                        .append(escape(off.get(i).status())).append(')');
            }
            h.append(".</p>\n");
        }
        h.append("</section>\n");
    }

    private static void board(StringBuilder h, RunContext x) {
        h.append("<section id=\"board\">\n<h2>Board and design</h2>\n<table>\n<tbody>\n");
        row(h, "Board", escape(x.board()));
        row(h, "Serial number", x.serial() == null ? "not given" : escape(x.serial()));
        row(h, "Design file", escape(x.design().name()));
        row(h, "Design SHA-256", "<span class=\"hash\">" + x.design().sha256() + "</span>");
        h.append("</tbody>\n</table>\n<h3>Design as checked</h3>\n<pre>").append(escape(x.design().text()))
                .append("</pre>\n</section>\n");
    }

    private static void comparison(StringBuilder h, CheckContent k) {
        Set<String> keys = new LinkedHashSet<>();
        for (String key : MAIN_KEYS) {
            if (k.prediction(key).isPresent() || check(k, key).isPresent()) {
                keys.add(key);
            }
        }
        k.predictions().forEach(p -> keys.add(p.quantity()));
        k.checks().forEach(q -> keys.add(q.quantity()));
        h.append("<section id=\"comparison\">\n<h2>Measured against predicted</h2>\n");
        if (keys.isEmpty()) {
            h.append("<p>This run has no prediction to compare with.</p>\n</section>\n");
            return;
        }
        h.append("<table>\n<thead><tr><th>Quantity</th><th>Measured ± U</th><th>Nominal</th>")
                .append("<th>Statistical band (95 %)</th><th>Worst-case band</th><th>Status</th></tr></thead>\n<tbody>\n");
        List<SvgCharts.BandRow> rows = new ArrayList<>();
        for (String key : keys) {
            Optional<Predicted> p = k.prediction(key);
            Optional<QuantityCheck> q = check(k, key);
            Optional<Measured> m = k.measurement(key);
            double measured = m.map(Measured::value).orElse(q.map(QuantityCheck::measured).orElse(Double.NaN));
            double u = m.map(Measured::uncertainty).orElse(Double.NaN);
            double nominal = p.map(Predicted::nominal).orElse(Double.NaN);
            h.append("<tr><td>").append(escape(HtmlText.label(key))).append("</td><td class=\"n\">")
                    .append(escape(HtmlText.byKey(key, measured)));
            if (Double.isFinite(u)) {
                h.append(" ± ").append(escape(HtmlText.byKey(key.equals("duty") ? "duty" : key, u)));
            }
            h.append("</td><td class=\"n\">").append(escape(HtmlText.byKey(key, nominal))).append("</td><td class=\"n\">")
                    .append(range(key, p.map(Predicted::statLow), p.map(Predicted::statHigh))).append("</td><td class=\"n\">")
                    .append(range(key, p.map(Predicted::worstLow), p.map(Predicted::worstHigh))).append("</td><td class=\"status\">")
                    .append(escape(q.map(QuantityCheck::status).orElse("—"))).append("</td></tr>\n");
            if (p.isPresent() && Double.isFinite(nominal) && nominal != 0 && Double.isFinite(measured)) {
                rows.add(new SvgCharts.BandRow(HtmlText.label(key), nominal, p.get().worstLow(), p.get().worstHigh(),
                        p.get().statLow(), p.get().statHigh(), measured, u));
            }
        }
        h.append("</tbody>\n</table>\n");
        if (!rows.isEmpty()) {
            h.append("<figure>").append(SvgCharts.bands(rows)).append("<figcaption>Each quantity as deviation from its"
                    + " nominal value: the worst-case band is the dashed box, the statistical band the grey bar, the"
                    + " measurement the diamond with its expanded uncertainty.</figcaption></figure>\n");
        }
        h.append("</section>\n");
    }

    private static void suspects(StringBuilder h, CheckContent k) {
        h.append("<section id=\"suspects\">\n<h2>Suspects and part estimates</h2>\n");
        if (k.suspects().isEmpty()) {
            h.append("<p>No suspect: nothing points at a particular part.</p>\n");
        } else {
            h.append("<table>\n<thead><tr><th>Rank</th><th>Part</th><th>Estimated</th><th>Nominal</th>")
                    .append("<th>Deviation</th><th>Probability</th></tr></thead>\n<tbody>\n");
            for (Suspect s : k.suspects()) {
                String unit = k.estimates().stream().filter(e -> e.part().equals(s.part())).map(Estimate::unit)
                        .findFirst().orElse("1");
                h.append("<tr><td class=\"n\">").append(s.rank()).append("</td><td>").append(escape(s.part()))
                        .append("</td><td class=\"n\">").append(escape(HtmlText.value(s.value(), unit)))
                        .append("</td><td class=\"n\">").append(escape(HtmlText.value(s.nominal(), unit)))
                        .append("</td><td class=\"n\">").append(escape(deviation(s))).append("</td><td class=\"n\">")
                        .append(Double.isFinite(s.probability()) ? String.format(Locale.ROOT, "%.0f %%", s.probability() * 100) : "—")
                        .append("</td></tr>\n");
            }
            h.append("</tbody>\n</table>\n");
        }
        if (!k.estimates().isEmpty()) {
            h.append("<h3>Estimated part values</h3>\n<table>\n<thead><tr><th>Part</th><th>Estimate</th>")
                    .append("<th>Interval</th><th>Nominal</th><th>Off nominal</th><th>Tolerance</th></tr></thead>\n<tbody>\n");
            for (Estimate e : k.estimates()) {
                h.append("<tr><td>").append(escape(e.part())).append("</td><td class=\"n\">")
                        .append(escape(HtmlText.value(e.value(), e.unit()))).append("</td><td class=\"n\">")
                        .append(escape(HtmlText.value(e.low(), e.unit()))).append(" to ")
                        .append(escape(HtmlText.value(e.high(), e.unit()))).append("</td><td class=\"n\">")
                        .append(escape(HtmlText.value(e.nominal(), e.unit()))).append("</td><td class=\"n\">")
                        .append(escape(HtmlText.signedPercent(e.value() / e.nominal() - 1))).append("</td><td class=\"n\">")
                        .append(escape(HtmlText.tolerance(e.tolerance()))).append("</td></tr>\n");
            }
            h.append("</tbody>\n</table>\n");
        }
        if (!k.ambiguities().isEmpty()) {
            h.append("<h3>What these measurements cannot tell apart</h3>\n<ul>\n");
            k.ambiguities().forEach(a -> h.append("<li>").append(escape(a)).append("</li>\n"));
            h.append("</ul>\n");
        }
        h.append("</section>\n");
    }

    private static void uncertainty(StringBuilder h, ReportInput in) {
        CheckContent k = in.run().content();
        ProbeInfo probe = in.run().context().probe();
        h.append("<section id=\"uncertainty\">\n<h2>Uncertainty budget</h2>\n");
        JsonNode budget = in.run().document().path("frequency_uncertainty");
        if (budget.isObject() && budget.size() > 0) {
            h.append("<h3>Frequency</h3>\n<table>\n<thead><tr><th>Component</th><th>Value</th></tr></thead>\n<tbody>\n");
            for (Iterator<Map.Entry<String, JsonNode>> it = budget.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                String key = e.getKey();
                String text = e.getValue().isNumber()
                        ? HtmlText.value(e.getValue().doubleValue(), key.endsWith("_hz") ? "Hz" : key.endsWith("_s") ? "s" : "1")
                        : e.getValue().asText();
                row(h, escape(key.replaceAll("_(hz|s)$", "").replace('_', ' ')), escape(text));
            }
            h.append("</tbody>\n</table>\n");
        }
        h.append("<h3>Measured quantities</h3>\n<table>\n<thead><tr><th>Quantity</th><th>Value</th>")
                .append("<th>Expanded uncertainty U</th><th>Relative</th></tr></thead>\n<tbody>\n");
        for (Measured m : k.measurements()) {
            if (!Double.isFinite(m.uncertainty())) {
                continue;
            }
            boolean duty = m.quantity().equals("duty");
            h.append("<tr><td>").append(escape(HtmlText.label(m.quantity()))).append("</td><td class=\"n\">")
                    .append(escape(duty ? HtmlText.byKey("duty", m.value()) : HtmlText.value(m.value(), m.unit())))
                    .append("</td><td class=\"n\">")
                    .append(escape(duty ? HtmlText.byKey("duty", m.uncertainty()) : HtmlText.value(m.uncertainty(), m.unit())))
                    .append(String.format(Locale.ROOT, " (k = %.0f)", m.coverage())).append("</td><td class=\"n\">")
                    .append(m.value() != 0 ? HtmlText.number(m.uncertainty() / Math.abs(m.value()) * 1e6, 3, false) + " ppm" : "—")
                    .append("</td></tr>\n");
        }
        h.append("</tbody>\n</table>\n<p>The probe clock contributes its calibration uncertainty of ")
                .append(Double.isFinite(probe.clockUncertaintyPpm())
                        ? HtmlText.number(probe.clockUncertaintyPpm(), 3, false) + " ppm (one standard uncertainty)"
                        : "an unstated amount")
                .append(" to every time and frequency above.</p>\n</section>\n");
    }

    private static void probe(StringBuilder h, ProbeInfo p, ProbeCalibration cal) {
        h.append("<section id=\"probe\">\n<h2>Probe and calibration</h2>\n<table>\n<tbody>\n");
        row(h, "Probe", p.probeId() == null ? "not recorded" : escape(p.probeId()));
        row(h, "Firmware", p.firmware() == null ? "not recorded" : escape(p.firmware()));
        row(h, "Clock offset applied", HtmlText.number(p.clockOffsetPpm(), 4, true) + " ppm");
        row(h, "Its standard uncertainty", Double.isFinite(p.clockUncertaintyPpm())
                ? HtmlText.number(p.clockUncertaintyPpm(), 3, false) + " ppm" : "not stated");
        row(h, "Source of the offset", p.calibrationSource() == null ? "not recorded" : escape(p.calibrationSource()));
        if (cal != null) {
            row(h, "Latest calibration on record", HtmlText.number(cal.offsetPpm(), 4, true) + " ppm ± "
                    + HtmlText.number(cal.uncertaintyPpm(), 3, false) + " ppm against " + escape(cal.reference()) + ", "
                    + WHEN.format(cal.measuredAt()));
        } else if (p.probeId() != null) {
            row(h, "Latest calibration on record", "none for this probe");
        }
        h.append("</tbody>\n</table>\n");
        if (cal != null && Math.abs(cal.offsetPpm() - p.clockOffsetPpm()) > 2 * cal.uncertaintyPpm()) {
            h.append("<p>The offset applied to this run differs from the latest calibration by more than twice its"
                    + " uncertainty: the probe may have been recalibrated since, or the run used another source.</p>\n");
        }
        h.append("</section>\n");
    }

    private static void plots(StringBuilder h, ReportInput in) {
        CheckContent k = in.run().content();
        h.append("<section id=\"plots\">\n<h2>Plots</h2>\n");
        if (k.histogram() != null) {
            CheckContent.PeriodHistogram hist = k.histogram();
            h.append("<figure>").append(SvgCharts.histogram(hist)).append("<figcaption>Periods of ")
                    .append(hist.total()).append(" cycles");
            if (hist.below() + hist.above() > 0) {
                h.append(" (").append(hist.below()).append(" shorter and ").append(hist.above())
                        .append(" longer ones left off the axis)");
            }
            h.append(".</figcaption></figure>\n");
        } else {
            h.append("<p>No period histogram is stored with this run.</p>\n");
        }
        if (k.trend().size() >= 2) {
            h.append("<figure>").append(SvgCharts.frequencyTrend(k.trend()))
                    .append("<figcaption>Frequency over the capture, averaged over stretches of cycles.</figcaption></figure>\n");
        } else {
            h.append("<p>No frequency trend is stored with this run.</p>\n");
        }
        boolean any = false;
        for (TrendAnalysis a : in.partHistory()) {
            if (a.trend().points().size() >= 2) {
                any = true;
                h.append("<figure>").append(SvgCharts.partHistory(a)).append("<figcaption>")
                        .append(escape(TrendText.describe(a)))
                        .append(". Squares: estimates with their intervals; grey: tolerance band; dotted: fitted line.")
                        .append("</figcaption></figure>\n");
            }
        }
        if (!any) {
            h.append("<p>This unit has fewer than two stored runs with part estimates: no part history yet.</p>\n");
        }
        h.append("</section>\n");
    }

    private static void capture(StringBuilder h, RunContext x) {
        h.append("<section id=\"capture\">\n<h2>Capture and note</h2>\n<table>\n<tbody>\n");
        if (x.capture() != null) {
            row(h, "Capture file", escape(x.capture().path()));
            row(h, "Size", x.capture().sizeBytes() + " bytes");
            row(h, "SHA-256", "<span class=\"hash\">" + x.capture().sha256() + "</span>");
        } else {
            row(h, "Capture file", "none (a live check)");
        }
        row(h, "Checked", WHEN.format(x.recordedAt()));
        row(h, "Operator's note", x.note() == null ? "none" : escape(x.note()));
        h.append("</tbody>\n</table>\n</section>\n");
    }

    private static void safety(StringBuilder h) {
        h.append("<section id=\"safety\">\n<h2>Working safely</h2>\n<ul class=\"caution\">\n");
        ReportStyle.CAUTIONS.forEach(c -> h.append("<li>").append(escape(c)).append("</li>\n"));
        h.append("</ul>\n</section>\n");
    }

    private static Optional<QuantityCheck> check(CheckContent k, String key) {
        return k.checks().stream().filter(q -> q.quantity().equals(key)).findFirst();
    }

    private static String range(String key, Optional<Double> lo, Optional<Double> hi) {
        if (lo.isEmpty() || !Double.isFinite(lo.get())) {
            return "—";
        }
        return escape(HtmlText.byKey(key, lo.get())) + " to " + escape(HtmlText.byKey(key, hi.get()));
    }

    private static String deviation(Suspect s) {
        if (Double.isFinite(s.value()) && Double.isFinite(s.nominal()) && s.nominal() != 0) {
            return HtmlText.signedPercent(s.value() / s.nominal() - 1);
        }
        return Double.isFinite(s.deviation()) ? String.format(Locale.ROOT, "%.3g", s.deviation()) : "—";
    }

    private static void row(StringBuilder h, String name, String valueHtml) {
        h.append("<tr><th scope=\"row\">").append(name).append("</th><td>").append(valueHtml).append("</td></tr>\n");
    }
}
