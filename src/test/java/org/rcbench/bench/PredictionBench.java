package org.rcbench.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.tolerance.InputSpace;
import org.rcbench.tolerance.MonteCarlo;
import org.rcbench.tolerance.Predictor;
import org.rcbench.tolerance.Quantities;

/**
 * Speed of the forward model: one evaluation per topology (the example designs in captures/), a
 * 100 000-draw Monte Carlo run, and a whole prediction. Run from the worktree root:
 * {@code java -cp target/test-classes:target/classes:$(cat cp.txt) org.openjdk.jmh.Main PredictionBench}
 * (with {@code mvn dependency:build-classpath -Dmdep.outputFile=cp.txt}).
 */
@State(Scope.Thread)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class PredictionBench {
    @Param({"piper-mk2", "wren", "lumen-dm1", "kestrel", "tally", "tally-rev-a"})
    public String design;

    private TimerModel model;
    private double[] params;
    private int capacitor;
    private final Timing timing = new Timing();
    private Design parsed;
    private InputSpace space;
    private List<TimingQuantity> quantities;
    private long step;

    @Setup
    public void setUp() {
        parsed = DesignReader.read(java.nio.file.Path.of("captures", design + ".toml"));
        model = TimerModels.build(parsed.circuit());
        params = model.nominal();
        capacitor = model.parameters().index("C1");
        space = InputSpace.of(parsed, model);
        quantities = Quantities.of(parsed.circuit());
    }

    /** One model evaluation with a changing capacitor value (so nothing is constant-folded). */
    @Benchmark
    @BenchmarkMode(Mode.AverageTime)
    @OutputTimeUnit(TimeUnit.NANOSECONDS)
    public double evaluate() {
        params[capacitor] *= (step++ & 1) == 0 ? 1.0001 : 1 / 1.0001;
        model.evaluate(params, timing);
        return timing.periodSeconds() + timing.highSeconds();
    }

    /** 100 000 Monte Carlo draws (JCGM 101) including the sort for the coverage interval. */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Warmup(iterations = 3)
    @Measurement(iterations = 10)
    public MonteCarlo.Result monteCarlo100k() {
        return new MonteCarlo(space, quantities, 100_000, 1).run();
    }

    /** A whole prediction: nominal, worst case, GUM and 100 000-draw Monte Carlo. */
    @Benchmark
    @BenchmarkMode(Mode.SingleShotTime)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    @Warmup(iterations = 3)
    @Measurement(iterations = 10)
    public Object predict() {
        return new Predictor().predict(parsed);
    }
}
