package org.rcbench.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.Callable;
import org.rcbench.common.BadInputException;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.BenchSettings;
import org.rcbench.gui.SourceChoice;
import org.rcbench.gui.Sources;
import org.rcbench.gui.view.GuiLauncher;
import org.rcbench.sim.Pace;
import org.rcbench.source.SourceSpec;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
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
            "Reads the simulated board by default (demo:piper-mk2, with a little timing noise and a short warm-up"
                + " unless --jitter or --warm-up say otherwise), or a probe (--port), or replays a capture file"
                + " (FILE or --replay) in real time.",
            "Safety: the probe's ground is the computer's ground; never probe mains-referenced or transformerless"
                + " circuits without isolation. The window shows the full notice on first start."})
public final class GuiCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    SourceOptions source;

    @Mixin
    DatabaseOption database;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "Capture file to replay (as --replay).")
    Path file;

    @Option(names = "--design", paramLabel = "DESIGN",
            description = "Design to compare with (default: the simulated board's design, if any).")
    Path design;

    @Option(names = "--snapshot", paramLabel = "PNG",
            description = "Render the window headless after --after of data, write it to PNG and exit.")
    Path snapshot;

    @Option(names = "--after", paramLabel = "TIME", defaultValue = "4s", converter = ValueConverters.TimeOrZero.class,
            description = "With --snapshot: seconds of data before the picture (default: ${DEFAULT-VALUE}).")
    double afterSeconds;

    @Option(names = "--size", paramLabel = "WxH", defaultValue = "1280x800",
            description = "With --snapshot: window size in pixels (default: ${DEFAULT-VALUE}).")
    String size;

    @Override
    public Integer call() throws Exception {
        if (file != null) {
            if (source.replay != null) {
                throw new BadInputException("gui", "give the capture file once: FILE or --replay FILE");
            }
            source.replay = file;
        }
        SourceChoice choice = choice(source.sourceSpec());
        Path folder = Path.of("").toAbsolutePath();
        BenchServices services = GuiServices.standard(database.calibrations(), database.path());
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

    /** The source strip's fields for the command line's source, keeping the exact spec for the first start. */
    private SourceChoice choice(SourceSpec s) {
        if (s instanceof SourceSpec.Port p) {
            return SourceChoice.port(p.port()).withExact(s);
        }
        if (s instanceof SourceSpec.CaptureFile f) {
            return SourceChoice.file(f.file().toString()).withFast(f.pace() == Pace.FAST).withExact(s);
        }
        SourceSpec.Simulated sim = (SourceSpec.Simulated) s;
        if (source.jitterSeconds == 0 && source.warmUp == null && sim.design() != null) {
            sim = new SourceSpec.Simulated(sim.label(), sim.design(), sim.referenceHz(),
                    Sources.benchConditions(sim.simulation(), sim.design()), sim.probe());
        }
        return SourceChoice.simulated(sim.label(), String.join(" ", source.faults)).withExact(sim);
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
