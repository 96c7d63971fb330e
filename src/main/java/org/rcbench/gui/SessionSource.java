package org.rcbench.gui;

import java.util.Locale;
import java.util.Map;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.probe.ProbeClock;
import org.rcbench.probe.ProbeSession;
import org.rcbench.probe.SessionStatus;
import org.rcbench.protocol.DecoderCounters;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.ProbeEvents;

/**
 * A probe session (serial port or simulated board) as a window source: the probe's hello gives the
 * clock, session status snapshots become {@link org.rcbench.gui.SourceStatus}, and the session's
 * own reader thread feeds the sink. Thread-safe.
 */
public final class SessionSource implements BenchSource {

    /** Makes the (not yet started) session that will feed {@code sink} and {@code events}. */
    @FunctionalInterface
    public interface SessionFactory {
        ProbeSession create(EdgeSink sink, ProbeEvents events);
    }

    private final String name;
    private final SessionFactory factory;
    private final Runnable afterStop;
    private ProbeSession session;

    /**
     * @param name      the source's name in the status line, e.g. the port
     * @param factory   makes the session
     * @param afterStop run after the session has closed (a simulated board stops its own thread
     *                  here); may be a no-op
     */
    public SessionSource(String name, SessionFactory factory, Runnable afterStop) {
        this.name = name;
        this.factory = factory;
        this.afterStop = afterStop;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public synchronized void start(SourceSink sink) {
        if (session != null) {
            throw new IllegalStateException("session already started: " + name);
        }
        ProbeEvents events = new ProbeEvents() {
            @Override
            public void onHello(Hello hello) {
                sink.onClock(ProbeClock.timebase(hello), Map.of());
            }
        };
        ProbeSession s = factory.create(sink, events);
        s.addStatusListener(status -> sink.onStatus(status(status)));
        session = s;
        s.start();
    }

    @Override
    public void stop() {
        ProbeSession s;
        synchronized (this) {
            s = session;
        }
        if (s != null) {
            s.close();
        }
        afterStop.run();
    }

    /** The window's view of a session snapshot. */
    static SourceStatus status(SessionStatus s) {
        Hello h = s.hello();
        DecoderCounters c = s.counters();
        String probe = h == null ? "" : "probe " + h.probeIdHex() + (h.name().isEmpty() ? "" : " \"" + h.name() + "\"")
                + " fw " + h.firmwareVersion();
        String clock = h == null ? "" : clockWords(h);
        long errors = c.crcErrors() + c.resyncs() + c.overruns() + c.malformed() + c.linesBad() + c.framesMissed();
        return new SourceStatus(state(s), s.line(), probe, clock, c.gapMarks(), errors, h == null ? "" : h.probeIdHex());
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

    /** {@code 16 MHz crystal, calibrated +12.300 ppm ± 0.020 ppm} or {@code ..., not calibrated (± 29 ppm)}. */
    static String clockWords(Hello h) {
        Timebase tb = ProbeClock.timebase(h);
        String mhz = h.clockHz() % 1_000_000 == 0 ? Long.toString(h.clockHz() / 1_000_000)
                : String.format(Locale.ROOT, "%.6f", h.clockHz() / 1e6);
        String base = mhz + " MHz " + h.clockSource().word();
        if (h.calibrated()) {
            return base + String.format(Locale.ROOT, ", calibrated %+.3f ppm ± %.3f ppm", tb.offsetPpm(),
                    tb.tolerancePpm());
        }
        return base + String.format(Locale.ROOT, ", not calibrated (± %.0f ppm standard uncertainty)",
                tb.tolerancePpm());
    }
}
