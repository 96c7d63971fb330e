package org.rcbench.probe;

import java.io.IOException;
import java.time.Duration;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CopyOnWriteArrayList;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.protocol.DecoderCounters;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.HostCommand;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.protocol.StreamDecoder;
import org.rcbench.protocol.Trouble;

/**
 * A live connection to one probe: opens the transport, waits for the hello through boot noise,
 * starts the capture, reads on one thread into a {@link StreamDecoder}, and keeps going across
 * unplugs when the same probe returns.
 *
 * <p>Use: {@code session = new ProbeSession(opener, config, sink, events); session.start();
 * Hello hello = session.awaitStreaming(Duration.ofSeconds(10)); ... session.close();}
 *
 * <p>Threads: {@link #start()} starts one daemon reader thread. The edge sink, the
 * {@link ProbeEvents} and the status listeners are all called on that thread, edges only while
 * {@link SessionState#STREAMING}; a disconnect puts {@link EdgeSink#UNKNOWN} on every channel with a
 * known level, and {@link EdgeSink#onEnd(long)} is called once when the session ends. Everything
 * else ({@link #status()}, {@link #close()}, {@link #send}) may be called from any thread.
 */
public final class ProbeSession implements AutoCloseable {
    private static final long STATUS_INTERVAL_NANOS = 250_000_000L;
    private static final long HELLO_REPEAT_NANOS = 1_000_000_000L;
    private static final int START_ATTEMPTS = 3;

    private final TransportOpener opener;
    private final SessionConfig config;
    private final StreamDecoder decoder;
    private final List<SessionListener> listeners = new CopyOnWriteArrayList<>();
    private final Object monitor = new Object();
    private final ProbeCommands commands = new ProbeCommands();
    private final SessionTap tap;

    private volatile SessionStatus status;
    private volatile ByteTransport transport;
    private volatile boolean closing;
    private volatile Hello hello;
    private volatile String notice = "";
    private volatile long lastByteNanos = System.nanoTime();
    private BadInputException failure;
    private Thread reader;
    private int reconnects;

    /**
     * @param opener opens (and after a disconnect, reopens) the probe's transport
     * @param config probe type, timeouts, channels
     * @param sink   receives the edges and gaps, on the reader thread
     * @param events receives hello, ADC, notes, acks and trouble, on the reader thread (may be a no-op)
     */
    public ProbeSession(TransportOpener opener, SessionConfig config, EdgeSink sink, ProbeEvents events) {
        this.opener = opener;
        this.config = config;
        this.tap = new SessionTap(sink, events, new SessionTap.Session() {
            @Override
            public boolean sameProbe(Hello h) {
                return ProbeSession.this.sameProbe(h);
            }

            @Override
            public void helloWhileStreaming(Hello h) {
                hello = h;
                ByteTransport t = transport;
                if (h.atBoot() && t != null) {
                    // The probe reset (the decoder has marked the gap): start the capture again.
                    sendCaptureCommands(t);
                }
            }
        });
        this.decoder = new StreamDecoder(tap, tap, config.mode());
        this.status = new SessionStatus(SessionState.CONNECTING, "opening " + opener.name(), opener.name(), null,
                decoder.counters(), 0, 0);
    }

    /** Adds a status listener; call before {@link #start()} to see every change. */
    public void addStatusListener(SessionListener listener) {
        listeners.add(listener);
    }

    /** Starts the reader thread; returns at once. */
    public synchronized void start() {
        if (reader != null) {
            throw new IllegalStateException("session already started");
        }
        reader = new Thread(this::run, "rcbench-probe " + opener.name());
        reader.setDaemon(true);
        reader.start();
    }

