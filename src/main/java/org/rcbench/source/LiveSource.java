package org.rcbench.source;

import java.io.IOException;
import java.time.Duration;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.locks.LockSupport;
import java.util.function.Function;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.probe.CalibrationStore;
import org.rcbench.probe.ProbeClock;
import org.rcbench.probe.ProbeSession;
import org.rcbench.probe.SessionConfig;
import org.rcbench.probe.SessionListener;
import org.rcbench.probe.SessionState;
import org.rcbench.probe.SessionStatus;
import org.rcbench.probe.SinkOnHello;
import org.rcbench.probe.StoredCalibration;
import org.rcbench.protocol.ClockSource;
import org.rcbench.protocol.DecoderCounters;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.serial.SerialPorts;
import org.rcbench.sim.Pace;
import org.rcbench.sim.SimulatedProbe;
import org.rcbench.sim.VirtualBoard;

/**
 * One source of live edges for a command or the GUI, whatever is behind it: a probe on a serial port,
 * a simulated board on a simulated probe (through the real protocol and decoder), or a capture file
 * replayed.
 *
 * <p>Use: {@code LiveSource src = LiveSource.of(spec, SessionConfig.defaults(), store);
 * src.addStatusListener(...); src.start(start -> mySink(start.timebase()), events);
 * StreamStart s = src.awaitStreaming(Duration.ofSeconds(10)); ... src.close();}
 *
 * <p>The sink factory is called once, on the first hello (a file: at the start), with the
 * calibrated timebase, before any edge; edges, events and status go to the source's one thread
 * (the session's reader thread, or the replay thread). The timebase applies the host's newest stored
 * calibration of the probe's id ({@link CalibrationStore#timebase}). {@link #status()},
 * {@link #close()} and the await methods may be called from any thread.
 */
