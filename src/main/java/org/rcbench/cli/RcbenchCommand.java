package org.rcbench.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The root {@code rcbench} command: prints usage when called without a subcommand. */
@Command(
        name = "rcbench",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Measure, predict and diagnose RC timing circuits of the 555 family.",
        subcommands = {
            // Each stage registers its command here, one line each.
            MeasureCommand.class,
            BenchCommand.class,
            PortsCommand.class,
            PredictCommand.class,
            DesignCommand.class,
            RecordCommand.class,
            WatchCommand.class,
            CalibrateCommand.class,
            CheckCommand.class,
            TuneCommand.class,
            EvidenceCommand.class,
            HistoryCommand.class,
            ReportCommand.class,
            ExportCommand.class,
            GuiCommand.class,
        })
public final class RcbenchCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCodes.OK;
    }
}
