package org.rcbench.sim;

import java.io.IOException;
import java.util.concurrent.atomic.AtomicLong;
import org.rcbench.probe.ByteTransport;
import org.rcbench.probe.MemoryPort;
import org.rcbench.probe.TransportOpener;

/**
 * A simulated probe's port: a {@link MemoryPort} whose host end counts the bytes the host has read
 * from each plug-in, so that a probe running {@link Pace#FAST} can stay a bounded distance ahead of
 * the host and can let the host read everything before a simulated unplug. Thread-safe.
 */
final class LinkPort implements TransportOpener {
    private final MemoryPort port;
    private volatile AtomicLong readSincePlugIn = new AtomicLong();

    LinkPort(String name) {
        this.port = new MemoryPort(name);
    }

    /** Plugs a new probe in; see {@link MemoryPort#plugIn()}. */
    synchronized ByteTransport plugIn() {
        readSincePlugIn = new AtomicLong();
        return port.plugIn();
    }

    void unplug() {
        port.unplug();
    }

    /** Bytes the host has read since the latest plug-in. */
    long hostRead() {
        return readSincePlugIn.get();
    }

    @Override
    public synchronized ByteTransport open() throws IOException {
        ByteTransport t = port.open();
        AtomicLong counter = readSincePlugIn;
        return new ByteTransport() {
            @Override
            public int read(byte[] buf, int off, int len, int timeoutMillis) throws IOException {
                int n = t.read(buf, off, len, timeoutMillis);
                if (n > 0) {
                    counter.addAndGet(n);
                }
                return n;
            }

            @Override
            public void write(byte[] buf, int off, int len) throws IOException {
                t.write(buf, off, len);
            }

            @Override
            public void setDtr(boolean high) {
                t.setDtr(high);
            }

            @Override
            public String name() {
                return t.name();
            }

            @Override
            public String usbId() {
                return t.usbId();
            }

            @Override
            public void close() {
                t.close();
            }
        };
    }

    @Override
    public String name() {
        return port.name();
    }
}
