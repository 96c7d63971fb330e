package org.rcbench.capture;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Reads an rcbench edge-capture file, version 1: the header when opened, the data lines when
 * streamed.
 *
 * <p>Data lines are {@code tick,channel,level} with no spaces: {@code tick} 0..2^63-1 and never
 * smaller than the tick of the line before, {@code channel} 0..255 (and named in the header if the
 * header names any channel), {@code level} {@code 0}, {@code 1} or {@code x}/{@code X} (a gap:
 * {@link EdgeSink#UNKNOWN}). Every line may end in CRLF. Blank lines and {@code #} comment lines
 * are skipped; the comment {@code # end_tick=N} extends the end the sink is told of. A last line
 * without a newline is accepted if it is complete; if it is the beginning of a data line cut short
 * (as a recorder killed mid-write leaves it) it is dropped with a warning; anything else is an
 * error.
 *
 * <p>Speed: lines are parsed in place in a 64 KiB window by a fast path that handles well-formed
 * data lines without allocating; anything unusual (a comment, an error, the end of the input)
 * drops to a careful path that handles one line and produces the message. Not thread-safe.
 */
final class EdgeCaptureReader implements Capture {
    /** More than the longest well-formed data line (27 bytes with CRLF), so the fast path never runs off the window. */
    private static final int FAST_WINDOW = 48;
    /** Ticks with at most this many digits cannot overflow a long (10^18 - 1 < 2^63 - 1). */
    private static final int SAFE_TICK_DIGITS = 18;

    private final LineCursor cur;
    private final EdgeCaptureHeader header;
    private final Warnings warnings = new Warnings();
    private boolean streamed;

    /** Tick of the last data line, for the never-decreasing check. */
    private long lastTick;
    private long endTick;

    EdgeCaptureReader(ByteInput in, String name) throws IOException {
        this.cur = new LineCursor(in, name);
        this.header = EdgeCaptureHeader.read(cur, warnings);
    }

    @Override
    public String name() {
        return cur.name;
    }

    @Override
    public Timebase timebase() {
        return header.timebase;
    }

    @Override
    public Map<String, String> header() {
        return header.fields;
    }

    @Override
    public Map<Integer, String> channels() {
        return header.channels;
    }

    @Override
    public List<String> warnings() {
        return warnings.list();
    }

    @Override
    public void streamTo(EdgeSink sink) throws IOException {
        if (streamed) {
            throw new IllegalStateException("streamTo may be called only once: " + cur.name);
        }
        streamed = true;
        final ByteInput in = cur.in;
        final boolean[] allowed = header.allowed;
        long last = lastTick;
        long line = cur.line;
        for (;;) {
            final byte[] b = in.buf;
            int p = in.pos;
            if (in.limit - p < FAST_WINDOW) {
                if (!in.eof) {
                    cur.line = line;
                    cur.fill();
                    continue;
                }
                if (p == in.limit) {
                    break;
                }
            } else {
                // Fast path: one well-formed data line, or a jump to the careful path below.
                int start = p;
                long tick = 0;
                int c;
                while ((c = b[p] - '0') >= 0 && c <= 9 && p - start < SAFE_TICK_DIGITS) {
                    tick = tick * 10 + c;
                    p++;
                }
                if (p > start && b[p] == ',') {
                    p++;
                    int ch = b[p] - '0';
                    if (ch >= 0 && ch <= 9) {
                        p++;
                        if ((c = b[p] - '0') >= 0 && c <= 9) {
                            ch = ch * 10 + c;
                            p++;
                            if ((c = b[p] - '0') >= 0 && c <= 9) {
                                ch = ch * 10 + c;
                                p++;
                            }
                        }
                        if (b[p] == ',' && ch <= EdgeCaptureFormat.MAX_CHANNEL && allowed[ch] && tick >= last) {
                            byte lv = b[p + 1];
                            int level = lv == '0' ? EdgeSink.LOW : lv == '1' ? EdgeSink.HIGH
                                    : lv == 'x' || lv == 'X' ? EdgeSink.UNKNOWN : 2;
                            p += 2;
                            if (b[p] == '\r') {
                                p++;
                            }
                            if (level != 2 && b[p] == '\n') {
                                in.pos = p + 1;
                                line++;
                                last = tick;
                                sink.onEdge(tick, ch, level);
                                continue;
                            }
                        }
                    }
                }
            }
            // Careful path: exactly one line of any kind, or an error naming it.
            cur.line = line;
            lastTick = last;
            if (!carefulLine(sink)) {
                break;
            }
            last = lastTick;
            line = cur.line;
        }
        cur.line = line;
        if (in.cutShort) {
            warnings.add(cur.where(), "the compressed data ends early (the file was cut short); "
                    + "everything before this line was read");
        }
        sink.onEnd(Math.max(last, endTick));
    }

    /** Handles the line at the cursor; returns false at the end of input. */
    private boolean carefulLine(EdgeSink sink) throws IOException {
        if (!cur.locate()) {
            return false;
        }
        byte[] b = cur.in.buf;
        if (cur.start == cur.end) {
            cur.consume();
            return true;
        }
        if (b[cur.start] == '#') {
            trailer();
            cur.consume();
            return true;
        }
        DataLine d = new DataLine(b, cur.start, cur.end);
        if (d.problem != null) {
            if (!cur.terminated && d.cutShort) {
                warnings.add(cur.where(), "last line " + cur.quoted() + " is cut short (no newline at the end"
                        + " of the file, as a recorder stopped mid-write leaves it); ignored");
                cur.consume();
                return true;
            }
            throw new BadInputException(cur.where(), d.problem);
        }
        if (!header.allowed[d.channel]) {
            throw new BadInputException(cur.where(), "channel " + d.channel + " is not named in the header"
                    + " (named: " + CaptureFiles.listChannels(header.channels) + ")");
        }
        if (d.tick < lastTick) {
            throw new BadInputException(cur.where(), "tick " + d.tick + " is before the previous data line's tick "
                    + lastTick + " (ticks must never decrease)");
        }
        lastTick = d.tick;
        cur.consume();
        sink.onEdge(d.tick, d.channel, d.level);
        return true;
    }

    /** A comment after the column line; {@code # end_tick=N} is the only one with a meaning. */
    private void trailer() {
        byte[] b = cur.in.buf;
        int i = cur.start + 1;
        while (i < cur.end && (b[i] == ' ' || b[i] == '\t')) {
            i++;
        }
        String key = EdgeCaptureFormat.END_TICK + "=";
        for (int k = 0; k < key.length(); k++) {
            if (i + k >= cur.end || b[i + k] != key.charAt(k)) {
                return;
            }
        }
        int from = i + key.length();
        int to = cur.end;
        while (to > from && (b[to - 1] == ' ' || b[to - 1] == '\t')) {
            to--;
        }
        long v = DataLine.parseTick(b, from, to);
        if (v < 0) {
            warnings.add(cur.where(), "end_tick " + Snippet.quote(b, from, to)
                    + " is not a whole number of ticks; ignored");
        } else if (v < lastTick) {
            warnings.add(cur.where(), "end_tick " + v + " is before the last data line's tick " + lastTick
                    + "; ignored");
        } else {
            endTick = Math.max(endTick, v);
        }
    }

    @Override
    public void close() throws IOException {
        cur.in.close();
    }
}
