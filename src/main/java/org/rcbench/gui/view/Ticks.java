package org.rcbench.gui.view;

/** Tick positions for plot axes. Stateless. */
final class Ticks {
    private Ticks() {
    }

    /**
     * About {@code count} round ticks (1, 2 or 5 times a power of ten apart) covering
     * {@code [min, max]}; empty when the range is empty or not finite.
     */
    static double[] linear(double min, double max, int count) {
        if (!(max > min) || !Double.isFinite(min) || !Double.isFinite(max)) {
            return new double[0];
        }
        double raw = (max - min) / Math.max(1, count);
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = raw / mag < 1.5 ? mag : raw / mag < 3.5 ? 2 * mag : raw / mag < 7.5 ? 5 * mag : 10 * mag;
        long first = (long) Math.ceil(min / step);
        long last = (long) Math.floor(max / step);
        int n = (int) Math.max(0, Math.min(100, last - first + 1));
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = (first + i) * step;
        }
        return t;
    }

    /** The powers of ten within {@code [min, max]} (both above zero). */
    static double[] decades(double min, double max) {
        if (!(min > 0) || !(max > min)) {
            return new double[0];
        }
        int a = (int) Math.ceil(Math.log10(min) - 1e-9);
        int b = (int) Math.floor(Math.log10(max) + 1e-9);
        double[] t = new double[Math.max(0, b - a + 1)];
        for (int i = 0; i < t.length; i++) {
            t[i] = Math.pow(10, a + i);
        }
        return t;
    }
}
