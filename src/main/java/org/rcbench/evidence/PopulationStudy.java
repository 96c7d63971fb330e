package org.rcbench.evidence;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.Topology;
import org.rcbench.design.Design;
import org.rcbench.diagnose.Diagnoser;
import org.rcbench.diagnose.Diagnosis;
import org.rcbench.diagnose.Suspect;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;
import org.rcbench.units.Tolerance;

/**
 * Runs a {@link Population}: builds each board's deviations, simulates it through
 * {@link VirtualBoard} (quantized probe clock with an offset, period jitter), measures it with
 * {@link CycleMeter} as a capture would be, and diagnoses the measurement. Deterministic from the
 * population's seed. Stateless; thread-safe.
 */
public final class PopulationStudy {
    private PopulationStudy() {
    }

    /** Runs every board of {@code pop}. */
    public static StudyResult run(Population pop) {
        Design design = pop.design();
        Diagnoser diagnoser = Diagnoser.of(design);
        Timing nominal = TimerModels.build(design.circuit()).evaluateNominal();
        boolean mono = design.circuit().topology() == Topology.MONOSTABLE;
        double cycleSeconds = mono ? 2.5 * nominal.pulseWidthSeconds() : nominal.periodSeconds();
        if (!(cycleSeconds > 0)) {
            throw new IllegalArgumentException(pop.name() + ": the design does not run at nominal");
        }
        List<String> toleranced = toleranced(design);
        SplittableRandom rnd = new SplittableRandom(pop.seed());
        List<Outcome> out = new ArrayList<>(pop.boards());
        for (int b = 0; b < pop.boards(); b++) {
            List<Deviation> devs = new ArrayList<>();
            String faulty = pop.faultable().get(rnd.nextInt(pop.faultable().size()));
            double dev = Double.NaN;
            double multiple = Double.NaN;
            for (String name : toleranced) {
                Tolerance t = design.spread(name).tolerance();
                double d;
                if (name.equals(faulty)) {
                    multiple = pop.minMultiple() + (pop.maxMultiple() - pop.minMultiple()) * rnd.nextDouble();
                    boolean down = rnd.nextBoolean();
                    d = down ? Math.max(-0.9, -multiple * t.minusFraction()) : multiple * t.plusFraction();
                    dev = d;
                } else {
                    d = -t.minusFraction() + (t.minusFraction() + t.plusFraction()) * rnd.nextDouble();
                }
                devs.add(Deviation.relative(name, d));
            }
            double offset = pop.clockOffsetPpm() * (2 * rnd.nextDouble() - 1);
            SimulationSpec spec = SimulationSpec.defaults().withDeviations(devs).withClockHz(pop.clockHz())
                    .withClockOffsetPpm(offset).withJitterSeconds(pop.jitterFraction() * cycleSeconds)
                    .withSeed(rnd.nextLong());
            VirtualBoard board = VirtualBoard.of(design, spec);
            Timebase tb = board.timebase().withTolerancePpm(pop.clockTolerancePpm() / Math.sqrt(3));
            CycleMeter meter = new CycleMeter(MeterConfig.of(VirtualBoard.OUTPUT, tb));
            board.runFor(spec.powerUpSeconds() + (pop.cycles() + 2) * cycleSeconds * Math.max(1, 1 + dev), meter);
            Diagnosis d = diagnoser.diagnose(meter.snapshot());
            Suspect top = d.topSuspect();
            boolean noFault = d.best() != null && d.best().isNoFault();
            out.add(new Outcome(faulty, dev, multiple, top == null ? "" : top.name(),
                    top == null ? 0 : top.probability(), d.ambiguous(), noFault));
        }
        return new StudyResult(pop, out);
    }

    /** The resistors, capacitors and potentiometers of the timing network that have a tolerance. */
    public static List<String> toleranced(Design design) {
        List<String> out = new ArrayList<>();
        for (Element e : design.circuit().elements()) {
            if (e.role() != Role.OTHER && e.role() != Role.CONTROL_BYPASS && e.type() != ElementType.DIODE
                    && !design.spread(e.designator()).tolerance().equals(Tolerance.NONE)) {
                out.add(e.designator());
            }
        }
        return out;
    }
}
