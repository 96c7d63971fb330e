package org.rcbench.testing;

import java.io.IOException;
import java.io.OutputStream;
import org.rcbench.probe.ByteTransport;

/** Adapts the probe end of a transport for an {@link ProbeEmulator}. */
public final class TransportStreams {
    private TransportStreams() {
    }

    public static OutputStream output(ByteTransport t) {
        return new OutputStream() {
            @Override
            public void write(int b) throws IOException {
                t.write(new byte[] {(byte) b}, 0, 1);
            }

            @Override
            public void write(byte[] b, int off, int len) throws IOException {
                t.write(b, off, len);
            }
        };
    }

    /** Starts a daemon thread feeding what the host writes to the emulator until the transport ends. */
    public static Thread pump(ByteTransport t, ProbeEmulator emulator) {
        Thread th = new Thread(() -> {
            byte[] buf = new byte[512];
            try {
                for (int n; (n = t.read(buf, 0, buf.length, 100)) >= 0; ) {
                    if (n > 0) {
                        emulator.hostBytes(buf, 0, n);
                    }
                }
            } catch (IOException | RuntimeException e) {
                // The link is gone; the emulator stops hearing the host.
            }
        }, "emulator pump");
        th.setDaemon(true);
        th.start();
        return th;
    }
}
