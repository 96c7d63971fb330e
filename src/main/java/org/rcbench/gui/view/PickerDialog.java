package org.rcbench.gui.view;

import java.util.ArrayList;
import java.util.List;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.stage.Modality;
import javafx.stage.Window;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.PickerModel;

/** The part-picking helper: targets for the design's topology, candidate part sets, and taking one. */
final class PickerDialog {
    private PickerDialog() {
    }

    static Dialog<ButtonType> show(Window owner, BenchModel model) {
        PickerModel picker = model.picker();
        Dialog<ButtonType> d = new Dialog<>();
        d.initOwner(owner);
        d.initModality(Modality.NONE);
        d.setTitle("Find parts");
        d.setHeaderText("Part sets from E24 resistors (±5 %) and E6 capacitors (±10 %) for "
                + model.design().titleProperty().get());
        GridPane targets = new GridPane();
        targets.setHgap(8);
        targets.setVgap(6);
        List<TextField> fields = new ArrayList<>();
        int row = 0;
        for (String t : picker.targetsFor(model.design().design())) {
            TextField f = new TextField();
            f.setId("pick-" + t.replace(' ', '-'));
            f.setPromptText(t.contains("duty") ? "e.g. 60 %" : t.contains("pulse") ? "e.g. 1.5 s" : "e.g. 700 Hz");
            fields.add(f);
            targets.addRow(row++, new Label(t), f);
        }
        Button find = new Button("Find");
        find.setId("pick-find");
        find.disableProperty().bind(picker.busyProperty());
        find.setOnAction(e -> {
            List<String> texts = new ArrayList<>();
            for (TextField f : fields) {
                texts.add(f.getText());
            }
            picker.find(texts);
        });
        ListView<PickerModel.Option> list = new ListView<>(picker.options());
        list.setId("pick-options");
        list.setPrefSize(560, 200);
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(PickerModel.Option o, boolean empty) {
                super.updateItem(o, empty);
                setText(empty || o == null ? null : o.parts() + "\n   " + o.summary());
            }
        });
        Button use = new Button("Use these parts");
        use.setId("pick-use");
        use.disableProperty().bind(list.getSelectionModel().selectedItemProperty().isNull());
        use.setOnAction(e -> picker.apply(list.getSelectionModel().getSelectedItem()));
        Label problem = new Label();
        problem.getStyleClass().add("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(picker.problemProperty());
        Label notes = new Label();
        notes.setWrapText(true);
        notes.textProperty().bind(picker.notesProperty());
        VBox body = new VBox(8, targets, new HBox(8, find, use), problem, list, notes);
        body.setPadding(new Insets(6));
        d.getDialogPane().setContent(body);
        d.getDialogPane().setId("picker");
        d.getDialogPane().getButtonTypes().add(ButtonType.CLOSE);
        d.show();
        return d;
    }
}
