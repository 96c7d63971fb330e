package org.rcbench.protocol;

import java.nio.charset.StandardCharsets;

/**
 * The plain-text line mode: one record per line, fields separated by spaces or tabs, lines ended
 * by LF (a CR before it is ignored). {@code E tick channel level} is an edge, {@code T tick} a
 * heartbeat, {@code D total} the probe's dropped-edge total, {@code H key=value ...} the hello,
 * {@code #...} a comment. Ticks are decimal, at most 18 digits, free-running; a tick smaller than
 * the previous one means the probe reset. Anything else is a bad line: counted, thrown away, and a
 * gap. Edge lines are parsed without allocating. Not thread-safe.
 */
final class TextLineReader {
    /** Longest line kept; longer lines are bad. */
    static final int MAX_LINE = 160;
    private static final int MAX_DIGITS = 18;

    private final Timeline timeline;
    private final ProbeEvents events;
    private final byte[] line = new byte[MAX_LINE];
    private int fill;
    private long overflow;
    private boolean havePrev;
    private long prevTick;
    private boolean haveDropped;
    private long droppedTotal;
    /** Cursor of the field parser. */
    private int at;
    /** Set by the facade while it is still deciding between binary and text. */
    boolean quiet;

    long linesOk;
    long linesBad;
    long resyncs;
    long bytesDiscarded;
    long overruns;

    TextLineReader(Timeline timeline, ProbeEvents events) {
        this.timeline = timeline;
        this.events = events;
    }

    void restart() {
        havePrev = false;
        haveDropped = false;
    }

    /** Feeds one byte; returns true when it completed a line that was understood. */
    boolean accept(byte b) {
        if (b != '\n') {
            if (fill < MAX_LINE) {
                line[fill++] = b;
            } else {
                overflow++;
            }
            return false;
        }
        int len = fill;
        long total = fill + overflow + 1;
        boolean tooLong = overflow > 0;
        fill = 0;
        overflow = 0;
        if (len > 0 && line[len - 1] == '\r') {
            len--;
        }
        if (tooLong) {
            bad(total);
            return false;
        }
        if (len == 0) {
            return false;
        }
        int verdict = interpret(len);
        if (verdict < 0) {
            bad(total);
            return false;
        }
        linesOk++;
        return verdict > 0;
    }

    /** Drops a partial line (after a disconnect). */
    void flushPartial() {
        if (fill + overflow > 0) {
            bad(fill + overflow);
        }
        fill = 0;
        overflow = 0;
    }

    long pendingBytes() {
        return fill + overflow;
    }

    private void bad(long bytes) {
        linesBad++;
        resyncs++;
        bytesDiscarded += bytes;
        if (!quiet) {
            timeline.gap(Trouble.BAD_LINE);
        }
    }

    /** Handles a complete line of {@code len} bytes: 1 a record, 0 a comment, -1 not a valid line. */
    private int interpret(int len) {
        byte kind = line[0];
        if (kind == '#') {
            return 0;
        }
        if (len < 2 || !isBlank(line[1])) {
            return -1;
        }
        at = 1;
        switch (kind) {
            case 'E': {
                long tick = number(len);
                long channel = number(len);
                long level = number(len);
                if (tick < 0 || channel < 0 || channel > 255 || level < 0 || level > 1 || !atEnd(len)) {
                    return -1;
                }
                timeline.edge(advanceTo(tick), (int) channel, (int) level);
                timeline.vouched();
                return 1;
            }
            case 'T': {
                long tick = number(len);
                if (tick < 0 || !atEnd(len)) {
                    return -1;
                }
                advanceTo(tick);
                timeline.vouched();
                return 1;
            }
            case 'D': {
                long total = number(len);
                if (total < 0 || !atEnd(len)) {
                    return -1;
                }
                if (haveDropped && total != droppedTotal) {
                    overruns += Math.max(0, total - droppedTotal);
                    timeline.gap(Trouble.OVERRUN);
                }
                haveDropped = true;
                droppedTotal = total;
                return 1;
            }
            case 'H': {
                Hello hello = TextHello.parse(new String(line, 2, len - 2, StandardCharsets.US_ASCII));
                if (hello == null) {
                    return -1;
                }
                events.onHello(hello);
                return 1;
            }
            default:
                return -1;
        }
    }

    private long advanceTo(long tick) {
        long t = havePrev ? timeline.next(tick - prevTick) : timeline.first();
        havePrev = true;
        prevTick = tick;
        return t;
    }

    /** The next blank-separated unsigned decimal field, or -1 when it is missing or not a number. */
    private long number(int len) {
        if (at >= len || !isBlank(line[at])) {
            return -1;
        }
        while (at < len && isBlank(line[at])) {
            at++;
        }
        long v = 0;
        int digits = 0;
        while (at < len && !isBlank(line[at])) {
            int d = line[at++] - '0';
            if (d < 0 || d > 9 || ++digits > MAX_DIGITS) {
                return -1;
            }
            v = v * 10 + d;
        }
        return digits == 0 ? -1 : v;
    }

    private boolean atEnd(int len) {
        while (at < len && isBlank(line[at])) {
            at++;
        }
        return at == len;
    }

    private static boolean isBlank(byte b) {
        return b == ' ' || b == '\t';
    }
}
