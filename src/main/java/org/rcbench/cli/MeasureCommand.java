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
import picocli.CommandLine.Mixin;
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
    @Spec
    CommandSpec spec;

    @Mixin
    CaptureOptions capture;

    @Parameters(index = "0", paramLabel = "FILE", description = "Capture file.")
    Path file;

    @Option(names = "--set-channel", paramLabel = "N|NAME",
            description = "Bistable: the set button input; reports response time and contact bounce.")
    String setChannel;

    @Option(names = "--reset-channel", paramLabel = "N|NAME", description = "Bistable: the reset button input.")
    String resetChannel;

    @Option(names = "--bounce-window", paramLabel = "TIME", defaultValue = "20ms", converter = ValueConverters.TimeOrZero.class,
            description = "Bistable: edges this soon after a press or release are bounce (default: ${DEFAULT-VALUE}).")
    double bounceWindowSeconds;

    @Option(names = "--json", description = "Print one JSON object (SI units) instead of the table.")
    boolean json;

    @Option(names = "--mtie-windows", paramLabel = "CYCLES", split = ",",
            description = "MTIE window lengths in cycles, e.g. 10,100,1000 (default: octaves).")
    List<Long> mtieWindows = new ArrayList<>();

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        try (Capture capture = CaptureFiles.open(file)) {
            int ch = this.capture.channel(capture);
            Timebase timebase = this.capture.timebase(capture);
            CycleMeter meter = new CycleMeter(config(ch, timebase));
            MonostableMeter mono = null;
            BistableMeter latch = null;
            List<EdgeSink> sinks = new ArrayList<>(List.of(meter));
            int trig = this.capture.triggerChannel(capture, ch);
            if (trig >= 0) {
                mono = new MonostableMeter(trig, ch, this.capture.activeLevel(), timebase);
                sinks.add(mono);
            }
            if (setChannel != null) {
                int set = CaptureFiles.selectChannel(capture, setChannel);
                int reset = resetChannel == null ? -1 : CaptureFiles.selectChannel(capture, resetChannel);
                CaptureOptions.requireDifferent("--set-channel", set, ch);
                CaptureOptions.requireDifferent("--reset-channel", reset, ch);
                CaptureOptions.requireDifferent("--reset-channel", reset, set);
                latch = new BistableMeter(set, reset, ch, EdgeSink.LOW,
                        Math.round(bounceWindowSeconds * timebase.ticksPerSecond()), timebase);
                sinks.add(latch);
            } else if (resetChannel != null) {
                throw new BadInputException("--reset-channel", "needs --set-channel as well");
            }
            capture.streamTo(new FanOut(sinks.toArray(new EdgeSink[0])));
            Measurement m = meter.result();
            CaptureOptions.warn(capture, err);
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
            return this.capture.config(ch, timebase).withMtieWindowsCycles(mtieWindows);
        } catch (IllegalArgumentException e) {
            throw new BadInputException("measure", e.getMessage(), e);
        }
    }
}
