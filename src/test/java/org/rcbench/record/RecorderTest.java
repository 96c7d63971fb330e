package org.rcbench.record;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayOutputStream;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.testing.RecordingSink;

class RecorderTest {
    static final Map<String, String> HEADER = EdgeCaptureFormat.header(Timebase.of(16e6), Map.of(0, "output"));
    /** Long enough that only an explicit or event-driven flush can explain bytes in the file. */
    static final RecorderOptions SLOW = RecorderOptions.defaults().withFlushIntervalMillis(1000);

    @Test
    void recordsAFileThatReadsBackWithItsEnd(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("r.rce");
        try (Recorder r = Recorder.create(file, HEADER, RecorderOptions.defaults())) {
            r.onEdge(100, 0, EdgeSink.HIGH);
            r.onEdge(200, 0, EdgeSink.LOW);
            r.onEnd(250);
            assertThat(r.edgesFlushed()).isEqualTo(2);
        }
        RecordingSink sink = read(file);
        assertThat(sink.edges).extracting(Object::toString).containsExactly("100,0,1", "200,0,0");
        assertThat(sink.endTick).isEqualTo(250);
    }

    @Test
    void gzipRecordingReadsBack(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("r.rce.gz");
        try (Recorder r = Recorder.create(file, HEADER, RecorderOptions.defaults().withGzip(true))) {
            for (int i = 0; i < 1000; i++) {
                r.onEdge(i * 100L, 0, i % 2);
            }
        }
        assertThat(Files.readAllBytes(file)[0] & 0xff).isEqualTo(0x1f);
        assertThat(read(file).edges).hasSize(1000);
    }

    @Test
    void anExistingFileIsNeverReplacedUnlessAsked(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("old.rce");
        Files.writeString(file, "earlier recording");
        assertThatThrownBy(() -> Recorder.create(file, HEADER, RecorderOptions.defaults()))
                .isInstanceOf(BadInputException.class)
                .hasMessage(file + ": already exists; choose another name or allow overwriting");
        assertThat(Files.readString(file)).isEqualTo("earlier recording");
        Recorder.create(file, HEADER, RecorderOptions.defaults().withOverwrite(true)).close();
        assertThat(Files.readString(file)).startsWith(EdgeCaptureFormat.MAGIC);
    }

    @Test
    void aMissingFolderIsABadInput(@TempDir Path dir) {
        Path file = dir.resolve("no/such/r.rce");
        assertThatThrownBy(() -> Recorder.create(file, HEADER, RecorderOptions.defaults()))
                .isInstanceOf(BadInputException.class).hasMessageStartingWith(file + ": cannot create the file");
    }

    @Test
    void edgesReachTheFileWithinTheIntervalWithNoFurtherCalls(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("idle.rce");
        try (Recorder r = Recorder.create(file, HEADER, RecorderOptions.defaults().withFlushIntervalMillis(50))) {
            r.onEdge(1, 0, 1);
            r.onEdge(2, 0, 0);
            // No flush, no more edges: only the background flusher can write them. Wait up to 10 s.
            long deadline = System.nanoTime() + 10_000_000_000L;
            while (!Files.readString(file).endsWith("2,0,0\n") && System.nanoTime() < deadline) {
                Thread.sleep(10);
            }
            assertThat(Files.readString(file)).endsWith("1,0,1\n2,0,0\n");
            assertThat(r.edgesFlushed()).isEqualTo(2);
        }
    }

    @Test
    void aGapIsFlushedAtOnce(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("gap.rce");
        try (Recorder r = Recorder.create(file, HEADER, SLOW)) {
            r.onEdge(1, 0, 1);
            r.onEdge(5, 0, EdgeSink.UNKNOWN);
            assertThat(Files.readString(file)).endsWith("tick,channel,level\n1,0,1\n5,0,x\n");
        }
    }

    @Test
    void aFullDiskIsReportedNamingTheFile() {
        Path full = Path.of("/dev/full");
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.isWritable(full), "no /dev/full on this system");
        Recorder r = Recorder.create(full, HEADER, SLOW.withOverwrite(true));
        r.onEdge(1, 0, 1);
        assertThatThrownBy(r::flush)
                .isInstanceOf(BadInputException.class)
                .hasMessageStartingWith("/dev/full: cannot write the capture (No space left on device)");
        assertThatThrownBy(() -> r.onEdge(2, 0, 0)).isInstanceOf(BadInputException.class);
        r.close(); // closing after a failure does not throw again
    }

    @Test
    void aFailedWriteKeepsWhatWasAlreadyWritten() throws IOException {
        ByteArrayOutputStream kept = new ByteArrayOutputStream();
        FailingStream out = new FailingStream(kept);
        Recorder r = Recorder.to(out, "stick.rce", HEADER, SLOW);
        r.onEdge(10, 0, 1);
        r.onEdge(20, 0, 0);
        r.flush();
        out.failing = true;
        r.onEdge(30, 0, 1);
        assertThatThrownBy(r::flush)
                .isInstanceOf(BadInputException.class)
                .hasMessage("stick.rce: cannot write the capture (device removed); the file keeps the 2 edges"
                        + " flushed before the failure");
        r.close();
        String text = kept.toString(StandardCharsets.UTF_8);
        assertThat(text).endsWith("tick,channel,level\n10,0,1\n20,0,0\n");
        try (Capture c = CaptureFiles.open(new java.io.ByteArrayInputStream(kept.toByteArray()), "stick.rce")) {
            RecordingSink sink = new RecordingSink();
            c.streamTo(sink);
            assertThat(sink.edges).hasSize(2);
        }
    }

    @Test
    void aBackgroundFailureSurfacesOnTheNextCall() throws Exception {
        FailingStream out = new FailingStream(new ByteArrayOutputStream());
        Recorder r = Recorder.to(out, "bg.rce", HEADER, RecorderOptions.defaults().withFlushIntervalMillis(5));
        r.onEdge(1, 0, 1);
        out.failing = true; // the flusher, not this thread, meets the failure
        long deadline = System.nanoTime() + 10_000_000_000L;
        while (out.attempts == 0 && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        Thread.sleep(20);
        assertThatThrownBy(() -> r.onEdge(2, 0, 0)).isInstanceOf(BadInputException.class)
                .hasMessageStartingWith("bg.rce: cannot write the capture (device removed)");
        r.close();
    }

    @Test
    void callsAfterEndAreRefused(@TempDir Path dir) {
        Recorder r = Recorder.create(dir.resolve("e.rce"), HEADER, SLOW);
        r.onEnd(0);
        assertThatThrownBy(() -> r.onEdge(1, 0, 1)).isInstanceOf(IllegalStateException.class);
        r.close();
    }

    private static RecordingSink read(Path file) throws IOException {
        try (Capture c = CaptureFiles.open(file)) {
            RecordingSink sink = new RecordingSink();
            c.streamTo(sink);
            assertThat(c.warnings()).isEqualTo(List.of());
            return sink;
        }
    }

    /** Passes bytes through until told to fail, like a USB stick pulled out. */
    static final class FailingStream extends FilterOutputStream {
        volatile boolean failing;
        volatile int attempts;

        FailingStream(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            if (failing) {
                attempts++;
                throw new IOException("device removed");
            }
            out.write(b, off, len);
        }
    }
}
