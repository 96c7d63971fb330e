package org.rcbench.report;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import org.rcbench.history.CheckContent.FrequencyPoint;
import org.rcbench.history.CheckContent.PeriodHistogram;
import org.rcbench.history.PartTrend;
import org.rcbench.history.TrendAnalysis;
import org.rcbench.units.Tolerance;

/**
 * The report's plots as SVG text, drawn in black and greys with dash patterns and marker shapes so
 * they read the same printed without colour. Axis steps are "nice numbers" (1, 2 or 5 times a power
 * of ten; Heckbert, "Nice numbers for graph labels", Graphics Gems, 1990). Stateless.
 */
final class SvgCharts {
    static final int W = 640;
    static final int H = 250;
    private static final double L = 96;
    private static final double R = 36;
    private static final double T = 16;
    private static final double B = 46;
    private static final String AXIS = "stroke:#000;stroke-width:1;fill:none";
    private static final String GRID = "stroke:#bbb;stroke-width:0.6;stroke-dasharray:2,3;fill:none";
    private static final DateTimeFormatter DAY =
            DateTimeFormatter.ofPattern("uuuu-MM-dd", Locale.ROOT).withZone(ZoneOffset.UTC);

    private SvgCharts() {
    }

    /** Bars of the period histogram, periods on x. */
    static String histogram(PeriodHistogram h) {
        double[] e = h.edgesSeconds();
        long[] c = h.counts();
        long max = 1;
        for (long x : c) {
            max = Math.max(max, x);
        }
        Svg svg = new Svg(W, H, "Histogram of cycle periods");
        Axes ax = new Axes(e[0], e[e.length - 1], 0, max * 1.05);
        ax.draw(svg, "s", "period", "cycles");
        for (int i = 0; i < c.length; i++) {
            double x0 = ax.x(e[i]);
            double x1 = ax.x(e[i + 1]);
            svg.rect(x0, ax.y(c[i]), x1 - x0, ax.y(0) - ax.y(c[i]), "fill:#888;stroke:#000;stroke-width:0.5");
        }
        return svg.end();
    }

    /** Frequency against time since the capture started. */
    static String frequencyTrend(List<FrequencyPoint> pts) {
        double t0 = Double.POSITIVE_INFINITY;
        double t1 = Double.NEGATIVE_INFINITY;
        double f0 = Double.POSITIVE_INFINITY;
        double f1 = Double.NEGATIVE_INFINITY;
        for (FrequencyPoint p : pts) {
            t0 = Math.min(t0, p.tSeconds());
            t1 = Math.max(t1, p.tSeconds());
            f0 = Math.min(f0, p.frequencyHz());
            f1 = Math.max(f1, p.frequencyHz());
        }
        double pad = Math.max((f1 - f0) * 0.1, Math.abs(f1) * 1e-6);
        Svg svg = new Svg(W, H, "Frequency over the capture");
        Axes ax = new Axes(t0, t1 > t0 ? t1 : t0 + 1, f0 - pad, f1 + pad);
        ax.draw(svg, "s", "time since start of capture", "Hz");
        double[] xs = new double[pts.size()];
        double[] ys = new double[pts.size()];
        for (int i = 0; i < xs.length; i++) {
            xs[i] = ax.x(pts.get(i).tSeconds());
            ys[i] = ax.y(pts.get(i).frequencyHz());
        }
        svg.polyline(xs, ys, "stroke:#000;stroke-width:1.2;fill:none");
        return svg.end();
    }

