package org.rcbench.cli;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.Callable;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MeterConfig;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench bench}: how many edges per second the measurement handles, (a) in memory and
 * (b) parsing a generated capture file. The signal is a jittered astable of about 690 Hz sampled
 * by a 16 MHz probe clock, generated from a fixed seed. Wall-clock figures on this machine; they
 * are reported, never asserted.
 */
@Command(name = "bench", mixinStandardHelpOptions = true,
        description = "Measure the speed of the analysis: edges per second in memory and from a capture file.")
public final class BenchCommand implements Callable<Integer> {
    static final double CLOCK_HZ = 16e6;

    @Spec
    CommandSpec spec;

    @Option(names = "--edges", paramLabel = "N", defaultValue = "10000000",
            description = "Edges to generate (default: ${DEFAULT-VALUE}).")
    int edges;

    @Option(names = "--repeat", paramLabel = "N", defaultValue = "5",
            description = "In-memory runs; the best is reported (default: ${DEFAULT-VALUE}).")
    int repeat;

    @Option(names = "--no-file", description = "Skip the capture-file part.")
    boolean noFile;

    @Option(names = "--keep-file", paramLabel = "PATH",
            description = "Write the generated capture here and keep it (default: a temporary file, deleted).")
    Path keepFile;

    @Override
    public Integer call() throws IOException {
        if (edges < 4 || repeat < 1) {
            throw new BadInputException("bench", "--edges must be at least 4 and --repeat at least 1");
        }
        PrintWriter out = spec.commandLine().getOut();
        long[] ticks = new long[edges];
        int[] levels = new int[edges];
        generate(ticks, levels, 20240601L);
        Timebase timebase = Timebase.of(CLOCK_HZ);

        double best = Double.POSITIVE_INFINITY;
        double resultSeconds = Double.POSITIVE_INFINITY;
        Measurement m = null;
        for (int r = 0; r < repeat; r++) {
            CycleMeter meter = new CycleMeter(MeterConfig.of(0, timebase));
            long t0 = System.nanoTime();
            for (int k = 0; k < edges; k++) {
                meter.onEdge(ticks[k], 0, levels[k]);
            }
            meter.onEnd(ticks[edges - 1]);
            long t1 = System.nanoTime();
            m = meter.result();
            best = Math.min(best, (t1 - t0) / 1e9);
            resultSeconds = Math.min(resultSeconds, (System.nanoTime() - t1) / 1e9);
        }
        out.println(String.format(Locale.ROOT, "in-memory analysis: %,d edges, best of %d runs %.3f s = %.1f million"
                + " edges/s (one thread)", edges, repeat, best, edges / best / 1e6));
        out.println(String.format(Locale.ROOT, "  final result with MTIE windows: %.3f s; check: %,d cycles, %.4f Hz",
                resultSeconds, m.cycles(), m.frequency().frequencyHz()));

        if (!noFile) {
            Path file = keepFile != null ? keepFile : Files.createTempFile("rcbench-bench", ".rce");
            try {
                write(file, ticks, levels);
                long size = Files.size(file);
                long t0 = System.nanoTime();
                Measurement fm;
                try (Capture capture = CaptureFiles.open(file)) {
                    CycleMeter meter = new CycleMeter(MeterConfig.of(0, capture.timebase()));
                    capture.streamTo(meter);
                    fm = meter.result();
                }
                double s = (System.nanoTime() - t0) / 1e9;
                out.println(String.format(Locale.ROOT, "parse + analysis:   %,d edges from a %.0f MB file, %.3f s ="
                        + " %.1f million edges/s", edges, size / 1e6, s, edges / s / 1e6));
                out.println(String.format(Locale.ROOT, "  check: %,d cycles, %.4f Hz", fm.cycles(),
                        fm.frequency().frequencyHz()));
            } finally {
                if (keepFile == null) {
                    Files.deleteIfExists(file);
                }
            }
        }
        out.flush();
        return ExitCodes.OK;
    }

    /**
     * A 555-like astable: period 23 188.4 ticks (690 Hz at 16 MHz), duty 0.524, white frequency
     * noise of 2 ticks RMS per period; edges floored to whole ticks. Fills both arrays.
     */
    static void generate(long[] ticks, int[] levels, long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        double t = 1000;
        for (int k = 0; k < ticks.length; k += 2) {
            double period = 23_188.4 + 2 * gaussian(random);
            ticks[k] = (long) t;
            levels[k] = EdgeSink.HIGH;
            if (k + 1 < ticks.length) {
                ticks[k + 1] = (long) (t + 0.524 * period);
                levels[k + 1] = EdgeSink.LOW;
            }
            t += period;
        }
    }

    private static double gaussian(SplittableRandom r) {
        return Math.sqrt(-2 * Math.log(1 - r.nextDouble())) * Math.cos(2 * Math.PI * r.nextDouble());
    }

    private static void write(Path file, long[] ticks, int[] levels) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("# rcbench edges v1\n# clock_hz=16000000\n# probe=rcbench bench generator\ntick,channel,level\n");
            StringBuilder line = new StringBuilder(32);
            for (int k = 0; k < ticks.length; k++) {
                line.setLength(0);
                line.append(ticks[k]).append(",0,").append(levels[k]).append('\n');
                w.append(line);
            }
        }
    }
}
