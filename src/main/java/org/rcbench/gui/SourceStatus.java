package org.rcbench.gui;

import java.util.Objects;

/**
 * One status snapshot of a live source, made on the source's thread and shown by the window.
 *
 * @param state   where the source is
 * @param line    one line saying what is happening, e.g. {@code waiting for the probe's hello on /dev/ttyUSB0}
 * @param probe   the probe's id and name, or the capture file's name; "" before it is known
 * @param clock   the timestamp clock and its calibration in words; "" before it is known
 * @param gaps    stretches of data lost so far (each a gap in the edge stream)
 * @param errors  corrupt or lost stretches the decoder counted (CRC errors, resyncs, overruns, bad
 *                lines) or, for a file, its warnings
 * @param probeId the probe's own id as stored with recordings and checks (16 hex digits from its hello,
 *                or a capture file's {@code probe} header); "" when unknown
 */
public record SourceStatus(ConnectionState state, String line, String probe, String clock, long gaps, long errors,
        String probeId) {
    public SourceStatus {
        Objects.requireNonNull(state, "state");
        Objects.requireNonNull(line, "line");
        Objects.requireNonNull(probe, "probe");
        Objects.requireNonNull(clock, "clock");
        Objects.requireNonNull(probeId, "probeId");
    }

    /** A status without a probe id. */
    public SourceStatus(ConnectionState state, String line, String probe, String clock, long gaps, long errors) {
        this(state, line, probe, clock, gaps, errors, "");
    }

    /** Nothing connected. */
    public static SourceStatus idle() {
        return new SourceStatus(ConnectionState.IDLE, "no source", "", "", 0, 0);
    }

    public SourceStatus withState(ConnectionState s, String newLine) {
        return new SourceStatus(s, newLine, probe, clock, gaps, errors, probeId);
    }
}
