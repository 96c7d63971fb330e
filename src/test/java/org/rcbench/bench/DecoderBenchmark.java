package org.rcbench.bench;

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
import org.rcbench.protocol.DecoderThroughput;

/**
 * Decoded edges per second from bytes (one operation = one edge). Run with
 * {@code java -cp target/test-classes:target/classes:$(cat cp.txt) org.openjdk.jmh.Main DecoderBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class DecoderBenchmark {
    static final int EDGES = 1_000_000;
    byte[] stream;

    @Setup
    public void build() {
        stream = DecoderThroughput.stream(EDGES);
    }

    @Benchmark
    @OperationsPerInvocation(EDGES)
    public long decodeBinaryStream() {
        return DecoderThroughput.decodeOnce(stream);
    }
}
