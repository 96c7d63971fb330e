package org.rcbench.sim;

/**
 * What pokes a simulated monostable or bistable. Immutable; NaN means "choose": from the design
 * when it says, else the default named below.
 *
 * @param triggerIntervalSeconds monostable: time between trigger presses; NaN for the design's
 *                               interval, else 2.5 pulse widths (every trigger then fires a pulse)
 * @param triggerWidthSeconds    monostable: how long each trigger holds the input low; NaN for the
 *                               design's width, else 1 ms
 * @param pressIntervalSeconds   bistable: time between button presses; set and reset alternate
 * @param holdSeconds            bistable: how long a button is held down
 * @param bounceSeconds          bistable: contact bounce lasts up to this long after a press and
 *                               after a release (0 for clean contacts)
 * @param maxBounces             bistable: at most this many extra open-close pairs per bounce,
 *                               chosen uniformly from 0..maxBounces
 */
public record Stimulus(double triggerIntervalSeconds, double triggerWidthSeconds, double pressIntervalSeconds,
        double holdSeconds, double bounceSeconds, int maxBounces) {

    public Stimulus {
        if (!Double.isNaN(triggerIntervalSeconds) && !(triggerIntervalSeconds > 0)) {
            throw new IllegalArgumentException("triggerIntervalSeconds <= 0: " + triggerIntervalSeconds);
        }
        if (!Double.isNaN(triggerWidthSeconds) && !(triggerWidthSeconds > 0)) {
            throw new IllegalArgumentException("triggerWidthSeconds <= 0: " + triggerWidthSeconds);
        }
        if (!(bounceSeconds >= 0) || maxBounces < 0) {
            throw new IllegalArgumentException("bounce < 0: " + bounceSeconds + " s, " + maxBounces);
        }
        if (!(holdSeconds > bounceSeconds) || !(pressIntervalSeconds > holdSeconds + bounceSeconds)) {
            throw new IllegalArgumentException("need bounce < hold and hold + bounce < press interval: "
                    + bounceSeconds + ", " + holdSeconds + ", " + pressIntervalSeconds);
        }
    }

    /**
     * Monostable: the design's trigger (or 1 ms presses every 2.5 pulse widths). Bistable: a press
     * every 0.5 s held 0.1 s, bouncing up to 4 times within 2 ms (a few milliseconds of bounce is
     * typical of small push buttons: common practice, no source).
     */
    public static Stimulus defaults() {
        return new Stimulus(Double.NaN, Double.NaN, 0.5, 0.1, 2e-3, 4);
    }

    public Stimulus withTriggerIntervalSeconds(double s) {
        return new Stimulus(s, triggerWidthSeconds, pressIntervalSeconds, holdSeconds, bounceSeconds, maxBounces);
    }

    public Stimulus withTriggerWidthSeconds(double s) {
        return new Stimulus(triggerIntervalSeconds, s, pressIntervalSeconds, holdSeconds, bounceSeconds, maxBounces);
    }

    public Stimulus withPresses(double intervalSeconds, double hold) {
        return new Stimulus(triggerIntervalSeconds, triggerWidthSeconds, intervalSeconds, hold, bounceSeconds,
                maxBounces);
    }

    public Stimulus withBounce(double seconds, int max) {
        return new Stimulus(triggerIntervalSeconds, triggerWidthSeconds, pressIntervalSeconds, holdSeconds, seconds,
                max);
    }
}