    /** A part's estimates over the runs with their intervals, the tolerance band and the fitted line. */
    static String partHistory(TrendAnalysis a) {
        PartTrend t = a.trend();
        List<PartTrend.Point> pts = t.points();
        Instant first = pts.get(0).recordedAt();
        double span = Math.max(TrendAnalysis.years(first, pts.get(pts.size() - 1).recordedAt()), 1.0 / 365);
        double y0 = Double.POSITIVE_INFINITY;
        double y1 = Double.NEGATIVE_INFINITY;
        for (PartTrend.Point p : pts) {
            for (double v : new double[] {p.value(), p.low(), p.high()}) {
                if (Double.isFinite(v)) {
                    y0 = Math.min(y0, v);
                    y1 = Math.max(y1, v);
                }
            }
        }
        boolean band = t.tolerance() != null && !t.tolerance().equals(Tolerance.NONE) && Double.isFinite(t.nominal());
        if (band) {
            y0 = Math.min(y0, t.tolerance().low(t.nominal()));
            y1 = Math.max(y1, t.tolerance().high(t.nominal()));
        }
        double pad = Math.max((y1 - y0) * 0.08, Math.abs(y1) * 1e-6);
        Svg svg = new Svg(W, H, "Estimated " + t.part() + " over the runs");
        Axes ax = new Axes(-span * 0.05, span * 1.05, y0 - pad, y1 + pad);
        ax.drawValueAxis(svg, t.unit(), t.part() + " (" + t.unit() + ")");
        ax.dateAxis(svg, first, span);
        if (band) {
            double yl = ax.y(t.tolerance().low(t.nominal()));
            double yh = ax.y(t.tolerance().high(t.nominal()));
            svg.rect(L, yh, W - L - R, yl - yh, "fill:#eee;stroke:none");
            svg.line(L, yl, W - R, yl, "stroke:#000;stroke-width:0.8;stroke-dasharray:6,3");
            svg.line(L, yh, W - R, yh, "stroke:#000;stroke-width:0.8;stroke-dasharray:6,3");
            svg.line(L, ax.y(t.nominal()), W - R, ax.y(t.nominal()), "stroke:#666;stroke-width:0.6");
        }
        if (Double.isFinite(a.slopePerYear()) && pts.size() >= 2) {
            double meanX = 0;
            double meanY = 0;
            for (PartTrend.Point p : pts) {
                meanX += TrendAnalysis.years(first, p.recordedAt()) / pts.size();
                meanY += p.value() / pts.size();
            }
            double xa = -span * 0.05;
            double xb = span * 1.05;
            svg.line(ax.x(xa), ax.y(meanY + a.slopePerYear() * (xa - meanX)), ax.x(xb),
                    ax.y(meanY + a.slopePerYear() * (xb - meanX)), "stroke:#000;stroke-width:1;stroke-dasharray:1,2");
        }
        for (PartTrend.Point p : pts) {
            double x = ax.x(TrendAnalysis.years(first, p.recordedAt()));
            if (Double.isFinite(p.low()) && Double.isFinite(p.high())) {
                svg.line(x, ax.y(p.low()), x, ax.y(p.high()), "stroke:#000;stroke-width:1");
            }
            double y = ax.y(p.value());
            svg.rect(x - 3.5, y - 3.5, 7, 7, "fill:#000;stroke:none");
        }
        return svg.end();
    }

