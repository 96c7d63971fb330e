package org.rcbench.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.diagnose.Ambiguity;
import org.rcbench.diagnose.Diagnosis;
import org.rcbench.diagnose.FaultKind;
import org.rcbench.diagnose.QuantityCheck;
import org.rcbench.diagnose.Suspect;
import org.rcbench.diagnose.Verdict;
import org.rcbench.diagnose.Words;
import org.rcbench.measure.BistableMeter.BistableResult;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MonostableMeter.MonostableResult;
import org.rcbench.probe.SessionStatus;
import org.rcbench.source.LiveReading;
import org.rcbench.source.StreamStart;
import org.rcbench.tolerance.Prediction;
import org.rcbench.units.SiFormat;
import org.rcbench.units.ValueCode;

/**
 * The lines of {@code rcbench watch}: what is measured now (the rolling figures over the newest
 * cycles), and with a design its nominal, bands and a verdict per quantity, the finding (no part
 * off, or the top suspect and what the measurement cannot tell apart from it), and a tuning step
 * for a potentiometer (all from
 * {@link WatchJudge}, that is from the diagnosis stage). A function of its inputs (the judge caches
 * per reading), so it is tested without a terminal.
 */
final class WatchView {
    private static final String ROW = "  %-11s %-14s %-11s %-24s %s";

    /** The lines, whether any quantity was judged, and whether any is out of its worst-case band. */
    record Screen(List<String> lines, boolean judged, boolean fails) {
    }

    private WatchView() {
    }

    static Screen render(StreamStart start, SessionStatus status, LiveReading r, Design design, WatchJudge judge) {
        List<String> lines = new ArrayList<>();
        lines.add(start.source() + (design == null ? "" : "  ·  design " + design.title() + " (" + design.source() + ")"));
        if (start.hello() != null) {
            lines.add("  " + start.hello().summary());
        }
        lines.add("  " + start.clockNote());
        Prediction p = judge == null ? null : judge.prediction();
        WatchJudge.Judgement j = null;
        if (r == null) {
            lines.add("  waiting for the first edges");
        } else {
            j = judge == null ? null : judge.of(r);
            Measurement m = r.measurement();
            Measurement.Irregularities irr = m.irregularities();
            lines.add(String.format(Locale.ROOT, "  %s of signal: %d edges, %d cycle%s measured (%d settling, %d glitches),"
                    + " %d gaps", SiFormat.format(r.probeSeconds(), "s", 3), r.edges(), m.cycles(), m.cycles() == 1 ? "" : "s",
                    irr.settlingCycles(), irr.glitches(), r.gaps()));
            if (r.bistable() != null) {
                latch(lines, r.bistable());
            } else if (r.monostable() != null) {
                pulse(lines, r.monostable(), p, j);
            } else {
                cycles(lines, m, p, j);
            }
            if (j != null) {
                diagnosis(lines, j);
            }
            if (p != null && !p.runs()) {
                lines.add("  the design itself does not run: " + p.reason());
            }
            if (j != null && j.verdict() != null) {
                lines.add("  verdict: " + switch (j.verdict()) {
                    case PASS -> "PASS, every quantity inside its 95 % band";
                    case MARGINAL -> "MARGINAL, outside the 95 % band but inside the worst case";
                    default -> "FAIL, outside the worst case";
                });
            }
        }
        lines.add("  " + status.line());
        boolean judged = j != null && j.verdict() != null;
        return new Screen(lines, judged, judged && j.verdict() == Verdict.FAIL);
    }

    /**
     * The finding: that no part needs to be off, or (when a fault is the likelier explanation) the
     * top suspect and what the measurement cannot tell apart from it; then the tuning step.
     */
    private static void diagnosis(List<String> lines, WatchJudge.Judgement j) {
        Diagnosis d = j.diagnosis();
        Suspect top = d == null ? null : d.topSuspect();
        if (d != null && (top == null || !(d.noFaultProbability() < 0.5))) {
            String summary = d.summary();
            int end = summary.indexOf(". ");
            lines.add("  diagnosis: " + (end < 0 ? summary : summary.substring(0, end + 1)));
        } else if (d != null) {
            String value = top.kind() == FaultKind.FAMILY ? "" : " at " + ValueCode.formatSi(top.value(), top.unit(), 3)
                    + (Double.isFinite(top.deviation()) ? String.format(Locale.ROOT, " (%+.1f %%%s)", 100 * top.deviation(),
                            Double.isFinite(top.toleranceMultiple())
                                    ? String.format(Locale.ROOT, ", %.1f× its tolerance", top.toleranceMultiple()) : "")
                            : "");
            lines.add(String.format(Locale.ROOT, "  top suspect: %s%s, probability %.0f %%", top.label(), value,
                    100 * top.probability()));
            if (d.ambiguous()) {
                Ambiguity a = d.ambiguities().get(0);
                lines.add("  cannot tell apart: " + String.join(", ", a.between())
                        + (a.determined() == null || a.determined().isEmpty() ? "" : "; " + a.determined()));
            }
        }
        if (j.tuning() != null) {
            lines.add("  tuning: " + j.tuning().step());
        } else if (j.tuneError() != null) {
            lines.add("  tuning: " + j.tuneError());
        }
    }

