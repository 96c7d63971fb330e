package org.rcbench.gui.view;

import javafx.scene.canvas.GraphicsContext;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.gui.Expected;
import org.rcbench.gui.LiveFrame;
import org.rcbench.units.SiFormat;

/**
 * The spread of the newest periods as a histogram, with the design's statistical band shaded, the
 * worst case as dashed lines and the nominal as a solid line. When the band is far off the data's
 * scale (a badly drifted part), the data keep the scale and a note says where the band is.
 */
final class HistogramPlot extends PlotCanvas {
    static final int MAX_BINS = 60;
    private final int[] counts = new int[MAX_BINS];
    private int cycles;

    HistogramPlot() {
        super("Period spread");
    }

    @Override
    String subtitle() {
        return cycles == 0 ? "" : " — newest " + cycles + " cycles";
    }

    @Override
    void paint(GraphicsContext g, Area a) {
        LiveFrame f = frame;
        int n = f.recentCount();
        cycles = n;
        if (n < 2) {
            note(g, a, "collecting cycles");
            return;
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double p = f.periodSeconds(i);
            lo = Math.min(lo, p);
            hi = Math.max(hi, p);
        }
        double dataSpan = Math.max(hi - lo, hi * 1e-6);
        Expected e = expectation == null ? null : expectation.of(TimingQuantity.PERIOD);
        double min = lo - dataSpan * 0.1;
        double max = hi + dataSpan * 0.1;
        String offScale = "";
        if (e != null) {
            double bLo = e.hasWorstCase() ? e.worstLow() : e.hasStatistical() ? e.statLow() : e.nominal();
            double bHi = e.hasWorstCase() ? e.worstHigh() : e.hasStatistical() ? e.statHigh() : e.nominal();
            double uLo = Math.min(min, bLo);
            double uHi = Math.max(max, bHi);
            if (uHi - uLo <= 40 * dataSpan) {
                min = uLo - (uHi - uLo) * 0.04;
                max = uHi + (uHi - uLo) * 0.04;
            } else {
                offScale = (e.nominal() < lo ? "← expected " : "expected → ") + SiFormat.format(e.nominal(), "s", 4);
            }
        }
        // Bins a whole number of probe ticks wide: narrower bins than the tick would alternate
        // between full and empty, since periods only take whole-tick values.
        double tick = f.timebase().tickSeconds();
        double width = Math.max(1, Math.ceil((max - min) / tick / MAX_BINS)) * tick;
        int bins = (int) Math.min(MAX_BINS, Math.ceil((max - min) / width));
        max = min + bins * width;
        java.util.Arrays.fill(counts, 0);
        int top = 1;
        for (int i = 0; i < n; i++) {
            int b = (int) Math.min(bins - 1, Math.max(0, Math.floor((f.periodSeconds(i) - min) / width)));
            top = Math.max(top, ++counts[b]);
        }
        for (double t : Ticks.linear(min, max, xTicks(a))) {
            xTick(g, a, a.xOf(t, min, max), SiFormat.format(t, "s", 4));
        }
        for (double t : Ticks.linear(0, top, 3)) {
            yTick(g, a, a.yOf(t, 0, top * 1.08), Long.toString(Math.round(t)));
        }
        if (e != null && offScale.isEmpty()) {
            drawBand(g, a, e, min, max);
        }
        g.setFill(Palette.TRACE);
        double bw = a.w() / bins;
        for (int b = 0; b < bins; b++) {
            if (counts[b] > 0) {
                double y = a.yOf(counts[b], 0, top * 1.08);
                g.fillRect(a.x() + b * bw + 0.5, y, Math.max(1, bw - 1), a.y() + a.h() - y);
            }
        }
        if (!offScale.isEmpty()) {
            g.setFill(Palette.VERMILLION.darker());
            g.setFont(TICK);
            g.setTextAlign(javafx.scene.text.TextAlignment.LEFT);
            g.setTextBaseline(javafx.geometry.VPos.TOP);
            g.fillText(offScale, a.x() + 6, a.y() + 4);
        }
    }

    /** Statistical band shaded, worst case dashed, nominal solid, as vertical marks on a period axis. */
    static void drawBand(GraphicsContext g, Area a, Expected e, double min, double max) {
        if (e.hasStatistical()) {
            double x0 = a.xOf(e.statLow(), min, max);
            double x1 = a.xOf(e.statHigh(), min, max);
            g.setFill(Palette.BAND_FILL);
            g.fillRect(x0, a.y(), Math.max(1, x1 - x0), a.h());
        }
        g.setLineWidth(1.4);
        if (e.hasWorstCase()) {
            g.setStroke(Palette.WORST_LINE);
            g.setLineDashes(5, 4);
            for (double v : new double[] {e.worstLow(), e.worstHigh()}) {
                double x = a.xOf(v, min, max);
                g.strokeLine(x, a.y(), x, a.y() + a.h());
            }
            g.setLineDashes();
        }
        g.setStroke(Palette.BLUISH_GREEN.darker());
        double x = a.xOf(e.nominal(), min, max);
        g.strokeLine(x, a.y(), x, a.y() + a.h());
    }
}
