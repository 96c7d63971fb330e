package org.rcbench.sim;

import java.io.IOException;
import java.io.OutputStream;
import java.util.Random;
import org.rcbench.probe.ByteTransport;

/**
 * The probe's side of the cable: bytes go to a {@link ByteTransport}, some of them damaged or lost
 * on the way as {@link LinkFaults} asks. Counts what it did. Not thread-safe (the probe's one thread).
 */
final class FaultyOutput extends OutputStream {
    private final ByteTransport transport;
    private final double flipRate;
    private final double dropRate;
    private final Random random;
    private final byte[] buf = new byte[512];
    long bytesSent;
    long bytesFlipped;
    long bytesDropped;

    FaultyOutput(ByteTransport transport, LinkFaults faults, Random random) {
        this.transport = transport;
        this.flipRate = faults.byteFlipRate();
        this.dropRate = faults.byteDropRate();
        this.random = random;
    }

    @Override
    public void write(int b) throws IOException {
        write(new byte[] {(byte) b}, 0, 1);
    }

    @Override
    public void write(byte[] b, int off, int len) throws IOException {
        if (flipRate == 0 && dropRate == 0) {
            transport.write(b, off, len);
            bytesSent += len;
            return;
        }
        int n = 0;
        for (int i = off, end = off + len; i < end; i++) {
            if (dropRate > 0 && random.nextDouble() < dropRate) {
                bytesDropped++;
                continue;
            }
            byte x = b[i];
            if (flipRate > 0 && random.nextDouble() < flipRate) {
                x ^= (byte) (1 + random.nextInt(255));
                bytesFlipped++;
            }
            buf[n++] = x;
            if (n == buf.length) {
                transport.write(buf, 0, n);
                bytesSent += n;
                n = 0;
            }
        }
        if (n > 0) {
            transport.write(buf, 0, n);
            bytesSent += n;
        }
    }
}