    private static void cycles(List<String> lines, Measurement m, Prediction p, WatchJudge.Judgement j) {
        Measurement.Rolling roll = m.rolling();
        if (roll.cycles() == 0) {
            lines.add("  no complete cycle yet");
            return;
        }
        lines.add(String.format(Locale.ROOT, ROW, "", "now (" + roll.cycles() + " cyc)", p == null ? "" : "design",
                p == null ? "" : "95 % band", p == null ? "" : "verdict"));
        row(lines, TimingQuantity.FREQUENCY, roll.frequencyHz(), j);
        row(lines, TimingQuantity.DUTY, roll.duty(), j);
        row(lines, TimingQuantity.HIGH, roll.highSeconds(), j);
        row(lines, TimingQuantity.LOW, roll.lowSeconds(), j);
        Measurement.Jitter jit = m.jitter();
        lines.add(String.format(Locale.ROOT, "  %-11s %s RMS per period, %s cycle to cycle (quantization removed%s)",
                "jitter", SiFormat.format(jit.periodRmsCorrectedSeconds(), "s", 3),
                SiFormat.format(jit.cycleToCycleRmsCorrectedSeconds(), "s", 3),
                jit.periodCorrectionClamped() ? "; below the probe's resolution" : ""));
        lines.add(String.format(Locale.ROOT, "  %-11s %s ± %s (k = 2) over all %d cycles", "since start",
                SiFormat.format(m.frequency().frequencyHz(), "Hz", 7), SiFormat.format(m.frequency().expandedHz(), "Hz", 2),
                m.cycles()));
    }

    private static void pulse(List<String> lines, MonostableResult mono, Prediction p, WatchJudge.Judgement j) {
        lines.add(String.format(Locale.ROOT, "  triggers    %d (%d ignored during a pulse), %d pulses timed", mono.triggers(),
                mono.ignoredTriggers(), mono.pulses()));
        if (mono.pulses() == 0) {
            lines.add("  no complete pulse yet");
            return;
        }
        lines.add(String.format(Locale.ROOT, ROW, "", "mean", p == null ? "" : "design", p == null ? "" : "95 % band",
                p == null ? "" : "verdict"));
        row(lines, TimingQuantity.PULSE_WIDTH, mono.pulseWidth().meanSeconds(), j);
        lines.add(String.format(Locale.ROOT, "  %-11s %s (trigger to output)", "delay",
                SiFormat.format(mono.delay().meanSeconds(), "s", 3)));
    }

    private static void latch(List<String> lines, BistableResult b) {
        lines.add(String.format(Locale.ROOT, "  set         %d presses, %d bounces; response %s", b.setPresses(),
                b.setBounces(), SiFormat.format(b.setResponse().meanSeconds(), "s", 3)));
        lines.add(String.format(Locale.ROOT, "  reset       %d presses, %d bounces; response %s", b.resetPresses(),
                b.resetBounces(), SiFormat.format(b.resetResponse().meanSeconds(), "s", 3)));
        lines.add(String.format(Locale.ROOT, "  unexplained %d output changes with no press, %d presses that changed nothing",
                b.spontaneous(), b.noChange()));
    }

    /** One quantity's row, with its verdict when the judge compared it. */
    private static void row(List<String> lines, TimingQuantity q, double value, WatchJudge.Judgement j) {
        String measured = Words.value(q, value);
        QuantityCheck c = j == null ? null : j.row(q);
        if (c == null) {
            lines.add(String.format(Locale.ROOT, ROW, label(q), measured, "", "", "").stripTrailing());
            return;
        }
        String verdict = c.status().fileName() + (c.status() == Verdict.PASS ? "" : " (" + offset(c) + ")");
        lines.add(String.format(Locale.ROOT, ROW, label(q), measured, Words.value(q, c.nominal()),
                Words.band(q, c.statistical()), verdict).stripTrailing());
    }

    /** The deviation from nominal, e.g. {@code +33.3 %} (duty: {@code +9.85 % pts}). */
    private static String offset(QuantityCheck c) {
        if (c.quantity() == TimingQuantity.DUTY) {
            return String.format(Locale.ROOT, "%+.2f %% pts", (c.measured() - c.nominal()) * 100);
        }
        return String.format(Locale.ROOT, "%+.1f %%", c.deviation() * 100);
    }

    private static String label(TimingQuantity q) {
        return switch (q) {
            case FREQUENCY -> "frequency";
            case DUTY -> "duty";
            case HIGH -> "high";
            case LOW -> "low";
            case PULSE_WIDTH -> "pulse width";
            default -> q.jsonKey();
        };
    }
}
