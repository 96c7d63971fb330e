package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.Callable;
import org.rcbench.common.BadInputException;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.PartTrend;
import org.rcbench.history.ProbeCalibration;
import org.rcbench.history.RunRecord;
import org.rcbench.history.TrendAnalysis;
import org.rcbench.report.HtmlReport;
import org.rcbench.report.ReportInput;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code rcbench report RUN|--last [-o FILE]}: a printable HTML test record of one stored run. */
@Command(name = "report", mixinStandardHelpOptions = true,
        description = {"Write a printable test record of a stored run.",
            "One self-contained HTML file with its plots; open it in a browser and print it on A4 or Letter."})
public final class ReportCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    RunChoice runs;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write to FILE instead of stdout.")
    Path output;

    @Option(names = "--horizon", paramLabel = "YEARS", defaultValue = "10",
            description = "How far ahead part trends are projected (default: ${DEFAULT-VALUE} years).")
    double horizonYears;

    @Mixin
    DatabaseOption database;

    @Override
    public Integer call() throws Exception {
        if (!(horizonYears > 0) || horizonYears > 1000) {
            throw new BadInputException("--horizon", "must be more than 0 and at most 1000 years, not " + horizonYears);
        }
        PrintWriter err = spec.commandLine().getErr();
        ReportInput input;
        try (HistoryStore store = database.openExisting(err)) {
            RunRecord r = runs.pick(store);
            List<TrendAnalysis> trends = new ArrayList<>();
            String key = r.context().serial() != null ? r.context().serial() : r.context().board();
            for (PartTrend t : store.partTrends(key)) {
                if (t.board().equalsIgnoreCase(r.context().board())
                        && Objects.equals(t.serial(), r.context().serial())) {
                    trends.add(t.analyse(horizonYears));
                }
            }
            String probe = r.context().probe().probeId();
            ProbeCalibration cal = probe == null ? null : store.latestCalibration(probe).orElse(null);
            input = new ReportInput(r, trends, cal, Instant.now(), new VersionProvider().getVersion()[0].replaceFirst("^rcbench ", ""));
        }
        String html = HtmlReport.render(input);
        OutputFile.text(output, spec.commandLine().getOut(), w -> w.write(html));
        if (!OutputFile.isStdout(output)) {
            err.println("rcbench: report of run " + input.run().id() + " written to " + output);
            err.flush();
        }
        return ExitCodes.OK;
    }
}
