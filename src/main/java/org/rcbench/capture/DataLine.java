package org.rcbench.capture;

import org.rcbench.edge.EdgeSink;

/**
 * One data line {@code tick,channel,level} parsed carefully, with the reason when it is wrong.
 * Used off the fast path only (errors, unusual lines), so it may allocate.
 */
final class DataLine {
    long tick;
    int channel;
    int level;
    /** What is wrong, or null when the line is well-formed. */
    String problem;
    /** The line is the beginning of a well-formed line (so a cut-off write could have produced it). */
    boolean cutShort;

    DataLine(byte[] b, int from, int to) {
        int c1 = indexOf(b, from, to, (byte) ',');
        int c2 = c1 < 0 ? -1 : indexOf(b, c1 + 1, to, (byte) ',');
        int extra = c2 < 0 ? -1 : indexOf(b, c2 + 1, to, (byte) ',');
        cutShort = isPrefixOfDataLine(b, from, to, c1, c2);
        if (c2 < 0 || extra >= 0) {
            int fields = 1;
            for (int i = from; i < to; i++) {
                fields += b[i] == ',' ? 1 : 0;
            }
            problem = "expected 3 fields tick,channel,level, found " + fields + ": " + Snippet.quote(b, from, to);
            return;
        }
        tick = parseTick(b, from, c1);
        if (tick < 0) {
            problem = tick == OVERFLOW
                    ? "tick " + Snippet.quote(b, from, c1) + " is larger than 2^63-1"
                    : "tick must be a whole number of ticks, 0 or more, found " + Snippet.quote(b, from, c1);
            return;
        }
        long ch = parseTick(b, c1 + 1, c2);
        if (ch < 0 && ch != OVERFLOW) {
            problem = "channel must be a whole number, found " + Snippet.quote(b, c1 + 1, c2);
            return;
        }
        if (ch < 0 || ch > EdgeCaptureFormat.MAX_CHANNEL) {
            problem = "channel " + Snippet.quote(b, c1 + 1, c2) + " is out of range 0.." + EdgeCaptureFormat.MAX_CHANNEL;
            return;
        }
        channel = (int) ch;
        if (to - c2 == 2) {
            byte lv = b[c2 + 1];
            if (lv == '0' || lv == '1' || lv == 'x' || lv == 'X') {
                level = lv == '0' ? EdgeSink.LOW : lv == '1' ? EdgeSink.HIGH : EdgeSink.UNKNOWN;
                return;
            }
        }
        problem = "level must be 0, 1 or x, found " + Snippet.quote(b, c2 + 1, to);
    }

    static final long NOT_A_NUMBER = -1;
    static final long OVERFLOW = -2;

    /** Decimal digits only, at least one: the value; {@link #NOT_A_NUMBER} or {@link #OVERFLOW} otherwise. */
    static long parseTick(byte[] b, int from, int to) {
        if (from == to) {
            return NOT_A_NUMBER;
        }
        long v = 0;
        boolean overflow = false;
        for (int i = from; i < to; i++) {
            int d = b[i] - '0';
            if (d < 0 || d > 9) {
                return NOT_A_NUMBER;
            }
            if (v > (Long.MAX_VALUE - d) / 10) {
                overflow = true;
            } else {
                v = v * 10 + d;
            }
        }
        return overflow ? OVERFLOW : v;
    }

    /** {@code digits[,[digits{0,3}[,]]]}: what a data line looks like when its end was never written. */
    private static boolean isPrefixOfDataLine(byte[] b, int from, int to, int c1, int c2) {
        int tickEnd = c1 < 0 ? to : c1;
        if (tickEnd == from || !allDigits(b, from, tickEnd)) {
            return false;
        }
        if (c1 < 0) {
            return true;
        }
        int chEnd = c2 < 0 ? to : c2;
        if (chEnd - (c1 + 1) > 3 || !allDigits(b, c1 + 1, chEnd)) {
            return false;
        }
        return c2 < 0 ? true : c2 + 1 == to && chEnd > c1 + 1;
    }

    private static boolean allDigits(byte[] b, int from, int to) {
        for (int i = from; i < to; i++) {
            if (b[i] < '0' || b[i] > '9') {
                return false;
            }
        }
        return true;
    }

    private static int indexOf(byte[] b, int from, int to, byte x) {
        for (int i = from; i < to; i++) {
            if (b[i] == x) {
                return i;
            }
        }
        return -1;
    }
}
