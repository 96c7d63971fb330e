package org.rcbench.diagnose;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.circuit.TimerModels;
import org.rcbench.design.Design;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;

/**
 * Round trips: known part values, simulated through {@link VirtualBoard} (16 MHz probe clock with an
 * offset inside the ±50 ppm the measurement assumes, period jitter, quantization), measured with
 * {@link CycleMeter}, back-solved: each part's 95 % interval must hold its true value in at least
 * the stated share of boards. The bound allows for sampling: with n intervals the observed coverage
 * of a true 95 % interval stays above 0.95 - 3 sqrt(0.95 * 0.05 / n) (normal approximation to the
 * binomial, three standard deviations).
 */
class RoundTripTest {
    private static final Design ASTABLE = Boards.parse("[timer]\ntopology = \"astable\"\nfamily = \"bipolar\"\n"
            + "supply = \"9 V\"\n" + Boards.part("R1", "charge", "4k7", "5%", "carbon-film")
            + Boards.part("R2", "shared", "10k", "5%", "carbon-film") + Boards.part("C1", "timing", "10n", "5%", "film"));
    private static final Design MONOSTABLE = Boards.parse("[timer]\ntopology = \"monostable\"\nfamily = \"bipolar\"\n"
            + "supply = \"5 V\"\n" + Boards.part("R1", "charge", "100k", "5%", "carbon-film")
            + Boards.part("C1", "timing", "1u", "10%", "polyester"));

    @ParameterizedTest(name = "{0}, fault {1}-{2} tolerances")
    @CsvSource({"astable, 0, 0", "astable, 3, 6", "monostable, 0, 0", "monostable, 3, 6"})
    void intervalsHoldTheTrueValues(String which, double minMultiple, double maxMultiple) {
        Design design = which.equals("astable") ? ASTABLE : MONOSTABLE;
        List<String> parts = List.of("R1", "C1");
        if (which.equals("astable")) {
            parts = List.of("R1", "R2", "C1");
        }
        Diagnoser diagnoser = Diagnoser.of(design);
        double nominalCycle = which.equals("astable")
                ? TimerModels.build(design.circuit()).evaluateNominal().periodSeconds()
                : 2.5 * TimerModels.build(design.circuit()).evaluateNominal().pulseWidthSeconds();
        SplittableRandom rnd = new SplittableRandom(11);
        int covered = 0;
        int intervals = 0;
        int boards = 60;
        for (int b = 0; b < boards; b++) {
            String faulty = minMultiple > 0 ? parts.get(rnd.nextInt(parts.size())) : "";
            List<Deviation> devs = new ArrayList<>();
            double[] truth = new double[parts.size()];
            for (int i = 0; i < parts.size(); i++) {
                String name = parts.get(i);
                double tol = design.spread(name).tolerance().plusFraction();
                double d = parts.get(i).equals(faulty)
                        ? (rnd.nextBoolean() ? 1 : -1) * tol * (minMultiple + (maxMultiple - minMultiple) * rnd.nextDouble())
                        : tol * (2 * rnd.nextDouble() - 1);
                devs.add(Deviation.relative(name, d));
                truth[i] = design.part(name).value() * (1 + d);
            }
            SimulationSpec spec = SimulationSpec.defaults().withDeviations(devs).withJitterSeconds(1e-4 * nominalCycle)
                    .withClockOffsetPpm(80 * rnd.nextDouble() - 40).withSeed(rnd.nextLong());
            VirtualBoard board = VirtualBoard.of(design, spec);
            Timebase tb = board.timebase().withTolerancePpm(50 / Math.sqrt(3));
            CycleMeter meter = new CycleMeter(MeterConfig.of(VirtualBoard.OUTPUT, tb));
            board.runFor(spec.powerUpSeconds() + 800 * nominalCycle, meter);
            Diagnosis d = diagnoser.diagnose(meter.snapshot());
            for (int i = 0; i < parts.size(); i++) {
                Estimate e = d.estimate(parts.get(i));
                intervals++;
                covered += e.covers(truth[i]) ? 1 : 0;
            }
        }
        double coverage = (double) covered / intervals;
        double bound = Estimate.COVERAGE - 3 * Math.sqrt(Estimate.COVERAGE * (1 - Estimate.COVERAGE) / intervals);
        assertThat(coverage).as("coverage of %d intervals", intervals).isGreaterThanOrEqualTo(bound);
    }
}
