package org.rcbench.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code rcbench export ...}: rcbench's data in formats other tools read (CSV, IEEE 1364 VCD). */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = "Write rcbench's data for other tools: cycles or measurements as CSV (RFC 4180), captures as VCD.",
        subcommands = {ExportCyclesCommand.class, ExportMeasurementsCommand.class, ExportVcdCommand.class})
public final class ExportCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return ExitCodes.OK;
    }
}
