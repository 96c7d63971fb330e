package org.rcbench.gui.view;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.BenchSettings;
import org.rcbench.gui.ConnectionState;
import org.rcbench.gui.Formats;
import org.rcbench.gui.NominalExpectations;
import org.rcbench.gui.SafetyNotice;
import org.rcbench.gui.SharedSource;
import org.rcbench.probe.CalibrationStore;
import org.rcbench.probe.SessionConfig;
import org.rcbench.sim.ProbeOptions;
import org.rcbench.source.LiveSource;
import org.rcbench.source.SourceSpec;
import org.rcbench.gui.SourceChoice;
import org.rcbench.gui.TeeSource;
import org.rcbench.measure.Measurement;
import org.rcbench.sim.SimulationSpec;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** The bench window on Monocle's headless platform, driven with TestFX as a user would. */
@ExtendWith(ApplicationExtension.class)
class BenchWindowTest {
    private static final Path PIPER = Path.of("captures", "piper-mk2.toml");

    @TempDir
    static Path dir;

    private final AtomicReference<TeeSource> tee = new AtomicReference<>();
    private BenchModel model;
    private BenchWindow window;
    private Stage stage;

    @Start
    void start(Stage s) {
        stage = s;
        Design piper = DesignReader.read(PIPER);
        // A fixed seed and no warm-up: the simulated board, with every edge also fed to the test's meter.
        BenchServices services = BenchServices.standard()
                .withExpectations(new NominalExpectations())
                .withSources(choice -> {
                    // The simulated board on its simulated probe, through the real protocol and decoder.
                    SourceSpec spec = new SourceSpec.Simulated("piper", piper, Double.NaN,
                            SimulationSpec.defaults().withJitterSeconds(100e-9).withSeed(42), ProbeOptions.defaults());
                    TeeSource t = new TeeSource(new SharedSource(LiveSource.of(spec,
                            SessionConfig.defaults().withReconnectPollMillis(50), CalibrationStore.none())));
                    tee.set(t);
                    return t;
                });
        model = new BenchModel(services, BenchSettings.inMemory(true));
        window = new BenchWindow(model, dir, 1280, 800);
        window.show(s);
        s.requestFocus();
    }

    @AfterEach
    void close() throws Exception {
        WaitForAsyncUtils.asyncFx(() -> stage.hide()).get(10, TimeUnit.SECONDS);
    }

    private static void waitUntil(BooleanSupplier condition, long seconds) throws Exception {
        WaitForAsyncUtils.waitFor(seconds, TimeUnit.SECONDS, condition::getAsBoolean);
    }

    private static String text(FxRobot robot, String id) {
        return robot.lookup("#" + id).queryAs(Label.class).getText();
    }

    @Test
    void readingsOfTheSimulatedBoardAreTheCoresNumbersForTheSameEdges(FxRobot robot) throws Exception {
        robot.clickOn("#start-stop");
        waitUntil(() -> model.statusProperty().get().state() == ConnectionState.STREAMING, 10);
        waitUntil(() -> model.frameProperty().get() != null && model.frameProperty().get().measurement().cycles() > 600,
                10);
        robot.type(KeyCode.F5); // stop, by the shortcut
        waitUntil(() -> model.frameProperty().get().ended(), 10);
        WaitForAsyncUtils.sleep(BenchModel.READOUT_NANOS / 1_000_000 * 3, TimeUnit.MILLISECONDS);
        WaitForAsyncUtils.waitForFxEvents();

        assertThat(model.runningProperty().get()).isFalse();
        Measurement core = tee.get().meter().snapshot(256);
        assertThat(core.cycles()).isGreaterThan(600);
        assertThat(text(robot, "value-frequency_hz")).isEqualTo(Formats.value(TimingQuantity.FREQUENCY,
                core.rolling().frequencyHz()));
        assertThat(text(robot, "value-duty")).isEqualTo(Formats.value(TimingQuantity.DUTY, core.rolling().duty()));
        assertThat(text(robot, "value-high_s")).isEqualTo(Formats.value(TimingQuantity.HIGH,
                core.rolling().highSeconds()));
        assertThat(text(robot, "connection-state")).isEqualTo("ENDED");
        // The simulated board's design is the one compared with.
        assertThat(model.design().design().title()).isEqualTo("Piper Mk2");
    }

    @Test
    void typingAValueRepredictsTheExpectedReading(FxRobot robot) throws Exception {
        robot.clickOn("#start-stop");
        waitUntil(() -> model.design().expectation() != null, 10);
        TextField r2 = robot.lookup("#value-R2").queryAs(TextField.class);
        robot.doubleClickOn(r2).eraseText(r2.getText().length()).write("4k7");
        Design edited = DesignReader.read(PIPER).withValue("R2", 4700);
        double f = TimerModels.build(edited.circuit()).evaluateNominal().frequencyHz();
        String want = "expected " + Formats.shortValue(TimingQuantity.FREQUENCY, f);
        waitUntil(() -> model.readings().reading(TimingQuantity.FREQUENCY).expectedProperty().get().equals(want), 10);
        assertThat(model.design().titleProperty().get()).contains("(edited)");

        robot.write("x");
        waitUntil(() -> !model.design().problemProperty().get().isEmpty(), 5);
        assertThat(text(robot, "design-problem")).startsWith("R2 value: ");
        assertThat(model.design().design().part("R2").value()).isEqualTo(4700);
    }

