package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.report.CycleCsv;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code rcbench export cycles CAPTURE}: one CSV record per cycle of one channel. */
@Command(name = "cycles", mixinStandardHelpOptions = true,
        description = {"Write the cycles of one channel of a capture as CSV.",
            "One record per cycle as the measurement forms it, rising edge to rising edge: cycle, start_tick, start_s,"
                + " period_s, high_s, low_s, duty, flags. No cycle spans a gap, a stall or a lost edge; glitches are"
                + " merged away; start-up settling cycles are kept and flagged (flags: settling, new-run,"
                + " glitch-removed)."})
public final class ExportCyclesCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CAPTURE", description = "rcbench edge capture or VCD file (.gz too).")
    Path capture;

    @Option(names = "--channel", paramLabel = "N|NAME", description = "Channel (default: the first channel).")
    String channel;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write to FILE instead of stdout.")
    Path output;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        try (Capture c = CaptureFiles.open(capture)) {
            int ch = CaptureOptions.channel(Channels.of(c), channel);
            CycleCsv.Summary[] summary = new CycleCsv.Summary[1];
            OutputFile.text(output, spec.commandLine().getOut(), w -> summary[0] = CycleCsv.write(c, ch, w));
            CaptureOptions.warn(c, err);
            if (!OutputFile.isStdout(output)) {
                CycleCsv.Summary sum = summary[0];
                err.println("rcbench: " + sum.cycles() + " cycles of channel " + ch + " written to " + output
                        + notes(sum));
            }
        }
        err.flush();
        return ExitCodes.OK;
    }

    /** {@code " (1 settling, 2 glitches removed, 1 gap: no cycle spans it)"}, or empty. */
    private static String notes(CycleCsv.Summary s) {
        StringBuilder sb = new StringBuilder();
        if (s.settlingCycles() > 0) {
            sb.append(s.settlingCycles()).append(" settling");
        }
        if (s.glitches() > 0) {
            sb.append(sb.length() == 0 ? "" : ", ").append(s.glitches()).append(s.glitches() == 1 ? " glitch" : " glitches")
                    .append(" removed");
        }
        if (s.gaps() > 0) {
            sb.append(sb.length() == 0 ? "" : ", ").append(s.gaps() == 1 ? "1 gap: no cycle spans it"
                    : s.gaps() + " gaps: no cycle spans them");
        }
        return sb.length() == 0 ? "" : " (" + sb + ")";
    }
}
