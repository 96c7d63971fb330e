package org.rcbench.gui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import java.util.SplittableRandom;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.capture.EdgeCaptureWriter;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Writes synthetic astable captures for the window's tests: a square wave of known period and duty
 * with white timing noise, quantized by flooring to a 16 MHz clock. The numbers under test are
 * always recomputed from the same file by the core, so these signals carry no expected answers.
 */
final class TestCaptures {
    static final double CLOCK_HZ = 16e6;

    private TestCaptures() {
    }

    /**
     * An astable of {@code cycles} cycles, {@code periodTicks} long at {@code duty}, with
     * {@code noiseTicks} of white frequency noise per period, optionally drifting by {@code driftPerCycle}
     * (relative change of the period per cycle).
     */
    static Path astable(Path file, int cycles, double periodTicks, double duty, double noiseTicks,
            double driftPerCycle, long seed) throws IOException {
        SplittableRandom random = new SplittableRandom(seed);
        Map<String, String> header = EdgeCaptureFormat.header(Timebase.of(CLOCK_HZ), Map.of(0, "out"));
        try (EdgeCaptureWriter w = EdgeCaptureWriter.create(file, header, false)) {
            double t = 1000;
            double p = periodTicks;
            for (int k = 0; k <= cycles; k++) {
                w.append((long) Math.floor(t), 0, EdgeSink.HIGH);
                if (k == cycles) {
                    break;
                }
                double q = p + noiseTicks * gauss(random);
                w.append((long) Math.floor(t + duty * q), 0, EdgeSink.LOW);
                t += q;
                p *= 1 + driftPerCycle;
            }
            w.end((long) Math.floor(t) + 1);
        }
        return file;
    }

    static double gauss(SplittableRandom r) {
        double u = r.nextDouble();
        double v = r.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u)) * Math.cos(2 * Math.PI * v);
    }
}
