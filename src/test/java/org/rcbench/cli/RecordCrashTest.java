package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;
import org.rcbench.source.DemoDesigns;
import org.rcbench.testing.RecordingSink;

/**
 * {@code rcbench record} as a child process on the simulated board in real time, stopped the hard
 * way: SIGKILL ({@link Process#destroyForcibly()} on Linux) leaves a file that reads back up to its
 * last flush; SIGTERM (what Ctrl-C's SIGINT also does: the shutdown hook runs) closes it cleanly with
 * its end trailer. Either way the edges are exactly the simulated board's.
 */
class RecordCrashTest {

    static Process record(Path file, Path dir) throws Exception {
        String java = System.getProperty("java.home") + File.separator + "bin" + File.separator + "java";
        return new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"), Main.class.getName(), "record",
                "--sim", "demo:piper-mk2", "--jitter", "1us", "--seed", "4", "-o", file.toString(), "--db",
                dir.resolve("history.db").toString())
                .redirectErrorStream(true).redirectOutput(dir.resolve("child.log").toFile()).start();
    }

    /** Reads what the file holds now (it may end in a line being written). */
    static RecordingSink readNow(Path file) throws Exception {
        RecordingSink sink = new RecordingSink();
        if (!Files.exists(file)) {
            return sink;
        }
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(sink);
        } catch (org.rcbench.common.BadInputException e) {
            // The header itself is not complete yet.
        }
        return sink;
    }

    static int waitForEdges(Path file, int n, Process child) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (true) {
            int have = readNow(file).edges.size();
            if (have >= n) {
                return have;
            }
            assertThat(child.isAlive()).as("the recorder runs").isTrue();
            assertThat(System.nanoTime()).as("edges arrive").isLessThan(deadline);
            Thread.sleep(50);
        }
    }

    static void assertTheBoardsEdges(List<RecordingSink.Edge> got) {
        RecordingSink truth = new RecordingSink();
        SimulationSpec spec = SimulationSpec.defaults().withJitterSeconds(1e-6).withSeed(4);
        VirtualBoard.of(DemoDesigns.resolve("demo:piper-mk2"), spec).runFor(60, truth);
        long first = truth.edges.get(0).tick();
        for (int i = 0; i < got.size(); i++) {
            RecordingSink.Edge t = truth.edges.get(i);
            assertThat(got.get(i)).isEqualTo(new RecordingSink.Edge(t.tick() - first, t.channel(), t.level()));
        }
    }

    @Test
    void aRecorderKilledMidCaptureLeavesAFileThatReadsBackUpToItsLastFlush(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("killed.rce");
        Process child = record(file, dir);
        int seen;
        try {
            seen = waitForEdges(file, 2000, child);
            child.destroyForcibly();
            assertThat(child.waitFor(30, TimeUnit.SECONDS)).isTrue();
        } finally {
            child.destroyForcibly();
        }
        assertThat(child.exitValue()).isEqualTo(137); // 128 + SIGKILL
        RecordingSink got = new RecordingSink();
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(got);
            for (String w : c.warnings()) {
                assertThat(w).matches(file + ":[0-9]+: last line .* is cut short .*");
            }
        }
        assertThat(got.edges.size()).isGreaterThanOrEqualTo(seen);
        assertTheBoardsEdges(got.edges);
    }

    @Test
    void aRecorderAskedToStopClosesTheFileCleanly(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("stopped.rce");
        Process child = record(file, dir);
        try {
            waitForEdges(file, 1500, child);
            child.destroy(); // SIGTERM: the shutdown hook closes the recording
            assertThat(child.waitFor(30, TimeUnit.SECONDS)).isTrue();
        } finally {
            child.destroyForcibly();
        }
        String text = Files.readString(file);
        assertThat(text).as(Files.readString(dir.resolve("child.log"))).contains("# end_tick=");
        RecordingSink got = new RecordingSink();
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(got);
            assertThat(c.warnings()).isEmpty();
        }
        assertThat(got.edges.size()).isGreaterThanOrEqualTo(1500);
        assertTheBoardsEdges(got.edges);
    }
}
