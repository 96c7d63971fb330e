package org.rcbench.testing;

import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.util.Random;

/**
 * Hands out a byte array in pieces: one byte per read, or random sizes from a fixed seed, the way a
 * pipe or a serial port does. Test use only.
 */
public final class ChunkedInputStream extends InputStream {
    private final ByteArrayInputStream data;
    private final Random random;
    private final int maxChunk;

    private ChunkedInputStream(byte[] bytes, Random random, int maxChunk) {
        this.data = new ByteArrayInputStream(bytes);
        this.random = random;
        this.maxChunk = maxChunk;
    }

    /** One byte per {@code read} call. */
    public static InputStream byteByByte(byte[] bytes) {
        return new ChunkedInputStream(bytes, null, 1);
    }

    /** Reads of 1..maxChunk bytes, sizes drawn from {@code new Random(seed)}. */
    public static InputStream randomChunks(byte[] bytes, long seed, int maxChunk) {
        return new ChunkedInputStream(bytes, new Random(seed), maxChunk);
    }

    @Override
    public int read() {
        return data.read();
    }

    @Override
    public int read(byte[] b, int off, int len) {
        if (len == 0) {
            return 0;
        }
        int n = random == null ? 1 : 1 + random.nextInt(maxChunk);
        return data.read(b, off, Math.min(len, n));
    }
}
