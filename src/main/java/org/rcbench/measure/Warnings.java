package org.rcbench.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Plain-language cautions attached to a {@link Measurement}. Stateless. */
final class Warnings {
    private Warnings() {
    }

    static List<String> of(long cycles, Measurement.FrequencyEstimate frequency, Measurement.Jitter jitter,
            Measurement.Irregularities irregular, boolean recordSaturated) {
        List<String> w = new ArrayList<>();
        if (cycles == 0) {
            w.add("no complete cycle was measured");
            return w;
        }
        if (cycles < 16) {
            w.add(String.format(Locale.ROOT, "only %d cycles measured: figures are rough", cycles));
        }
        if (!frequency.quantizationDecorrelated()) {
            w.add("period readings vary by less than one probe tick: the frequency uncertainty uses the one-tick"
                    + " floor and the jitter figures are at the probe's resolution");
        } else if (jitter.periodCorrectionClamped()) {
            w.add("period jitter is below the probe's quantization noise");
        }
        if (irregular.settlingCycles() > 0) {
            w.add(String.format(Locale.ROOT, "%d settling cycles at the start were excluded",
                    irregular.settlingCycles()));
        }
        if (irregular.glitches() > 0) {
            w.add(String.format(Locale.ROOT, "%d glitches (runt pulses) were dropped", irregular.glitches()));
        }
        if (irregular.gaps() > 0) {
            w.add(String.format(Locale.ROOT, "%d gaps in the data: no cycle spans a gap", irregular.gaps()));
        }
        if (irregular.stalls() > 0) {
            w.add(String.format(Locale.ROOT, "the output stalled %d times (%.3g s in all)", irregular.stalls(),
                    irregular.stalledSeconds()));
        }
        if (irregular.missedEdges() > 0) {
            w.add(String.format(Locale.ROOT, "%d edges seem to have been lost (level repeated)",
                    irregular.missedEdges()));
        }
        if (recordSaturated) {
            w.add("too many gaps for the time-error record: MTIE covers only the first part of the capture");
        }
        return w;
    }
}