    /**
     * Waits until the probe streams and returns its hello. Throws the session's one-line
     * {@link BadInputException} when it failed (port missing, no hello), or one saying it is still
     * waiting when {@code timeout} passes first or the session was closed.
     */
    public Hello awaitStreaming(Duration timeout) throws InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        synchronized (monitor) {
            while (status.state() != SessionState.STREAMING && !status.state().isFinal()) {
                long left = deadline - System.nanoTime();
                if (left <= 0) {
                    throw new BadInputException(opener.name(), "no probe streaming after "
                            + seconds(timeout.toNanos()) + " (" + status.line() + ")");
                }
                monitor.wait(Math.max(1, left / 1_000_000));
            }
            if (failure != null) {
                throw failure;
            }
            if (status.state() != SessionState.STREAMING) {
                throw new BadInputException(opener.name(), "session closed before the probe streamed");
            }
            return hello;
        }
    }

    /** Waits until the session has ended (closed, failed, or disconnected with reconnect off). */
    public void awaitEnd(Duration timeout) throws InterruptedException {
        Thread t = reader;
        if (t != null) {
            t.join(Math.max(1, timeout.toMillis()));
        }
    }

    /** The latest status snapshot. */
    public SessionStatus status() {
        return status;
    }

    public SessionState state() {
        return status.state();
    }

    /** The probe's latest hello, or null before the first. */
    public Hello hello() {
        return hello;
    }

    /** Ticks to seconds for this probe (from its hello), or null before the hello. */
    public Timebase timebase() {
        Hello h = hello;
        return h == null ? null : ProbeClock.timebase(h);
    }

    /** Decoder counters as of the latest status (at most about 250 ms old while streaming). */
    public DecoderCounters counters() {
        return status.counters();
    }

    /** Asks the probe for its hello again (binary frame and the text-mode {@code ?} line). */
    public void requestHello() {
        ByteTransport t = transport;
        if (t != null) {
            commands.helloRequest(t, decoder.mode() != StreamDecoder.Mode.TEXT);
        }
    }

    /** Sends one command to the probe now (best effort: a write error shows up as a disconnect). */
    public void send(HostCommand command) {
        ByteTransport t = transport;
        if (t != null) {
            commands.send(t, command);
        }
    }

    /** Stops the capture (when the probe speaks binary), closes the transport and ends the reader thread. */
    @Override
    public void close() {
        closing = true;
        ByteTransport t = transport;
        if (t != null && decoder.mode() == StreamDecoder.Mode.BINARY && state() == SessionState.STREAMING) {
            commands.send(t, HostCommand.stop());
        }
        Thread r = reader;
        if (r != null && r != Thread.currentThread()) {
            try {
                r.join(2000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
        if (t != null) {
            t.close();
        }
        if (r == null) {
            publish(SessionState.CLOSED, "closed");
        }
    }

    // ---- reader thread -------------------------------------------------------------------------

    private void run() {
        try {
            ByteTransport t = open();
            while (t != null && !closing) {
                Outcome outcome = waitForHello(t);
                if (outcome == Outcome.HELLO) {
                    startCapture(t);
                    outcome = stream(t);
                }
                t.close();
                transport = null;
                if (hello == null && reconnects == 0 && !closing) {
                    if (outcome == Outcome.TIMEOUT) {
                        fail(new BadInputException(t.name(), "no hello from the probe after "
                                + seconds(config.profile().helloTimeout().toNanos()) + " (" + bytesLine()
                                + "): check that the rcbench firmware is flashed and the probe type ("
                                + config.profile().name() + ") is right"));
                        return;
                    }
                    if (outcome == Outcome.GONE) {
                        fail(new BadInputException(t.name(), "the port closed before the probe said hello ("
                                + bytesLine() + ")"));
                        return;
                    }
                }
                if (closing || !config.reconnect()) {
                    break;
                }
                t = reopen();
            }
            publish(SessionState.CLOSED, "closed; " + decoder.counters().summary());
        } catch (BadInputException e) {
            fail(e);
        } catch (RuntimeException e) {
            fail(new BadInputException(opener.name(), "probe session stopped: " + e));
        } finally {
            decoder.end();
        }
    }

    private enum Outcome { HELLO, TIMEOUT, GONE, WRONG_PROBE }

    private ByteTransport open() throws BadInputException {
        publish(SessionState.CONNECTING, "opening " + opener.name());
        try {
            ByteTransport t = opener.open();
            applyDtr(t);
            transport = t;
            return t;
        } catch (IOException e) {
            throw new BadInputException(opener.name(), "cannot open: " + e.getMessage(), e);
        }
    }

    private void applyDtr(ByteTransport t) {
        switch (config.profile().dtr()) {
            case RAISE -> t.setDtr(true);
            case HOLD_LOW -> t.setDtr(false);
            default -> {
            }
        }
    }

    private Outcome waitForHello(ByteTransport t) {
        tap.newConnection();
        long startedAt = System.nanoTime();
        long bootQuiet = config.profile().bootQuiet().toNanos();
        long timeout = config.profile().helloTimeout().toNanos();
        long nextRequest = startedAt + bootQuiet;
        long nextStatus = startedAt;
        long discardedBefore = decoder.counters().bytesDiscarded();
        byte[] buf = new byte[4096];
        while (!closing) {
            int n = readSome(t, buf);
            if (n < 0) {
                return Outcome.GONE;
            }
            Hello h = tap.connectionHello;
            if (h != null) {
                if (!sameProbe(h)) {
                    notice = "a different probe (" + h.probeIdHex() + ") answered on " + t.name()
                            + "; waiting for " + String.format(Locale.ROOT, "%016x", wantedProbeId());
                    publish(SessionState.RECONNECTING, notice);
                    return Outcome.WRONG_PROBE;
                }
                return Outcome.HELLO;
            }
            long now = System.nanoTime();
            if (now >= nextRequest) {
                commands.helloRequest(t, decoder.mode() != StreamDecoder.Mode.TEXT);
                nextRequest = now + HELLO_REPEAT_NANOS;
            }
            if (now - startedAt > timeout) {
                return Outcome.TIMEOUT;
            }
            if (now >= nextStatus) {
                long noise = decoder.counters().bytesDiscarded() - discardedBefore;
                String phase = now - startedAt < bootQuiet ? "; board starting" : "";
                publish(SessionState.WAITING_FOR_HELLO, "waiting for the probe's hello on " + t.name() + ": "
                        + seconds(now - startedAt) + " of " + seconds(timeout) + phase
                        + (noise > 0 ? ", " + noise + " bytes of boot noise discarded" : ""));
                nextStatus = now + STATUS_INTERVAL_NANOS;
            }
        }
        return Outcome.GONE;
    }

    private long wantedProbeId() {
        if (config.expectedProbeId() != 0) {
            return config.expectedProbeId();
        }
        Hello first = hello;
        return first == null ? 0 : first.probeId();
    }

    private boolean sameProbe(Hello h) {
        long wanted = wantedProbeId();
        return wanted == 0 || h.probeId() == wanted;
    }

    private void startCapture(ByteTransport t) {
        hello = tap.connectionHello;
        tap.gateOpen = true;
        sendCaptureCommands(t);
        publish(SessionState.STREAMING, streamingLine(t));
    }

    private void sendCaptureCommands(ByteTransport t) {
        tap.startAcked = false;
        if (decoder.mode() == StreamDecoder.Mode.TEXT) {
            return; // text-mode probes stream all the time
        }
        Hello h = hello;
        int all = (1 << Math.min(8, h.channelCount())) - 1;
        int channels = config.channelMask() == 0 ? all : config.channelMask() & all;
        HostCommand edges = HostCommand.edges(channels, config.risingMask() & channels,
                config.fallingMask() & channels);
        if (config.adcRateHz() > 0 && config.adcChannelMask() != 0) {
            commands.send(t, edges, HostCommand.adc(config.adcChannelMask(), config.adcRateHz()), HostCommand.start());
        } else {
            commands.send(t, edges, HostCommand.start());
        }
    }

    private Outcome stream(ByteTransport t) {
        byte[] buf = new byte[8192];
        long nextStatus = System.nanoTime();
        long startSentAt = System.nanoTime();
        int startAttempts = 1;
        while (!closing) {
            int n = readSome(t, buf);
            if (n < 0) {
                decoder.markGap(Trouble.DISCONNECT);
                return Outcome.GONE;
            }
            long now = System.nanoTime();
            if (!tap.startAcked && decoder.mode() == StreamDecoder.Mode.BINARY
                    && now - startSentAt > config.ackTimeoutMillis() * 1_000_000L && startAttempts < START_ATTEMPTS) {
                sendCaptureCommands(t);
                startSentAt = now;
                startAttempts++;
            }
            if (now >= nextStatus) {
                publish(SessionState.STREAMING, streamingLine(t));
                nextStatus = now + STATUS_INTERVAL_NANOS;
            }
        }
        return Outcome.GONE;
    }

    private ByteTransport reopen() {
        long goneAt = System.nanoTime();
        long nextStatus = goneAt;
        while (!closing) {
            long now = System.nanoTime();
            if (now >= nextStatus) {
                String who = hello == null ? "the probe" : "probe " + hello.probeIdHex();
                publish(SessionState.RECONNECTING, opener.name() + " disconnected " + seconds(now - goneAt)
                        + " ago; waiting for " + who + " to come back" + (notice.isEmpty() ? "" : " (" + notice + ")"));
                nextStatus = now + STATUS_INTERVAL_NANOS;
            }
            try {
                ByteTransport t = opener.open();
                applyDtr(t);
                Hello h = hello;
                long advance = h == null ? 0 : Math.round((System.nanoTime() - goneAt) * 1e-9 * h.clockHz());
                decoder.restartTimeline(advance);
                transport = t;
                reconnects++;
                notice = "";
                return t;
            } catch (IOException | BadInputException e) {
                sleep(config.reconnectPollMillis());
            }
        }
        return null;
    }

    private int readSome(ByteTransport t, byte[] buf) {
        int n;
        try {
            n = t.read(buf, 0, buf.length, config.readTimeoutMillis());
        } catch (IOException e) {
            return -1;
        }
        if (n > 0) {
            lastByteNanos = System.nanoTime();
            decoder.feed(buf, 0, n);
        }
        return n;
    }

    // ---- status --------------------------------------------------------------------------------

    private String streamingLine(ByteTransport t) {
        Hello h = hello;
        long silent = (System.nanoTime() - lastByteNanos) / 1_000_000;
        String quiet = h != null && h.sendsHeartbeats() && silent > 2000
                ? "; nothing received for " + seconds(silent * 1_000_000) : "";
        return "streaming from " + (h == null ? "probe" : h.summary()) + " on " + t.name() + ": "
                + decoder.counters().summary() + (tap.refusal.isEmpty() ? "" : "; " + tap.refusal) + quiet;
    }

    private String bytesLine() {
        DecoderCounters c = decoder.counters();
        return c.bytes() == 0 ? "nothing received" : c.bytes() + " bytes received, none of them a hello";
    }

    private void fail(BadInputException e) {
        synchronized (monitor) {
            failure = e;
        }
        publish(SessionState.FAILED, e.getMessage());
    }

    private void publish(SessionState state, String line) {
        ByteTransport t = transport;
        SessionStatus s = new SessionStatus(state, line, t == null ? opener.name() : t.name(), hello,
                decoder.counters(), reconnects, (System.nanoTime() - lastByteNanos) / 1_000_000);
        synchronized (monitor) {
            if (status.state().isFinal() && state != status.state()) {
                return;
            }
            status = s;
            monitor.notifyAll();
        }
        for (SessionListener l : listeners) {
            l.onStatus(s);
        }
    }

    private static String seconds(long nanos) {
        return String.format(Locale.ROOT, "%.1f s", nanos * 1e-9);
    }

    private static void sleep(int millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
