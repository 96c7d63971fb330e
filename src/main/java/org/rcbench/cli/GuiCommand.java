package org.rcbench.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.rcbench.common.BadInputException;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.BenchSettings;
import org.rcbench.gui.SourceChoice;
import org.rcbench.gui.view.GuiLauncher;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code rcbench gui [--sim DESIGN [--fault F]... | --port P | FILE]}: opens the bench window, or with
 * {@code --snapshot out.png} renders it headless after a few seconds of data.
 */
@Command(name = "gui", mixinStandardHelpOptions = true,
        description = {"Open the bench window: live readings against the design's bands, plots, suspects and the"
                + " trimmer guide.",
            "Reads the simulated board by default, or a serial probe (--port), or replays a capture file in real time.",
            "Safety: the probe's ground is the computer's ground; never probe mains-referenced or transformerless"
                + " circuits without isolation. The window shows the full notice on first start."})
public final class GuiCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "Capture file to replay.")
    Path file;

    @Option(names = "--sim", paramLabel = "DESIGN", arity = "0..1", fallbackValue = "",
            description = "Read the simulated board built from DESIGN (without a value: the built-in board).")
    String sim;

    @Option(names = "--fault", paramLabel = "DEVIATION",
            description = "A deviation built into the simulated board, e.g. C1=-35% (repeatable).")
    List<String> faults = new ArrayList<>();

    @Option(names = "--port", paramLabel = "PORT", description = "Read the probe on PORT (device path or USB id).")
    String port;

    @Option(names = "--design", paramLabel = "DESIGN",
            description = "Design to compare with (default: the simulated board's design, if any).")
    Path design;

    @Option(names = "--speed", paramLabel = "X", defaultValue = "1",
            description = "Replay speed for FILE relative to real time (default: ${DEFAULT-VALUE}).")
    double speed;

    @Option(names = "--snapshot", paramLabel = "PNG",
            description = "Render the window headless after --after of data, write it to PNG and exit.")
    Path snapshot;

    @Option(names = "--after", paramLabel = "TIME", defaultValue = "4s", converter = SecondsConverter.class,
            description = "With --snapshot: seconds of data before the picture (default: ${DEFAULT-VALUE}).")
    double afterSeconds;

    @Option(names = "--size", paramLabel = "WxH", defaultValue = "1440x900",
            description = "With --snapshot: window size in pixels (default: ${DEFAULT-VALUE}).")
    String size;

    @Override
    public Integer call() throws Exception {
        SourceChoice choice = choice();
        Path folder = Path.of("").toAbsolutePath();
        BenchServices services = GuiServices.standard();
        if (snapshot != null) {
            int[] wh = parseSize(size);
            if (!(afterSeconds >= 0) || afterSeconds > 600) {
                throw new BadInputException("--after", "give 0 to 600 seconds, not " + afterSeconds);
            }
            Path parent = snapshot.toAbsolutePath().getParent();
            if (parent != null && !Files.isDirectory(parent)) {
                throw new BadInputException(snapshot.toString(), "cannot write the picture: no such folder");
            }
            GuiLauncher.Launch launch = new GuiLauncher.Launch(choice, true, design, folder, services,
                    BenchSettings.inMemory(true));
            int[] got = GuiLauncher.snapshot(launch, snapshot, Duration.ofMillis(Math.round(afterSeconds * 1000)),
                    wh[0], wh[1]);
            spec.commandLine().getOut().println("wrote " + snapshot + " (" + got[0] + "×" + got[1] + ")");
            return ExitCodes.OK;
        }
        GuiLauncher.runWindow(new GuiLauncher.Launch(choice, true, design, folder, services,
                BenchSettings.userPreferences()));
        return ExitCodes.OK;
    }

    private SourceChoice choice() {
        int given = (file != null ? 1 : 0) + (sim != null ? 1 : 0) + (port != null ? 1 : 0);
        if (given > 1) {
            throw new BadInputException("gui", "choose one source: --sim DESIGN, --port PORT or a capture FILE");
        }
        if (!faults.isEmpty() && (file != null || port != null)) {
            throw new BadInputException("--fault", "only the simulated board takes faults");
        }
        if (!(speed > 0)) {
            throw new BadInputException("--speed", "must be above zero, not " + speed);
        }
        if (file != null) {
            return SourceChoice.file(file.toString()).withSpeed(speed);
        }
        if (port != null) {
            return SourceChoice.port(port);
        }
        return SourceChoice.simulated(sim == null ? "" : sim, String.join(" ", faults));
    }

    static int[] parseSize(String text) {
        String[] f = text.toLowerCase(java.util.Locale.ROOT).split("x");
        try {
            if (f.length == 2) {
                int w = Integer.parseInt(f[0].strip());
                int h = Integer.parseInt(f[1].strip());
                if (w >= 320 && h >= 240 && w <= 8000 && h <= 8000) {
                    return new int[] {w, h};
                }
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new BadInputException("--size", "give the window size as WIDTHxHEIGHT from 320x240 to 8000x8000, not \""
                + text + "\"");
    }
}
