package org.rcbench.gui.view;

import java.io.File;
import java.util.Locale;
import javafx.beans.binding.Bindings;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import javafx.stage.Window;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.SourceChoice;
import org.rcbench.gui.SourceStatus;
import org.rcbench.serial.PortInfo;
import org.rcbench.serial.SerialPorts;

/**
 * The source strip across the top: what to read (simulated board with a fault, serial port, capture
 * file), start and stop, and the live state (connection, probe, clock, gaps, errors, recording).
 */
final class SourceBar extends VBox {
    private final BenchModel model;
    private final ComboBox<SourceChoice.Kind> kind = new ComboBox<>(FXCollections.observableArrayList(
            SourceChoice.Kind.values()));
    private final ComboBox<String> target = new ComboBox<>();
    private final TextField fault = new TextField();
    private final Button browse = new Button("Browse…");
    private final Button startStop = new Button();
    private final StackPane mark = new StackPane();

    SourceBar(BenchModel model) {
        super(4);
        this.model = model;
        getStyleClass().add("source-bar");
        setPadding(new Insets(6, 10, 6, 10));

        kind.setId("source-kind");
        kind.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(SourceChoice.Kind k) {
                return k == null ? "" : capitalised(k.words());
            }

            @Override
            public SourceChoice.Kind fromString(String s) {
                return null;
            }
        });
        target.setEditable(true);
        target.setId("source-target");
        target.setPrefWidth(330);
        HBox.setHgrow(target, Priority.SOMETIMES);
        fault.setId("source-fault");
        fault.setPromptText("fault, e.g. C1=-35%");
        fault.setPrefColumnCount(14);
        fault.setTooltip(new Tooltip("Deviations the simulated board is built with, e.g. C1=-35% or R2=+20%"));
        startStop.setId("start-stop");
        startStop.getStyleClass().add("start-stop");
        startStop.textProperty().bind(Bindings.when(model.runningProperty()).then("Stop  (F5)").otherwise("Start  (F5)"));
        startStop.setOnAction(e -> toggle());
        browse.setOnAction(e -> browse());

        SourceChoice c = model.choiceProperty().get();
        kind.setValue(c.kind());
        target.getEditor().setText(c.target());
        fault.setText(c.fault());
        kind.valueProperty().addListener((o, was, now) -> kindChanged(now));
        kindChanged(c.kind());
        model.choiceProperty().addListener((o, was, now) -> {
            kind.setValue(now.kind());
            target.getEditor().setText(now.target());
            fault.setText(now.fault());
        });

        Label pick = new Label("Read from");
        HBox controls = new HBox(8, pick, kind, target, browse, fault, startStop);
        controls.setAlignment(Pos.CENTER_LEFT);

        mark.setMinSize(14, 14);
        Label state = new Label();
        state.setId("connection-state");
        state.getStyleClass().add("connection-state");
        Label line = new Label();
        line.setId("status-line");
        line.getStyleClass().add("status-line");
        Tooltip whole = new Tooltip();
        whole.textProperty().bind(line.textProperty());
        line.setTooltip(whole);
        line.setMaxWidth(Double.MAX_VALUE);
        Label probe = new Label();
        probe.setId("probe");
        Label clock = new Label();
        clock.setId("clock");
        Label counts = new Label();
        counts.setId("counts");
        Label rec = new Label();
        rec.setId("recording");
        rec.getStyleClass().add("recording");
        rec.textProperty().bind(Bindings.when(model.recordingProperty())
                .then(Bindings.concat("● ", model.recordingTextProperty())).otherwise(""));
        rec.visibleProperty().bind(model.recordingProperty());
        rec.managedProperty().bind(model.recordingProperty());
        for (Label l : new Label[] {state, probe, counts, rec}) {
            l.setMinWidth(Region.USE_PREF_SIZE);
        }
        clock.setMaxWidth(Double.MAX_VALUE);
        HBox.setHgrow(clock, Priority.SOMETIMES);
        Tooltip clockTip = new Tooltip();
        clockTip.textProperty().bind(clock.textProperty());
        clock.setTooltip(clockTip);
        HBox status = new HBox(10, mark, state, probe, clock, counts, rec);
        status.setAlignment(Pos.CENTER_LEFT);
        showStatus(model.statusProperty().get(), state, line, probe, clock, counts);
        model.statusProperty().addListener((o, was, now) -> showStatus(now, state, line, probe, clock, counts));

        getChildren().addAll(controls, status, line);
    }

    /** The choice the fields describe now. */
    SourceChoice fieldsChoice() {
        SourceChoice.Kind k = kind.getValue();
        String t = target.getEditor().getText().strip();
        switch (k) {
            case SIMULATED: return SourceChoice.simulated(t, fault.getText().strip());
            case PORT: return SourceChoice.port(t);
            default: return SourceChoice.file(t);
        }
    }

    /**
     * Start with what the fields say, or stop. Unchanged fields keep the chosen source as it is (with
     * every option the command line gave it).
     */
    void toggle() {
        if (model.runningProperty().get()) {
            model.stop();
            return;
        }
        SourceChoice now = model.choiceProperty().get();
        SourceChoice typed = fieldsChoice();
        boolean same = typed.kind() == now.kind() && typed.target().equals(now.target())
                && typed.fault().equals(now.fault());
        if (!same) {
            model.choose(typed);
        }
        model.start();
    }

    private void kindChanged(SourceChoice.Kind k) {
        fault.setDisable(k != SourceChoice.Kind.SIMULATED);
        switch (k) {
            case SIMULATED:
                target.getEditor().setPromptText("design file (empty: the built-in board)");
                target.getItems().clear();
                browse.setText("Browse…");
                break;
            case PORT:
                target.getEditor().setPromptText("device path or USB id, e.g. /dev/ttyACM0");
                refreshPorts();
                browse.setText("Refresh");
                break;
            default:
                target.getEditor().setPromptText("capture file (.rce, .rce.gz, .vcd)");
                target.getItems().clear();
                browse.setText("Browse…");
        }
    }

    private void refreshPorts() {
        target.getItems().clear();
        try {
            for (PortInfo p : SerialPorts.list()) {
                target.getItems().add(p.path());
            }
        } catch (RuntimeException | UnsatisfiedLinkError e) {
            model.tell("cannot list serial ports: " + e.getMessage());
        }
    }

    private void browse() {
        SourceChoice.Kind k = kind.getValue();
        if (k == SourceChoice.Kind.PORT) {
            refreshPorts();
            target.show();
            return;
        }
        FileChooser chooser = new FileChooser();
        if (k == SourceChoice.Kind.SIMULATED) {
            chooser.setTitle("Design file for the simulated board");
            chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("rcbench designs", "*.toml"));
        } else {
            chooser.setTitle("Capture file to replay");
            chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("Captures", "*.rce", "*.gz", "*.vcd",
                    "*.csv", "*"));
        }
        Window w = getScene() == null ? null : getScene().getWindow();
        File f = chooser.showOpenDialog(w);
        if (f != null) {
            target.getEditor().setText(f.getPath());
        }
    }

    private void showStatus(SourceStatus s, Label state, Label line, Label probe, Label clock, Label counts) {
        mark.getChildren().setAll(Marks.of(s.state(), 14));
        state.setText(s.state().words().toUpperCase(Locale.ROOT));
        state.setTextFill(Palette.of(s.state()).darker());
        line.setText(s.line());
        probe.setText(s.probe());
        clock.setText(s.clock());
        counts.setText("gaps " + s.gaps() + " · errors " + s.errors());
    }

    static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
