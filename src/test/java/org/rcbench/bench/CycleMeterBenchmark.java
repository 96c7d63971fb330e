package org.rcbench.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OperationsPerInvocation;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;

/**
 * Edges per second through {@link CycleMeter} in memory (the score is operations per second, one
 * operation per edge). A jittered 690 Hz astable at a 16 MHz probe clock, one million edges per
 * invocation. To run (the JMH annotation processor is configured in pom.xml):
 *
 * <pre>
 * mvn -B -ntp -q -DskipTests test-compile dependency:build-classpath \
 *     -Dmdep.outputFile=target/test-classpath.txt -Dmdep.includeScope=test
 * java -cp target/test-classes:target/classes:$(cat target/test-classpath.txt) \
 *     org.openjdk.jmh.Main CycleMeterBenchmark
 * </pre>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class CycleMeterBenchmark {
    static final int EDGES = 1_000_000;

    long[] ticks;
    int[] levels;

    @Setup
    public void generate() {
        ticks = new long[EDGES];
        levels = new int[EDGES];
        SplittableRandom random = new SplittableRandom(1);
        double t = 1000;
        for (int k = 0; k < EDGES; k += 2) {
            double period = 23_188.4 + 2 * (random.nextDouble() + random.nextDouble() - 1) * 1.7;
            ticks[k] = (long) t;
            levels[k] = EdgeSink.HIGH;
            ticks[k + 1] = (long) (t + 0.524 * period);
            levels[k + 1] = EdgeSink.LOW;
            t += period;
        }
    }

    /** Feeding every edge and ending the stream; the cheap snapshot keeps the work observable. */
    @Benchmark
    @OperationsPerInvocation(EDGES)
    public long feedEdges() {
        CycleMeter meter = new CycleMeter(MeterConfig.of(0, Timebase.of(16e6)));
        for (int k = 0; k < EDGES; k++) {
            meter.onEdge(ticks[k], 0, levels[k]);
        }
        meter.onEnd(ticks[EDGES - 1]);
        return meter.snapshot().cycles();
    }

    /** As {@link #feedEdges()} with a second channel interleaved that the meter must skip. */
    @Benchmark
    @OperationsPerInvocation(2 * EDGES)
    public long feedWithOtherChannel() {
        CycleMeter meter = new CycleMeter(MeterConfig.of(0, Timebase.of(16e6)));
        for (int k = 0; k < EDGES; k++) {
            meter.onEdge(ticks[k], 0, levels[k]);
            meter.onEdge(ticks[k] + 5, 1, levels[k]);
        }
        meter.onEnd(ticks[EDGES - 1]);
        return meter.snapshot().cycles();
    }
}
