package org.rcbench.protocol;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Random;
import org.rcbench.edge.EdgeSink;

/**
 * Measures how fast {@link StreamDecoder} turns bytes into edges, for the {@code bench} command
 * and the closing notes (speed is measured and reported, never asserted). The stream is a
 * realistic one: one channel, both edges, half-periods of 500–1500 ticks (about 5–16 kHz at
 * 16 MHz), so most items are 2 bytes, in full edge frames.
 */
public final class DecoderThroughput {
    /** UART at 500 000 baud, 8N1: 10 bits per byte. */
    public static final double UART_500K_BYTES_PER_SECOND = 50_000;
    /** A realistic CDC payload rate on full-speed USB (12 Mbit/s signalling), about 1 MB/s (common practice, no source). */
    public static final double USB_FULL_SPEED_BYTES_PER_SECOND = 1_000_000;

    /**
     * @param edgesPerSecond decoded edges per second of wall time on this machine
     * @param bytesPerEdge   stream bytes per edge, frame overhead included
     * @param bytesPerSecond decoded input bytes per second
     */
    public record Result(double edgesPerSecond, double bytesPerEdge, double bytesPerSecond) {
        /** Edges per second a link of {@code linkBytesPerSecond} can carry at this stream's bytes per edge. */
        public double linkEdgesPerSecond(double linkBytesPerSecond) {
            return linkBytesPerSecond / bytesPerEdge;
        }
    }

    private DecoderThroughput() {
    }

    /** A binary stream of {@code edges} edges as described above, from a fixed seed. */
    public static byte[] stream(int edges) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(edges * 3);
        FrameEncoder enc = new FrameEncoder(out);
        Random random = new Random(1);
        long tick = 0;
        try {
            for (int i = 0; i < edges; i++) {
                enc.edge(tick, 0, i & 1);
                tick += 500 + random.nextInt(1000);
            }
            enc.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /** Decodes {@code stream} once into a sink that only counts; returns the edges seen. */
    public static long decodeOnce(byte[] stream) {
        long[] count = new long[1];
        StreamDecoder d = new StreamDecoder(new EdgeSink() {
            @Override
            public void onEdge(long tick, int channel, int level) {
                count[0] += channel + 1;
            }
        }, new ProbeEvents() { }, StreamDecoder.Mode.BINARY);
        d.feed(stream, 0, stream.length);
        return count[0];
    }

    /** Decodes a {@code edges}-edge stream {@code rounds} times after one warm-up round and reports the rate. */
    public static Result measure(int edges, int rounds) {
        byte[] s = stream(edges);
        decodeOnce(s);
        long start = System.nanoTime();
        long seen = 0;
        for (int r = 0; r < rounds; r++) {
            seen += decodeOnce(s);
        }
        double seconds = (System.nanoTime() - start) * 1e-9;
        return new Result(seen / seconds, s.length / (double) edges, (double) s.length * rounds / seconds);
    }
}
