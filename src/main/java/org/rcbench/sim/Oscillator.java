package org.rcbench.sim;

import org.rcbench.circuit.Timing;
import org.rcbench.edge.EdgeSink;

/**
 * A free-running timer (every astable topology): the output rises at power-up, stays high for the
 * model's first high time (the capacitor starts at 0 V), then alternates low and high times. The
 * high time is evaluated with the supply at its start, the low time with the supply at its start,
 * so ripple slower than the oscillation modulates it cycle by cycle. When the model says the circuit
 * cannot run at that moment, the output holds its level and the process tries again a little later
 * (never again, when the conditions are constant).
 */
final class Oscillator implements BoardProcess {
    /** How long a stopped circuit waits before the next try while the supply changes. */
    private static final double RETRY_SECONDS = 1e-3;

    private final Conditions conditions;
    private final int channel;
    private final double halfSigma;
    private double rise;
    private boolean first = true;
    private boolean stuckHigh;

    Oscillator(Conditions conditions, int channel, double powerUpSeconds) {
        this.conditions = conditions;
        this.channel = channel;
        this.rise = powerUpSeconds;
        // Independent noise on high and low, each sigma/sqrt(2): the period then has sigma.
        this.halfSigma = conditions.jitterSeconds() / Math.sqrt(2);
    }

    @Override
    public double nextStep() {
        return rise;
    }

    @Override
    public void step(EventQueue queue) {
        Timing t = conditions.at(rise);
        if (!t.oscillates()) {
            if (first) {
                queue.add(rise, channel, EdgeSink.HIGH); // powered, charging, never reaching the threshold
                first = false;
                stuckHigh = true;
            }
            rise = conditions.constant() ? Double.POSITIVE_INFINITY : rise + RETRY_SECONDS;
            return;
        }
        double high = conditions.interval(first ? t.firstHighSeconds() : t.highSeconds(), rise, halfSigma);
        double low = t.lowSeconds();
        if (!stuckHigh) {
            queue.add(rise, channel, EdgeSink.HIGH);
        }
        first = false;
        stuckHigh = false;
        double fall = rise + high;
        queue.add(fall, channel, EdgeSink.LOW);
        Timing atFall = conditions.at(fall);
        if (atFall.oscillates()) {
            low = atFall.lowSeconds();
        }
        rise = fall + conditions.interval(low, fall, halfSigma);
    }
}
