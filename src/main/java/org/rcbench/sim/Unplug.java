package org.rcbench.sim;

/**
 * A pulled cable: at board time {@code atSeconds} the simulated probe's port goes away, and
 * {@code downSeconds} later (board time) the probe is plugged back in and boots again.
 */
public record Unplug(double atSeconds, double downSeconds) {
    public Unplug {
        if (!(atSeconds >= 0) || Double.isInfinite(atSeconds)) {
            throw new IllegalArgumentException("atSeconds < 0: " + atSeconds);
        }
        if (!(downSeconds >= 0) || Double.isInfinite(downSeconds)) {
            throw new IllegalArgumentException("downSeconds < 0: " + downSeconds);
        }
    }
}
