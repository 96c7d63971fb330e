package org.rcbench.circuit;

/**
 * How a monostable is triggered, when the design says so.
 *
 * @param widthSeconds    how long the trigger input stays below its threshold per trigger (s), NaN if not given
 * @param intervalSeconds time between triggers for a repeatedly triggered monostable (s), NaN if not given
 */
public record Trigger(double widthSeconds, double intervalSeconds) {
    public static final Trigger UNSPECIFIED = new Trigger(Double.NaN, Double.NaN);

    public Trigger {
        if (!Double.isNaN(widthSeconds) && !(widthSeconds > 0)) {
            throw new IllegalArgumentException("widthSeconds <= 0: " + widthSeconds);
        }
        if (!Double.isNaN(intervalSeconds) && !(intervalSeconds > 0)) {
            throw new IllegalArgumentException("intervalSeconds <= 0: " + intervalSeconds);
        }
    }
}
