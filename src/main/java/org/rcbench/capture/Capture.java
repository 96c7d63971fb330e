package org.rcbench.capture;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * An opened capture: its header is read, its edges are streamed on request.
 *
 * <p>Opening reads and validates the header only; {@link #streamTo(EdgeSink)} then reads the edges
 * once, in order, without holding them in memory. Problems in the file throw
 * {@link org.rcbench.common.BadInputException} whose message is {@code file:line: what is wrong}.
 * Problems that still let the rest be analysed (a truncated final line from a crashed recorder)
 * are collected in {@link #warnings()}, complete once streaming has finished.
 */
public interface Capture extends AutoCloseable {

    /** The file or stream name used in messages, e.g. {@code captures/healthy.rce}. */
    String name();

    /** Ticks-to-seconds conversion declared by the file (clock_hz, calibration_ppm; VCD timescale). */
    Timebase timebase();

    /** All {@code key=value} header fields in file order (for VCD: date, version, timescale...). */
    Map<String, String> header();

    /** Channel numbers present, with display names where the file gives them. */
    Map<Integer, String> channels();

    /**
     * Signals the file declares that are not channels, with the reason, e.g.
     * {@code top.count -> "an 8-bit vector"}; empty for rcbench edge captures.
     */
    default Map<String, String> skippedSignals() {
        return Map.of();
    }

    /**
     * Streams every edge to {@code sink}, then calls {@link EdgeSink#onEnd(long)} once.
     * May be called only once.
     */
    void streamTo(EdgeSink sink) throws IOException;

    /** Non-fatal problems found so far, each one line of the form {@code file:line: what}. */
    List<String> warnings();

    @Override
    void close() throws IOException;
}
