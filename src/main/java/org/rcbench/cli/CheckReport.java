package org.rcbench.cli;

import java.util.Locale;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.diagnose.Ambiguity;
import org.rcbench.diagnose.CheckResult;
import org.rcbench.diagnose.Diagnosis;
import org.rcbench.diagnose.Estimate;
import org.rcbench.diagnose.FaultKind;
import org.rcbench.diagnose.QuantityCheck;
import org.rcbench.diagnose.Suspect;
import org.rcbench.diagnose.Words;
import org.rcbench.measure.Measurement;
import org.rcbench.units.SiFormat;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * The readable form of a check: the verdict line first, then measured against predicted with the
 * bands, then the diagnosis (summary, suspects, estimates, what the measurement cannot tell apart).
 */
final class CheckReport {
    /** Suspects below this probability are not listed (they stay in the JSON). */
    static final double LIST_FROM = 0.01;

    private CheckReport() {
    }

    /**
     * The report of {@code r}; {@code source} names what was measured (a capture, a live source) and
     * {@code pulses} is the number of monostable pulses timed from the trigger channel, or -1 when the
     * cycles were counted.
     */
    static String text(CheckResult r, String source, long pulses) {
        StringBuilder sb = new StringBuilder();
        sb.append(r.verdict().name()).append("  ").append(r.design().title()).append(": ").append(r.reason()).append('\n');
        Measurement m = r.measurement();
        long n = pulses >= 0 ? pulses : m.cycles();
        String span = Double.isFinite(m.spanSeconds()) && m.spanSeconds() > 0
                ? " in " + SiFormat.format(m.spanSeconds(), "s", 3) : "";
        sb.append(String.format(Locale.ROOT, "(%s: %d %s%s%s; design %s)%n", source, n, pulses >= 0 ? "pulse" : "cycle",
                n == 1 ? "" : "s", span, r.design().source()));
        if (!r.checks().isEmpty()) {
            sb.append('\n');
            sb.append(String.format(Locale.ROOT, "%-12s %-24s %-12s %-24s %-24s %s%n", "", "measured", "nominal",
                    "95 % band", "worst case", "status"));
            for (QuantityCheck c : r.checks()) {
                TimingQuantity q = c.quantity();
                String measured = Words.value(q, c.measured()) + (Double.isFinite(c.uncertainty())
                        ? " ± " + uncertainty(q, c.uncertainty()) : "");
                sb.append(String.format(Locale.ROOT, "%-12s %-24s %-12s %-24s %-24s %s%n", Words.name(q), measured,
                        Words.value(q, c.nominal()), Words.band(q, c.statistical()), Words.band(q, c.worstCase()),
                        c.status().fileName()));
            }
        }
        diagnosis(sb, r.diagnosis());
        return sb.toString();
    }

    static void diagnosis(StringBuilder sb, Diagnosis d) {
        sb.append("\nDiagnosis: ").append(d.summary()).append('\n');
        if (!d.solved()) {
            return;
        }
        sb.append("\nSuspects (probability that each is at fault; value it would have):\n");
        int listed = 0;
        for (Suspect s : d.suspects()) {
            if (s.probability() < LIST_FROM) {
                continue;
            }
            listed++;
            sb.append(String.format(Locale.ROOT, "  %-28s %5.1f %%  %s%n", s.label(), 100 * s.probability(), value(s)));
        }
        if (listed == 0) {
            sb.append("  none above 1 %\n");
        }
        sb.append("\nEstimated parts (median and 95 % interval over all explanations):\n");
        for (Estimate e : d.estimates()) {
            boolean wiper = e.unit() == Unit.NONE;
            sb.append(String.format(Locale.ROOT, "  %-10s %-12s %-28s nominal %s%n", e.name(), format(e.value(), e.unit(), wiper),
                    format(e.low(), e.unit(), wiper) + " .. " + format(e.high(), e.unit(), wiper),
                    format(e.nominal(), e.unit(), wiper)));
        }
        if (d.ambiguous()) {
            sb.append("\nWhat the measurement cannot tell:\n");
            for (Ambiguity a : d.ambiguities()) {
                sb.append("  - ").append(a.text()).append('\n');
            }
        }
    }

    /** An expanded uncertainty with two significant digits; a duty's in percentage points. */
    private static String uncertainty(TimingQuantity q, double u) {
        return q == TimingQuantity.DUTY ? String.format(Locale.ROOT, "%.2g pts", u * 100)
                : SiFormat.format(u, q.unit().symbol(), 2);
    }

    private static String value(Suspect s) {
        if (s.kind() == FaultKind.FAMILY) {
            return "";
        }
        String v = ValueCode.formatSi(s.value(), s.unit(), 3) + " (95 %: " + ValueCode.formatSi(s.low(), s.unit(), 2)
                + " .. " + ValueCode.formatSi(s.high(), s.unit(), 2) + ")";
        if (!Double.isFinite(s.nominal())) {
            return v;
        }
        return v + String.format(Locale.ROOT, ", nominal %s, %+.1f %%", ValueCode.formatSi(s.nominal(), s.unit(), 3),
                100 * s.deviation()) + (Double.isFinite(s.toleranceMultiple())
                        ? String.format(Locale.ROOT, ", %.1f× its tolerance", s.toleranceMultiple()) : "");
    }

    private static String format(double v, Unit unit, boolean wiper) {
        return wiper ? String.format(Locale.ROOT, "%.3f", v) : ValueCode.formatSi(v, unit, 4);
    }
}
