package org.rcbench.gui.view;

import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.scene.text.TextAlignment;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.TuningModel;

/**
 * The trimmer guide, shown for designs with a potentiometer: a target, and a gauge of the wiper's
 * track with where it is (filled triangle), where it must go (hollow diamond) and an arrow between.
 */
final class TuningPane extends VBox {
    private final TuningModel tuning;
    private final Canvas gauge = new Canvas(250, 64);

    TuningPane(BenchModel model) {
        super(6);
        this.tuning = model.tuning();
        getStyleClass().add("tuning-pane");
        setPadding(new Insets(10));
        visibleProperty().bind(tuning.applicableProperty());
        managedProperty().bind(visibleProperty());

        Label heading = new Label();
        heading.getStyleClass().add("pane-heading");
        heading.textProperty().bind(tuning.partProperty().concat(" trimmer guide"));
        ComboBox<TimingQuantity> quantity = new ComboBox<>(FXCollections.observableArrayList(
                tuning.choices(model.design().design())));
        quantity.setId("tune-quantity");
        quantity.setValue(tuning.quantityProperty().get());
        quantity.valueProperty().addListener((o, was, now) -> {
            if (now != null && now != tuning.quantityProperty().get()) {
                tuning.setQuantity(now);
            }
        });
        model.design().designProperty().addListener((o, was, now) -> {
            quantity.getItems().setAll(tuning.choices(now));
            quantity.setValue(tuning.quantityProperty().get());
        });
        TextField target = new TextField();
        target.setId("tune-target");
        target.setPromptText("target, e.g. 1 kHz or 30 %");
        target.textProperty().addListener((o, was, now) -> tuning.setTarget(now));
        HBox row = new HBox(6, new Label("Make the"), quantity);
        row.setAlignment(Pos.CENTER_LEFT);
        HBox row2 = new HBox(6, new Label("read"), target);
        row2.setAlignment(Pos.CENTER_LEFT);
        quantity.setConverter(new javafx.util.StringConverter<>() {
            @Override
            public String toString(TimingQuantity q) {
                return q == null ? "" : q.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ');
            }

            @Override
            public TimingQuantity fromString(String s) {
                return null;
            }
        });
        Label advice = new Label();
        advice.setId("tune-advice");
        advice.setWrapText(true);
        advice.getStyleClass().add("tune-advice");
        advice.textProperty().bind(tuning.adviceProperty());
        Label problem = new Label();
        problem.getStyleClass().add("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(tuning.problemProperty());
        getChildren().addAll(heading, row, row2, gauge, advice, problem);
        tuning.presentProperty().addListener(o -> draw());
        tuning.wantedProperty().addListener(o -> draw());
        draw();
    }

    private void draw() {
        GraphicsContext g = gauge.getGraphicsContext2D();
        double w = gauge.getWidth();
        double left = 14;
        double right = w - 14;
        double y = 30;
        g.setFill(Palette.PLOT_BACKGROUND);
        g.fillRect(0, 0, w, gauge.getHeight());
        g.setStroke(Palette.INK);
        g.setLineWidth(3);
        g.strokeLine(left, y, right, y);
        g.setLineWidth(1);
        g.setFont(PlotCanvas.TICK);
        g.setFill(Palette.INK);
        g.setTextBaseline(VPos.TOP);
        for (int i = 0; i <= 10; i++) {
            double x = left + (right - left) * i / 10.0;
            g.strokeLine(x, y - (i % 5 == 0 ? 8 : 4), x, y + (i % 5 == 0 ? 8 : 4));
        }
        g.setTextAlign(TextAlignment.LEFT);
        g.fillText("0", left - 3, y + 12);
        g.setTextAlign(TextAlignment.RIGHT);
        g.fillText("1", right + 3, y + 12);
        double now = tuning.presentProperty().get();
        double want = tuning.wantedProperty().get();
        if (Double.isFinite(now) && Double.isFinite(want)) {
            double x0 = left + (right - left) * now;
            double x1 = left + (right - left) * want;
            g.setStroke(Palette.ORANGE.darker());
            g.setLineWidth(2);
            g.strokeLine(x0, y - 18, x1, y - 18);
            double dir = Math.signum(x1 - x0);
            g.strokeLine(x1, y - 18, x1 - dir * 6, y - 22);
            g.strokeLine(x1, y - 18, x1 - dir * 6, y - 14);
        }
        if (Double.isFinite(want)) {
            double x = left + (right - left) * want;
            g.setStroke(Palette.ORANGE.darker());
            g.setLineWidth(2);
            g.strokePolygon(new double[] {x, x + 7, x, x - 7}, new double[] {y - 8, y, y + 8, y}, 4);
        }
        if (Double.isFinite(now)) {
            double x = left + (right - left) * now;
            g.setFill(Palette.BLUE);
            g.fillPolygon(new double[] {x, x + 7, x - 7}, new double[] {y + 2, y + 14, y + 14}, 3);
        }
    }
}
