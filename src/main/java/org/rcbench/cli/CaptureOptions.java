package org.rcbench.cli;

import java.util.Locale;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.MeterConfig;
import picocli.CommandLine.Option;

/**
 * The options every command that reads a capture shares (measure, check, tune): which channel, the
 * probe clock's offset and tolerance, the cycle meter's thresholds, and the monostable's trigger
 * channel. A picocli mixin: {@code @Mixin CaptureOptions capture;}.
 */
final class CaptureOptions {
    /** Default probe clock limit: a quartz crystal board, +-50 ppm (see the option's help). */
    static final double DEFAULT_CLOCK_LIMIT_PPM = 50;

    @Option(names = "--channel", paramLabel = "N|NAME",
            description = "Channel to measure: number or name (default: the first channel).")
    String channel;

    @Option(names = "--trigger-channel", paramLabel = "N|NAME",
            description = "Monostable: the trigger input; reports pulse width and trigger-to-output delay.")
    String triggerChannel;

    @Option(names = "--trigger-edge", paramLabel = "falling|rising", defaultValue = "falling",
            description = "Active trigger edge (default: ${DEFAULT-VALUE}, the 555 convention).")
    String triggerEdge;

    @Option(names = "--clock-ppm", paramLabel = "PPM",
            description = "Known offset of the probe clock, ppm (a fast clock is positive); overrides the file's"
                + " calibration_ppm.")
    Double clockPpm;

    @Option(names = "--clock-tolerance-ppm", paramLabel = "PPM",
            description = {"Limit of the probe clock's error after the offset, +-ppm, taken as rectangular"
                + " (standard uncertainty PPM/sqrt(3)).",
                "Default: the file's calibration_u_ppm if stated, else 50 (a quartz crystal board: initial"
                + " tolerance, temperature and ageing together). Use about 5000 for a ceramic resonator."})
    Double clockTolerancePpm;

    @Option(names = "--glitch-fraction", paramLabel = "F", defaultValue = "0.2",
            description = "Pulses shorter than F times the typical pulse are glitches (default: ${DEFAULT-VALUE}).")
    double glitchFraction;

    @Option(names = "--stall-periods", paramLabel = "N", defaultValue = "8",
            description = "No edge for more than N typical periods is a stall (default: ${DEFAULT-VALUE}).")
    double stallPeriods;

    @Option(names = "--settle-tolerance", paramLabel = "F", defaultValue = "0.02",
            description = "Start-up cycles off the typical by more than F are settling (default: ${DEFAULT-VALUE}).")
    double settleTolerance;

    /** The channel to measure: the option's, else the capture's lowest. */
    int channel(Capture capture) {
        if (channel != null) {
            return CaptureFiles.selectChannel(capture, channel);
        }
        return capture.channels().isEmpty() ? 0 : capture.channels().keySet().stream().min(Integer::compare).get();
    }

    /** The trigger channel, or -1 when none was asked for; it must differ from {@code output}. */
    int triggerChannel(Capture capture, int output) {
        if (triggerChannel == null) {
            return -1;
        }
        int trig = CaptureFiles.selectChannel(capture, triggerChannel);
        requireDifferent("--trigger-channel", trig, output);
        return trig;
    }

    /** The cycle meter's configuration for {@code ch}. */
    MeterConfig config(int ch, Timebase timebase) {
        try {
            return MeterConfig.of(ch, timebase).withGlitchFraction(glitchFraction).withStallPeriods(stallPeriods)
                    .withSettleTolerance(settleTolerance);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("capture options", e.getMessage(), e);
        }
    }

    /** The file's timebase with the options applied; see {@code --clock-tolerance-ppm} for the default. */
    Timebase timebase(Capture capture) {
        Timebase t = capture.timebase();
        if (clockPpm != null) {
            if (!Double.isFinite(clockPpm) || Math.abs(clockPpm) >= 1e6) {
                throw new BadInputException("--clock-ppm", "out of range: " + clockPpm);
            }
            t = t.withOffsetPpm(clockPpm);
        }
        if (clockTolerancePpm != null) {
            if (!(clockTolerancePpm >= 0) || Double.isInfinite(clockTolerancePpm)) {
                throw new BadInputException("--clock-tolerance-ppm", "must be zero or more: " + clockTolerancePpm);
            }
            t = t.withTolerancePpm(clockTolerancePpm / Math.sqrt(3));
        } else if (!capture.header().containsKey("calibration_u_ppm")) {
            t = t.withTolerancePpm(DEFAULT_CLOCK_LIMIT_PPM / Math.sqrt(3));
        }
        return t;
    }

    /** The level a trigger edge goes to. */
    int activeLevel() {
        switch (triggerEdge.strip().toLowerCase(Locale.ROOT)) {
            case "falling":
                return EdgeSink.LOW;
            case "rising":
                return EdgeSink.HIGH;
            default:
                throw new BadInputException("--trigger-edge", "\"" + triggerEdge + "\" is not falling or rising");
        }
    }

    static void requireDifferent(String option, int a, int b) {
        if (a >= 0 && a == b) {
            throw new BadInputException(option, "names channel " + a + ", which already has another role");
        }
    }
}
