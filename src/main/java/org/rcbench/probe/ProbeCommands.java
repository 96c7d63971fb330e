package org.rcbench.probe;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import org.rcbench.protocol.FrameEncoder;
import org.rcbench.protocol.HostCommand;
import org.rcbench.protocol.TextLines;
import org.rcbench.protocol.Wire;

/**
 * Writes host commands to a probe with the host's own sequence numbers. Each batch starts with a
 * delimiter so it never joins bytes the probe had half-read. Write errors are ignored: the reader
 * sees the transport gone and reports the disconnect. Thread-safe.
 */
final class ProbeCommands {
    private final ByteArrayOutputStream buffer = new ByteArrayOutputStream();
    private final FrameEncoder encoder = new FrameEncoder(buffer);

    /** Asks for the hello: the text-mode line {@code ?}, then (unless the probe is known to speak text) the frame. */
    void helloRequest(ByteTransport t, boolean binaryToo) {
        byte[] text = TextLines.bytes("\n" + TextLines.HELLO_REQUEST);
        write(t, text);
        if (binaryToo) {
            send(t, HostCommand.helloRequest());
        }
    }

    /** Sends the commands as one write. */
    void send(ByteTransport t, HostCommand... commands) {
        byte[] bytes;
        synchronized (buffer) {
            buffer.reset();
            buffer.write(Wire.DELIMITER);
            try {
                for (HostCommand c : commands) {
                    encoder.command(c);
                }
            } catch (IOException e) {
                throw new IllegalStateException("in-memory write failed", e);
            }
            bytes = buffer.toByteArray();
        }
        write(t, bytes);
    }

    private static void write(ByteTransport t, byte[] b) {
        try {
            t.write(b, 0, b.length);
        } catch (IOException e) {
            // The reader sees the transport gone and reports the disconnect.
        }
    }
}
