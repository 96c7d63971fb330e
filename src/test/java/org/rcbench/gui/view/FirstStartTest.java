package org.rcbench.gui.view;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.BenchSettings;
import org.rcbench.gui.SourceChoice;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/** On first start the window shows the safety notice, and remembers once it has been read. */
@ExtendWith(ApplicationExtension.class)
class FirstStartTest {
    @TempDir
    static Path dir;

    private final BenchSettings settings = BenchSettings.inMemory(false);
    private BenchModel model;

    @Start
    void start(Stage stage) {
        model = new BenchModel(BenchServices.standard(), settings);
        new BenchWindow(model, dir, 1280, 800).show(stage);
        stage.requestFocus();
    }

    @Test
    void theSafetyNoticeComesFirstAndIsRememberedOnceRead(FxRobot robot) throws Exception {
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, () -> robot.lookup("#safety-notice").tryQuery().isPresent());
        assertThat(model.safetyNoticeDueProperty().get()).isTrue();
        assertThat(model.choiceProperty().get().kind()).isEqualTo(SourceChoice.Kind.SIMULATED);
        robot.clickOn("I have read this");
        WaitForAsyncUtils.waitFor(5, TimeUnit.SECONDS, () -> robot.lookup("#safety-notice").tryQuery().isEmpty());
        assertThat(settings.safetyNoticeAccepted()).isTrue();
        assertThat(model.safetyNoticeDueProperty().get()).isFalse();
    }
}
