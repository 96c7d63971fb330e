package org.rcbench.gui;

import java.nio.file.Path;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.temporal.ChronoUnit;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.atomic.AtomicReference;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.Timebase;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;
import org.rcbench.record.Recorder;
import org.rcbench.record.RecorderOptions;

/**
 * The window's end of a live source: measures one channel with a {@link CycleMeter} on the
 * source's thread, optionally records every edge, and every {@code publishNanos} (checked on each
 * edge, so a slow signal publishes on each of its edges, and on each status call when edges are
 * still unpublished) builds a {@link LiveFrame} that the window takes with {@link #latestFrame()}. The window never touches the meter, so the per-edge path takes
 * no lock except while recording.
 *
 * <p>Threads: the {@link SourceSink} methods run on the source's thread; everything else may be
 * called from any thread (the window's).
 */
public final class LivePipeline implements SourceSink {
    /** Default time between frames: 20 per second, enough for smooth plots. */
    public static final long DEFAULT_PUBLISH_NANOS = 50_000_000L;

    private final int wantedChannel;
    private final long publishNanos;
    private final AtomicReference<LiveFrame> frame = new AtomicReference<>();
    private final AtomicReference<SourceStatus> status = new AtomicReference<>(SourceStatus.idle());
    private final AtomicReference<String> recordingProblem = new AtomicReference<>("");
    private final Object recordLock = new Object();

    private volatile int rollingCycles = 256;
    private volatile Timebase timebase;
    private volatile Map<Integer, String> channelNames = Map.of();
    private volatile int channel;
    private volatile boolean recorderMayBeSet;
    private volatile long publishCostNanos;
    private Recorder recorder; // guarded by recordLock

    // Source thread only.
    private CycleMeter meter;
    private long serial;
    private long nextPublish;
    private long latestTick = -1;
    private boolean unpublished;

    /**
     * @param channel      the probe channel to measure; when a file names channels and not this
     *                     one, its first channel is measured instead
     * @param publishNanos time between frames
     */
    public LivePipeline(int channel, long publishNanos) {
        if (publishNanos <= 0) {
            throw new IllegalArgumentException("publishNanos <= 0: " + publishNanos);
        }
        this.wantedChannel = channel;
        this.channel = channel;
        this.publishNanos = publishNanos;
    }

    // ---- source thread ---------------------------------------------------------------------------

    @Override
    public void onClock(Timebase tb, Map<Integer, String> channels) {
        Timebase old = timebase;
        channelNames = Map.copyOf(channels);
        int ch = channels.isEmpty() || channels.containsKey(wantedChannel) ? wantedChannel
                : channels.keySet().iterator().next();
        if (meter == null || !tb.equals(old) || ch != channel) {
            channel = ch;
            meter = new CycleMeter(MeterConfig.of(ch, tb));
        }
        timebase = tb;
    }

    @Override
    public void onEdge(long tick, int ch, int level) {
        if (meter == null) {
            return; // no clock yet: nothing can be measured
        }
        meter.onEdge(tick, ch, level);
        unpublished = true;
        if (tick > latestTick) {
            latestTick = tick;
        }
        if (recorderMayBeSet) {
            record(tick, ch, level);
        }
        long now = System.nanoTime();
        if (now - nextPublish >= 0) {
            publish(now, false);
            nextPublish = now + publishNanos;
        }
    }

    @Override
    public void onEnd(long lastTick) {
        if (meter == null) {
            return;
        }
        meter.onEnd(lastTick);
        synchronized (recordLock) {
            if (recorder != null) {
                try {
                    recorder.onEnd(lastTick);
                } catch (BadInputException e) {
                    recordingProblem.set(e.getMessage());
                }
                recorder = null;
                recorderMayBeSet = false;
            }
        }
        publish(System.nanoTime(), true);
    }

    /**
     * Keeps the status and, when edges arrived since the last frame, publishes one: a burst of edges
     * followed by silence (a probe's last frame before it stops) still reaches the window within a
     * status interval. Sources call this on their own thread, like the edges.
     */
    @Override
    public void onStatus(SourceStatus s) {
        status.set(s);
        if (meter != null && unpublished) {
            long now = System.nanoTime();
            publish(now, false);
            nextPublish = now + publishNanos;
        }
    }

