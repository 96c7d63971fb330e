package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.capture.VcdTimescale;
import org.rcbench.capture.VcdWriter;
import org.rcbench.common.BadInputException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code rcbench export vcd CAPTURE -o FILE}: a capture as an IEEE 1364 value change dump. */
@Command(name = "vcd", mixinStandardHelpOptions = true,
        description = {"Write a capture as an IEEE 1364 value change dump (VCD).",
            "One 1-bit wire per channel, for waveform viewers and logic tools. Gaps become x.",
            "The default time unit keeps every tick exact."})
public final class ExportVcdCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "CAPTURE", description = "rcbench edge capture or VCD file (.gz too).")
    Path capture;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", required = true, description = "The VCD file to write.")
    Path output;

    @Option(names = "--channel", paramLabel = "N|NAME",
            description = "A channel to write; repeat for more (default: every named channel).")
    List<String> channels;

    @Option(names = "--timescale", paramLabel = "UNIT",
            description = "VCD time unit: 1, 10 or 100 s|ms|us|ns|ps|fs (default: the coarsest that keeps ticks exact).")
    String timescale;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        try (Capture c = CaptureFiles.open(capture)) {
            VcdTimescale unit;
            try {
                unit = timescale == null ? VcdTimescale.coarsestExactFor(c.timebase().clockHz())
                        : VcdTimescale.parse(timescale);
            } catch (IllegalArgumentException e) {
                throw new BadInputException("--timescale", e.getMessage(), e);
            }
            Map<Integer, String> chosen = new LinkedHashMap<>();
            if (channels == null || channels.isEmpty()) {
                chosen.putAll(c.channels());
                if (chosen.isEmpty()) {
                    throw new BadInputException(capture.toString(),
                            "names no channels; say which to write with --channel N");
                }
            } else {
                for (String name : channels) {
                    int ch = CaptureFiles.selectChannel(c, name);
                    chosen.put(ch, c.channels().getOrDefault(ch, "ch" + ch));
                }
            }
            OutputFile.stream(output, os -> VcdWriter.write(c, os, unit, chosen));
            CaptureOptions.warn(c, err);
            err.println("rcbench: " + chosen.size() + (chosen.size() == 1 ? " channel" : " channels") + " written to "
                    + output + " in units of " + unit.text());
        }
        err.flush();
        return ExitCodes.OK;
    }
}
