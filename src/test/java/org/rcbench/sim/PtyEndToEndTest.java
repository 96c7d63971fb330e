package org.rcbench.sim;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.FileInputStream;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.cli.ExitCodes;
import org.rcbench.design.Design;
import org.rcbench.probe.ByteTransport;
import org.rcbench.source.DemoDesigns;
import org.rcbench.testing.CliRun;
import org.rcbench.testing.PtyPair;
import org.rcbench.testing.RecordingSink;

/**
 * The whole chain through a real pseudo-terminal pair made by socat: the simulated probe (its bytes
 * pumped onto one pty end) is a probe emulator; {@code rcbench record --port} reads the other end
 * through jSerialComm, then {@code rcbench measure} reads the file. Killing socat pulls the cable.
 */
class PtyEndToEndTest {
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

    /** Copies bytes both ways between the simulated probe's port and a pty end until either side ends. */
    static void bridge(ByteTransport probeSide, InputStream ptyIn, OutputStream ptyOut) {
        Thread toPty = new Thread(() -> {
            byte[] buf = new byte[4096];
            try {
                for (int n; (n = probeSide.read(buf, 0, buf.length, 100)) >= 0; ) {
                    if (n > 0) {
                        ptyOut.write(buf, 0, n);
                        ptyOut.flush();
                    }
                }
            } catch (IOException e) {
                // socat is gone
            }
        }, "pty bridge out");
        Thread fromPty = new Thread(() -> {
            byte[] buf = new byte[256];
            try {
                for (int n; (n = ptyIn.read(buf)) >= 0; ) {
                    probeSide.write(buf, 0, n);
                }
            } catch (IOException e) {
                // socat is gone
            }
        }, "pty bridge in");
        toPty.setDaemon(true);
        fromPty.setDaemon(true);
        toPty.start();
        fromPty.start();
    }

    static int edgesIn(Path file) {
        RecordingSink sink = new RecordingSink();
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(sink);
        } catch (Exception e) {
            return 0; // not written far enough yet
        }
        return sink.edges.size();
    }

    @Test
    void recordsAndMeasuresThroughARealPtyAndReportsTheCableBeingPulled(@TempDir Path dir) throws Exception {
        Path[] pty = ptyPair(dir);
        Design piper = DemoDesigns.resolve("demo:piper-mk2");
        SimulationSpec spec = SimulationSpec.defaults().withDeviation(Deviation.parse("C1=-25%")).withSeed(2);
        SimulatedProbe probe = new SimulatedProbe(VirtualBoard.of(piper, spec), ProbeOptions.defaults());
        probe.start();
        FileOutputStream ptyOut = new FileOutputStream(pty[0].toFile());
        FileInputStream ptyIn = new FileInputStream(pty[0].toFile());
        bridge(probe.port().open(), ptyIn, ptyOut);

        Path file = dir.resolve("bench.rce");
        AtomicInteger edgesAtKill = new AtomicInteger(-1);
        Thread puller = new Thread(() -> {
            try {
                while (edgesIn(file) < 1500) {
                    Thread.sleep(50);
                }
                edgesAtKill.set(edgesIn(file));
                pair.unplug();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
        puller.setDaemon(true);
        puller.start();
        CliRun rec;
        try {
            rec = CliRun.of("record", "--port", pty[1].toString(), "--probe-type", "stream", "--duration", "5s",
                    "--plain", "-o", file.toString(), "--db", dir.resolve("history.db").toString());
        } finally {
            probe.close();
            ptyOut.close();
        }
        assertThat(rec.exitCode()).as(rec.err()).isEqualTo(ExitCodes.OK);
        assertThat(rec.err()).contains(pty[1] + " disconnected; the ").contains(" edges recorded so far are safe in "
                + file);
        assertThat(rec.err()).contains("warning: the probe was still disconnected when the recording ended");

        // The recording so far is intact: exactly the board's edges, then the gap of the pulled cable.
        RecordingSink got = new RecordingSink();
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(got);
            assertThat(c.warnings()).isEmpty();
        }
        RecordingSink truth = new RecordingSink();
        VirtualBoard.of(piper, spec).runFor(30, truth);
        long first = truth.edges.get(0).tick();
        int known = 0;
        for (RecordingSink.Edge e : got.edges) {
            if (e.level() == org.rcbench.edge.EdgeSink.UNKNOWN) {
                continue;
            }
            RecordingSink.Edge t = truth.edges.get(known++);
            assertThat(e).isEqualTo(new RecordingSink.Edge(t.tick() - first, t.channel(), t.level()));
        }
        assertThat(known).isGreaterThanOrEqualTo(edgesAtKill.get()).isGreaterThanOrEqualTo(1500);
        assertThat(got.edges.get(got.edges.size() - 1).level()).isEqualTo(org.rcbench.edge.EdgeSink.UNKNOWN);

        CliRun m = CliRun.of("measure", "--json", file.toString());
        assertThat(m.exitCode()).as(m.err()).isZero();
        double f = new ObjectMapper().readTree(m.out()).get("frequency_hz").asDouble();
        double expected = VirtualBoard.of(piper, spec).predicted().frequencyHz();
        assertThat(f).isCloseTo(expected, within(expected * 1e-6));
    }

    @Test
    void whileNoProbeAnswersWatchShowsItsWaitingAndThenSaysWhy(@TempDir Path dir) throws Exception {
        Path[] pty = ptyPair(dir);
        CliRun r = CliRun.of("watch", "--port", pty[1].toString(), "--probe-type", "stream", "--plain", "--db",
                dir.resolve("history.db").toString());
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.out()).contains("waiting for the probe's hello on " + pty[1]);
        assertThat(r.err()).startsWith("rcbench: " + pty[1] + " (/dev/pts/").contains("): no hello from the probe after 3.0 s (nothing received)");
        assertThat(r.err().lines()).hasSize(1);
    }
}
