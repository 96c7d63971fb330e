package org.rcbench.gui.view;

import javafx.collections.FXCollections;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.Reading;
import org.rcbench.gui.ReadingsModel;

/** The large live readings, one tile each, with the averaging window above them. */
final class ReadingsPane extends VBox {
    private final BenchModel model;
    private final HBox tiles = new HBox(10);

    ReadingsPane(BenchModel model) {
        super(6);
        this.model = model;
        getStyleClass().add("readings-pane");
        setPadding(new Insets(8, 10, 4, 10));

        Label heading = new Label("Live readings");
        heading.getStyleClass().add("pane-heading");
        ComboBox<Integer> averaging = new ComboBox<>(FXCollections.observableArrayList(BenchModel.AVERAGING_CHOICES));
        averaging.setId("averaging");
        averaging.setConverter(new StringConverter<>() {
            @Override
            public String toString(Integer n) {
                return n == null ? "" : n == ReadingsModel.WHOLE_RUN ? "whole run" : "last " + n + " cycles";
            }

            @Override
            public Integer fromString(String s) {
                return null;
            }
        });
        averaging.setValue(model.averagingProperty().get());
        averaging.valueProperty().addListener((o, was, now) -> {
            if (now != null) {
                model.setAveraging(now);
            }
        });
        model.averagingProperty().addListener((o, was, now) -> averaging.setValue(now.intValue()));
        Label avg = new Label("Average over");
        Region spring = new Region();
        HBox.setHgrow(spring, Priority.ALWAYS);
        Label quiet = new Label();
        quiet.getStyleClass().add("problem");
        quiet.textProperty().bind(model.signalNoteProperty());
        HBox head = new HBox(8, heading, quiet, spring, avg, averaging);
        head.setAlignment(Pos.CENTER_LEFT);

        tiles.setFillHeight(true);
        model.readings().readings().addListener((ListChangeListener<Reading>) c -> rebuild());
        rebuild();
        getChildren().addAll(head, tiles);
    }

    private void rebuild() {
        tiles.getChildren().clear();
        for (Reading r : model.readings().readings()) {
            ReadingTile t = new ReadingTile(r);
            t.setPrefWidth(230);
            t.setMinWidth(150);
            t.setMaxWidth(360);
            HBox.setHgrow(t, Priority.ALWAYS);
            tiles.getChildren().add(t);
        }
    }
}