    /**
     * Measured values against their bands, one row per quantity, as percent deviation from nominal:
     * worst-case band an open dashed box, statistical band a grey box, measurement a black diamond
     * with its expanded uncertainty.
     */
    static String bands(List<BandRow> rows) {
        double span = 1e-9;
        for (BandRow r : rows) {
            for (double v : new double[] {r.worstLow(), r.worstHigh(), r.statLow(), r.statHigh(),
                    r.measured() - r.uncertainty(), r.measured() + r.uncertainty()}) {
                if (Double.isFinite(v) && r.nominal() != 0) {
                    span = Math.max(span, Math.abs(v / r.nominal() - 1));
                }
            }
        }
        span *= 1.15;
        int rowH = 28;
        int h = (int) (T + rowH * rows.size() + 70);
        Svg svg = new Svg(W, h, "Measured values against predicted bands");
        double x0 = 170;
        double x1 = W - R;
        double mid = (x0 + x1) / 2;
        double scale = (x1 - x0) / 2 / span;
        double step = niceStep(2 * span * 100, 6) / 100;
        double axisY = T + rowH * rows.size() + 6;
        for (double v = Math.ceil(-span / step) * step; v <= span + 1e-12; v += step) {
            double x = mid + v * scale;
            svg.line(x, T - 4, x, axisY, GRID);
            svg.text(x, axisY + 14, "middle", tick(v * 100, step * 100, span * 100, "%"));
        }
        svg.text(mid, axisY + 30, "middle", "deviation from nominal");
        svg.line(mid, T - 4, mid, axisY, "stroke:#000;stroke-width:0.8");
        for (int i = 0; i < rows.size(); i++) {
            BandRow r = rows.get(i);
            double yc = T + rowH * i + rowH / 2.0;
            svg.text(x0 - 8, yc + 4, "end", r.label());
            if (r.nominal() == 0 || !Double.isFinite(r.nominal())) {
                continue;
            }
            if (Double.isFinite(r.worstLow()) && Double.isFinite(r.worstHigh())) {
                double a = mid + (r.worstLow() / r.nominal() - 1) * scale;
                double b = mid + (r.worstHigh() / r.nominal() - 1) * scale;
                svg.rect(Math.min(a, b), yc - 9, Math.abs(b - a), 18, "fill:none;stroke:#000;stroke-width:1;stroke-dasharray:4,2");
            }
            if (Double.isFinite(r.statLow()) && Double.isFinite(r.statHigh())) {
                double a = mid + (r.statLow() / r.nominal() - 1) * scale;
                double b = mid + (r.statHigh() / r.nominal() - 1) * scale;
                svg.rect(Math.min(a, b), yc - 5, Math.abs(b - a), 10, "fill:#bbb;stroke:#555;stroke-width:0.5");
            }
            if (Double.isFinite(r.measured())) {
                double m = mid + (r.measured() / r.nominal() - 1) * scale;
                if (Double.isFinite(r.uncertainty()) && r.uncertainty() > 0) {
                    double du = r.uncertainty() / Math.abs(r.nominal()) * scale;
                    svg.line(m - du, yc, m + du, yc, "stroke:#000;stroke-width:1.5");
                }
                svg.path("M" + Svg.n(m) + " " + Svg.n(yc - 7) + " L" + Svg.n(m + 6) + " " + Svg.n(yc) + " L" + Svg.n(m)
                        + " " + Svg.n(yc + 7) + " L" + Svg.n(m - 6) + " " + Svg.n(yc) + " Z", "fill:#000;stroke:#fff;stroke-width:0.8");
            }
        }
        double ly = axisY + 48;
        svg.rect(x0, ly - 8, 26, 12, "fill:none;stroke:#000;stroke-width:1;stroke-dasharray:4,2");
        svg.text(x0 + 32, ly + 2, "start", "worst case");
        svg.rect(x0 + 130, ly - 5, 26, 8, "fill:#bbb;stroke:#555;stroke-width:0.5");
        svg.text(x0 + 162, ly + 2, "start", "statistical (95 %)");
        svg.path("M" + Svg.n(x0 + 318) + " " + Svg.n(ly - 7) + " l6 7 l-6 7 l-6 -7 Z", "fill:#000");
        svg.text(x0 + 330, ly + 2, "start", "measured ± U (k = 2)");
        return svg.end();
    }

    /** One row of {@link #bands}. */
    record BandRow(String label, double nominal, double worstLow, double worstHigh, double statLow, double statHigh,
            double measured, double uncertainty) {
    }

    /** A small mark for a verdict that needs no colour: a distinct shape per verdict. */
    static String verdictMark(String verdict) {
        Svg svg = new Svg(48, 48, "verdict " + verdict);
        String ink = "fill:none;stroke:#000;stroke-width:4;stroke-linecap:round;stroke-linejoin:round";
        switch (verdict) {
            case "pass" -> svg.raw("<circle cx=\"24\" cy=\"24\" r=\"20\" style=\"fill:none;stroke:#000;stroke-width:3\"/>")
                    .path("M14 25 L21 32 L34 16", ink);
            case "marginal" -> svg.path("M24 5 L44 42 L4 42 Z", "fill:none;stroke:#000;stroke-width:3;stroke-linejoin:round")
                    .path("M24 17 L24 30 M24 36 L24 37", ink);
            case "fail" -> svg.rect(5, 5, 38, 38, "fill:none;stroke:#000;stroke-width:3")
                    .path("M15 15 L33 33 M33 15 L15 33", ink);
            default -> svg.rect(5, 5, 38, 38, "fill:none;stroke:#000;stroke-width:3").path("M11 28 L37 28", ink);
        }
        return svg.end();
    }

    private static final String[] PREFIXES = {"p", "n", "µ", "m", "", "k", "M", "G"};

