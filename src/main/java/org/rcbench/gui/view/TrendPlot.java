package org.rcbench.gui.view;

import javafx.scene.canvas.GraphicsContext;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.gui.Expected;
import org.rcbench.measure.FrequencyTrend;
import org.rcbench.units.SiFormat;

/** Frequency against time since the start (warm-up drift shows as a slope), with the band shaded. */
final class TrendPlot extends PlotCanvas {
    TrendPlot() {
        super("Frequency over time");
    }

    @Override
    void paint(GraphicsContext g, Area a) {
        FrequencyTrend t = frame.trend();
        int n = t.size();
        if (n < 2) {
            note(g, a, "collecting cycles");
            return;
        }
        double fLo = Double.POSITIVE_INFINITY;
        double fHi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            fLo = Math.min(fLo, t.frequencyHz()[i]);
            fHi = Math.max(fHi, t.frequencyHz()[i]);
        }
        double span = Math.max(fHi - fLo, fHi * 2e-6);
        double min = fLo - span * 0.15;
        double max = fHi + span * 0.15;
        Expected e = expectation == null ? null : expectation.of(TimingQuantity.FREQUENCY);
        boolean band = false;
        if (e != null && e.hasStatistical()) {
            double uLo = Math.min(min, e.statLow());
            double uHi = Math.max(max, e.statHigh());
            if (uHi - uLo <= 40 * span) {
                min = uLo - (uHi - uLo) * 0.04;
                max = uHi + (uHi - uLo) * 0.04;
                band = true;
            }
        }
        double t0 = t.timeSeconds()[0];
        double t1 = Math.max(t.timeSeconds()[n - 1], t0 + 1e-9);
        for (double v : Ticks.linear(t0, t1, xTicks(a))) {
            xTick(g, a, a.xOf(v, t0, t1), SiFormat.format(v, "s", 3));
        }
        for (double v : Ticks.linear(min, max, 4)) {
            yTick(g, a, a.yOf(v, min, max), SiFormat.format(v, "Hz", 5));
        }
        if (band) {
            double y0 = a.yOf(e.statHigh(), min, max);
            double y1 = a.yOf(e.statLow(), min, max);
            g.setFill(Palette.BAND_FILL);
            g.fillRect(a.x(), y0, a.w(), Math.max(1, y1 - y0));
        }
        g.setStroke(Palette.TRACE);
        g.setLineWidth(1.6);
        g.beginPath();
        for (int i = 0; i < n; i++) {
            double x = a.xOf(t.timeSeconds()[i], t0, t1);
            double y = a.yOf(t.frequencyHz()[i], min, max);
            if (i == 0) {
                g.moveTo(x, y);
            } else {
                g.lineTo(x, y);
            }
        }
        g.stroke();
    }
}
