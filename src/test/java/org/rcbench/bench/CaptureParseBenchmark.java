package org.rcbench.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureBench;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.edge.EdgeSink;

/**
 * Parse speed of an rcbench edge capture of 10 million edges (about 170 MB) from the page cache.
 * Lines per second = edges / (seconds per operation). Run:
 * {@code java -cp target/test-classes:target/classes:<test classpath> org.openjdk.jmh.Main CaptureParseBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2)
@Measurement(iterations = 5)
@Fork(1)
public class CaptureParseBenchmark {
    @Param("10000000")
    long edges;

    private Path file;

    @Setup(Level.Trial)
    public void generate() throws IOException {
        file = Files.createTempFile("rcbench-bench", ".rce");
        CaptureBench.generate(file, edges);
    }

    @TearDown(Level.Trial)
    public void delete() throws IOException {
        Files.deleteIfExists(file);
    }

    @Benchmark
    public void parse(Blackhole bh) throws IOException {
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(new EdgeSink() {
                @Override
                public void onEdge(long tick, int channel, int level) {
                    bh.consume(tick);
                }
            });
        }
    }
}
