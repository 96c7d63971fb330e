package org.rcbench.record;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.testing.RecordingSink;

/**
 * A recorder killed with SIGKILL ({@link Process#destroyForcibly()} on Linux) mid-capture leaves a
 * file that reads back, without an exception, with every edge up to its last flush.
 */
class RecorderCrashTest {

    @ParameterizedTest
    @ValueSource(strings = {"plain", "gzip"})
    void killedRecorderLeavesAReadableFileUpToItsLastFlush(String mode, @TempDir Path dir) throws Exception {
        Path file = dir.resolve("killed.rce");
        String java = System.getProperty("java.home") + File.separator + "bin" + File.separator + "java";
        Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                RecorderCrashMain.class.getName(), file.toString(), mode)
                .redirectError(ProcessBuilder.Redirect.INHERIT)
                .start();
        long flushedBeforeKill = 0;
        String paused = null;
        try (BufferedReader out = new BufferedReader(new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
            String line;
            while ((line = out.readLine()) != null && System.nanoTime() < deadline) {
                if (line.startsWith("paused")) {
                    paused = line;
                } else if (line.startsWith("flushed=")) {
                    flushedBeforeKill = Long.parseLong(line.substring("flushed=".length()));
                    if (paused != null && flushedBeforeKill >= RecorderCrashMain.PAUSE_AFTER + 100) {
                        break; // mid-capture: edges are still arriving
                    }
                }
            }
            child.destroyForcibly();
            assertThat(child.waitFor(30, TimeUnit.SECONDS)).isTrue();
        } finally {
            child.destroyForcibly();
        }
        assertThat(child.exitValue()).isEqualTo(137); // 128 + SIGKILL
        // While no edges came, the flusher still wrote out everything: the guarantee does not need new data.
        int n = RecorderCrashMain.PAUSE_AFTER;
        assertThat(paused).isEqualTo("paused written=" + n + " flushed=" + n);

        RecordingSink sink = new RecordingSink();
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(sink);
            for (String w : c.warnings()) {
                assertThat(w).matches(file + ":[0-9]+: (last line .* is cut short .*|the compressed data ends early .*)");
            }
        }
        assertThat((long) sink.edges.size()).isGreaterThanOrEqualTo(flushedBeforeKill);
        for (int i = 0; i < sink.edges.size(); i++) {
            assertThat(sink.edges.get(i)).isEqualTo(new RecordingSink.Edge(1000L * i, 0, i % 2));
        }
    }
}
