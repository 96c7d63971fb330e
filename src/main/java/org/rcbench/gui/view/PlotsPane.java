package org.rcbench.gui.view;

import javafx.geometry.Insets;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.RowConstraints;
import org.rcbench.gui.BenchModel;

/** The four live plots in a two-by-two grid, redrawn whenever the model hands over a new frame. */
final class PlotsPane extends GridPane {
    PlotsPane(BenchModel model) {
        setHgap(8);
        setVgap(8);
        setPadding(new Insets(4, 10, 8, 10));
        getStyleClass().add("plots-pane");
        WaveformPlot wave = new WaveformPlot();
        wave.setId("plot-waveform");
        HistogramPlot hist = new HistogramPlot();
        hist.setId("plot-histogram");
        TrendPlot trend = new TrendPlot();
        trend.setId("plot-trend");
        AllanPlot allan = new AllanPlot();
        allan.setId("plot-allan");
        add(wave, 0, 0);
        add(hist, 1, 0);
        add(trend, 0, 1);
        add(allan, 1, 1);
        for (int i = 0; i < 2; i++) {
            ColumnConstraints c = new ColumnConstraints();
            c.setPercentWidth(50);
            c.setHgrow(Priority.ALWAYS);
            getColumnConstraints().add(c);
            RowConstraints r = new RowConstraints();
            r.setPercentHeight(50);
            r.setVgrow(Priority.ALWAYS);
            getRowConstraints().add(r);
        }
        PlotCanvas[] plots = {wave, hist, trend, allan};
        Runnable redraw = () -> {
            for (PlotCanvas p : plots) {
                p.show(model.frameProperty().get(), model.design().expectation());
            }
        };
        model.frameProperty().addListener((o, was, now) -> redraw.run());
        model.design().expectationProperty().addListener((o, was, now) -> redraw.run());
        redraw.run();
    }
}
