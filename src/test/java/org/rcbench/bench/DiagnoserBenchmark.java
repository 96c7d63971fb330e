package org.rcbench.bench;

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
import org.rcbench.design.Design;
import org.rcbench.diagnose.Diagnoser;
import org.rcbench.diagnose.Diagnosis;
import org.rcbench.evidence.StandardPopulations;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;

/**
 * Time of one full diagnosis (every explanation solved, suspects, estimates, ambiguities) from a
 * measurement snapshot, as a live view would call it on each update. Boards: the standard
 * populations' designs ({@code population} is the index into {@link StandardPopulations#all()}:
 * 0 astable, 1 one-diode astable, 2 two-diode astable, 5 pot PWM, 6 monostable), simulated with C1
 * 30 % low. To run:
 *
 * <pre>
 * mvn -B -ntp -q -DskipTests test-compile dependency:build-classpath \
 *     -Dmdep.outputFile=target/test-classpath.txt -Dmdep.includeScope=test
 * java -cp target/test-classes:target/classes:$(cat target/test-classpath.txt) \
 *     org.openjdk.jmh.Main DiagnoserBenchmark
 * </pre>
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class DiagnoserBenchmark {
    @Param({"0", "2", "5", "6"})
    int population;

    Diagnoser diagnoser;
    org.rcbench.measure.Measurement measurement;

    @Setup
    public void prepare() {
        Design d = StandardPopulations.all().get(population).population().design();
        diagnoser = Diagnoser.of(d);
        VirtualBoard board = VirtualBoard.of(d, SimulationSpec.defaults().withDeviation(Deviation.parse("C1=-30%"))
                .withJitterSeconds(1e-8).withSeed(1));
        CycleMeter meter = new CycleMeter(MeterConfig.of(VirtualBoard.OUTPUT, board.timebase().withTolerancePpm(29)));
        board.runFor(d.circuit().topology() == org.rcbench.circuit.Topology.MONOSTABLE ? 3.0 : 0.2, meter);
        measurement = meter.snapshot();
    }

    @Benchmark
    public Diagnosis diagnose() {
        return diagnoser.diagnose(measurement);
    }
}
