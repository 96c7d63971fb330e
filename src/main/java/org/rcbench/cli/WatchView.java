package org.rcbench.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.measure.BistableMeter.BistableResult;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MonostableMeter.MonostableResult;
import org.rcbench.probe.SessionStatus;
import org.rcbench.source.LiveReading;
import org.rcbench.source.StreamStart;
import org.rcbench.tolerance.Prediction;
import org.rcbench.units.SiFormat;

/**
 * The lines of {@code rcbench watch}: what is measured now (the rolling figures over the newest
 * cycles), and with a design its nominal, bands and a verdict per quantity, and a tuning hint.
 * A pure function of its inputs, so it is tested without a terminal.
 */
final class WatchView {
    private static final String ROW = "  %-11s %-14s %-11s %-24s %s";

    /** The lines, whether any quantity was judged, and whether any is out of its worst-case band. */
    record Screen(List<String> lines, boolean judged, boolean fails) {
    }

    private WatchView() {
    }

    static Screen render(StreamStart start, SessionStatus status, LiveReading r, Design design, Prediction p) {
        List<String> lines = new ArrayList<>();
        lines.add(start.source() + (design == null ? "" : "  ·  design " + design.title() + " (" + design.source() + ")"));
        if (start.hello() != null) {
            lines.add("  " + start.hello().summary());
        }
        lines.add("  " + start.clockNote());
        Tally tally = new Tally();
        if (r == null) {
            lines.add("  waiting for the first edges");
        } else {
            Measurement m = r.measurement();
            Measurement.Irregularities irr = m.irregularities();
            lines.add(String.format(Locale.ROOT, "  %s of signal: %d edges, %d cycles measured (%d settling, %d glitches),"
                    + " %d gaps", SiFormat.format(r.probeSeconds(), "s", 3), r.edges(), m.cycles(), irr.settlingCycles(),
                    irr.glitches(), r.gaps()));
            if (r.bistable() != null) {
                latch(lines, r.bistable());
            } else if (r.monostable() != null) {
                pulse(lines, r.monostable(), p, tally);
            } else {
                cycles(lines, m, p, tally);
                if (design != null && p != null && m.rolling().cycles() > 0) {
                    String hint = BandCheck.tuning(design, p, m.rolling().frequencyHz(), m.rolling().duty());
                    if (hint != null) {
                        lines.add("  tuning: " + hint);
                    }
                }
            }
            if (p != null && !p.runs()) {
                lines.add("  the design itself does not run: " + p.reason());
            }
            if (tally.judged) {
                lines.add(tally.fails ? "  board: OUT OF BAND" : "  board: within the design's bands");
            }
        }
        lines.add("  " + status.line());
        return new Screen(lines, tally.judged, tally.fails);
    }

    /** What the rows found. */
    private static final class Tally {
        boolean judged;
        boolean fails;
    }

    private static void cycles(List<String> lines, Measurement m, Prediction p, Tally tally) {
        Measurement.Rolling roll = m.rolling();
        if (roll.cycles() == 0) {
            lines.add("  no complete cycle yet");
            return;
        }
        lines.add(String.format(Locale.ROOT, ROW, "", "now (" + roll.cycles() + " cyc)", p == null ? "" : "design",
                p == null ? "" : "95 % band", p == null ? "" : "verdict"));
        // The rolling window holds fewer cycles than the whole run: its expanded uncertainty is the whole
        // run's scaled by sqrt(N / n), which over-states the clock's share (never under-states the total).
        double scale = Math.sqrt(Math.max(1.0, (double) m.cycles() / roll.cycles()));
        row(lines, TimingQuantity.FREQUENCY, roll.frequencyHz(), scale * m.frequency().expandedHz(), p, tally);
        row(lines, TimingQuantity.DUTY, roll.duty(), scale * 2 * m.dutyStandardUncertainty(), p, tally);
        row(lines, TimingQuantity.HIGH, roll.highSeconds(), scale * 2 * m.high().standardUncertaintySeconds(), p, tally);
        row(lines, TimingQuantity.LOW, roll.lowSeconds(), scale * 2 * m.low().standardUncertaintySeconds(), p, tally);
        Measurement.Jitter j = m.jitter();
        lines.add(String.format(Locale.ROOT, "  %-11s %s RMS per period, %s cycle to cycle (quantization removed%s)",
                "jitter", SiFormat.format(j.periodRmsCorrectedSeconds(), "s", 3),
                SiFormat.format(j.cycleToCycleRmsCorrectedSeconds(), "s", 3),
                j.periodCorrectionClamped() ? "; below the probe's resolution" : ""));
        lines.add(String.format(Locale.ROOT, "  %-11s %s ± %s (k = 2) over all %d cycles", "since start",
                SiFormat.format(m.frequency().frequencyHz(), "Hz", 7), SiFormat.format(m.frequency().expandedHz(), "Hz", 2),
                m.cycles()));
    }

    private static void pulse(List<String> lines, MonostableResult mono, Prediction p, Tally tally) {
        lines.add(String.format(Locale.ROOT, "  triggers    %d (%d ignored during a pulse), %d pulses timed", mono.triggers(),
                mono.ignoredTriggers(), mono.pulses()));
        if (mono.pulses() == 0) {
            lines.add("  no complete pulse yet");
            return;
        }
        lines.add(String.format(Locale.ROOT, ROW, "", "mean", p == null ? "" : "design", p == null ? "" : "95 % band",
                p == null ? "" : "verdict"));
        row(lines, TimingQuantity.PULSE_WIDTH, mono.pulseWidth().meanSeconds(),
                2 * mono.pulseWidth().standardUncertaintySeconds(), p, tally);
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

    /** One quantity's row, judged against the prediction when there is one. */
    private static void row(List<String> lines, TimingQuantity q, double value, double u, Prediction p, Tally tally) {
        String measured = PredictCommand.value(q, value);
        if (p == null || !p.quantities().contains(q)) {
            lines.add(String.format(Locale.ROOT, ROW, label(q), measured, "", "", "").stripTrailing());
            return;
        }
        double nominal = p.nominal(q);
        BandCheck.Verdict v = BandCheck.judge(value, u, p.statistical(q), p.worstCase(q));
        String off = BandCheck.offset(value, nominal, q);
        String verdict = v.words + (v == BandCheck.Verdict.IN_BAND || off.isEmpty() ? "" : " (" + off + ")");
        lines.add(String.format(Locale.ROOT, ROW, label(q), measured, PredictCommand.value(q, nominal),
                PredictCommand.band(q, p.statistical(q)), verdict).stripTrailing());
        tally.judged |= v != BandCheck.Verdict.NONE;
        tally.fails |= v.fails();
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