public final class LiveSource implements AutoCloseable {
    private static final DateTimeFormatter DAY = DateTimeFormatter.ofPattern("yyyy-MM-dd", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final SourceSpec spec;
    private final SessionConfig config;
    private final CalibrationStore store;
    private final List<SessionListener> listeners = new CopyOnWriteArrayList<>();
    private final SimulatedProbe probe;
    private final Capture capture;
    private final Object monitor = new Object();
    private volatile StreamStart started;
    private volatile ProbeSession session;
    private volatile SessionStatus fileStatus;
    private volatile boolean closing;
    private Thread replay;
    private BadInputException replayFailure;

    private LiveSource(SourceSpec spec, SessionConfig config, CalibrationStore store, SimulatedProbe probe,
            Capture capture) {
        this.spec = spec;
        this.config = config;
        this.store = store;
        this.probe = probe;
        this.capture = capture;
        this.fileStatus = new SessionStatus(SessionState.CONNECTING, "opening " + spec.name(), spec.name(), null,
                zeroCounters(), 0, 0);
    }

    /**
     * A source (not started) for {@code spec}. A simulated board is built and a capture file's header
     * read now, so that a bad design deviation or a bad file fails here with its one-line error.
     */
    public static LiveSource of(SourceSpec spec, SessionConfig config, CalibrationStore store) {
        if (spec instanceof SourceSpec.Simulated sim) {
            VirtualBoard board = sim.board();
            return new LiveSource(spec, config, store, new SimulatedProbe(board, sim.probe()), null);
        }
        if (spec instanceof SourceSpec.CaptureFile file) {
            try {
                return new LiveSource(spec, config, store, null, CaptureFiles.open(file.file()));
            } catch (IOException e) {
                throw new BadInputException(file.file().toString(), "cannot read: " + e.getMessage(), e);
            }
        }
        return new LiveSource(spec, config, store, null, null);
    }

    public SourceSpec spec() {
        return spec;
    }

    public String name() {
        return spec.name();
    }

    /** Adds a status listener (called on the source's thread); add before {@link #start} to see every change. */
    public void addStatusListener(SessionListener listener) {
        listeners.add(listener);
        ProbeSession s = session;
        if (s != null) {
            s.addStatusListener(listener);
        }
    }

    /** Starts with one sink for every edge and no events. */
    public void start(EdgeSink sink) {
        start(s -> sink, new ProbeEvents() { });
    }

    /**
     * Starts: opens the port (or plugs the simulated probe in, or starts the replay) and returns at
     * once. {@code sinks} makes the sink from the stream's start; {@code events} gets the probe's
     * hello, acknowledgements, notes, probe time and trouble.
     */
    public synchronized void start(Function<StreamStart, EdgeSink> sinks, ProbeEvents events) {
        if (session != null || replay != null) {
            throw new IllegalStateException("source already started");
        }
        if (capture != null) {
            replay = new Thread(() -> replay(sinks), "rcbench-replay " + spec.name());
            replay.setDaemon(true);
            replay.start();
            return;
        }
        SinkOnHello tap = new SinkOnHello(hello -> sinks.apply(streamStart(hello)), events);
        ProbeSession s;
        if (probe != null) {
            s = probe.session(config, tap, tap);
        } else {
            SourceSpec.Port port = (SourceSpec.Port) spec;
            s = SerialPorts.session(port.port(), config.withProfile(port.profile()), tap, tap);
        }
        for (SessionListener l : listeners) {
            s.addStatusListener(l);
        }
        session = s;
        if (probe != null) {
            probe.start();
        }
        s.start();
    }

    /** What is known about the stream once it has started, or null before. */
    public StreamStart started() {
        return started;
    }

    /**
     * Waits until edges flow and returns the stream's start. Throws the one-line
     * {@link BadInputException} of a failed source, or one saying it is still waiting when
     * {@code timeout} passes first.
     */
    public StreamStart awaitStreaming(Duration timeout) throws InterruptedException {
        ProbeSession s = session;
        if (s != null) {
            s.awaitStreaming(timeout);
            return started;
        }
        long deadline = System.nanoTime() + timeout.toNanos();
        synchronized (monitor) {
            while (started == null && replayFailure == null) {
                long left = deadline - System.nanoTime();
                if (left <= 0) {
                    throw new BadInputException(spec.name(), "the replay has not started");
                }
                monitor.wait(Math.max(1, left / 1_000_000));
            }
            if (replayFailure != null) {
                throw replayFailure;
            }
            return started;
        }
    }

    /** The latest status: the session's, or the replay's. */
    public SessionStatus status() {
        ProbeSession s = session;
        return s != null ? s.status() : fileStatus;
    }

    /** True when the source has ended (closed, failed, or the file is done). */
    public boolean ended() {
        return status().state().isFinal();
    }

    /** Waits at most {@code timeout} for the source to end; returns whether it did. */
    public boolean awaitEnd(Duration timeout) throws InterruptedException {
        ProbeSession s = session;
        Thread r = replay;
        if (s != null) {
            s.awaitEnd(timeout);
        } else if (r != null) {
            r.join(Math.max(1, timeout.toMillis()));
        }
        return ended();
    }

    /** The simulated probe behind this source, or null. */
    public SimulatedProbe simulatedProbe() {
        return probe;
    }

    /** The probe session behind this source, or null for a file (and before start). */
    public ProbeSession session() {
        return session;
    }

    /** Stops: the probe is told to stop and the port closed, the simulated probe unplugged, the replay ended. */
    @Override
    public synchronized void close() {
        closing = true;
        ProbeSession s = session;
        if (s != null) {
            s.close();
        }
        if (probe != null) {
            probe.close();
        }
        Thread r;
        synchronized (this) {
            r = replay;
        }
        if (r != null && r != Thread.currentThread()) {
            try {
                r.join(2000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
        if (capture != null) {
            try {
                capture.close();
            } catch (IOException e) {
                // nothing was written; the reading is over
            }
        }
    }

    // ---- stream start ---------------------------------------------------------------------------

    private StreamStart streamStart(Hello hello) {
        Timebase tb = CalibrationStore.timebase(hello, store);
        Optional<StoredCalibration> stored = hello.probeId() == 0 ? Optional.empty() : store.latest(hello.probeIdHex());
        String note;
        if (stored.isPresent()) {
            StoredCalibration c = stored.get();
            note = String.format(Locale.ROOT, "clock calibrated %s against %s: %+.3f ppm, u %.3g ppm",
                    DAY.format(c.measuredAt()), c.reference(), c.offsetPpm(), c.uncertaintyPpm());
        } else if (hello.calibrated()) {
            note = String.format(Locale.ROOT, "clock calibration stored in the probe: %+.3f ppm, u %.3g ppm",
                    tb.offsetPpm(), tb.tolerancePpm());
        } else {
            note = String.format(Locale.ROOT, "clock not calibrated (%s, about ±%.0f ppm); rcbench calibrate measures it",
                    hello.clockSource().word(), ProbeClock.uncalibratedBoundPpm(hello.clockSource()));
        }
        Map<Integer, String> names = new TreeMap<>();
        if (probe != null) {
            names.putAll(probe.board().channelNames());
        } else {
            for (int c = 0; c < hello.channelCount(); c++) {
                names.put(c, "ch" + c);
            }
        }
        StreamStart s = new StreamStart(spec.name(), hello, tb, note, names);
        started = s;
        return s;
    }

    // ---- replay ---------------------------------------------------------------------------------

    private void replay(Function<StreamStart, EdgeSink> sinks) {
        try {
            Timebase tb = capture.timebase();
            String note;
            if (capture.header().containsKey(EdgeCaptureFormat.CALIBRATION_U_PPM)) {
                note = String.format(Locale.ROOT, "clock as the file states: %+.3f ppm, u %.3g ppm", tb.offsetPpm(),
                        tb.tolerancePpm());
            } else {
                double bound = ProbeClock.uncalibratedBoundPpm(ClockSource.CRYSTAL);
                tb = tb.withTolerancePpm(bound / Math.sqrt(3));
                note = String.format(Locale.ROOT, "the file states no clock uncertainty: taken as a crystal, ±%.0f ppm",
                        bound);
            }
            StreamStart s = new StreamStart(spec.name(), null, tb, note, capture.channels());
            EdgeSink sink = sinks.apply(s);
            synchronized (monitor) {
                started = s;
                monitor.notifyAll();
            }
            publishFile(SessionState.STREAMING, "replaying " + spec.name());
            boolean paced = ((SourceSpec.CaptureFile) spec).pace() == Pace.REALTIME;
            Paced p = new Paced(sink, tb, paced);
            try {
                capture.streamTo(p);
            } catch (Stopped e) {
                sink.onEnd(p.lastTick);
            }
            publishFile(SessionState.CLOSED, (closing ? "replay stopped: " : "replay done: ") + p.edges + " edges from "
                    + spec.name());
        } catch (BadInputException e) {
            failReplay(e);
        } catch (IOException e) {
            failReplay(new BadInputException(spec.name(), "cannot read: " + e.getMessage(), e));
        }
    }

    private void failReplay(BadInputException e) {
        synchronized (monitor) {
            replayFailure = e;
            monitor.notifyAll();
        }
        publishFile(SessionState.FAILED, e.getMessage());
    }

    private void publishFile(SessionState state, String line) {
        SessionStatus s = new SessionStatus(state, line, spec.name(), null, zeroCounters(), 0, 0);
        fileStatus = s;
        for (SessionListener l : listeners) {
            l.onStatus(s);
        }
    }

    private static DecoderCounters zeroCounters() {
        return new DecoderCounters(0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0);
    }

    /** Thrown inside the replay when the source is closed. */
    private static final class Stopped extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Stopped() {
            super(null, null, false, false);
        }
    }

    /** Passes edges on, waiting for the wall clock to catch up with each one when paced. */
    private final class Paced implements EdgeSink {
        private final EdgeSink sink;
        private final double ticksPerSecond;
        private final boolean paced;
        private long firstTick = -1;
        private long startNanos;
        long lastTick;
        long edges;

        Paced(EdgeSink sink, Timebase tb, boolean paced) {
            this.sink = sink;
            this.ticksPerSecond = tb.ticksPerSecond();
            this.paced = paced;
        }

        @Override
        public void onEdge(long tick, int channel, int level) {
            if (closing) {
                throw new Stopped();
            }
            if (paced) {
                if (firstTick < 0) {
                    firstTick = tick;
                    startNanos = System.nanoTime();
                }
                long due = startNanos + (long) ((tick - firstTick) / ticksPerSecond * 1e9);
                for (long left = due - System.nanoTime(); left > 0; left = due - System.nanoTime()) {
                    LockSupport.parkNanos(Math.min(left, 100_000_000L));
                    if (closing) {
                        throw new Stopped();
                    }
                }
            }
            lastTick = tick;
            edges++;
            sink.onEdge(tick, channel, level);
        }

        @Override
        public void onEnd(long last) {
            sink.onEnd(last);
        }
    }
}
