package org.rcbench.testing;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import org.rcbench.protocol.Ack;
import org.rcbench.protocol.ClockSource;
import org.rcbench.protocol.CommandReader;
import org.rcbench.protocol.FrameEncoder;
import org.rcbench.protocol.Hello;
import org.rcbench.protocol.HostCommand;
import org.rcbench.protocol.Wire;

/**
 * A probe in a test: answers host commands as the protocol document says (hello request, set
 * edges, set ADC, start, stop, each acknowledged) and writes edges the test gives it. Thread-safe:
 * commands may arrive on one thread while the test writes edges on another.
 */
public final class ProbeEmulator {
    private final OutputStream out;
    private final FrameEncoder enc;
    private final Hello hello;
    private final CommandReader commands;
    private final CountDownLatch started = new CountDownLatch(1);
    private volatile boolean running;
    private final java.util.concurrent.atomic.AtomicInteger starts = new java.util.concurrent.atomic.AtomicInteger();
    private volatile boolean answerHelloRequests = true;

    public ProbeEmulator(OutputStream out, long probeId) {
        this.out = out;
        this.enc = new FrameEncoder(out);
        this.hello = Hello.basic(probeId, 16_000_000L, ClockSource.CRYSTAL, "emulator")
                .withFlags(Wire.HELLO_HEARTBEAT);
        this.commands = new CommandReader(this::onCommand);
    }

    /** What the host wrote; call from the thread that reads the link. */
    public void hostBytes(byte[] b, int off, int len) {
        commands.feed(b, off, len);
    }

    /** Resets: a zero, then the boot hello with sequence 0. */
    public synchronized void boot() {
        running = false;
        io(() -> {
            out.write(0);
            enc.seq(0).hello(hello.withFlags(hello.flags() | Wire.HELLO_AT_BOOT));
        });
    }

    /** Raw bytes (boot noise, garbage). */
    public synchronized void raw(byte[] bytes) {
        io(() -> out.write(bytes));
    }

    public void answerHelloRequests(boolean on) {
        answerHelloRequests = on;
    }

    /** Waits until the host has sent start. */
    public boolean awaitStart(long millis) throws InterruptedException {
        return started.await(millis, TimeUnit.MILLISECONDS);
    }

    /** How many start commands arrived. */
    public int starts() {
        return starts.get();
    }

    public boolean running() {
        return running;
    }

    /** Edges at the given probe ticks on channel 0, alternating from {@code firstLevel}, as one batch. */
    public synchronized void edges(long[] ticks, int firstLevel) {
        io(() -> {
            int level = firstLevel;
            for (long t : ticks) {
                enc.edge(t, 0, level);
                level ^= 1;
            }
            enc.flush();
            out.flush();
        });
    }

    public synchronized void heartbeat(long tick) {
        io(() -> {
            enc.heartbeat(tick);
            out.flush();
        });
    }

    private synchronized void onCommand(HostCommand c, int seq) {
        io(() -> {
            switch (c.type()) {
                case Wire.T_HELLO_REQUEST -> {
                    if (!answerHelloRequests) {
                        return;
                    }
                    enc.hello(hello.withFlags(hello.flags() | (running ? Wire.HELLO_RUNNING : 0)));
                }
                case Wire.T_START -> running = true;
                case Wire.T_STOP -> running = false;
                case Wire.T_SET_ADC -> {
                    enc.ack(new Ack(c.type(), seq, Wire.ACK_UNSUPPORTED));
                    out.flush();
                    return;
                }
                default -> {
                }
            }
            enc.ack(new Ack(c.type(), seq, Wire.ACK_OK));
            out.flush();
            if (c.type() == Wire.T_START) {
                starts.incrementAndGet();
                started.countDown();
            }
        });
    }

    private interface Io {
        void run() throws IOException;
    }

    private static void io(Io action) {
        try {
            action.run();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
