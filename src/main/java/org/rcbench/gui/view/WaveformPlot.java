package org.rcbench.gui.view;

import javafx.scene.canvas.GraphicsContext;
import org.rcbench.gui.LiveFrame;
import org.rcbench.gui.MinMaxColumns;
import org.rcbench.units.SiFormat;

/**
 * The newest cycles as a logic trace, decimated to the lowest and highest level per pixel column
 * ({@link MinMaxColumns}); stretches without data (breaks between cycles) are drawn as a grey band.
 */
final class WaveformPlot extends PlotCanvas {
    /** Cycles shown in the strip. */
    static final int CYCLES = 24;

    private int[] min = new int[0];
    private int[] max = new int[0];
    private int shown;

    WaveformPlot() {
        super("Waveform");
    }

    @Override
    String subtitle() {
        return shown == 0 ? "" : " — newest " + shown + " cycles";
    }

    @Override
    void paint(GraphicsContext g, Area a) {
        LiveFrame f = frame;
        int n = f.recentCount();
        if (n == 0) {
            shown = 0;
            note(g, a, "no complete cycle yet");
            return;
        }
        int from = Math.max(0, n - CYCLES);
        shown = n - from;
        long t0 = f.startTicks()[from];
        long t1 = f.startTicks()[n - 1] + f.highTicks()[n - 1] + f.lowTicks()[n - 1];
        int columns = (int) Math.max(1, Math.floor(a.w()));
        if (min.length != columns) {
            min = new int[columns];
            max = new int[columns];
        }
        MinMaxColumns.decimate(f.startTicks(), f.highTicks(), f.lowTicks(), from, n, t0, t1, columns, min, max);

        double yHigh = a.y() + a.h() * 0.2;
        double yLow = a.y() + a.h() * 0.8;
        double tps = f.timebase().ticksPerSecond();
        double spanSeconds = (t1 - t0) / tps;
        for (double t : Ticks.linear(-spanSeconds, 0, xTicks(a))) {
            xTick(g, a, a.xOf(t, -spanSeconds, 0), SiFormat.format(t, "s", 3));
        }
        yTick(g, a, yHigh, "high");
        yTick(g, a, yLow, "low");

        // A one-level column is a short flat stroke, a column holding an edge a full-swing stroke:
        // neighbouring strokes touch, so the trace is continuous without joining logic.
        g.setLineWidth(1.6);
        g.setStroke(Palette.TRACE);
        g.setFill(Palette.GRID);
        for (int c = 0; c < columns; c++) {
            double x = a.x() + c;
            if (min[c] < 0) {
                g.fillRect(x, a.y() + 1, 1, a.h() - 1);
            } else if (min[c] == max[c]) {
                double y = min[c] == 1 ? yHigh : yLow;
                g.strokeLine(x, y, x + 1, y);
            } else {
                g.strokeLine(x + 0.5, yHigh, x + 0.5, yLow);
            }
        }
    }
}
