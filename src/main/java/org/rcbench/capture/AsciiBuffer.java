package org.rcbench.capture;

import java.io.IOException;
import java.io.OutputStream;

/**
 * A byte buffer in front of an output stream with allocation-free writers for the ASCII text
 * both capture writers produce. Hands full buffers to the stream; {@link #flush()} also flushes
 * the stream. Not thread-safe.
 */
final class AsciiBuffer {
    /** Room every {@code put} call may use without a check: a long, a separator and a short code. */
    static final int SLACK = 64;

    private final OutputStream out;
    private final byte[] buf = new byte[1 << 16];
    private int n;

    AsciiBuffer(OutputStream out) {
        this.out = out;
    }

    /** Makes room for {@code bytes} more (at most the buffer size minus {@link #SLACK}). */
    void reserve(int bytes) throws IOException {
        if (n + bytes > buf.length) {
            drain();
        }
    }

    void put(byte b) {
        buf[n++] = b;
    }

    void put(byte[] b) throws IOException {
        reserve(b.length);
        if (b.length > buf.length) {
            out.write(b);
            return;
        }
        System.arraycopy(b, 0, buf, n, b.length);
        n += b.length;
    }

    /** Writes the decimal digits of {@code v}, 0 or more, after {@link #reserve(int)} of 20 bytes. */
    void putDecimal(long v) {
        if (v < 10) {
            buf[n++] = (byte) ('0' + v);
            return;
        }
        int digits = 1;
        for (long x = v / 10; x != 0; x /= 10) {
            digits++;
        }
        int i = n + digits;
        n = i;
        do {
            buf[--i] = (byte) ('0' + v % 10);
            v /= 10;
        } while (v != 0);
    }

    /** Bytes waiting in the buffer. */
    int pending() {
        return n;
    }

    /** Hands the buffered bytes to the stream without flushing it. */
    void drain() throws IOException {
        if (n > 0) {
            // Reset first: if the write fails, the bytes are not retried into a stream in an unknown state.
            int len = n;
            n = 0;
            out.write(buf, 0, len);
        }
    }

    void flush() throws IOException {
        drain();
        out.flush();
    }

    void close() throws IOException {
        try {
            drain();
        } finally {
            out.close();
        }
    }
}
