package org.rcbench.gui.view;

import java.util.List;
import javafx.scene.canvas.GraphicsContext;
import org.rcbench.stability.StabilityPoint;
import org.rcbench.units.SiFormat;

/** Overlapping Allan deviation against averaging time, both axes logarithmic (decade grid). */
final class AllanPlot extends PlotCanvas {
    AllanPlot() {
        super("Stability — Allan deviation σy(τ)");
    }

    @Override
    void paint(GraphicsContext g, Area a) {
        List<StabilityPoint> points = frame.measurement().allan();
        int n = 0;
        double tLo = Double.POSITIVE_INFINITY;
        double tHi = 0;
        double dLo = Double.POSITIVE_INFINITY;
        double dHi = 0;
        for (StabilityPoint p : points) {
            if (p.deviation() > 0) {
                n++;
                tLo = Math.min(tLo, p.tauSeconds());
                tHi = Math.max(tHi, p.tauSeconds());
                dLo = Math.min(dLo, p.deviation());
                dHi = Math.max(dHi, p.deviation());
            }
        }
        if (n < 2) {
            note(g, a, "collecting cycles");
            return;
        }
        // Whole decades around the data, so the grid always has lines to read against.
        double xMin = Math.log10(tLo) - 0.15;
        double xMax = Math.log10(tHi) + 0.15;
        double yMin = Math.floor(Math.log10(dLo) - 0.05);
        double yMax = Math.ceil(Math.log10(dHi) + 0.05);
        for (double v : Ticks.decades(Math.pow(10, xMin), Math.pow(10, xMax))) {
            xTick(g, a, a.xOf(Math.log10(v), xMin, xMax), SiFormat.format(v, "s", 1));
        }
        for (double v : Ticks.decades(Math.pow(10, yMin), Math.pow(10, yMax))) {
            yTick(g, a, a.yOf(Math.log10(v), yMin, yMax), String.format(java.util.Locale.ROOT, "1e%d",
                    Math.round(Math.log10(v))));
        }
        g.setStroke(Palette.REDDISH_PURPLE.darker());
        g.setFill(Palette.REDDISH_PURPLE.darker());
        g.setLineWidth(1.6);
        g.beginPath();
        boolean first = true;
        for (StabilityPoint p : points) {
            if (!(p.deviation() > 0)) {
                continue;
            }
            double x = a.xOf(Math.log10(p.tauSeconds()), xMin, xMax);
            double y = a.yOf(Math.log10(p.deviation()), yMin, yMax);
            if (first) {
                g.moveTo(x, y);
                first = false;
            } else {
                g.lineTo(x, y);
            }
            g.fillRect(x - 2.5, y - 2.5, 5, 5);
        }
        g.stroke();
    }
}