    @Test
    void aBadDesignShowsItsErrorWhileTheSessionRuns(FxRobot robot) throws Exception {
        Path bad = dir.resolve("broken.toml");
        Files.writeString(bad, Files.readString(PIPER).replace("value = \"100n\"", "value = \"100q\""));
        robot.clickOn("#start-stop");
        waitUntil(() -> model.frameProperty().get() != null, 10);
        WaitForAsyncUtils.asyncFx(() -> model.loadDesign(bad)).get(5, TimeUnit.SECONDS);
        WaitForAsyncUtils.waitForFxEvents();
        assertThat(text(robot, "design-problem")).contains("broken.toml").contains("parts.C1.value");
        long serial = model.frameProperty().get().serial();
        waitUntil(() -> model.frameProperty().get().serial() > serial + 3, 10);
        assertThat(text(robot, "connection-state")).isEqualTo("STREAMING");
        assertThat(model.design().design().title()).isEqualTo("Piper Mk2");
    }

    @Test
    void recordingByShortcutWritesACaptureThatReadsBack(FxRobot robot) throws Exception {
        robot.clickOn("#start-stop");
        waitUntil(() -> model.frameProperty().get() != null, 10);
        robot.type(KeyCode.F6);
        waitUntil(() -> model.recordingProperty().get(), 5);
        waitUntil(() -> text(robot, "recording").startsWith("● REC rcbench-"), 5);
        assertThat(robot.lookup("#recording").queryAs(Label.class).isVisible()).isTrue();
        assertThat(stage.getTitle()).startsWith("● REC");
        WaitForAsyncUtils.sleep(700, TimeUnit.MILLISECONDS);
        robot.type(KeyCode.F6);
        waitUntil(() -> !model.recordingProperty().get(), 5);
        Path file = model.lastRecording();
        assertThat(file.getParent()).isEqualTo(dir);
        try (Capture c = CaptureFiles.open(file)) {
            assertThat(c.channels()).containsEntry(0, "output");
            long[] edges = new long[1];
            c.streamTo((tick, channel, level) -> edges[0]++);
            // 700 ms of a 679 Hz board: about 950 edges; at least a few hundred whatever the timing.
            assertThat(edges[0]).isGreaterThan(300);
        }
    }

    @Test
    void aPictureOfTheWindowIsSavedByShortcut(FxRobot robot) throws Exception {
        robot.type(KeyCode.F8);
        waitUntil(() -> model.messageProperty().get().startsWith("picture saved to "), 10);
        Path png = Path.of(model.messageProperty().get().substring("picture saved to ".length()));
        var image = javax.imageio.ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(1280);
        assertThat(image.getHeight()).isEqualTo(800);
    }

    @Test
    void thePartPickerTakesACandidateIntoTheDesign(FxRobot robot) throws Exception {
        WaitForAsyncUtils.asyncFx(() -> model.loadDesign(PIPER)).get(5, TimeUnit.SECONDS);
        robot.clickOn("#find-parts");
        waitUntil(() -> robot.lookup("#picker").tryQuery().isPresent(), 5);
        robot.clickOn("#pick-frequency").write("1 kHz");
        robot.clickOn("#pick-duty").write("60 %");
        robot.clickOn("#pick-find");
        waitUntil(() -> !model.picker().options().isEmpty(), 30);
        var first = model.picker().options().get(0);
        // The list's cells are laid out on a later pulse than the model's options arrive.
        waitUntil(() -> robot.lookup("#pick-options .list-cell").tryQuery()
                .map(n -> ((javafx.scene.control.ListCell<?>) n).getItem() != null).orElse(false), 10);
        robot.clickOn(robot.lookup("#pick-options .list-cell").nth(0).queryAs(javafx.scene.Node.class));
        robot.clickOn("#pick-use");
        waitUntil(() -> model.design().titleProperty().get().contains("(edited)"), 5);
        Design picked = first.candidate().design();
        assertThat(model.design().design().part("C1").value()).isEqualTo(picked.part("C1").value());
        assertThat(robot.lookup("#value-C1").queryAs(TextField.class).getText()).isNotEmpty();
        robot.clickOn("Close");
    }

    @Test
    void theHelpMenuShowsTheSafetyNotice(FxRobot robot) throws Exception {
        robot.clickOn("Help").clickOn("Safety notice");
        waitUntil(() -> robot.lookup("#safety-notice").tryQuery().isPresent(), 5);
        List<String> texts = robot.lookup("#safety-notice .label").queryAllAs(Label.class).stream()
                .map(Label::getText).toList();
        assertThat(String.join(" ", texts)).contains("The probe's ground is your computer's ground")
                .contains("transformerless").contains("hold a charge").contains("licensed practice");
        robot.clickOn("I have read this");
        waitUntil(() -> robot.lookup("#safety-notice").tryQuery().isEmpty(), 5);
        assertThat(SafetyNotice.PARAGRAPHS).hasSize(5);
    }
}
