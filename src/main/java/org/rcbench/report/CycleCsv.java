package org.rcbench.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import org.rcbench.capture.Capture;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleListener;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MeterConfig;

/**
 * Writes one channel's cycles as CSV, one record per cycle the measurement core forms
 * ({@link CycleMeter} with a {@link CycleListener}: rising edge to rising edge, glitches merged,
 * never across a gap, a stall or a lost edge; start-up settling cycles included and flagged):
 * {@code cycle,start_tick,start_s,period_s,high_s,low_s,duty,flags}. Seconds come from the
 * capture's timebase, calibration offset applied; duty is high over period; {@code flags} is empty
 * for a measured cycle, else words separated by spaces: {@code settling} (set aside, not in the
 * measurement), {@code new-run} (first after the start, a gap, a stall or a lost edge),
 * {@code glitch-removed} (a runt pulse inside it was merged away). Stateless.
 */
public final class CycleCsv {
    /** The header record. */
    public static final String[] HEADER = {"cycle", "start_tick", "start_s", "period_s", "high_s", "low_s", "duty",
        "flags"};

    /**
     * What was written.
     *
     * @param cycles         records written (settling cycles included)
     * @param settlingCycles of them, settling
     * @param glitches       runt pulses removed
     * @param gaps           gaps on the channel (no cycle spans one)
     * @param repeatedLevels lost edges seen (two equal levels in a row)
     */
    public record Summary(long cycles, long settlingCycles, long glitches, long gaps, long repeatedLevels) {
    }

    /** {@link #words} of every combination of the three flags, by their bits. */
    private static final String[] WORDS = new String[8];

    static {
        for (int f = 0; f < 8; f++) {
            StringBuilder sb = new StringBuilder();
            sb.append((f & CycleListener.SETTLING) != 0 ? " settling" : "");
            sb.append((f & CycleListener.NEW_RUN) != 0 ? " new-run" : "");
            sb.append((f & CycleListener.GLITCH_REMOVED) != 0 ? " glitch-removed" : "");
            WORDS[f] = sb.toString().strip();
        }
    }

    private CycleCsv() {
    }

    /** Streams {@code capture} once and writes channel {@code channel}'s cycles to {@code out} (not closed). */
    public static Summary write(Capture capture, int channel, Writer out) throws IOException {
        CsvWriter csv = new CsvWriter(out);
        csv.row(HEADER);
        Timebase tb = capture.timebase();
        long[] index = {0};
        CycleMeter meter = new CycleMeter(MeterConfig.of(channel, tb), (start, high, low, flags) -> {
            long period = high + low;
            try {
                csv.field(++index[0]).field(start).field(tb.seconds(start)).field(tb.seconds(period))
                        .field(tb.seconds(high)).field(tb.seconds(low)).field((double) high / period).field(words(flags))
                        .end();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
        try {
            capture.streamTo(meter);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        csv.flush();
        Measurement.Irregularities irr = meter.snapshot().irregularities();
        return new Summary(index[0], irr.settlingCycles(), irr.glitches(), irr.gaps(), irr.missedEdges());
    }

    /** The flags as words, e.g. {@code settling new-run}, or empty. */
    static String words(int flags) {
        return WORDS[flags & 7];
    }
}
