package org.rcbench.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.diagnose.Observations;
import org.rcbench.diagnose.TuneResult;
import org.rcbench.diagnose.TuneTarget;
import org.rcbench.diagnose.Tuner;
import org.rcbench.json.CheckJson;
import org.rcbench.json.MeasurementJson;
import org.rcbench.measure.Measurement;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench tune CAPTURE --design D --frequency 1k | --duty 0.3 | --pulse-width 10ms} (or live:
 * {@code --sim DESIGN}, {@code --port PORT}): where a potentiometer's wiper is now and which way and
 * how far to turn it.
 */
@Command(name = "tune", mixinStandardHelpOptions = true,
        description = {"Potentiometer tuning: estimate the wiper's position from a capture (or live from a probe or a"
            + " simulated board) and say which way and how far to turn it to reach a target frequency, duty or pulse"
            + " width."})
public final class TuneCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    BoardInput board;

    @Mixin
    DatabaseOption database;

    @ArgGroup(exclusive = true, multiplicity = "1")
    Goal goal;

    /** Exactly one target. */
    static final class Goal {
        @Option(names = "--frequency", paramLabel = "HZ", converter = ValueConverters.Frequency.class,
                description = "Target frequency, e.g. 1k or 690 Hz.")
        Double frequency;

        @Option(names = "--duty", paramLabel = "FRACTION", converter = ValueConverters.Fraction.class,
                description = "Target duty cycle, e.g. 0.3 or 30%%.")
        Double duty;

        @Option(names = "--pulse-width", paramLabel = "TIME", converter = ValueConverters.Time.class,
                description = "Target pulse width (monostable), e.g. 10ms.")
        Double pulseWidth;
    }

    @Option(names = "--pot", paramLabel = "DESIGNATOR", description = "Which potentiometer, when the design has several.")
    String pot;

    @Option(names = "--travel-degrees", paramLabel = "DEG",
            description = "The pot's mechanical travel in degrees (e.g. 270), to state the turn in degrees (default: the"
                + " design file's travel of the pot, if given).")
    Double travelDegrees;

    @Option(names = "--turns", paramLabel = "N",
            description = "The pot's number of turns (a multi-turn trimmer; default: the design file's travel, if given).")
    Double turns;

    @Option(names = "--json", description = "Print the result as JSON.")
    boolean json;

    @Override
    public Integer call() throws Exception {
        board.validate();
        Design d = board.design();
        Tuner tuner = Tuner.of(d);
        TuneTarget target = target(d);
        BoardInput.Reading in = board.read(spec.commandLine().getErr(), database);
        CaptureMeasurement cm = in.measurement();
        Measurement m = cm.meter().result();
        if (m.cycles() == 0 && (cm.mono() == null || cm.mono().pulses() == 0)) {
            throw new BadInputException(in.source(), "no complete cycle was measured: nothing to tune from");
        }
        TuneResult r = cm.mono() != null && d.circuit().topology() == Topology.MONOSTABLE
                ? tuner.tune(Observations.pulseWidth(cm.mono().pulseWidth(), Observations.clockShare(m)), target)
                : tuner.tune(m, target);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(MeasurementJson.write(CheckJson.of(r)));
        } else {
            out.println(r.advice());
        }
        out.flush();
        return ExitCodes.OK;
    }

    private TuneTarget target(Design d) {
        TuneTarget t;
        if (goal.frequency != null) {
            t = TuneTarget.of(TimingQuantity.FREQUENCY, goal.frequency);
        } else if (goal.duty != null) {
            t = TuneTarget.of(TimingQuantity.DUTY, goal.duty);
        } else {
            if (d.circuit().topology() != Topology.MONOSTABLE) {
                throw new BadInputException("--pulse-width", "only a monostable has a pulse width; use --frequency or --duty");
            }
            t = TuneTarget.of(TimingQuantity.PULSE_WIDTH, goal.pulseWidth);
        }
        if (pot != null) {
            t = t.withPot(pot);
        }
        if (travelDegrees != null) {
            if (!(travelDegrees > 0) || travelDegrees.isInfinite()) {
                throw new BadInputException("--travel-degrees", "must be above zero: " + travelDegrees);
            }
            t = t.withTravelDegrees(travelDegrees);
        }
        if (turns != null) {
            if (!(turns > 0) || turns.isInfinite()) {
                throw new BadInputException("--turns", "must be above zero: " + turns);
            }
            t = t.withTurns(turns);
        }
        return t;
    }
}
