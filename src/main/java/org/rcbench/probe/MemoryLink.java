package org.rcbench.probe;

import java.io.IOException;
import java.io.InterruptedIOException;

/**
 * An in-memory duplex link with two ends, for simulated boards and tests: what one end writes the
 * other reads. {@link #unplug()} ends both sides as a pulled cable would: bytes in flight are lost
 * and both ends read -1. Thread-safe.
 */
public final class MemoryLink {
    private final Pipe toHost;
    private final Pipe toProbe;
    private final End hostEnd;
    private final End probeEnd;

    /** A link whose ends call themselves {@code hostName} and {@code probeName} in messages. */
    public MemoryLink(String hostName, String probeName, int capacity) {
        toHost = new Pipe(capacity);
        toProbe = new Pipe(capacity);
        hostEnd = new End(hostName, toHost, toProbe);
        probeEnd = new End(probeName, toProbe, toHost);
    }

    public MemoryLink(String name) {
        this(name, name + " (probe side)", 1 << 20);
    }

    /** The end a {@link ProbeSession} reads. */
    public ByteTransport hostEnd() {
        return hostEnd;
    }

    /** The end a simulated probe writes its frames to and reads commands from. */
    public ByteTransport probeEnd() {
        return probeEnd;
    }

    /** Ends the link at once: bytes in flight are lost, both ends read -1 and writes fail. */
    public void unplug() {
        toHost.close(true);
        toProbe.close(true);
    }

    private static final class End implements ByteTransport {
        private final String name;
        private final Pipe in;
        private final Pipe out;

        End(String name, Pipe in, Pipe out) {
            this.name = name;
            this.in = in;
            this.out = out;
        }

        @Override
        public int read(byte[] buf, int off, int len, int timeoutMillis) throws IOException {
            return in.read(buf, off, len, timeoutMillis);
        }

        @Override
        public void write(byte[] buf, int off, int len) throws IOException {
            out.write(buf, off, len);
        }

        @Override
        public String name() {
            return name;
        }

        /** Closing one end lets the other read what was sent, then -1. */
        @Override
        public void close() {
            out.close(false);
            in.close(true);
        }
    }

    /** A bounded byte ring with blocking reads (with timeout) and blocking writes. */
    private static final class Pipe {
        private final byte[] ring;
        private int head;
        private int size;
        private boolean closed;

        Pipe(int capacity) {
            ring = new byte[capacity];
        }

        synchronized int read(byte[] buf, int off, int len, int timeoutMillis) throws IOException {
            long deadline = System.nanoTime() + timeoutMillis * 1_000_000L;
            while (size == 0 && !closed) {
                long left = deadline - System.nanoTime();
                if (left <= 0) {
                    return 0;
                }
                waitNanos(left);
            }
            if (size == 0) {
                return -1;
            }
            int n = Math.min(len, size);
            for (int i = 0; i < n; i++) {
                buf[off + i] = ring[(head + i) % ring.length];
            }
            head = (head + n) % ring.length;
            size -= n;
            notifyAll();
            return n;
        }

        synchronized void write(byte[] buf, int off, int len) throws IOException {
            for (int i = 0; i < len; i++) {
                while (size == ring.length && !closed) {
                    waitNanos(100_000_000L);
                }
                if (closed) {
                    throw new IOException("link closed");
                }
                ring[(head + size) % ring.length] = buf[off + i];
                size++;
            }
            notifyAll();
        }

        synchronized void close(boolean dropPending) {
            closed = true;
            if (dropPending) {
                size = 0;
            }
            notifyAll();
        }

        private void waitNanos(long nanos) throws InterruptedIOException {
            try {
                wait(Math.max(1, nanos / 1_000_000));
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new InterruptedIOException("interrupted");
            }
        }
    }
}
