package org.rcbench.bench;

import java.nio.file.Path;
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
import org.openjdk.jmh.infra.Blackhole;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;

/**
 * Simulated edges per second from a {@link VirtualBoard} (one operation = one edge): the Piper Mk2
 * with jitter, without and with supply ripple (one model evaluation per phase). Run from the project
 * folder with {@code java -cp target/test-classes:target/classes:$(cat cp.txt) org.openjdk.jmh.Main
 * VirtualBoardBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class VirtualBoardBenchmark {
    /** 100 s of a 679 Hz board: about 135 800 edges. */
    static final double SECONDS = 100;
    static final int EDGES = 135_800;
    Design piper;

    @Setup
    public void read() {
        piper = DesignReader.read(Path.of("captures/piper-mk2.toml"));
    }

    @Benchmark
    @OperationsPerInvocation(EDGES)
    public long jitter(Blackhole bh) {
        VirtualBoard b = VirtualBoard.of(piper, SimulationSpec.defaults().withJitterSeconds(1e-6));
        return b.runFor(SECONDS, (tick, channel, level) -> bh.consume(tick));
    }

    @Benchmark
    @OperationsPerInvocation(EDGES)
    public long jitterAndRipple(Blackhole bh) {
        VirtualBoard b = VirtualBoard.of(piper, SimulationSpec.defaults().withJitterSeconds(1e-6).withRipple(0.5, 100));
        return b.runFor(SECONDS, (tick, channel, level) -> bh.consume(tick));
    }
}
