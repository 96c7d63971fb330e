package org.rcbench.sim;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Random;
import org.rcbench.edge.EdgeSink;
import org.rcbench.probe.ByteTransport;
import org.rcbench.probe.ProbeProfile;
import org.rcbench.probe.ProbeSession;
import org.rcbench.protocol.Ack;
import org.rcbench.protocol.CommandReader;
import org.rcbench.protocol.FrameEncoder;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.HostCommand;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.protocol.Wire;
import org.rcbench.probe.SessionConfig;
import org.rcbench.probe.TransportOpener;

/**
 * A probe with a {@link VirtualBoard} on its inputs, speaking the real wire protocol
 * ({@code firmware-notes/protocol.md}) through an in-memory port ({@link org.rcbench.probe.MemoryPort}), so that a normal
 * {@link ProbeSession} decodes its bytes exactly as a serial port's.
 *
 * <p>Like the reference firmware it sends a zero and a boot hello when plugged in, boots stopped
 * with every channel and both polarities selected, answers every command with an acknowledgement
 * (hello request with the hello first; set ADC with "not supported": it has no ADC), ends an edge
 * frame 20 ms (board time) after its first edge, sends a heartbeat after 250 ms without a frame
 * while started, and counts dropped edges. The board powers up at the first start command; its
 * tick 0 is the probe's tick 0, and after a replug the probe's counter restarts from the board
 * time of the boot.
 *
 * <p>{@link Pace#REALTIME}: board time follows the wall clock from the first start on (it keeps
 * running while the capture is stopped or the cable is out). {@link Pace#FAST}: board time runs
 * only while started (and while unplugged), as fast as the host reads: the probe stays at most
 * 64 kB ahead of the host, and lets the host read everything sent before a simulated unplug, so
 * that a fast run loses nothing the same run in real time would not.
 *
 * <p>Use: {@code SimulatedProbe probe = new SimulatedProbe(board, ProbeOptions.defaults());
 * probe.start(); ProbeSession s = probe.session(SessionConfig.defaults(), sink, events); s.start();}
 * ... {@code s.close(); probe.close();}. When the host closes its end the probe stops.
 *
 * <p>Threads: {@link #start()} starts one daemon thread that runs the board and the protocol; the
 * board must not be used elsewhere meanwhile. {@link #stats()} and {@link #close()} are thread-safe.
 */
public final class SimulatedProbe implements AutoCloseable {
    /** The reference firmware ends an edge frame 20 ms after its first edge. */
    static final double FRAME_SECONDS = 0.020;
    /** The protocol's heartbeat promise: a frame at least every 250 ms while started. */
    static final double HEARTBEAT_SECONDS = 0.25;
    private static final EdgeSink DISCARD = (tick, channel, level) -> { };
    /** How far a fast probe may run ahead of the host's reading. */
    private static final long FAST_LEAD_BYTES = 64 * 1024;
    private static final long DRAIN_TIMEOUT_NANOS = 10_000_000_000L;

    private final VirtualBoard board;
    private final ProbeOptions options;
    private final LinkPort port;
    private final Hello hello;
    private final int allChannels;
    private final Random faultRandom;
    private final List<Unplug> unplugs;
    private final EdgeSink probeSink = this::captured;
    private volatile boolean closing;
    private Thread thread;

    // Probe thread only.
    private ByteTransport link;
    private FaultyOutput out;
    private FrameEncoder enc;
    private CommandReader commands;
    private boolean running;
    private boolean powered;
    private int channelMask;
    private int risingMask;
    private int fallingMask;
    private long bootTick;
    private double simNow;
    private long wallStartNanos;
    private int nextUnplug;
    private double replugAt = Double.NaN;
    private double lastFrameAt;
    private long framesAtLastCheck;
    private long droppedTotal;
    private int overrunLeft;

    private volatile long boots;
    private volatile long edgesSent;
    private volatile long edgesLost;
    private volatile long bytesSent;
    private volatile long bytesFlipped;
    private volatile long bytesDropped;
    private volatile double boardSeconds;
    private volatile String ending = "";

    /** A probe on {@code board} (freshly made: its power-up is the probe's first start). */
    public SimulatedProbe(VirtualBoard board, ProbeOptions options) {
        double hz = board.spec().clockHz();
        if (hz != Math.rint(hz) || hz > 0xFFFF_FFFFL) {
            throw new IllegalArgumentException("a probe states a whole number of hertz below 2^32: " + hz);
        }
        this.board = board;
        this.options = options;
        this.port = new LinkPort("simulated " + board.title());
        int channels = 0;
        for (int c : board.channelNames().keySet()) {
            channels = Math.max(channels, c + 1);
        }
        this.allChannels = (1 << channels) - 1;
        Hello h = Hello.basic(options.probeId(), (long) hz, options.clockSource(), ascii(options.name()))
                .withChannels(channels);
        h = new Hello(h.protocolVersion(), Wire.HELLO_HEARTBEAT, h.firmwareVersion(), h.probeId(), h.clockHz(),
                h.clockSource(), 0, 0, h.channelCount(), h.edgeCapabilities() | Wire.CAP_NOISE_FILTER, 100_000, 0, 0,
                0, h.name());
        this.hello = options.calibrated()
                ? h.withCalibration(options.calibrationPpb(), options.calibrationUncertaintyPpb()) : h;
        this.faultRandom = new Random(options.faults().seed());
        this.unplugs = options.faults().unplugs();
    }

