package org.rcbench.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.BistableMeter.BistableResult;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MonostableMeter.MonostableResult;
import org.rcbench.stability.StabilityPoint;
import org.rcbench.units.SiFormat;

/** The readable form of a measurement: one labelled line per figure, units chosen by magnitude. */
final class MeasurementTable {
    private MeasurementTable() {
    }

    static void print(PrintWriter out, String name, String channelName, Timebase timebase, Measurement m,
            MonostableResult mono, BistableResult latch) {
        String ch = channelName.isEmpty() ? "channel " + m.channel() : "channel " + m.channel() + " (" + channelName + ")";
        row(out, "capture", name + ", " + ch);
        row(out, "probe clock", SiFormat.format(timebase.clockHz(), "Hz", 6)
                + String.format(Locale.ROOT, ", offset %+.3f ppm, u %.3g ppm", timebase.offsetPpm(),
                        timebase.tolerancePpm()));
        Measurement.Irregularities irr = m.irregularities();
        row(out, "cycles", String.format(Locale.ROOT,
                "%d measured over %s (set aside: %d settling, %d glitches, %d gaps, %d stalls)",
                m.cycles(), SiFormat.format(m.spanSeconds(), "s"), irr.settlingCycles(), irr.glitches(), irr.gaps(),
                irr.stalls()));
        if (m.cycles() > 0) {
            Measurement.FrequencyEstimate f = m.frequency();
            row(out, "frequency", SiFormat.format(f.frequencyHz(), "Hz", 7) + " ± "
                    + SiFormat.format(f.expandedHz(), "Hz", 2)
                    + String.format(Locale.ROOT, " (%.3g ppm, k = 2)", f.expandedHz() / f.frequencyHz() * 1e6));
            row(out, "", "standard uncertainties: statistical " + SiFormat.format(f.statisticalHz(), "Hz", 2)
                    + ", quantization " + SiFormat.format(f.quantizationHz(), "Hz", 2) + ", probe clock "
                    + SiFormat.format(f.clockHz(), "Hz", 2));
            row(out, "period", SiFormat.format(f.periodSeconds(), "s", 7) + "  (u "
                    + SiFormat.format(f.periodStandardUncertaintySeconds(), "s", 2) + ")");
            row(out, "high", interval(m.high()));
            row(out, "low", interval(m.low()));
            row(out, "duty", SiFormat.percent(m.duty(), 3) + "  (u " + String.format(Locale.ROOT, "%.2g %%", m.dutyStandardUncertainty() * 100)
                    + ")");
            Measurement.Jitter j = m.jitter();
            row(out, "period jitter", SiFormat.format(j.periodRmsSeconds(), "s", 3) + " RMS, "
                    + SiFormat.format(j.periodPeakToPeakSeconds(), "s", 3) + " peak-to-peak; corrected for"
                    + " quantization " + SiFormat.format(j.periodRmsCorrectedSeconds(), "s", 3)
                    + (j.periodCorrectionClamped() ? " (below resolution)" : ""));
            row(out, "cycle-to-cycle", SiFormat.format(j.cycleToCycleRmsSeconds(), "s", 3) + " RMS, "
                    + SiFormat.format(j.cycleToCycleMaxSeconds(), "s", 3) + " largest; corrected "
                    + SiFormat.format(j.cycleToCycleRmsCorrectedSeconds(), "s", 3)
                    + (j.cycleToCycleCorrectionClamped() ? " (below resolution)" : ""));
            row(out, "", "one tick is " + SiFormat.format(timebase.tickSeconds(), "s", 4) + ": quantization "
                    + SiFormat.format(j.quantizationPerPeriodSeconds(), "s", 4) + " RMS per period");
            row(out, "time error", "TIE " + SiFormat.format(m.timeError().tieRmsSeconds(), "s", 3) + " RMS, MTIE "
                    + SiFormat.format(m.timeError().mtieSeconds(), "s", 3));
            for (Measurement.MtiePoint p : m.timeError().windows()) {
                row(out, "", String.format(Locale.ROOT, "MTIE over %d cycles (%s): %s", p.windowCycles(),
                        SiFormat.format(p.windowSeconds(), "s", 3), SiFormat.format(p.mtieSeconds(), "s", 3)));
            }
            Measurement.Drift d = m.drift();
            row(out, "drift", String.format(Locale.ROOT, "%.3g ppm/s", d.ppmPerSecond())
                    + (d.warmUp() ? String.format(Locale.ROOT, "; warm-up: settled after %d cycles, then %.3g ppm/s",
                            d.settledAtCycle(), d.settledPpmPerSecond()) : "; no warm-up seen"));
            String label = "Allan deviation";
            for (StabilityPoint p : m.allan()) {
                row(out, label, String.format(Locale.ROOT, "tau %-10s %.3e", SiFormat.format(p.tauSeconds(), "s", 3),
                        p.deviation()));
                label = "";
            }
        }
        if (mono != null) {
            row(out, "triggers", String.format(Locale.ROOT, "%d (%d pulses timed, %d ignored, %d untriggered pulses)",
                    mono.triggers(), mono.pulses(), mono.ignoredTriggers(), mono.untriggeredPulses()));
            row(out, "pulse width", interval(mono.pulseWidth()));
            row(out, "delay", interval(mono.delay()));
        }
        if (latch != null) {
            row(out, "set", String.format(Locale.ROOT, "%d presses, %d bounces; response %s", latch.setPresses(),
                    latch.setBounces(), interval(latch.setResponse())));
            row(out, "reset", String.format(Locale.ROOT, "%d presses, %d bounces; response %s", latch.resetPresses(),
                    latch.resetBounces(), interval(latch.resetResponse())));
            row(out, "", String.format(Locale.ROOT, "%d presses changed nothing, %d output changes without a press",
                    latch.noChange(), latch.spontaneous()));
        }
        for (String w : m.warnings()) {
            row(out, "note", w);
        }
    }

    private static String interval(Measurement.TimeStats t) {
        if (t.count() == 0) {
            return "—";
        }
        return SiFormat.format(t.meanSeconds(), "s", 6) + "  (u " + SiFormat.format(t.standardUncertaintySeconds(), "s", 2)
                + ", sd " + SiFormat.format(t.stdDevSeconds(), "s", 3) + ", " + SiFormat.format(t.minSeconds(), "s", 4)
                + " … " + SiFormat.format(t.maxSeconds(), "s", 4) + ")";
    }

    private static void row(PrintWriter out, String label, String text) {
        out.println(String.format(Locale.ROOT, "%-16s %s", label, text));
    }
}
