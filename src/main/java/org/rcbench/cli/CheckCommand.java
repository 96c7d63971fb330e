package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
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
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench check CAPTURE --design DESIGN}: the measurement against the design's prediction, a
 * verdict, and the back-solved parts with ranked suspects. Exit status 0 for pass or marginal, 1
 * ({@link ExitCodes#CHECK_FAILED}) for fail or stopped, 2 for bad input.
 */
@Command(name = "check", mixinStandardHelpOptions = true,
        description = {"Check a board: measure the capture, compare with the design's predicted bands, and back-solve"
            + " which part is off.",
            "Verdict: pass (inside the 95 %% band), marginal (inside the worst case), fail, or stopped (not running).",
            "Exit status 0 for pass or marginal, 1 for fail or stopped, 2 for bad input."})
public final class CheckCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    CaptureOptions capture;

    @Parameters(index = "0", paramLabel = "CAPTURE", description = "Capture file of the board's output.")
    Path file;

    @Option(names = "--design", required = true, paramLabel = "DESIGN", description = "The board's design file (TOML).")
    Path design;

    @Option(names = "--json", description = "Print one JSON object: the measure keys, prediction, verdict, checks,"
            + " estimates, suspects, ambiguities, histogram and trend.")
    boolean json;

    @Option(names = "--draws", paramLabel = "N", defaultValue = "100000",
            description = "Monte Carlo draws for the statistical band (default: ${DEFAULT-VALUE}).")
    int draws;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Monte Carlo seed (default: ${DEFAULT-VALUE}).")
    long seed;

    @Override
    public Integer call() throws Exception {
        if (draws < 1) {
            throw new BadInputException("--draws", "must be 1 or more, not " + draws);
        }
        Design d = DesignReader.read(design);
        if (d.circuit().topology() == Topology.BISTABLE) {
            throw new BadInputException(design.toString(), "a bistable has no timing to check; use measure with"
                    + " --set-channel for its response and contact bounce");
        }
        PrintWriter out = spec.commandLine().getOut();
        CaptureMeasurement cm = CaptureMeasurement.read(file, capture, spec.commandLine().getErr());
        Checker checker = Checker.of(d, new Predictor(draws, seed).predict(d));
        CheckResult r = checker.check(cm.meter().result(), cm.mono(), PeriodHistogram.of(cm.meter()), cm.meter().trend());
        if (json) {
            var o = CheckJson.of(r);
            o.put("capture", file.toString());
            if (cm.mono() != null) {
                MeasurementJson.addMonostable(o, cm.mono());
            }
            out.println(MeasurementJson.write(o));
        } else {
            out.print(CheckReport.text(r, file.toString()));
        }
        out.flush();
        return r.verdict().failed() ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
    }
}
