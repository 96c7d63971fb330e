package org.rcbench.sim;

import org.rcbench.edge.EdgeSink;

/**
 * A reference oscillator for calibrating the probe clock: a pulse train of exactly
 * {@code frequencyHz} in true time (a 1 Hz pulse-per-second output, a crystal oscillator), high
 * for half the period or 100 ms, whichever is shorter (pulse-per-second outputs are typically
 * 100 ms pulses: common practice, no source). The simulation's jitter applies to each rising edge
 * as white phase noise; the edges never drift, which is what makes it a reference.
 */
final class ReferenceWave implements BoardProcess {
    private final Conditions conditions;
    private final int channel;
    private final double start;
    private final double period;
    private final double high;
    private long n;

    ReferenceWave(Conditions conditions, int channel, double powerUpSeconds, double frequencyHz) {
        this.conditions = conditions;
        this.channel = channel;
        this.start = powerUpSeconds;
        this.period = 1 / frequencyHz;
        this.high = Math.min(period / 2, 0.1);
    }

    /** Steps come half a pulse before each nominal rising edge, so noise of either sign stays after the step. */
    @Override
    public double nextStep() {
        return start + n * period;
    }

    @Override
    public void step(EventQueue queue) {
        double nominalRise = start + n * period + high / 2;
        // sigma at most an eighth of the pulse, the draw clamped to a quarter: the edge stays after the step.
        double sigma = Math.min(conditions.jitterSeconds(), high / 8);
        double rise = nominalRise + Math.max(-high / 4, Math.min(high / 4, conditions.noise(sigma)));
        queue.add(rise, channel, EdgeSink.HIGH);
        queue.add(rise + high, channel, EdgeSink.LOW);
        n++;
    }
}
