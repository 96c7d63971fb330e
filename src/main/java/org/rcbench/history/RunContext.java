package org.rcbench.history;

import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.Objects;

/**
 * What the check document itself does not say about a run: which board, which unit, against which
 * design, with which probe, from which capture, the operator's note and when. Immutable; change it
 * with the {@code with...} methods.
 *
 * @param board      the board's name, e.g. {@code Piper} (never blank)
 * @param serial     the unit's serial number, or null when not given
 * @param design     the design checked against
 * @param probe      the probe and its clock calibration
 * @param capture    the capture file, or null for a live check without a file
 * @param note       the operator's note, or null
 * @param recordedAt when the check ran (stored in UTC, to the millisecond)
 */
public record RunContext(String board, String serial, DesignRef design, ProbeInfo probe, CaptureRef capture,
        String note, Instant recordedAt) {

    public RunContext {
        if (board == null || board.isBlank()) {
            throw new IllegalArgumentException("board is blank: " + board);
        }
        Objects.requireNonNull(design, "design");
        Objects.requireNonNull(probe, "probe");
        Objects.requireNonNull(recordedAt, "recordedAt");
        serial = blankToNull(serial);
        note = blankToNull(note);
        recordedAt = recordedAt.truncatedTo(ChronoUnit.MILLIS);
    }

    /** A run of {@code board} against {@code design}, now, with nothing else known. */
    public static RunContext of(String board, DesignRef design) {
        return new RunContext(board, null, design, ProbeInfo.UNKNOWN, null, null, Instant.now());
    }

    public RunContext withSerial(String s) {
        return new RunContext(board, s, design, probe, capture, note, recordedAt);
    }

    public RunContext withProbe(ProbeInfo p) {
        return new RunContext(board, serial, design, p, capture, note, recordedAt);
    }

    public RunContext withCapture(CaptureRef c) {
        return new RunContext(board, serial, design, probe, c, note, recordedAt);
    }

    public RunContext withNote(String n) {
        return new RunContext(board, serial, design, probe, capture, n, recordedAt);
    }

    public RunContext withRecordedAt(Instant t) {
        return new RunContext(board, serial, design, probe, capture, note, t);
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.strip();
    }
}
