package org.rcbench.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import org.rcbench.capture.Capture;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Writes one channel's cycles as CSV, one record per cycle ({@link CycleExtractor} decides what a
 * cycle is): {@code cycle,start_tick,start_s,period_s,high_s,low_s,duty}. Seconds come from the
 * capture's timebase, calibration offset applied; duty is high over period. Stateless.
 */
public final class CycleCsv {
    /** The header record. */
    public static final String[] HEADER = {"cycle", "start_tick", "start_s", "period_s", "high_s", "low_s", "duty"};

    /** What was written. */
    public record Summary(long cycles, long gaps, long repeatedLevels) {
    }

    private CycleCsv() {
    }

    /** Streams {@code capture} once and writes channel {@code channel}'s cycles to {@code out} (not closed). */
    public static Summary write(Capture capture, int channel, Writer out) throws IOException {
        CsvWriter csv = new CsvWriter(out);
        csv.row(HEADER);
        Timebase tb = capture.timebase();
        long[] index = {0};
        CycleExtractor cycles = new CycleExtractor(channel, (start, high, period) -> {
            try {
                csv.field(++index[0]).field(start).field(tb.seconds(start)).field(tb.seconds(period))
                        .field(tb.seconds(high)).field(tb.seconds(period - high)).field((double) high / period).end();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
        try {
            capture.streamTo(new EdgeSink() {
                @Override
                public void onEdge(long tick, int ch, int level) {
                    cycles.onEdge(tick, ch, level);
                }
            });
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        csv.flush();
        return new Summary(cycles.cycles(), cycles.gaps(), cycles.repeatedLevels());
    }
}
