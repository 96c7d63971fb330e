package org.rcbench.gui.view;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.BenchSettings;
import org.rcbench.gui.ConnectionState;
import org.rcbench.gui.HistoryCheckSaver;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.RunRecord;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The suspects panel on the simulated Piper Mk2 (through its simulated probe): a fault typed in the
 * source strip moves the suspect list, and a check is saved to the history.
 */
@ExtendWith(ApplicationExtension.class)
class DiagnosisWindowTest {
    @TempDir
    static Path dir;

    private BenchModel model;
    private Stage stage;

    @Start
    void start(Stage s) {
        stage = s;
        BenchServices services = BenchServices.standard().withChecks(new HistoryCheckSaver(dir.resolve("history.db")));
        model = new BenchModel(services, BenchSettings.inMemory(true));
        new BenchWindow(model, dir, 1280, 800).show(s);
        s.requestFocus();
    }

    @AfterEach
    void close() throws Exception {
        WaitForAsyncUtils.asyncFx(() -> stage.hide()).get(10, TimeUnit.SECONDS);
    }

    private String firstSuspect(FxRobot robot) {
        VBox list = robot.lookup("#suspects").queryAs(VBox.class);
        return list.getChildren().isEmpty() ? "" : ((Label) list.getChildren().get(0)).getText();
    }

    private void runWithFault(FxRobot robot, String fault) throws Exception {
        TextField f = robot.lookup("#source-fault").queryAs(TextField.class);
        WaitForAsyncUtils.asyncFx(() -> f.setText(fault)).get(5, TimeUnit.SECONDS);
        robot.clickOn("#start-stop");
        WaitForAsyncUtils.waitFor(15, TimeUnit.SECONDS,
                () -> model.statusProperty().get().state() == ConnectionState.STREAMING);
    }

    @Test
    void aFaultTypedInTheSourceStripMovesTheSuspects(FxRobot robot) throws Exception {
        runWithFault(robot, "C1=-30%");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> firstSuspect(robot).startsWith("1. C1  "));
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).startsWith("C1 at ");

        robot.clickOn("#start-stop"); // stop
        WaitForAsyncUtils.waitFor(10, TimeUnit.SECONDS, () -> !model.runningProperty().get());
        runWithFault(robot, "R2=+45%");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> firstSuspect(robot).startsWith("1. R2  "));
        assertThat(robot.lookup("#verdict").queryAs(Label.class).getText()).startsWith("R2 at ");
    }

    @Test
    void aCheckIsSavedToTheHistoryWithItsVerdictAndSuspects(FxRobot robot) throws Exception {
        runWithFault(robot, "C1=-30%");
        WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, () -> firstSuspect(robot).startsWith("1. C1  "));
        robot.type(KeyCode.F6);
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, () -> model.recordingProperty().get());
        WaitForAsyncUtils.sleep(500, TimeUnit.MILLISECONDS);
        robot.type(KeyCode.F6);
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, () -> !model.recordingProperty().get());
        robot.clickOn("#save-check");
        WaitForAsyncUtils.waitFor(30, TimeUnit.SECONDS, () -> model.messageProperty().get().startsWith("check saved"));
        assertThat(model.messageProperty().get()).startsWith("check saved as run 1 in ").endsWith(": fail");
        try (HistoryStore store = HistoryStore.open(dir.resolve("history.db"))) {
            RunRecord run = store.run(1).orElseThrow();
            assertThat(run.context().board()).isEqualTo("Piper Mk2");
            assertThat(run.content().verdict()).isEqualTo("fail");
            assertThat(run.content().suspects().get(0).part()).isEqualTo("C1");
            assertThat(run.context().capture().path()).isEqualTo(model.lastRecording().toString());
            assertThat(run.context().probe().probeId()).isEqualTo(model.statusProperty().get().probeId());
        }
    }
}