    /** The port a {@link ProbeSession} opens (it fails like an absent port while the cable is out). */
    public TransportOpener port() {
        return port;
    }

    /** The hello this probe sends (without the boot and running flags). */
    public Hello hello() {
        return hello;
    }

    public VirtualBoard board() {
        return board;
    }

    /** A session (not yet started) on this probe's port, with the {@link ProbeProfile#STREAM} profile. */
    public ProbeSession session(SessionConfig config, EdgeSink sink, ProbeEvents events) {
        return new ProbeSession(port, config.withProfile(ProbeProfile.STREAM), sink, events);
    }

    /** Plugs the probe in (it boots and says hello) and starts its thread; returns at once. */
    public synchronized void start() {
        if (thread != null) {
            throw new IllegalStateException("probe already started");
        }
        boot(); // before the thread, so that a session opened right after finds the port
        thread = new Thread(this::run, "rcbench-sim-probe " + board.title());
        thread.setDaemon(true);
        thread.start();
    }

    /** Pulls the cable for good and stops the thread. */
    @Override
    public void close() {
        closing = true;
        port.unplug();
        Thread t;
        synchronized (this) {
            t = thread;
        }
        if (t != null && t != Thread.currentThread()) {
            try {
                t.join(2000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    /** What the probe has done so far. */
    public Stats stats() {
        FaultyOutput o = out;
        long sent = bytesSent + (o == null ? 0 : o.bytesSent);
        long flipped = bytesFlipped + (o == null ? 0 : o.bytesFlipped);
        long dropped = bytesDropped + (o == null ? 0 : o.bytesDropped);
        return new Stats(boots, edgesSent, edgesLost, sent, flipped, dropped, boardSeconds, ending);
    }

    /**
     * Counts since the probe was made.
     *
     * @param boots        times it booted (1 + replugs)
     * @param edgesSent    edges put into frames
     * @param edgesLost    edges not sent because of injected overruns
     * @param bytesSent    bytes that reached the link
     * @param bytesFlipped bytes damaged on the way
     * @param bytesDropped bytes lost on the way
     * @param boardSeconds how far the board has run, true seconds
     * @param ending       why the probe stopped, or "" while it runs
     */
    public record Stats(long boots, long edgesSent, long edgesLost, long bytesSent, long bytesFlipped,
            long bytesDropped, double boardSeconds, String ending) {
    }

    // ---- probe thread ---------------------------------------------------------------------------

    private void run() {
        byte[] buf = new byte[1024];
        try {
            while (!closing) {
                boolean busy = options.pace() == Pace.FAST && (running || link == null);
                boolean ahead = busy && link != null && out.bytesSent - port.hostRead() > FAST_LEAD_BYTES;
                if (link != null) {
                    int n = link.read(buf, 0, buf.length, ahead ? 1 : busy ? 0 : 10);
                    if (n < 0) {
                        ending = closing ? "closed" : "the host closed the port";
                        return;
                    }
                    if (n > 0) {
                        commands.feed(buf, 0, n);
                    }
                } else if (!busy) {
                    Thread.sleep(10);
                }
                if (!ahead) {
                    advance();
                }
            }
            ending = "closed";
        } catch (IOException | UncheckedIOException e) {
            ending = closing ? "closed" : "the link failed: " + e.getMessage();
        } catch (InterruptedException e) {
            ending = "interrupted";
        }
    }

    /** Runs the board up to the time the pace allows, a frame interval at a time. */
    private void advance() throws IOException {
        double target;
        if (options.pace() == Pace.FAST) {
            target = running || link == null ? simNow + FRAME_SECONDS : simNow;
        } else {
            target = powered ? (System.nanoTime() - wallStartNanos) * 1e-9 : simNow;
        }
        while (simNow < target && !closing) {
            double next = Math.min(target, simNow + FRAME_SECONDS);
            boolean unplugDue = link != null && nextUnplug < unplugs.size()
                    && unplugs.get(nextUnplug).atSeconds() <= next;
            if (unplugDue) {
                next = Math.max(simNow, unplugs.get(nextUnplug).atSeconds());
            }
            if (link == null && replugAt <= next) {
                next = replugAt;
            }
            board.advanceTo(next, link != null && running ? probeSink : DISCARD);
            simNow = next;
            boardSeconds = next;
            if (link != null && running) {
                endFrame();
            }
            if (unplugDue) {
                unplug(unplugs.get(nextUnplug++));
            } else if (link == null && simNow >= replugAt) {
                boot();
            }
        }
    }

    /** Sends the pending edges, or a heartbeat when nothing was sent for 250 ms. */
    private void endFrame() throws IOException {
        enc.flush();
        long frames = enc.framesWritten();
        if (frames != framesAtLastCheck) {
            framesAtLastCheck = frames;
            lastFrameAt = simNow;
        } else if (simNow - lastFrameAt > HEARTBEAT_SECONDS - FRAME_SECONDS - 1e-9) {
            // Checked once per frame interval: sending one interval early keeps the promise of 250 ms.
            enc.heartbeat(board.tickAt(simNow) - bootTick);
            framesAtLastCheck = enc.framesWritten();
            lastFrameAt = simNow;
        }
    }

    private void boot() {
        link = port.plugIn();
        if (out != null) {
            bytesSent += out.bytesSent;
            bytesFlipped += out.bytesFlipped;
            bytesDropped += out.bytesDropped;
        }
        out = new FaultyOutput(link, options.faults(), faultRandom);
        enc = new FrameEncoder(out);
        commands = new CommandReader(new Commands());
        running = false;
        channelMask = allChannels;
        risingMask = allChannels;
        fallingMask = allChannels;
        droppedTotal = 0;
        overrunLeft = 0;
        replugAt = Double.NaN;
        bootTick = board.tickAt(simNow);
        framesAtLastCheck = 0;
        boots++;
        try {
            out.write(0);
            enc.seq(0).hello(hello.withFlags(hello.flags() | Wire.HELLO_AT_BOOT));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void unplug(Unplug u) throws IOException {
        if (options.pace() == Pace.FAST) {
            drain();
        }
        port.unplug();
        link = null;
        running = false;
        replugAt = simNow + u.downSeconds();
    }

    /** Waits (a fast probe only) until the host has read everything sent, or 10 s at most. */
    private void drain() throws IOException {
        enc.flush();
        long deadline = System.nanoTime() + DRAIN_TIMEOUT_NANOS;
        byte[] buf = new byte[256];
        while (!closing && out.bytesSent > port.hostRead() && System.nanoTime() < deadline) {
            int n = link.read(buf, 0, buf.length, 1);
            if (n < 0) {
                return;
            }
            if (n > 0) {
                commands.feed(buf, 0, n);
            }
        }
    }

    /** The probe's input capture: filters by the host's selection, loses edges on injected overruns. */
    private void captured(long tick, int channel, int level) {
        int bit = 1 << channel;
        if ((channelMask & bit) == 0 || ((level == EdgeSink.HIGH ? risingMask : fallingMask) & bit) == 0) {
            return;
        }
        try {
            double rate = options.faults().overrunRate();
            if (overrunLeft == 0 && rate > 0 && faultRandom.nextDouble() < rate) {
                overrunLeft = 1 + faultRandom.nextInt(8);
            }
            if (overrunLeft > 0) {
                overrunLeft--;
                edgesLost++;
                enc.dropped(++droppedTotal); // ends the current frame first, as the protocol requires
                return;
            }
            enc.edge(tick - bootTick, channel, level);
            edgesSent++;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The firmware's command handling. */
    private final class Commands implements CommandReader.Listener {
        @Override
        public void onCommand(HostCommand c, int seq) {
            int status = Wire.ACK_OK;
            try {
                switch (c.type()) {
                    case Wire.T_HELLO_REQUEST -> enc.hello(hello.withFlags(hello.flags()
                            | (running ? Wire.HELLO_RUNNING : 0)));
                    case Wire.T_START -> {
                        if (!powered) {
                            powered = true;
                            wallStartNanos = System.nanoTime() - (long) (simNow * 1e9);
                        }
                        if (!running) {
                            lastFrameAt = simNow;
                            framesAtLastCheck = enc.framesWritten();
                        }
                        running = true;
                    }
                    case Wire.T_STOP -> {
                        enc.flush();
                        running = false;
                    }
                    case Wire.T_SET_EDGES -> {
                        if ((c.channelMask() & ~allChannels) != 0) {
                            status = Wire.ACK_BAD_ARGUMENT;
                        } else {
                            channelMask = c.channelMask();
                            risingMask = c.risingMask();
                            fallingMask = c.fallingMask();
                        }
                    }
                    default -> status = Wire.ACK_UNSUPPORTED; // set ADC: this probe has no ADC
                }
                enc.ack(new Ack(c.type(), seq, status));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }

        @Override
        public void onBadCommand(int type, int seq) {
            try {
                enc.ack(new Ack(type, seq, Wire.ACK_UNKNOWN_COMMAND));
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    private static String ascii(String s) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < s.length() && sb.length() < Wire.MAX_NAME; i++) {
            char c = s.charAt(i);
            sb.append(c >= 0x20 && c < 0x7F ? c : '?');
        }
        return sb.toString();
    }
}
