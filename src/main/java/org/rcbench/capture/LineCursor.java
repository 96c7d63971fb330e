package org.rcbench.capture;

import java.io.IOException;
import java.util.zip.ZipException;
import org.rcbench.common.BadInputException;

/**
 * Finds whole lines in a {@link ByteInput} and counts them, for the careful (slow) paths of the
 * edge-capture reader: header lines, comments, blank lines and every error message.
 *
 * <p>After {@link #locate()} returns true, the line is {@code in.buf[start..end)} without its
 * {@code \n} and without one {@code \r} before it; {@link #terminated} says whether a newline ended
 * it (false only for the last line of the input). {@link #consume()} moves past it. Not thread-safe.
 */
final class LineCursor {
    final ByteInput in;
    final String name;
    /** Number (from 1) of the line that starts at {@code in.pos}. */
    long line = 1;

    int start;
    int end;
    boolean terminated;
    private int next;

    LineCursor(ByteInput in, String name) {
        this.in = in;
        this.name = name;
    }

    /** Locates the line at {@code in.pos}, reading more input as needed; false at the end of input. */
    boolean locate() throws IOException {
        int scanned = 0;
        for (;;) {
            byte[] b = in.buf;
            int lim = in.limit;
            for (int i = in.pos + scanned; i < lim; i++) {
                if (b[i] == '\n') {
                    start = in.pos;
                    next = i + 1;
                    end = i > start && b[i - 1] == '\r' ? i - 1 : i;
                    terminated = true;
                    return true;
                }
            }
            scanned = lim - in.pos;
            if (in.eof) {
                if (scanned == 0) {
                    return false;
                }
                start = in.pos;
                next = lim;
                end = b[lim - 1] == '\r' ? lim - 1 : lim;
                terminated = false;
                return true;
            }
            if (!fill()) {
                throw new BadInputException(where(), "line is longer than " + ByteInput.WINDOW_BYTES
                        + " bytes: " + Snippet.quote(b, in.pos, in.pos + Snippet.MAX_CHARS));
            }
        }
    }

    /** Moves past the located line. */
    void consume() {
        in.pos = next;
        line++;
    }

    /** Reads more input, turning corrupt compressed data into a one-line error at this line. */
    boolean fill() throws IOException {
        try {
            return in.fill();
        } catch (ZipException e) {
            throw new BadInputException(where(), "corrupt gzip data (" + e.getMessage() + ")", e);
        }
    }

    /** {@code name:line} of the current line. */
    String where() {
        return name + ":" + line;
    }

    /** The located line quoted for a message. */
    String quoted() {
        return Snippet.quote(in.buf, start, end);
    }

    boolean equalsAscii(String text) {
        // Trailing spaces and tabs are tolerated on the magic and column lines.
        int e = end;
        while (e > start && (in.buf[e - 1] == ' ' || in.buf[e - 1] == '\t')) {
            e--;
        }
        int n = e - start;
        if (n != text.length()) {
            return false;
        }
        for (int i = 0; i < n; i++) {
            if (in.buf[start + i] != text.charAt(i)) {
                return false;
            }
        }
        return true;
    }
}
