package org.rcbench.capture;

import java.io.EOFException;
import java.io.IOException;
import java.io.InputStream;

/**
 * A fixed-size byte window over an input stream, shared by the capture readers.
 *
 * <p>Readers parse {@code buf[pos..limit)} in place and call {@link #fill()} when a line or token
 * runs past {@code limit}; {@code fill} moves the unread bytes to the start of the window first, so
 * an index the reader holds must be re-based by the amount {@code pos} moved. Memory is the window
 * only, whatever the length of the stream. Not thread-safe.
 */
final class ByteInput {
    static final int WINDOW_BYTES = 1 << 16;

    final byte[] buf = new byte[WINDOW_BYTES];
    int pos;
    int limit;
    boolean eof;
    /** True when the stream is gzip and its compressed data stopped before the gzip trailer. */
    boolean cutShort;

    private final InputStream in;
    private final boolean compressed;

    ByteInput(InputStream in, boolean compressed) {
        this.in = in;
        this.compressed = compressed;
    }

    /**
     * Moves {@code buf[pos..limit)} to the start of the window, then reads once.
     *
     * @return false if the window was already full of unread bytes (nothing could be read)
     */
    boolean fill() throws IOException {
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, limit - pos);
            limit -= pos;
            pos = 0;
        }
        if (limit == buf.length) {
            return false;
        }
        while (!eof) {
            int n;
            try {
                n = in.read(buf, limit, buf.length - limit);
            } catch (EOFException e) {
                if (!compressed) {
                    throw e;
                }
                // GZIPInputStream hands out every byte it could inflate before it reports that the
                // compressed stream ended early, so everything up to the break has been delivered.
                cutShort = true;
                n = -1;
            }
            if (n < 0) {
                eof = true;
            } else if (n > 0) {
                limit += n;
                break;
            }
        }
        return true;
    }

    /** Reads until at least {@code n} unread bytes are in the window or the stream ends. */
    void request(int n) throws IOException {
        while (limit - pos < n && !eof) {
            if (!fill()) {
                return;
            }
        }
    }

    void close() throws IOException {
        in.close();
    }
}
