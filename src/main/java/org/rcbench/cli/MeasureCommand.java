package org.rcbench.cli;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.json.MeasurementJson;
import org.rcbench.measure.BistableMeter;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MeterConfig;
import org.rcbench.measure.MonostableMeter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code rcbench measure FILE}: measures one channel of a capture file, as a table or as JSON. */
@Command(name = "measure", mixinStandardHelpOptions = true,
        description = {"Measure a timer's output from a capture file (rcbench edges v1, gzip, or IEEE 1364 VCD).",
            "Frequency is a least-squares fit with an expanded uncertainty (k = 2); settling, glitches, gaps and"
                + " stalls are set aside and counted."})
public final class MeasureCommand implements Callable<Integer> {
    /** Default probe clock limit: a quartz crystal board, +-50 ppm (see the option's help). */
    static final double DEFAULT_CLOCK_LIMIT_PPM = 50;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "Capture file.")
    Path file;

    @Option(names = "--channel", paramLabel = "N|NAME",
            description = "Channel to measure: number or name (default: the first channel).")
    String channel;

    @Option(names = "--trigger-channel", paramLabel = "N|NAME",
            description = "Monostable: the trigger input; reports pulse width and trigger-to-output delay.")
    String triggerChannel;

    @Option(names = "--trigger-edge", paramLabel = "falling|rising", defaultValue = "falling",
            description = "Active trigger edge (default: ${DEFAULT-VALUE}, the 555 convention).")
    String triggerEdge;

    @Option(names = "--set-channel", paramLabel = "N|NAME",
            description = "Bistable: the set button input; reports response time and contact bounce.")
    String setChannel;

    @Option(names = "--reset-channel", paramLabel = "N|NAME", description = "Bistable: the reset button input.")
    String resetChannel;

    @Option(names = "--bounce-window", paramLabel = "TIME", defaultValue = "20ms", converter = SecondsConverter.class,
            description = "Bistable: edges this soon after a press or release are bounce (default: ${DEFAULT-VALUE}).")
    double bounceWindowSeconds;

    @Option(names = "--json", description = "Print one JSON object (SI units) instead of the table.")
    boolean json;

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

    @Option(names = "--mtie-windows", paramLabel = "CYCLES", split = ",",
            description = "MTIE window lengths in cycles, e.g. 10,100,1000 (default: octaves).")
    List<Long> mtieWindows = new ArrayList<>();

    @Option(names = "--glitch-fraction", paramLabel = "F", defaultValue = "0.2",
            description = "Pulses shorter than F times the typical pulse are glitches (default: ${DEFAULT-VALUE}).")
    double glitchFraction;

    @Option(names = "--stall-periods", paramLabel = "N", defaultValue = "8",
            description = "No edge for more than N typical periods is a stall (default: ${DEFAULT-VALUE}).")
    double stallPeriods;

    @Option(names = "--settle-tolerance", paramLabel = "F", defaultValue = "0.02",
            description = "Start-up cycles off the typical by more than F are settling (default: ${DEFAULT-VALUE}).")
    double settleTolerance;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try (Capture capture = CaptureFiles.open(file)) {
            int ch = channel == null ? firstChannel(capture) : CaptureFiles.selectChannel(capture, channel);
            Timebase timebase = timebase(capture);
            CycleMeter meter = new CycleMeter(config(ch, timebase));
            MonostableMeter mono = null;
            BistableMeter latch = null;
            List<EdgeSink> sinks = new ArrayList<>(List.of(meter));
            if (triggerChannel != null) {
                int trig = CaptureFiles.selectChannel(capture, triggerChannel);
                requireDifferent("--trigger-channel", trig, ch);
                mono = new MonostableMeter(trig, ch, activeLevel(), timebase);
                sinks.add(mono);
            }
            if (setChannel != null) {
                int set = CaptureFiles.selectChannel(capture, setChannel);
                int reset = resetChannel == null ? -1 : CaptureFiles.selectChannel(capture, resetChannel);
                requireDifferent("--set-channel", set, ch);
                requireDifferent("--reset-channel", reset, ch);
                requireDifferent("--reset-channel", reset, set);
                latch = new BistableMeter(set, reset, ch, EdgeSink.LOW,
                        Math.round(bounceWindowSeconds * timebase.ticksPerSecond()), timebase);
                sinks.add(latch);
            } else if (resetChannel != null) {
                throw new BadInputException("--reset-channel", "needs --set-channel as well");
            }
            capture.streamTo(new FanOut(sinks.toArray(new EdgeSink[0])));
            Measurement m = meter.result();
            for (String w : capture.warnings()) {
                err.println("rcbench: warning: " + w);
            }
            if (json) {
                ObjectNode o = MeasurementJson.of(m);
                o.put("capture", capture.name());
                o.put("channel_name", capture.channels().getOrDefault(ch, ""));
                o.put("clock_hz", timebase.clockHz());
                o.put("clock_offset_ppm", timebase.offsetPpm());
                o.put("clock_u_ppm", timebase.tolerancePpm());
                ArrayNode cw = o.putArray("capture_warnings");
                capture.warnings().forEach(cw::add);
                if (mono != null) {
                    MeasurementJson.addMonostable(o, mono.result());
                }
                if (latch != null) {
                    MeasurementJson.addBistable(o, latch.result());
                }
                out.println(MeasurementJson.write(o));
            } else {
                MeasurementTable.print(out, capture.name(), capture.channels().getOrDefault(ch, ""), timebase, m,
                        mono == null ? null : mono.result(), latch == null ? null : latch.result());
            }
            out.flush();
        }
        return ExitCodes.OK;
    }

    private MeterConfig config(int ch, Timebase timebase) {
        try {
            return MeterConfig.of(ch, timebase).withGlitchFraction(glitchFraction).withStallPeriods(stallPeriods)
                    .withSettleTolerance(settleTolerance).withMtieWindowsCycles(mtieWindows);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("measure", e.getMessage(), e);
        }
    }

    /** The file's timebase with the options applied; see {@code --clock-tolerance-ppm} for the default. */
    private Timebase timebase(Capture capture) {
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

    private int activeLevel() {
        switch (triggerEdge.strip().toLowerCase(java.util.Locale.ROOT)) {
            case "falling":
                return EdgeSink.LOW;
            case "rising":
                return EdgeSink.HIGH;
            default:
                throw new BadInputException("--trigger-edge", "\"" + triggerEdge + "\" is not falling or rising");
        }
    }

    private static int firstChannel(Capture capture) {
        return capture.channels().isEmpty() ? 0 : capture.channels().keySet().stream().min(Integer::compare).get();
    }

    private static void requireDifferent(String option, int a, int b) {
        if (a >= 0 && a == b) {
            throw new BadInputException(option, "names channel " + a + ", which already has another role");
        }
    }
}
