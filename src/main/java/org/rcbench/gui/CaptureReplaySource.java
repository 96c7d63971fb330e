package org.rcbench.gui;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Replays a capture file (rcbench edges or VCD) as if it were arriving now: edges are released
 * when the wall clock reaches their time, scaled by {@code speed} ({@code 1} is real time,
 * {@link Double#POSITIVE_INFINITY} as fast as the file reads). The reading thread sleeps only when
 * it is more than two milliseconds ahead, so at high edge rates edges arrive in small bursts.
 * Thread-safe; one reader thread per start.
 */
public final class CaptureReplaySource implements BenchSource {
    private static final long AHEAD_NANOS = 2_000_000L;
    private static final long STATUS_NANOS = 250_000_000L;

    private final Path file;
    private final double speed;
    private volatile boolean stopping;
    private Thread reader;

    /** @param speed replay speed relative to real time, above zero; infinity for no pacing */
    public CaptureReplaySource(Path file, double speed) {
        if (!(speed > 0)) {
            throw new IllegalArgumentException("speed <= 0: " + speed);
        }
        this.file = file;
        this.speed = speed;
    }

    @Override
    public String name() {
        Path n = file.getFileName();
        return n == null ? file.toString() : n.toString();
    }

    @Override
    public synchronized void start(SourceSink sink) {
        if (reader != null) {
            throw new IllegalStateException("replay already started: " + file);
        }
        reader = new Thread(() -> run(sink), "rcbench-replay " + name());
        reader.setDaemon(true);
        reader.start();
    }

    @Override
    public void stop() {
        stopping = true;
        Thread r;
        synchronized (this) {
            r = reader;
        }
        if (r != null && r != Thread.currentThread()) {
            try {
                r.join(2000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    private void run(SourceSink sink) {
        SourceStatus status = new SourceStatus(ConnectionState.CONNECTING, "opening " + file, name(), "", 0, 0);
        sink.onStatus(status);
        try (Capture capture = CaptureFiles.open(file)) {
            Timebase tb = capture.timebase();
            status = new SourceStatus(ConnectionState.STREAMING, "replaying " + file + pace(), name(),
                    clockWords(tb), 0, 0, capture.header().getOrDefault(org.rcbench.capture.EdgeCaptureFormat.PROBE, ""));
            sink.onClock(tb, capture.channels());
            sink.onStatus(status);
            Pacer pacer = new Pacer(sink, tb.ticksPerSecond(), status);
            try {
                capture.streamTo(pacer);
            } catch (Stopped s) {
                sink.onEnd(pacer.lastTick);
                sink.onStatus(pacer.status().withState(ConnectionState.ENDED, "replay stopped after "
                        + pacer.edges + " edges"));
                return;
            }
            int warnings = capture.warnings().size();
            String warned = warnings == 0 ? "" : "; " + capture.warnings().get(0)
                    + (warnings > 1 ? " (and " + (warnings - 1) + " more warnings)" : "");
            SourceStatus last = pacer.status();
            sink.onStatus(new SourceStatus(ConnectionState.ENDED, "replayed " + pacer.edges + " edges of " + file
                    + warned, last.probe(), last.clock(), last.gaps(), warnings, last.probeId()));
        } catch (BadInputException e) {
            sink.onStatus(status.withState(ConnectionState.FAILED, e.getMessage()));
        } catch (IOException e) {
            sink.onStatus(status.withState(ConnectionState.FAILED, file + ": cannot read: " + e.getMessage()));
        }
    }

    private String pace() {
        if (speed == Double.POSITIVE_INFINITY) {
            return " as fast as it reads";
        }
        return speed == 1 ? " in real time" : String.format(Locale.ROOT, " at %.3g× real time", speed);
    }

    /** The clock of a file, in words: {@code 16 MHz, calibration +12.0 ppm ± 0.5 ppm}. */
    static String clockWords(Timebase tb) {
        String clock = org.rcbench.units.SiFormat.format(tb.clockHz(), "Hz", 6).replaceAll("\\.?0+ ", " ");
        if (tb.offsetPpm() == 0 && tb.tolerancePpm() == 0) {
            return clock + ", no calibration stated";
        }
        return clock + String.format(Locale.ROOT, ", calibration %+.1f ppm ± %.1f ppm", tb.offsetPpm(),
                tb.tolerancePpm());
    }

    /** Thrown through the capture reader to end a replay early. */
    private static final class Stopped extends RuntimeException {
        Stopped() {
            super("replay stopped", null, false, false);
        }
    }

    /** Holds each edge back until the wall clock reaches it. */
    private final class Pacer implements EdgeSink {
        private final SourceSink sink;
        private final double ticksPerSecond;
        private final SourceStatus base;
        private long startNanos = -1;
        private long firstTick;
        private long lastTick;
        private long edges;
        private long gaps;
        private long nextStatus;

        Pacer(SourceSink sink, double ticksPerSecond, SourceStatus base) {
            this.sink = sink;
            this.ticksPerSecond = ticksPerSecond;
            this.base = base;
        }

        @Override
        public void onEdge(long tick, int channel, int level) {
            if (stopping) {
                throw new Stopped();
            }
            long now = System.nanoTime();
            if (startNanos < 0) {
                startNanos = now;
                firstTick = tick;
                nextStatus = now + STATUS_NANOS;
            }
            if (speed != Double.POSITIVE_INFINITY) {
                long due = startNanos + (long) ((tick - firstTick) / ticksPerSecond / speed * 1e9);
                if (due - now > AHEAD_NANOS) {
                    sleepUntil(due);
                    now = System.nanoTime();
                }
            }
            if (level == UNKNOWN) {
                gaps++;
            } else {
                edges++;
            }
            lastTick = tick;
            sink.onEdge(tick, channel, level);
            if (now >= nextStatus) {
                sink.onStatus(status());
                nextStatus = now + STATUS_NANOS;
            }
        }

        @Override
        public void onEnd(long endTick) {
            sink.onEnd(endTick);
        }

        SourceStatus status() {
            return new SourceStatus(base.state(), base.line(), base.probe(), base.clock(), gaps, 0, base.probeId());
        }

        private void sleepUntil(long due) {
            long left;
            while (!stopping && (left = due - System.nanoTime()) > 0) {
                try {
                    Thread.sleep(Math.min(50, Math.max(1, left / 1_000_000)));
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new Stopped();
                }
            }
        }
    }
}