    private void record(long tick, int ch, int level) {
        synchronized (recordLock) {
            if (recorder == null) {
                return;
            }
            try {
                recorder.onEdge(tick, ch, level);
            } catch (BadInputException | IllegalArgumentException e) {
                recordingProblem.set(e.getMessage());
                recorder.close();
                recorder = null;
                recorderMayBeSet = false;
            }
        }
    }

    private void publish(long now, boolean ended) {
        int window = rollingCycles;
        int capacity = meter.config().recentCycles();
        long[] start = new long[capacity];
        long[] high = new long[capacity];
        long[] low = new long[capacity];
        int n = meter.recentCycles(start, high, low);
        frame.set(new LiveFrame(++serial, meter.config().timebase(), meter.snapshot(Math.min(window, capacity)),
                Math.min(window, capacity), start, high, low, n, meter.trend(), Steadiness.steady(high, low, n, window),
                latestTick, now, ended));
        publishCostNanos = System.nanoTime() - now;
        unpublished = false;
    }

    // ---- any thread ------------------------------------------------------------------------------

    /** The newest frame, or null before the first; frames never go back in {@link LiveFrame#serial()}. */
    public LiveFrame latestFrame() {
        return frame.get();
    }

    /** How long building the newest frame took on the source's thread, ns (for benchmarks). */
    public long publishCostNanos() {
        return publishCostNanos;
    }

    /** The source's newest status. */
    public SourceStatus latestStatus() {
        return status.get();
    }

    /** Sets the averaging window of the rolling figures (cycles, 2 and up), from the next frame on. */
    public void setRollingCycles(int cycles) {
        if (cycles < 2) {
            throw new IllegalArgumentException("rolling window < 2 cycles: " + cycles);
        }
        rollingCycles = cycles;
    }

    /** The clock, or null before the source has said. */
    public Timebase timebase() {
        return timebase;
    }

    /** The channel measured. */
    public int channel() {
        return channel;
    }

    /**
     * Starts writing every edge from now on to {@code file}, an rcbench edge capture with this
     * source's clock and channel names; ticks keep the source's timeline.
     *
     * @throws BadInputException when the clock is not known yet, a recording runs already, or the
     *                           file cannot be created (it exists, its folder is missing ...)
     */
    public void startRecording(Path file, RecorderOptions options, String probe) {
        Timebase tb = timebase;
        if (tb == null) {
            throw new BadInputException(file.toString(), "cannot record yet: the source has not said its clock");
        }
        synchronized (recordLock) {
            if (recorder != null) {
                throw new BadInputException(file.toString(), "already recording to " + recorder.name());
            }
            Map<String, String> header = new LinkedHashMap<>(EdgeCaptureFormat.header(tb, channelNames));
            if (!probe.isEmpty()) {
                header.put(EdgeCaptureFormat.PROBE, probe.replace('\n', ' '));
            }
            header.put(EdgeCaptureFormat.STARTED,
                    OffsetDateTime.now(ZoneOffset.UTC).truncatedTo(ChronoUnit.SECONDS).toString());
            recordingProblem.set("");
            recorder = Recorder.create(file, header, options);
            recorderMayBeSet = true;
        }
    }

    /** Stops the recording (flushes, syncs, closes the file); returns edges written, or -1 when none ran. */
    public long stopRecording() {
        synchronized (recordLock) {
            if (recorder == null) {
                return -1;
            }
            Recorder r = recorder;
            recorder = null;
            recorderMayBeSet = false;
            long written = r.edgesWritten();
            try {
                r.close();
            } catch (BadInputException e) {
                recordingProblem.set(e.getMessage());
            }
            return written;
        }
    }

    /** Edges written by the running recording, or -1 when none runs. */
    public long recordedEdges() {
        synchronized (recordLock) {
            return recorder == null ? -1 : recorder.edgesWritten();
        }
    }

    /** Why the last recording stopped by itself (disk full ...), or "". */
    public String recordingProblem() {
        return recordingProblem.get();
    }
}
