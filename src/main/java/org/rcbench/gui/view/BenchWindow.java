package org.rcbench.gui.view;

import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Scene;
import javafx.scene.control.Alert;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.RadioMenuItem;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.stage.Stage;
import org.rcbench.common.BadInputException;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.ReadingsModel;

/**
 * The bench window: menus and shortcuts, the source strip, the design on the left, the readings and
 * plots in the middle, the suspects and trimmer guide on the right, messages at the bottom. Builds
 * the scene and the frame loop; all state lives in the model.
 */
public final class BenchWindow {
    /** Start or stop the source. */
    public static final KeyCodeCombination START_STOP = new KeyCodeCombination(KeyCode.F5);
    /** Start or stop recording. */
    public static final KeyCodeCombination RECORD = new KeyCodeCombination(KeyCode.F6);
    /** Save a picture of the window. */
    public static final KeyCodeCombination PICTURE = new KeyCodeCombination(KeyCode.F8);

    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss", Locale.ROOT);

    private final BenchModel model;
    private final Path folder;
    private final Scene scene;
    private final FrameLoop loop;
    private final SourceBar sourceBar;

    /**
     * @param folder where recordings and pictures started by shortcut are saved
     */
    public BenchWindow(BenchModel model, Path folder, double width, double height) {
        this.model = model;
        this.folder = folder;
        this.loop = new FrameLoop(model);
        this.sourceBar = new SourceBar(model);

        // The readings run across the whole width, large, right under the source strip; the design
        // sits left of the plots, the suspects and the trimmer guide right of them.
        ScrollPane left = scroll(new DesignPane(model));
        VBox right = new VBox(new SuspectsPane(model), new TuningPane(model));
        right.setPrefWidth(290);
        PlotsPane plots = new PlotsPane(model);

        BorderPane root = new BorderPane();
        root.setId("bench-window");
        root.getStyleClass().add("bench-window");
        root.setTop(new VBox(menus(), sourceBar, new ReadingsPane(model)));
        root.setLeft(left);
        root.setCenter(plots);
        root.setRight(scroll(right));
        root.setBottom(statusLine());
        scene = new Scene(root, width, height);
        scene.getStylesheets().add(BenchWindow.class.getResource("bench.css").toExternalForm());
    }

    public Scene scene() {
        return scene;
    }

    public FrameLoop frameLoop() {
        return loop;
    }

    /** Puts the window on {@code stage}, starts the frame loop and shows the safety notice when due. */
    public void show(Stage stage) {
        stage.setScene(scene);
        stage.titleProperty().bind(Bindings.when(model.recordingProperty()).then("● REC — rcbench bench window")
                .otherwise(Bindings.concat("rcbench bench window — ", model.design().titleProperty())));
        stage.setOnHidden(e -> {
            loop.stop();
            model.close();
        });
        stage.show();
        loop.start();
        if (model.safetyNoticeDueProperty().get()) {
            SafetyDialog.show(stage, model);
        }
    }

    /** F5: start with what the source strip says, or stop. */
    public void startOrStop() {
        sourceBar.toggle();
    }

    /** F6: record to a new time-stamped file in the folder, or stop recording. */
    public void recordOrStop() {
        model.toggleRecording(folder.resolve("rcbench-" + LocalDateTime.now().format(STAMP) + ".rce"));
    }

    /** F8: save a picture of the window in the folder. */
    public Path savePicture() {
        Path file = folder.resolve("rcbench-window-" + LocalDateTime.now().format(STAMP) + ".png");
        try {
            WindowPicture.write(scene, file);
            model.tell("picture saved to " + file);
        } catch (BadInputException e) {
            model.tell("picture not saved: " + e.getMessage());
        }
        return file;
    }

    private MenuBar menus() {
        MenuItem startStop = item("Start or stop", e -> startOrStop());
        startStop.setAccelerator(START_STOP);
        MenuItem record = item("Record to a file or stop", e -> recordOrStop());
        record.setAccelerator(RECORD);
        MenuItem picture = item("Save a picture of the window", e -> savePicture());
        picture.setAccelerator(PICTURE);
        MenuItem save = item("Save check to history", e -> model.saveCheck());
        save.setDisable(!model.canSaveChecks());
        MenuItem quit = item("Close window", e -> scene.getWindow().hide());
        Menu bench = new Menu("Bench", null, startStop, record, picture, save, new SeparatorMenuItem(), quit);

        Menu averaging = new Menu("Average over");
        ToggleGroup group = new ToggleGroup();
        for (int n : BenchModel.AVERAGING_CHOICES) {
            RadioMenuItem r = new RadioMenuItem(n == ReadingsModel.WHOLE_RUN ? "whole run" : "last " + n + " cycles");
            r.setToggleGroup(group);
            r.setSelected(model.averagingProperty().get() == n);
            r.setOnAction(e -> model.setAveraging(n));
            model.averagingProperty().addListener((o, was, now) -> r.setSelected(now.intValue() == n));
            averaging.getItems().add(r);
        }
        Menu view = new Menu("Readings", null, averaging);

        MenuItem safety = item("Safety notice", e -> SafetyDialog.show(scene.getWindow(), model));
        MenuItem keys = item("Keyboard shortcuts", e -> info("Keyboard shortcuts",
                "F5  start or stop the source\nF6  start or stop recording to a capture file\n"
                        + "F8  save a picture of the window\n\nRecordings and pictures go to " + folder.toAbsolutePath()));
        Menu help = new Menu("Help", null, safety, keys);
        MenuBar bar = new MenuBar(bench, view, help);
        bar.setId("menu-bar");
        return bar;
    }

    private HBox statusLine() {
        Label message = new Label();
        message.setId("message");
        message.textProperty().bind(model.messageProperty());
        Region spring = new Region();
        HBox.setHgrow(spring, Priority.ALWAYS);
        Label stats = new Label();
        stats.setId("frame-stats");
        stats.getStyleClass().add("frame-stats");
        stats.textProperty().bind(loop.statsProperty());
        HBox line = new HBox(10, message, spring, stats);
        line.setAlignment(Pos.CENTER_LEFT);
        line.setPadding(new Insets(3, 10, 3, 10));
        line.getStyleClass().add("message-line");
        return line;
    }

    private void info(String title, String text) {
        Alert a = new Alert(Alert.AlertType.INFORMATION, text);
        a.initOwner(scene.getWindow());
        a.setTitle(title);
        a.setHeaderText(title);
        a.show();
    }

    private static MenuItem item(String text, javafx.event.EventHandler<javafx.event.ActionEvent> action) {
        MenuItem m = new MenuItem(text);
        m.setOnAction(action);
        return m;
    }

    private static ScrollPane scroll(javafx.scene.Node n) {
        ScrollPane s = new ScrollPane(n);
        s.setFitToWidth(true);
        s.setHbarPolicy(ScrollPane.ScrollBarPolicy.NEVER);
        s.getStyleClass().add("side-scroll");
        return s;
    }
}
