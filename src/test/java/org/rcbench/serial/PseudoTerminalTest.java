package org.rcbench.serial;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.FileInputStream;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.CopyOnWriteArrayList;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.edge.EdgeSink;
import org.rcbench.probe.ProbeProfile;
import org.rcbench.probe.ProbeSession;
import org.rcbench.probe.SessionConfig;
import org.rcbench.probe.SessionState;
import org.rcbench.protocol.ProbeEvents;
import org.rcbench.protocol.Trouble;
import org.rcbench.testing.ProbeEmulator;
import org.rcbench.testing.PtyPair;

/**
 * End to end through a real pseudo-terminal pair made by socat: a probe emulator writes protocol
 * bytes on one end, a {@link ProbeSession} reads the other through jSerialComm.
 */
class PseudoTerminalTest {
    PtyPair pair;

    @AfterEach
    void stopSocat() {
        if (pair != null) {
            pair.close();
        }
    }

    /** Starts socat and waits until both ends exist. */
    Path[] ptyPair(Path dir) throws Exception {
        pair = PtyPair.start(dir);
        return new Path[] {pair.a(), pair.b()};
    }

    static final class Sink implements EdgeSink {
        final List<String> calls = new CopyOnWriteArrayList<>();
        volatile boolean ended;

        @Override
        public void onEdge(long tick, int channel, int level) {
            calls.add(tick + " " + channel + " " + (level == UNKNOWN ? "?" : Integer.toString(level)));
        }

        @Override
        public void onEnd(long lastTick) {
            ended = true;
        }
    }

    @Test
    void edgesCrossARealPtyIntactAndKillingSocatIsADisconnect(@TempDir Path dir) throws Exception {
        Path[] pty = ptyPair(dir);
        FileOutputStream probeOut = new FileOutputStream(pty[0].toFile());
        InputStream probeIn = new FileInputStream(pty[0].toFile());
        ProbeEmulator probe = new ProbeEmulator(probeOut, 0x7777);
        Thread pump = new Thread(() -> {
            byte[] buf = new byte[256];
            try {
                for (int n; (n = probeIn.read(buf)) >= 0; ) {
                    probe.hostBytes(buf, 0, n);
                }
            } catch (IOException e) {
                // socat is gone
            }
        });
        pump.setDaemon(true);
        pump.start();

        Sink sink = new Sink();
        List<Trouble> troubles = new CopyOnWriteArrayList<>();
        SessionConfig config = SessionConfig.defaults().withProfile(ProbeProfile.NATIVE_USB).withReconnect(false);
        ProbeSession session = new ProbeSession(
                SerialPorts.opener(pty[1].toString(), SerialPorts.DEFAULT_BAUD, config.profile().dtr(), 100),
                config, sink, new ProbeEvents() {
                    @Override
                    public void onTrouble(Trouble trouble, long tick) {
                        troubles.add(trouble);
                    }
                });
        try {
            session.start();
            assertThat(session.awaitStreaming(Duration.ofSeconds(15)).probeId()).isEqualTo(0x7777);
            assertThat(session.status().port()).startsWith(pty[1].toString() + " (/dev/pts/");
            assertThat(probe.awaitStart(10_000)).isTrue();

            Random random = new Random(99);
            List<String> truth = new ArrayList<>();
            long tick = 123_456;
            long origin = tick;
            int level = 1;
            for (int batch = 0; batch < 40; batch++) {
                long[] ticks = new long[50];
                int first = level;
                for (int i = 0; i < ticks.length; i++) {
                    ticks[i] = tick;
                    truth.add((tick - origin) + " 0 " + level);
                    tick += 200 + random.nextInt(30_000);
                    level ^= 1;
                }
                probe.edges(ticks, first);
            }
            long deadline = System.nanoTime() + 15_000_000_000L;
            while (sink.calls.size() < truth.size() && System.nanoTime() < deadline) {
                Thread.sleep(20);
            }
            assertThat(sink.calls).isEqualTo(truth);

            pair.unplug();
            deadline = System.nanoTime() + 15_000_000_000L;
            while (!session.state().isFinal() && System.nanoTime() < deadline) {
                Thread.sleep(20);
            }
            assertThat(session.state()).isEqualTo(SessionState.CLOSED);
            assertThat(troubles).contains(Trouble.DISCONNECT);
            assertThat(sink.calls.subList(0, truth.size())).isEqualTo(truth);
            assertThat(sink.calls.get(sink.calls.size() - 1)).endsWith(" 0 ?");
            assertThat(sink.ended).isTrue();
            assertThat(session.counters().crcErrors()).isZero();
        } finally {
            session.close();
            probeOut.close();
        }
    }
}
