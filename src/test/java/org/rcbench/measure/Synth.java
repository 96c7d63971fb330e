package org.rcbench.measure;

import java.util.SplittableRandom;
import org.rcbench.edge.EdgeSink;

/**
 * Synthetic astable edges with known truth: true period {@code periodTicks} (real, in ticks of the
 * probe clock), duty {@code duty}, white frequency noise {@code fmTicks} per period and white phase
 * noise {@code pmTicks} per edge, start phase {@code phase}; edges are quantized by flooring.
 */
final class Synth {
    private Synth() {
    }

    static void astable(EdgeSink sink, int channel, int cycles, double periodTicks, double duty, double fmTicks,
            double pmTicks, double phase, SplittableRandom random) {
        double t = phase;
        for (int k = 0; k <= cycles; k++) {
            sink.onEdge((long) Math.floor(t + pmTicks * gauss(random)), channel, EdgeSink.HIGH);
            if (k == cycles) {
                break;
            }
            double p = periodTicks + fmTicks * gauss(random);
            sink.onEdge((long) Math.floor(t + duty * p + pmTicks * gauss(random)), channel, EdgeSink.LOW);
            t += p;
        }
        sink.onEnd((long) Math.floor(t) + 1);
    }

    static double gauss(SplittableRandom r) {
        // Box-Muller; SplittableRandom has no nextGaussian on Java 17.
        double u = r.nextDouble();
        double v = r.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u)) * Math.cos(2 * Math.PI * v);
    }
}
