package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.probe.SessionState;
import org.rcbench.probe.SessionStatus;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.record.Recorder;
import org.rcbench.record.RecorderOptions;
import org.rcbench.source.DurationGate;
import org.rcbench.source.LiveSource;
import org.rcbench.source.SourceSpec;
import org.rcbench.source.StreamStart;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench record}: writes a live edge stream to a capture file as it arrives, flushed at
 * least every 250 ms, so that a crash or a pulled plug loses at most the last fraction of a second.
 */
@Command(name = "record", mixinStandardHelpOptions = true,
        description = {"Record a probe (or a simulated board) to an rcbench edge capture, written as the data arrives.",
            "Ctrl-C ends the recording cleanly; even a killed recorder leaves a file that reads back up to its last"
                + " flush (at most 250 ms old).",
            "Caution: the probe's ground is the computer's ground. Never connect it to mains-referenced or"
                + " transformerless circuits without isolation."})
public final class RecordCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Mixin
    SourceOptions source;

    @Mixin
    DatabaseOption database;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", required = true, description = "The capture file to write.")
    Path output;

    @Option(names = "--duration", paramLabel = "TIME", converter = ValueConverters.Time.class,
            description = "Stop after this much probe time (default: until Ctrl-C).")
    Double duration;

    @Option(names = "--gzip", description = "Compress the file with gzip (sync-flushed: a cut-off file still reads).")
    boolean gzip;

    @Option(names = "--overwrite", description = "Replace FILE if it exists (default: refuse, to keep earlier recordings).")
    boolean overwrite;

    @Option(names = "--plain", description = "Status as appended lines even on a terminal.")
    boolean plain;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!overwrite && Files.exists(output)) {
            throw new BadInputException(output.toString(), "already exists; choose another name or add --overwrite");
        }
        Terminal status = new Terminal(err, !plain && Terminal.detect());
        LiveSource src = source.open(err, database.calibrations());
        Tally tally = new Tally();
        DurationGate gate = new DurationGate(duration == null ? Double.POSITIVE_INFINITY : duration);
        Recorder[] recorder = new Recorder[1];
        try (ShutdownGuard guard = new ShutdownGuard(src::close)) {
            src.start(start -> {
                recorder[0] = Recorder.create(output, header(start, src.spec()), RecorderOptions.defaults().withGzip(gzip)
                        .withOverwrite(overwrite));
                tally.target = recorder[0];
                tally.ticksPerSecond = start.timebase().ticksPerSecond();
                return gate.wrap(tally, start.timebase().ticksPerSecond());
            }, gate);
            try {
                src.awaitStreaming(source.streamTimeout());
            } catch (BadInputException e) {
                if (guard.triggered()) {
                    status.finish();
                    err.println("rcbench: stopped before the probe streamed; nothing was recorded");
                    return ExitCodes.OK;
                }
                throw e;
            }
            StreamStart start = src.started();
            status.notice("recording " + src.name() + " to " + output + " (" + start.clockNote() + ")");
            SessionState[] last = new SessionState[1];
            LiveLoop.run(src, gate, guard, source, duration, 200, () -> false, () -> {
                SessionStatus st = src.status();
                if (st.state() == SessionState.RECONNECTING && last[0] != SessionState.RECONNECTING) {
                    status.notice("rcbench: " + src.name() + " disconnected; the " + tally.edges
                            + " edges recorded so far are safe in " + output + " (waiting for the probe to come back;"
                            + " Ctrl-C stops)");
                }
                last[0] = st.state();
                status.status(line(tally, st), st.state().name());
            });
            SessionStatus end = src.status();
            src.close();
            status.finish();
            if (recorder[0] == null) {
                throw new BadInputException(src.name(), "nothing was recorded: " + end.line());
            }
            recorder[0].close();
            out.println(summary(tally, src.status()));
            if (end.state() == SessionState.FAILED) {
                err.println("rcbench: " + end.line());
                return ExitCodes.BAD_INPUT;
            }
            if (end.state() == SessionState.RECONNECTING) {
                err.println("rcbench: warning: the probe was still disconnected when the recording ended");
            }
            out.flush();
            return ExitCodes.OK;
        } finally {
            src.close();
        }
    }

    private static Map<String, String> header(StreamStart start, SourceSpec s) {
        Map<String, String> h = EdgeCaptureFormat.header(start.timebase(), start.channelNames());
        h.put(EdgeCaptureFormat.PROBE, start.hello() == null ? start.source() : start.hello().summary());
        h.put(EdgeCaptureFormat.STARTED, Instant.now().truncatedTo(ChronoUnit.SECONDS).toString());
        h.put("source", start.source());
        if (s instanceof SourceSpec.Simulated sim) {
            h.put("simulation", sim.description());
        }
        if (start.hello() != null) {
            h.put("probe_id", start.hello().probeIdHex());
        }
        h.put("clock_note", start.clockNote());
        return h;
    }

    private static String line(Tally t, SessionStatus st) {
        return String.format(Locale.ROOT, "%8.1f s  %d edges  %d gaps | %s", t.seconds(), t.edges, t.gaps, st.line());
    }

    private String summary(Tally t, SessionStatus end) {
        return String.format(Locale.ROOT, "recorded %d edges (%d gaps) over %.3f s of probe time to %s (%s)", t.edges,
                t.gaps, t.seconds(), output, "link: " + end.counters().summary());
    }

    /** Counts what reaches the recorder, for the status line (read from the command's thread). */
    private static final class Tally implements EdgeSink, ProbeEvents {
        volatile EdgeSink target;
        volatile double ticksPerSecond = 1;
        volatile long edges;
        volatile long gaps;
        private volatile long first = -1;
        private volatile long last = -1;

        @Override
        public void onEdge(long tick, int channel, int level) {
            target.onEdge(tick, channel, level);
            if (first < 0) {
                first = tick;
            }
            last = tick;
            if (level == UNKNOWN) {
                gaps++;
            } else {
                edges++;
            }
        }

        @Override
        public void onEnd(long lastTick) {
            if (first >= 0) {
                last = Math.max(last, lastTick);
            }
            target.onEnd(lastTick);
        }

        double seconds() {
            return first < 0 ? 0 : (last - first) / ticksPerSecond;
        }
    }
}
