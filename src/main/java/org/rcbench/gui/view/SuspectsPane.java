package org.rcbench.gui.view;

import java.util.Locale;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.Label;
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
        VBox list = new VBox(4);
        list.setId("suspects");
        list.getStyleClass().add("suspect-list");
        d.suspects().addListener((javafx.collections.ListChangeListener<Suspect>) c -> fill(list, d));
        fill(list, d);
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

    private static void fill(VBox list, DiagnosisModel d) {
        list.getChildren().clear();
        int rank = 1;
        for (Suspect s : d.suspects()) {
            Label l = new Label(line(rank++, s));
            l.setWrapText(true);
            l.getStyleClass().add(rank == 2 ? "suspect-first" : "suspect");
            list.getChildren().add(l);
        }
    }

    /** {@code 1. C1  68.2 nF (64.0 nF – 72.5 nF), −31.8 % from nominal, p 0.930}. */
    static String line(int rank, Suspect s) {
        StringBuilder sb = new StringBuilder().append(rank).append(". ").append(s.part());
        if (!s.estimate().isEmpty()) {
            sb.append("  ").append(s.estimate());
            if (!s.interval().isEmpty()) {
                sb.append(" (").append(s.interval()).append(')');
            }
        }
        if (!s.deviation().isEmpty()) {
            sb.append(", ").append(s.deviation());
        }
        if (!Double.isNaN(s.probability())) {
            sb.append(s.probability() < 0.001 ? ", p < 0.001" : String.format(Locale.ROOT, ", p %.3f", s.probability()));
        }
        return sb.toString();
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
