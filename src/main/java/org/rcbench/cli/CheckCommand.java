package org.rcbench.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.diagnose.CheckResult;
import org.rcbench.diagnose.Checker;
import org.rcbench.diagnose.PeriodHistogram;
import org.rcbench.json.CheckJson;
import org.rcbench.json.MeasurementJson;
import org.rcbench.tolerance.Predictor;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench check CAPTURE --design DESIGN}, or live {@code rcbench check --sim DESIGN [--fault
 * ...]} / {@code --port PORT --design DESIGN}: the measurement against the design's prediction, a
 * verdict, and the back-solved parts with ranked suspects; {@code --save} stores it in the history.
 * Exit status 0 for pass or marginal, 1 ({@link ExitCodes#CHECK_FAILED}) for fail or stopped, 2 for
 * bad input.
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Check a board: measure it (a capture file, or live from a probe or a simulated board),"
            + " compare with the design's predicted bands, and back-solve which part is off.",
            "Verdict: pass (inside the 95 %% band), marginal (inside the worst case), fail, or stopped (not running).",
            "Exit status 0 for pass or marginal, 1 for fail or stopped, 2 for bad input.",
            "Caution: the probe's ground is the computer's ground. Never connect it to mains-referenced or"
                + " transformerless circuits without isolation; mind charged capacitors."})
public final class CheckCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    BoardInput board;

    @Mixin
    SaveOptions save;

    @Option(names = "--json", description = "Print one JSON object: the measure keys, prediction, verdict, checks,"
            + " estimates, suspects, ambiguities, histogram and trend.")
    boolean json;

    @Option(names = "--draws", paramLabel = "N", defaultValue = "100000",
            description = "Monte Carlo draws for the statistical band (default: ${DEFAULT-VALUE}).")
    int draws;

    @Option(names = "--draws-seed", paramLabel = "S", defaultValue = "1",
            description = "Seed of the Monte Carlo draws (default: ${DEFAULT-VALUE}).")
    long drawsSeed;

    @Override
    public Integer call() throws Exception {
        board.validate();
        save.validate();
        if (draws < 1) {
            throw new BadInputException("--draws", "must be 1 or more, not " + draws);
        }
        Design d = board.design();
        if (d.circuit().topology() == Topology.BISTABLE) {
            throw new BadInputException(d.source(), "a bistable has no timing to check; use measure with"
                    + " --set-channel for its response and contact bounce");
        }
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Checker checker = Checker.of(d, new Predictor(draws, drawsSeed).predict(d));
        BoardInput.Reading in = board.read(err, save.database());
        CaptureMeasurement cm = in.measurement();
        CheckResult r = checker.check(cm.meter().result(), cm.mono(), PeriodHistogram.of(cm.meter()), cm.meter().trend());
        var o = CheckJson.of(r);
        o.put("source", in.source());
        o.put("capture", in.captureFile() == null ? null : in.captureFile().toString());
        if (cm.mono() != null) {
            MeasurementJson.addMonostable(o, cm.mono());
        }
        if (json) {
            out.println(MeasurementJson.write(o));
        } else {
            out.print(CheckReport.text(r, in.source(), cm.mono() == null ? -1 : cm.mono().pulses()));
        }
        out.flush();
        if (save.requested()) {
            save.save(o, new SaveOptions.Request(d.title(), board.designRef(), in.captureFile(), in.probe()), err);
        }
        return r.verdict().failed() ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
    }
}
