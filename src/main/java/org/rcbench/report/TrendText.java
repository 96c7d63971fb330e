package org.rcbench.report;

import java.util.Locale;
import org.rcbench.history.PartTrend;
import org.rcbench.history.Projection;
import org.rcbench.history.TrendAnalysis;

/** One-sentence descriptions of a part's trend, shared by the history command and the report. Stateless. */
public final class TrendText {
    private TrendText() {
    }

    /**
     * E.g. {@code C1 (nominal 100 nF ±10 %): 4 runs over 3.0 years, -2.00 nF a year (standard error
     * 0.11 nF a year, -2.0 % a year); leaves its band (90 nF) around 2024-12, 95 % range ...}.
     */
    public static String describe(TrendAnalysis a) {
        PartTrend t = a.trend();
        StringBuilder sb = new StringBuilder();
        sb.append(t.part()).append(" (nominal ").append(HtmlText.value(t.nominal(), t.unit()));
        if (t.tolerance() != null) {
            sb.append(' ').append(HtmlText.tolerance(t.tolerance()));
        }
        sb.append("): ").append(a.runs()).append(a.runs() == 1 ? " run" : " runs");
        if (a.runs() >= 2) {
            sb.append(String.format(Locale.ROOT, " over %.1f years", a.spanYears()));
        }
        if (Double.isFinite(a.slopePerYear())) {
            sb.append(", ").append(perYear(a.slopePerYear(), t.unit()));
            if (Double.isFinite(a.slopeStdErrPerYear())) {
                sb.append(" (standard error ").append(perYear(a.slopeStdErrPerYear(), t.unit()));
                if (Double.isFinite(a.relativeSlopePerYear())) {
                    sb.append(", ").append(HtmlText.signedPercent(a.relativeSlopePerYear())).append(" a year");
                }
                if (a.slopePValue() < 0.001) {
                    sb.append(", p < 0.001");
                } else if (Double.isFinite(a.slopePValue())) {
                    sb.append(String.format(Locale.ROOT, ", p = %.2g", a.slopePValue()));
                }
                sb.append(')');
            }
        }
        Projection p = a.projection();
        sb.append("; ").append(p.text(Double.isFinite(p.edge()) ? HtmlText.value(p.edge(), t.unit()) : ""));
        return sb.toString();
    }

    private static String perYear(double v, String unit) {
        String s = HtmlText.value(v, unit);
        return (v > 0 ? "+" : "") + s + " a year";
    }
}
