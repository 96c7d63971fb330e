package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.edge.EdgeSink;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MeterConfig;

/** The window's model driven from the test thread, as the animation timer drives it; no window. */
class BenchModelTest {
    @TempDir
    Path dir;

    private BenchModel model;

    @AfterEach
    void close() {
        if (model != null) {
            model.close();
        }
    }

    private BenchModel newModel() {
        BenchServices services = BenchServices.standard().withExpectations(new NominalExpectations())
                .withWorker(Runnable::run);
        model = new BenchModel(services, BenchSettings.inMemory(true), 5_000_000L);
        return model;
    }

    /** The core's numbers for a whole capture, computed without the window's pipeline. */
    private static Measurement coreSnapshot(Path file, int rolling) throws IOException {
        try (Capture c = CaptureFiles.open(file)) {
            CycleMeter meter = new CycleMeter(MeterConfig.of(0, c.timebase()));
            c.streamTo(meter);
            return meter.snapshot(rolling);
        }
    }

    private void runToEnd(Path file) throws InterruptedException {
        model.choose(SourceChoice.file(file.toString()).withFast(true));
        model.start();
        assertThat(ModelDriver.pollUntil(model, () -> model.frameProperty().get() != null
                && model.frameProperty().get().ended(), Duration.ofSeconds(20))).isTrue();
        ModelDriver.settleReadouts(model);
    }

    @Test
    void replayedCaptureReadsWhatTheCoreMeasuresOverTheSameEdges() throws Exception {
        Path file = TestCaptures.astable(dir.resolve("a.rce"), 3000, 23188.4, 0.523, 2.5, 0, 11);
        newModel();
        runToEnd(file);
        Measurement core = coreSnapshot(file, 256);

        Reading f = model.readings().reading(TimingQuantity.FREQUENCY);
        assertThat(f.measured()).isEqualTo(core.rolling().frequencyHz());
        assertThat(f.valueProperty().get()).isEqualTo(Formats.value(TimingQuantity.FREQUENCY,
                core.rolling().frequencyHz()));
        assertThat(model.readings().reading(TimingQuantity.DUTY).measured()).isEqualTo(core.rolling().duty());
        assertThat(model.readings().reading(TimingQuantity.HIGH).measured()).isEqualTo(core.rolling().highSeconds());
        assertThat(model.readings().reading(TimingQuantity.LOW).measured()).isEqualTo(core.rolling().lowSeconds());
        assertThat(f.detailProperty().get()).isEqualTo("last 256 cycles");

        model.setAveraging(ReadingsModel.WHOLE_RUN);
        ModelDriver.settleReadouts(model);
        assertThat(f.measured()).isEqualTo(core.frequency().frequencyHz());
        assertThat(model.readings().reading(TimingQuantity.PERIOD).measured()).isEqualTo(core.period().meanSeconds());
        assertThat(f.detailProperty().get()).startsWith("± ").endsWith(core.cycles() + " cycles");
        assertThat(model.statusProperty().get().state()).isEqualTo(ConnectionState.ENDED);
        assertThat(model.runningProperty().get()).isFalse();
    }

    @Test
    void aDriftingSignalReadsAsSettlingAndASteadyOneDoesNot() throws Exception {
        Path drifting = TestCaptures.astable(dir.resolve("drift.rce"), 3000, 23188.4, 0.5, 2.5, 2e-5, 3);
        Path steady = TestCaptures.astable(dir.resolve("steady.rce"), 3000, 23188.4, 0.5, 2.5, 0, 3);
        newModel();
        runToEnd(drifting);
        assertThat(model.readings().reading(TimingQuantity.FREQUENCY).stateProperty().get())
                .isEqualTo(ReadingState.SETTLING);
        model.close();
        newModel();
        runToEnd(steady);
        assertThat(model.readings().reading(TimingQuantity.FREQUENCY).stateProperty().get())
                .isEqualTo(ReadingState.UNPREDICTED);
    }

