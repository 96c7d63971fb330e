package org.rcbench.gui.view;

import java.util.Locale;
import javafx.animation.AnimationTimer;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.rcbench.gui.BenchModel;

/**
 * The window's one animation timer: once per frame it polls the model, which hands the newest live
 * frame to the plots and refreshes the readouts when due. It also times its own work, so the cost
 * of a frame at a given edge rate can be read off the status line (and reported); it never asserts
 * anything about that time.
 */
public final class FrameLoop extends AnimationTimer {
    private final BenchModel model;
    private final ReadOnlyStringWrapper stats = new ReadOnlyStringWrapper(this, "stats", "");
    private long windowStart = -1;
    private int frames;
    private long busyNanos;
    private long worstNanos;
    private double lastMeanMillis = Double.NaN;
    private double lastWorstMillis = Double.NaN;
    private double lastFps = Double.NaN;

    public FrameLoop(BenchModel model) {
        this.model = model;
    }

    @Override
    public void handle(long now) {
        long t0 = System.nanoTime();
        model.poll(t0);
        long spent = System.nanoTime() - t0;
        frames++;
        busyNanos += spent;
        worstNanos = Math.max(worstNanos, spent);
        if (windowStart < 0) {
            windowStart = now;
        } else if (now - windowStart >= 1_000_000_000L) {
            double seconds = (now - windowStart) * 1e-9;
            lastFps = frames / seconds;
            lastMeanMillis = busyNanos / 1e6 / frames;
            lastWorstMillis = worstNanos / 1e6;
            stats.set(String.format(Locale.ROOT, "%.0f frames/s, %.2f ms per frame (worst %.1f ms)", lastFps,
                    lastMeanMillis, lastWorstMillis));
            windowStart = now;
            frames = 0;
            busyNanos = 0;
            worstNanos = 0;
        }
    }

    /** {@code 60 frames/s, 0.42 ms per frame (worst 1.3 ms)}, over the last second; "" at first. */
    public ReadOnlyStringProperty statsProperty() {
        return stats.getReadOnlyProperty();
    }

    /** Mean time spent per frame over the last full second, ms (NaN before the first second). */
    public double meanMillis() {
        return lastMeanMillis;
    }

    /** Worst time spent in one frame over the last full second, ms. */
    public double worstMillis() {
        return lastWorstMillis;
    }

    /** Frames per second over the last full second. */
    public double framesPerSecond() {
        return lastFps;
    }
}
