package org.rcbench.capture;

import java.io.IOException;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Reads an IEEE Std 1364-2005 (section 18.2) four-state value change dump as edges of its 1-bit
 * wires, one VCD time unit per tick.
 *
 * <p>Value changes: {@code #time} sets the time (never decreasing); {@code 0id}/{@code 1id} give a
 * level; {@code x}/{@code z} give {@link EdgeSink#UNKNOWN} (a gap); {@code b...} vector and
 * {@code r...} real changes are read and ignored (a {@code b} value on a 1-bit wire gives its last
 * bit); {@code $dumpvars}, {@code $dumpall} and {@code $dumpon} blocks list current values;
 * {@code $dumpoff} makes every channel unknown; {@code $comment} is skipped. Only real changes
 * reach the sink: a value equal to the channel's current one (as {@code $dumpall} repeats) is
 * dropped, so the first value of each channel is its initial level, not necessarily an edge. Not
 * thread-safe.
 */
final class VcdReader implements Capture {
    private static final int NONE = Integer.MIN_VALUE;

    private final VcdTokens t;
    private final VcdHeader header;
    private final Warnings warnings = new Warnings();
    private boolean streamed;

    VcdReader(ByteInput in, String name) throws IOException {
        this.t = new VcdTokens(in, name);
        this.header = VcdHeader.read(t, warnings);
    }

    @Override
    public String name() {
        return t.name;
    }

    @Override
    public Timebase timebase() {
        return header.timescale.timebase();
    }

    @Override
    public Map<String, String> header() {
        return header.fieldsView();
    }

    @Override
    public Map<Integer, String> channels() {
        return Collections.unmodifiableMap(header.channels);
    }

    @Override
    public Map<String, String> skippedSignals() {
        return Collections.unmodifiableMap(header.skipped);
    }

    @Override
    public List<String> warnings() {
        return warnings.list();
    }

    @Override
    public void streamTo(EdgeSink sink) throws IOException {
        if (streamed) {
            throw new IllegalStateException("streamTo may be called only once: " + t.name);
        }
        streamed = true;
        final int[] level = new int[header.channels.size()];
        Arrays.fill(level, NONE);
        final VcdIds ids = header.ids;
        long time = 0;
        String openBlock = null;
        while (t.next()) {
            byte[] b = t.in.buf;
            byte c = b[t.start];
            int value = scalar(c);
            if (value != NONE) {
                if (t.end - t.start < 2) {
                    throw new BadInputException(t.where(), "value change " + t.quoted() + " has no identifier code");
                }
                int ch = lookup(ids, t.start + 1, t.end);
                if (ch >= 0 && level[ch] != value) {
                    level[ch] = value;
                    sink.onEdge(time, ch, value);
                }
            } else if (c == '#') {
                long next = DataLine.parseTick(b, t.start + 1, t.end);
                if (next < 0) {
                    throw new BadInputException(t.where(), next == DataLine.OVERFLOW
                            ? "time " + t.quoted() + " is larger than 2^63-1"
                            : "time must be # and a whole number, found " + t.quoted());
                }
                if (next < time) {
                    throw new BadInputException(t.where(), "time #" + next + " is before the previous time #" + time
                            + " (times must never decrease)");
                }
                time = next;
            } else if (c == 'b' || c == 'B') {
                int last = binaryValue(b, t.start + 1, t.end);
                expectCode("vector value");
                int ch = lookup(ids, t.start, t.end);
                if (ch >= 0 && level[ch] != last) {
                    level[ch] = last;
                    sink.onEdge(time, ch, last);
                }
            } else if (c == 'r' || c == 'R') {
                expectCode("real value");
                lookup(ids, t.start, t.end);
            } else if (c == '$') {
                openBlock = command(openBlock, level, time, sink);
            } else {
                throw new BadInputException(t.where(), "expected #time, a value change or a $ command, found "
                        + t.quoted());
            }
        }
        if (openBlock != null) {
            warnings.add(t.where(), "file ends inside " + openBlock + " (no $end)");
        }
        if (t.in.cutShort) {
            warnings.add(t.where(), "the compressed data ends early (the file was cut short); "
                    + "everything before this line was read");
        }
        sink.onEnd(time);
    }

    /** Handles a {@code $} token among the value changes; returns the block now open, if any. */
    private String command(String openBlock, int[] level, long time, EdgeSink sink) throws IOException {
        if (t.is("$end")) {
            if (openBlock == null) {
                throw new BadInputException(t.where(), "$end without an opening command");
            }
            return null;
        }
        if (t.is("$dumpvars") || t.is("$dumpall") || t.is("$dumpon") || t.is("$dumpoff")) {
            if (t.is("$dumpoff")) {
                for (int ch = 0; ch < level.length; ch++) {
                    if (level[ch] != EdgeSink.UNKNOWN) {
                        level[ch] = EdgeSink.UNKNOWN;
                        sink.onEdge(time, ch, EdgeSink.UNKNOWN);
                    }
                }
            }
            return t.text();
        }
        String keyword = t.text();
        if (keyword.startsWith("$dumpports")) {
            throw new BadInputException(t.where(), "extended VCD (" + keyword + ") is not supported; "
                    + "dump the wires as a four-state VCD");
        }
        String where = t.where();
        skipUntilEnd(keyword, where);
        if (!keyword.equals("$comment")) {
            warnings.add(where, "unknown command " + Snippet.quote(keyword) + " skipped");
        }
        return openBlock;
    }

    private void skipUntilEnd(String keyword, String where) throws IOException {
        while (t.next()) {
            if (t.is("$end")) {
                return;
            }
        }
        throw new BadInputException(where, keyword + " has no closing $end");
    }

    /** Channel for a declared identifier code, or {@link VcdHeader#SKIPPED}; an error when undeclared. */
    private int lookup(VcdIds ids, int from, int to) {
        int ch = ids.get(t.in.buf, from, to);
        if (ch == VcdIds.NOT_FOUND) {
            throw new BadInputException(t.where(), "value change for identifier code "
                    + Snippet.quote(t.in.buf, from, to) + ", which no $var declares");
        }
        return ch;
    }

    private void expectCode(String what) throws IOException {
        String where = t.where();
        if (!t.next()) {
            throw new BadInputException(where, what + " without an identifier code at the end of the file");
        }
    }

    /** The level of the last bit of a {@code b} value ({@code b1}, {@code b0x1}); an error for other text. */
    private int binaryValue(byte[] b, int from, int to) {
        int last = NONE;
        for (int i = from; i < to; i++) {
            last = scalar(b[i]);
            if (last == NONE) {
                break;
            }
        }
        if (last == NONE) {
            throw new BadInputException(t.where(), "vector value must be b followed by 0, 1, x or z digits, found "
                    + t.quoted());
        }
        return last;
    }

    private static int scalar(byte c) {
        return switch (c) {
            case '0' -> EdgeSink.LOW;
            case '1' -> EdgeSink.HIGH;
            case 'x', 'X', 'z', 'Z' -> EdgeSink.UNKNOWN;
            default -> NONE;
        };
    }

    @Override
    public void close() throws IOException {
        t.in.close();
    }
}
