package org.rcbench.capture;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.SplittableRandom;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Measures how fast edge captures parse, for the {@code bench} command and the JMH benchmark.
 * Speed is reported, never asserted. Stateless.
 */
public final class CaptureBench {
    private CaptureBench() {
    }

    /**
     * One timed parse.
     *
     * @param edges   data lines delivered to the sink
     * @param bytes   size of the file
     * @param seconds wall-clock time from opening to the end of streaming
     */
    public record Result(long edges, long bytes, double seconds) {
        /** Data lines parsed per second. */
        public double linesPerSecond() {
            return edges / seconds;
        }

        /** File bytes parsed per second, in units of 10^6 bytes. */
        public double megabytesPerSecond() {
            return bytes / seconds / 1e6;
        }
    }

    /**
     * Writes a plain capture of {@code edges} edges on channel 0 to {@code file}: a 690 Hz timer
     * output of about 40 % duty seen by a 16 MHz probe, with some ticks of jitter, so ticks grow to
     * 12 digits as in a long real recording.
     */
    public static void generate(Path file, long edges) throws IOException {
        Map<String, String> header = EdgeCaptureFormat.header(Timebase.of(16e6), Map.of(0, "output"));
        header.put(EdgeCaptureFormat.PROBE, "synthetic");
        SplittableRandom rnd = new SplittableRandom(690);
        try (EdgeCaptureWriter w = EdgeCaptureWriter.create(file, header, false)) {
            long tick = 16_000;
            for (long i = 0; i < edges; i++) {
                int level = (int) (~i & 1);
                w.append(tick, 0, level);
                tick += (level == 1 ? 9_275 : 13_913) + rnd.nextInt(9) - 4;
            }
            w.end(tick);
        }
    }

    /** Parses {@code file} {@code rounds} times (at least 1) and returns the fastest round. */
    public static Result parse(Path file, int rounds) throws IOException {
        Result best = null;
        for (int r = 0; r < Math.max(1, rounds); r++) {
            long[] count = new long[1];
            EdgeSink counter = (tick, channel, level) -> count[0]++;
            long t0 = System.nanoTime();
            try (Capture c = CaptureFiles.open(file)) {
                c.streamTo(counter);
            }
            double s = (System.nanoTime() - t0) * 1e-9;
            if (best == null || s < best.seconds()) {
                best = new Result(count[0], Files.size(file), s);
            }
        }
        return best;
    }
}
