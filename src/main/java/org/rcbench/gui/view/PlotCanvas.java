package org.rcbench.gui.view;

import javafx.geometry.VPos;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.layout.Region;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;
import org.rcbench.gui.Expectation;
import org.rcbench.gui.LiveFrame;

/**
 * A live plot: a {@link Canvas} that fills its region and is redrawn from the newest frame. Subclasses
 * draw the data inside the plot area that {@link #paint} is given; axes, grid and the title are
 * drawn here. Window thread only.
 */
abstract class PlotCanvas extends Region {
    static final double LEFT = 74;
    static final double RIGHT = 24;
    static final double TOP = 24;
    static final double BOTTOM = 30;
    static final Font TITLE = Font.font("DejaVu Sans", 12.5);
    static final Font TICK = Font.font("DejaVu Sans", 10.5);

    private final Canvas canvas = new Canvas();
    private final String title;
    LiveFrame frame;
    Expectation expectation;

    PlotCanvas(String title) {
        this.title = title;
        getStyleClass().add("plot");
        getChildren().add(canvas);
        setMinSize(160, 120);
        setPrefSize(420, 230);
    }

    /** Shows {@code f} against {@code e} (either may be null) and redraws. */
    final void show(LiveFrame f, Expectation e) {
        frame = f;
        expectation = e;
        redraw();
    }

    @Override
    protected void layoutChildren() {
        double w = snapSizeX(getWidth());
        double h = snapSizeY(getHeight());
        if (canvas.getWidth() != w || canvas.getHeight() != h) {
            canvas.setWidth(w);
            canvas.setHeight(h);
            redraw();
        }
    }

    final void redraw() {
        double w = canvas.getWidth();
        double h = canvas.getHeight();
        if (w < 2 || h < 2) {
            return;
        }
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.setFill(Palette.PLOT_BACKGROUND);
        g.fillRect(0, 0, w, h);
        g.setFill(Palette.INK);
        g.setFont(TITLE);
        g.setTextAlign(TextAlignment.LEFT);
        g.setTextBaseline(VPos.TOP);
        g.fillText(title + subtitle(), 8, 5);
        Area a = new Area(LEFT, TOP, Math.max(1, w - LEFT - RIGHT), Math.max(1, h - TOP - BOTTOM));
        g.setStroke(Palette.GRID);
        g.setLineWidth(1);
        g.strokeRect(a.x() + 0.5, a.y() + 0.5, a.w(), a.h());
        if (frame == null) {
            note(g, a, "waiting for data");
            return;
        }
        paint(g, a);
    }

    /** Extra words after the title, e.g. the number of cycles shown; "" by default. */
    String subtitle() {
        return "";
    }

    /** Draws the data in {@code a}; {@link #frame} is not null. */
    abstract void paint(GraphicsContext g, Area a);

    /** How many ticks fit under {@code a} with room for their labels. */
    static int xTicks(Area a) {
        return (int) Math.max(2, Math.min(8, a.w() / 95));
    }

    /** A centred note in the plot area. */
    static void note(GraphicsContext g, Area a, String text) {
        g.setFill(Palette.GREY);
        g.setFont(TICK);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.CENTER);
        g.fillText(text, a.x() + a.w() / 2, a.y() + a.h() / 2);
    }

    /** A vertical grid line with its label under the plot area. */
    static void xTick(GraphicsContext g, Area a, double x, String label) {
        g.setStroke(Palette.GRID);
        g.strokeLine(Math.round(x) + 0.5, a.y(), Math.round(x) + 0.5, a.y() + a.h());
        g.setFill(Palette.INK);
        g.setFont(TICK);
        g.setTextAlign(TextAlignment.CENTER);
        g.setTextBaseline(VPos.TOP);
        g.fillText(label, x, a.y() + a.h() + 4);
    }

    /** A horizontal grid line with its label left of the plot area. */
    static void yTick(GraphicsContext g, Area a, double y, String label) {
        g.setStroke(Palette.GRID);
        g.strokeLine(a.x(), Math.round(y) + 0.5, a.x() + a.w(), Math.round(y) + 0.5);
        g.setFill(Palette.INK);
        g.setFont(TICK);
        g.setTextAlign(TextAlignment.RIGHT);
        g.setTextBaseline(VPos.CENTER);
        g.fillText(label, a.x() - 4, y);
    }

    /** The plot area in canvas pixels. */
    record Area(double x, double y, double w, double h) {
        double xOf(double v, double min, double max) {
            return x + (v - min) / (max - min) * w;
        }

        double yOf(double v, double min, double max) {
            return y + h - (v - min) / (max - min) * h;
        }
    }
}
