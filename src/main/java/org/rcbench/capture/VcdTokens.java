package org.rcbench.capture;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.zip.ZipException;
import org.rcbench.common.BadInputException;

/**
 * Splits a value change dump into white-space separated tokens, in place, counting lines.
 *
 * <p>After {@link #next()} returns true the token is {@code in.buf[start..end)}, valid until the
 * next call, and {@link #tokenLine} is the line it is on. Every byte up to space (0x20) counts
 * as white space; a token may hold any other byte. Not thread-safe.
 */
final class VcdTokens {
    final ByteInput in;
    final String name;
    int start;
    int end;
    long tokenLine = 1;
    private long line = 1;

    VcdTokens(ByteInput in, String name) {
        this.in = in;
        this.name = name;
    }

    /** Moves to the next token; false at the end of input. */
    boolean next() throws IOException {
        for (;;) {
            byte[] b = in.buf;
            int p = in.pos;
            int lim = in.limit;
            while (p < lim && (b[p] & 0xff) <= ' ') {
                if (b[p] == '\n') {
                    line++;
                }
                p++;
            }
            in.pos = p;
            if (p < lim) {
                break;
            }
            if (in.eof) {
                tokenLine = line;
                return false;
            }
            fill();
        }
        int scanned = 0;
        for (;;) {
            byte[] b = in.buf;
            int p = in.pos + scanned;
            int lim = in.limit;
            while (p < lim && (b[p] & 0xff) > ' ') {
                p++;
            }
            if (p < lim || in.eof) {
                start = in.pos;
                end = p;
                in.pos = p;
                tokenLine = line;
                return true;
            }
            scanned = p - in.pos;
            if (!fill()) {
                tokenLine = line;
                throw new BadInputException(where(), "token longer than " + ByteInput.WINDOW_BYTES + " bytes: "
                        + Snippet.quote(b, in.pos, in.pos + Snippet.MAX_CHARS));
            }
        }
    }

    private boolean fill() throws IOException {
        try {
            return in.fill();
        } catch (ZipException e) {
            throw new BadInputException(name + ":" + line, "corrupt gzip data (" + e.getMessage() + ")", e);
        }
    }

    /** The token as text (header and rare paths only: allocates). */
    String text() {
        return new String(in.buf, start, end - start, StandardCharsets.UTF_8);
    }

    /** The token quoted for a message. */
    String quoted() {
        return Snippet.quote(in.buf, start, end);
    }

    /** True when the token is exactly the ASCII {@code word}. */
    boolean is(String word) {
        if (end - start != word.length()) {
            return false;
        }
        for (int i = 0; i < word.length(); i++) {
            if (in.buf[start + i] != word.charAt(i)) {
                return false;
            }
        }
        return true;
    }

    /** {@code name:line} of the current token. */
    String where() {
        return name + ":" + tokenLine;
    }
}
