package org.rcbench.sim;

import org.rcbench.circuit.Timing;
import org.rcbench.edge.EdgeSink;

/**
 * A monostable and its trigger. At power-up the output is low and the trigger input idles high.
 * Every {@code interval} the trigger is pulled low for {@code width}; if no pulse is running, the
 * output rises one propagation delay later and stays high for the model's pulse width (the first
 * pulse after power-up from 0 V: the model's first high time), with warm-up and noise. Triggers
 * during a pulse are ignored (a 555 monostable is not retriggerable). A circuit that cannot end its
 * pulse (the model stops) stays high for good.
 */
final class OneShot implements BoardProcess {
    private final Conditions conditions;
    private final int output;
    private final int trigger;
    private final double powerUp;
    private final double interval;
    private final double width;
    private final double delay;
    private double nextTrigger;
    private double busyUntil = Double.NEGATIVE_INFINITY;
    private boolean powered;
    private boolean first = true;

    OneShot(Conditions conditions, int output, int trigger, double powerUpSeconds, double intervalSeconds,
            double widthSeconds, double delaySeconds) {
        this.conditions = conditions;
        this.output = output;
        this.trigger = trigger;
        this.powerUp = powerUpSeconds;
        this.interval = intervalSeconds;
        this.width = widthSeconds;
        this.delay = delaySeconds;
        this.nextTrigger = powerUpSeconds + intervalSeconds / 2;
    }

    @Override
    public double nextStep() {
        return powered ? nextTrigger : powerUp;
    }

    @Override
    public void step(EventQueue queue) {
        if (!powered) {
            queue.add(powerUp, output, EdgeSink.LOW);
            queue.add(powerUp, trigger, EdgeSink.HIGH);
            powered = true;
            return;
        }
        double tt = nextTrigger;
        queue.add(tt, trigger, EdgeSink.LOW);
        queue.add(tt + width, trigger, EdgeSink.HIGH);
        if (tt >= busyUntil) {
            Timing t = conditions.at(tt);
            double rise = tt + delay;
            queue.add(rise, output, EdgeSink.HIGH);
            if (t.runs()) {
                double w = conditions.interval(first ? t.firstHighSeconds() : t.highSeconds(), tt,
                        conditions.jitterSeconds());
                busyUntil = rise + w;
                queue.add(busyUntil, output, EdgeSink.LOW);
            } else {
                busyUntil = Double.POSITIVE_INFINITY;
            }
            first = false;
        }
        nextTrigger = tt + interval;
    }
}