    /**
     * An axis label for {@code v} on an axis with label step {@code step} whose largest magnitude is
     * {@code maxAbs}: one SI prefix for the whole axis (from {@code maxAbs}) and just enough decimals
     * to tell neighbouring labels apart. {@code count} gives whole numbers; {@code %} a signed percent.
     */
    static String tick(double v, double step, double maxAbs, String unit) {
        double value = Math.abs(v) < step * 1e-6 ? 0 : v;
        if (unit.equals("count")) {
            return String.format(Locale.ROOT, "%d", Math.round(value));
        }
        int exp = 0;
        String prefix = "";
        boolean si = !unit.isEmpty() && !unit.equals("1") && !unit.equals("%");
        if (si && maxAbs > 0) {
            exp = (int) Math.floor(Math.log10(maxAbs) / 3) * 3;
            exp = Math.max(-12, Math.min(9, exp));
            prefix = PREFIXES[exp / 3 + 4];
        }
        double scale = Math.pow(10, exp);
        int decimals = (int) Math.max(0, Math.ceil(-Math.log10(step / scale) - 1e-9));
        String number = String.format(Locale.ROOT, (unit.equals("%") && value != 0 ? "%+." : "%.") + decimals + "f",
                value / scale);
        return unit.isEmpty() || unit.equals("1") ? number : number + " " + prefix + unit;
    }

    /** The step between axis labels: 1, 2 or 5 times a power of ten, giving about {@code ticks} labels over {@code range}. */
    static double niceStep(double range, int ticks) {
        double raw = range / ticks;
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double f = raw / mag;
        return (f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10) * mag;
    }

    /** A plot area mapping data to the view box. */
    private static final class Axes {
        private final double x0;
        private final double x1;
        private final double y0;
        private final double y1;

        Axes(double x0, double x1, double y0, double y1) {
            this.x0 = x0;
            this.x1 = x1 > x0 ? x1 : x0 + 1;
            this.y0 = y0;
            this.y1 = y1 > y0 ? y1 : y0 + 1;
        }

        double x(double v) {
            return L + (v - x0) / (x1 - x0) * (W - L - R);
        }

        double y(double v) {
            return H - B - (v - y0) / (y1 - y0) * (H - T - B);
        }

        void draw(Svg svg, String xUnit, String xLabel, String yUnit) {
            svg.rect(L, T, W - L - R, H - T - B, AXIS);
            double sx = niceStep(x1 - x0, 6);
            for (double v = Math.ceil(x0 / sx) * sx; v <= x1 + sx * 1e-9; v += sx) {
                svg.line(x(v), T, x(v), H - B, GRID);
                svg.text(x(v), H - B + 14, "middle", tick(v, sx, Math.max(Math.abs(x0), Math.abs(x1)), xUnit));
            }
            svg.text((L + W - R) / 2, H - 8, "middle", xLabel);
            drawValueAxis(svg, yUnit.equals("cycles") ? "count" : yUnit, yUnit);
        }

        void drawValueAxis(Svg svg, String unit, String label) {
            svg.rect(L, T, W - L - R, H - T - B, AXIS);
            double sy = niceStep(y1 - y0, 5);
            for (double v = Math.ceil(y0 / sy) * sy; v <= y1 + sy * 1e-9; v += sy) {
                svg.line(L, y(v), W - R, y(v), GRID);
                svg.text(L - 5, y(v) + 4, "end", tick(v, sy, Math.max(Math.abs(y0), Math.abs(y1)), unit));
            }
            svg.raw("<text x=\"10\" y=\"" + Svg.n((T + H - B) / 2) + "\" text-anchor=\"middle\" transform=\"rotate(-90 10 "
                    + Svg.n((T + H - B) / 2) + ")\">" + HtmlText.escape(label) + "</text>");
        }

        void dateAxis(Svg svg, Instant first, double spanYears) {
            for (int i = 0; i <= 4; i++) {
                double yrs = spanYears * i / 4;
                svg.line(x(yrs), T, x(yrs), H - B, GRID);
                svg.text(x(yrs), H - B + 14, "middle", DAY.format(TrendAnalysis.at(first, yrs)));
            }
            svg.text((L + W - R) / 2, H - 8, "middle", "date of run (UTC)");
        }
    }
}
