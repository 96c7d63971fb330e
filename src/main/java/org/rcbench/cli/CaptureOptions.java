package org.rcbench.cli;

import java.io.PrintWriter;
import java.util.Locale;
import org.rcbench.capture.Capture;
import org.rcbench.capture.EdgeCaptureFormat;
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
    /** The name of the channel a monostable's trigger is taken from when no option names one. */
    static final String TRIGGER_NAME = "trigger";

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
        return channel(Channels.of(capture), channel);
    }

    /** The channel to measure among {@code channels}: the option's, else the lowest. */
    int channel(Channels channels) {
        return channel(channels, channel);
    }

    /** The channel {@code spec} names (a number or a name), or with {@code spec} null the lowest (0 when none is named). */
    static int channel(Channels channels, String spec) {
        if (spec != null) {
            return channels.select(spec);
        }
        int min = 0;
        boolean first = true;
        for (int ch : channels.names().keySet()) {
            if (first || ch < min) {
                min = ch;
                first = false;
            }
        }
        return min;
    }

    /** The trigger channel, or -1 when none was asked for; it must differ from {@code output}. */
    int triggerChannel(Capture capture, int output) {
        return triggerChannel(Channels.of(capture), output, false);
    }

    /**
     * The trigger channel, or -1 when none was asked for; it must differ from {@code output}. For a
     * {@code monostable} without the option: the channel named {@value #TRIGGER_NAME} when there is
     * one (the simulated board's and its recordings' layout).
     */
    int triggerChannel(Channels channels, int output, boolean monostable) {
        if (triggerChannel == null) {
            if (monostable) {
                for (var e : channels.names().entrySet()) {
                    if (e.getValue().equals(TRIGGER_NAME) && e.getKey() != output) {
                        return e.getKey();
                    }
                }
            }
            return -1;
        }
        int trig = channels.select(triggerChannel);
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
        return timebase(capture.timebase(), capture.header().containsKey(EdgeCaptureFormat.CALIBRATION_U_PPM));
    }

    /**
     * {@code t} with {@code --clock-ppm} and {@code --clock-tolerance-ppm} applied; without the
     * latter and when {@code t}'s uncertainty is not {@code stated}, the default limit
     * ({@value #DEFAULT_CLOCK_LIMIT_PPM} ppm). A live source states its own (stored calibration or the
     * clock's typical bound).
     */
    Timebase timebase(Timebase t, boolean stated) {
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
        } else if (!stated) {
            t = t.withTolerancePpm(DEFAULT_CLOCK_LIMIT_PPM / Math.sqrt(3));
        }
        return t;
    }

    /** Whether the clock options were given (they override the source's calibration). */
    boolean overridesClock() {
        return clockPpm != null || clockTolerancePpm != null;
    }

    /** Prints the capture's warnings on {@code err}, one line each. */
    static void warn(Capture capture, PrintWriter err) {
        for (String w : capture.warnings()) {
            err.println("rcbench: warning: " + w);
        }
        err.flush();
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
