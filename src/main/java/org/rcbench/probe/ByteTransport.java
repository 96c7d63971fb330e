package org.rcbench.probe;

import java.io.IOException;

/**
 * A duplex byte stream to a probe: a serial port, an in-memory link to a simulated board, a pipe.
 * One thread reads; any thread may write (implementations make {@link #write} safe for that).
 */
public interface ByteTransport extends AutoCloseable {

    /**
     * Reads up to {@code len} bytes into {@code buf} from {@code off}, waiting at most about
     * {@code timeoutMillis} for the first byte. Returns the number read, 0 when nothing came in
     * time, or -1 when the transport is gone (unplugged, closed, end of stream).
     */
    int read(byte[] buf, int off, int len, int timeoutMillis) throws IOException;

    /** Writes all {@code len} bytes; throws when the transport is gone. */
    void write(byte[] buf, int off, int len) throws IOException;

    /** Raises ({@code true}) or lowers the DTR line where the transport has one; otherwise does nothing. */
    default void setDtr(boolean high) {
    }

    /** What to call this transport in messages, e.g. {@code /dev/ttyACM0} or {@code simulated board}. */
    String name();

    /** The USB identity {@code vvvv:pppp:serial} (hex vendor and product id) when known, else "". */
    default String usbId() {
        return "";
    }

    /** Closes the transport; never throws, may be called more than once. */
    @Override
    void close();
}
