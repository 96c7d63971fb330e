package org.rcbench.gui.view;

import java.util.Locale;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.layout.VBox;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.DiagnosisModel;
import org.rcbench.gui.Suspect;

/** Ranked suspects with estimate and interval, the ambiguity in words and what would resolve it. */
final class SuspectsPane extends VBox {
    SuspectsPane(BenchModel model) {
        super(6);
        getStyleClass().add("suspects-pane");
        setPadding(new Insets(10));
        DiagnosisModel d = model.diagnosis();
        Label heading = new Label("Suspects");
        heading.getStyleClass().add("pane-heading");
        Label verdict = wrapped("verdict");
        verdict.getStyleClass().add("verdict");
        verdict.textProperty().bind(d.verdictProperty());
        Label note = wrapped("diagnosis-note");
        note.getStyleClass().add("note");
        note.textProperty().bind(d.noteProperty());
        ListView<Suspect> list = new ListView<>(d.suspects());
        list.setId("suspects");
        list.setPrefHeight(150);
        list.visibleProperty().bind(d.availableProperty());
        list.managedProperty().bind(list.visibleProperty());
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(Suspect s, boolean empty) {
                super.updateItem(s, empty);
                setText(empty || s == null ? null : line(getIndex() + 1, s));
                setWrapText(true);
            }
        });
        Label ambiguity = wrapped("ambiguity");
        ambiguity.textProperty().bind(d.ambiguityProperty());
        Label resolvers = wrapped("resolvers");
        resolvers.getStyleClass().add("resolvers");
        resolvers.textProperty().bind(d.resolversProperty());
        Button save = new Button("Save check");
        save.setId("save-check");
        save.setOnAction(e -> model.saveCheck());
        save.setDisable(!model.canSaveChecks());
        getChildren().addAll(heading, verdict, note, list, ambiguity, resolvers, save);
    }

    /** {@code 1. C1 68.2 nF (64.0 nF – 72.5 nF), −31.8 %, p 0.93}. */
    static String line(int rank, Suspect s) {
        String p = Double.isNaN(s.probability()) ? "" : String.format(Locale.ROOT, ", p %.2f", s.probability());
        return rank + ". " + s.part() + "  " + s.estimate() + (s.interval().isEmpty() ? "" : " (" + s.interval() + ")")
                + (s.deviation().isEmpty() ? "" : ", " + s.deviation()) + p;
    }

    private static Label wrapped(String id) {
        Label l = new Label();
        l.setId(id);
        l.setWrapText(true);
        l.visibleProperty().bind(l.textProperty().isNotEmpty());
        l.managedProperty().bind(l.visibleProperty());
        return l;
    }
}