    @Test
    void aBadDesignShowsItsProblemAndTheSessionKeepsRunning() throws Exception {
        Path file = TestCaptures.astable(dir.resolve("long.rce"), 20000, 23188.4, 0.5, 2.5, 0, 5);
        Path bad = dir.resolve("bad.toml");
        Files.writeString(bad, Files.readString(Path.of("captures/piper-mk2.toml")).replace("role = \"charge\"",
                "role = \"chrage\""));
        newModel();
        model.loadDesign(Path.of("captures/piper-mk2.toml"));
        var good = model.design().design();
        model.choose(SourceChoice.file(file.toString()));
        model.start();
        assertThat(ModelDriver.pollUntil(model, () -> model.frameProperty().get() != null, Duration.ofSeconds(10)))
                .isTrue();
        long before = model.frameProperty().get().serial();

        model.loadDesign(bad);

        assertThat(model.design().problemProperty().get()).contains("bad.toml").contains("parts.R1.role")
                .contains("chrage");
        assertThat(model.messageProperty().get()).contains("design not loaded");
        assertThat(model.design().design()).isSameAs(good);
        assertThat(ModelDriver.pollUntil(model, () -> model.frameProperty().get().serial() > before + 2,
                Duration.ofSeconds(5))).isTrue();
        assertThat(model.runningProperty().get()).isTrue();
        assertThat(model.statusProperty().get().state()).isEqualTo(ConnectionState.STREAMING);
    }

    @Test
    void recordingWritesTheEdgesAsTheyArriveToAReadableCapture() throws Exception {
        Path file = TestCaptures.astable(dir.resolve("src.rce"), 2000, 23188.4, 0.5, 2.5, 0, 7);
        Path out = dir.resolve("rec.rce");
        newModel();
        model.choose(SourceChoice.file(file.toString()));
        model.start();
        assertThat(ModelDriver.pollUntil(model, () -> model.frameProperty().get() != null, Duration.ofSeconds(10)))
                .isTrue();
        model.startRecording(out);
        assertThat(model.recordingProperty().get()).isTrue();
        ModelDriver.pollUntil(model, () -> false, Duration.ofMillis(800));
        assertThat(model.recordingTextProperty().get()).startsWith("REC rec.rce — ").endsWith(" edges");
        model.stopRecording();
        assertThat(model.recordingProperty().get()).isFalse();
        assertThat(model.messageProperty().get()).startsWith("recorded ").endsWith(" edges to " + out);

        List<long[]> source = edges(file);
        List<long[]> recorded = edges(out);
        assertThat(recorded.size()).isGreaterThan(500);
        int first = indexOfTick(source, recorded.get(0)[0]);
        for (int i = 0; i < recorded.size(); i++) {
            assertThat(recorded.get(i)).containsExactly(source.get(first + i));
        }
        try (Capture c = CaptureFiles.open(out)) {
            assertThat(c.timebase().clockHz()).isEqualTo(TestCaptures.CLOCK_HZ);
            assertThat(c.channels()).containsEntry(0, "out");
        }
    }

    @Test
    void aPortThatIsNotThereFailsWithTheReason() throws Exception {
        newModel();
        model.choose(SourceChoice.port(dir.resolve("ttyNOPE").toString()));
        model.start();
        assertThat(ModelDriver.pollUntil(model, () -> model.statusProperty().get().state() == ConnectionState.FAILED,
                Duration.ofSeconds(10))).isTrue();
        assertThat(model.statusProperty().get().line()).contains("ttyNOPE").contains("no such port");
        assertThat(model.messageProperty().get()).isEmpty();
        assertThat(model.runningProperty().get()).isFalse();
    }

    private static List<long[]> edges(Path file) throws IOException {
        List<long[]> out = new ArrayList<>();
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(new EdgeSink() {
                @Override
                public void onEdge(long tick, int channel, int level) {
                    out.add(new long[] {tick, channel, level});
                }
            });
        }
        return out;
    }

    private static int indexOfTick(List<long[]> edges, long tick) {
        for (int i = 0; i < edges.size(); i++) {
            if (edges.get(i)[0] == tick) {
                return i;
            }
        }
        throw new AssertionError("tick " + tick + " not in the source");
    }
}
