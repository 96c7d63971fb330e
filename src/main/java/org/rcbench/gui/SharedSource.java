package org.rcbench.gui;

import java.util.concurrent.atomic.AtomicReference;
import org.rcbench.design.Design;
import org.rcbench.edge.EdgeSink;
import org.rcbench.probe.SessionStatus;
import org.rcbench.protocol.DecoderCounters;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.source.LiveSource;
import org.rcbench.source.SourceSpec;
import org.rcbench.source.StreamStart;

/**
 * One of rcbench's shared live sources ({@link LiveSource}: a serial probe, the simulated board on
 * its simulated probe through the real protocol and decoder, or a capture file replayed) as the
 * window's source. The stream's start gives the calibrated clock; session snapshots become the
 * source strip's {@link SourceStatus}. Thread-safe.
 */
public final class SharedSource implements BenchSource {
    private final LiveSource source;
    private final AtomicReference<StreamStart> started = new AtomicReference<>();
    private volatile long gapsSeen;

    /** @param source made with {@link LiveSource#of}, not yet started */
    public SharedSource(LiveSource source) {
        this.source = source;
    }

    @Override
    public String name() {
        return source.name();
    }

    @Override
    public Design design() {
        return source.spec() instanceof SourceSpec.Simulated s ? s.design() : null;
    }

    @Override
    public void start(SourceSink sink) {
        EdgeSink counting = new EdgeSink() {
            @Override
            public void onEdge(long tick, int channel, int level) {
                if (level == UNKNOWN) {
                    gapsSeen++;
                }
                sink.onEdge(tick, channel, level);
            }

            @Override
            public void onEnd(long lastTick) {
                sink.onEnd(lastTick);
            }
        };
        source.addStatusListener(s -> sink.onStatus(status(s, started.get(), gapsSeen, source.spec())));
        source.start(start -> {
            started.set(start);
            sink.onClock(start.timebase(), start.channelNames());
            return counting;
        }, new ProbeEvents() { });
    }

    @Override
    public void stop() {
        source.close();
    }

    /** The window's view of a source snapshot. */
    static SourceStatus status(SessionStatus s, StreamStart start, long gapsSeen, SourceSpec spec) {
        Hello h = s.hello();
        DecoderCounters c = s.counters();
        String probe = h != null ? "probe " + h.probeIdHex() + (h.name().isEmpty() ? "" : " \"" + h.name() + "\"")
                + " fw " + h.firmwareVersion()
                : spec instanceof SourceSpec.CaptureFile ? "capture file, no probe" : "";
        String clock = start == null ? "" : start.clockNote();
        long errors = c.crcErrors() + c.resyncs() + c.overruns() + c.malformed() + c.linesBad() + c.framesMissed();
        return new SourceStatus(state(s), s.line(), probe, clock, Math.max(c.gapMarks(), gapsSeen), errors,
                h == null ? "" : h.probeIdHex());
    }

    private static ConnectionState state(SessionStatus s) {
        switch (s.state()) {
            case CONNECTING: return ConnectionState.CONNECTING;
            case WAITING_FOR_HELLO: return ConnectionState.WAITING;
            case STREAMING: return ConnectionState.STREAMING;
            case RECONNECTING: return ConnectionState.RECONNECTING;
            case CLOSED: return ConnectionState.ENDED;
            case FAILED: return ConnectionState.FAILED;
            default: throw new IllegalArgumentException(s.state().name());
        }
    }
}
