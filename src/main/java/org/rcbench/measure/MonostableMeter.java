package org.rcbench.measure;

import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Times a monostable from two channels: for each trigger, the delay from the trigger's active edge
 * to the output's rising edge and the output pulse width. A 555 triggers when its trigger input
 * falls below a third of the supply, so the active edge is falling by default.
 *
 * <p>A trigger while a pulse is running (or while an earlier trigger still awaits its pulse) is
 * counted as ignored; an output pulse with no trigger before it is counted as untriggered and not
 * timed; a gap on either channel abandons the pulse in progress. Allocation-free per edge; not
 * thread-safe.
 */
public final class MonostableMeter implements EdgeSink {
    private final int triggerChannel;
    private final int outputChannel;
    private final int activeLevel;
    private final Timebase timebase;
    private final ExactMoments widths = new ExactMoments();
    private final ExactMoments delays = new ExactMoments();
    private long pendingTrigger = -1;
    private long rise = -1;
    private boolean outputHigh;
    private long triggers;
    private long ignoredTriggers;
    private long untriggeredPulses;
    private long gaps;

    /**
     * @param activeLevel {@link #LOW} for a falling-edge trigger (the 555 convention), {@link #HIGH}
     *                    for a rising one
     */
    public MonostableMeter(int triggerChannel, int outputChannel, int activeLevel, Timebase timebase) {
        if (triggerChannel == outputChannel) {
            throw new IllegalArgumentException("trigger and output on the same channel: " + triggerChannel);
        }
        if (activeLevel != LOW && activeLevel != HIGH) {
            throw new IllegalArgumentException("activeLevel not LOW or HIGH: " + activeLevel);
        }
        this.triggerChannel = triggerChannel;
        this.outputChannel = outputChannel;
        this.activeLevel = activeLevel;
        this.timebase = timebase;
    }

    @Override
    public void onEdge(long tick, int channel, int level) {
        if (channel == triggerChannel) {
            onTrigger(tick, level);
        } else if (channel == outputChannel) {
            onOutput(tick, level);
        }
    }

    private void onTrigger(long tick, int level) {
        if (level == UNKNOWN) {
            gaps++;
            pendingTrigger = -1;
            return;
        }
        if (level != activeLevel) {
            return;
        }
        triggers++;
        if (outputHigh || pendingTrigger >= 0) {
            ignoredTriggers++;
        } else {
            pendingTrigger = tick;
        }
    }

    private void onOutput(long tick, int level) {
        if (level == UNKNOWN) {
            gaps++;
            pendingTrigger = -1;
            rise = -1;
            outputHigh = false;
            return;
        }
        if (level == HIGH && !outputHigh) {
            outputHigh = true;
            if (pendingTrigger >= 0) {
                delays.add(tick - pendingTrigger);
                rise = tick;
                pendingTrigger = -1;
            } else {
                untriggeredPulses++;
                rise = -1;
            }
        } else if (level == LOW && outputHigh) {
            outputHigh = false;
            if (rise >= 0) {
                widths.add(tick - rise);
                rise = -1;
            }
        }
    }

    /** Figures so far. */
    public MonostableResult result() {
        return new MonostableResult(triggers, widths.count(), ignoredTriggers, untriggeredPulses, gaps,
                IntervalStats.of(widths, timebase, Double.NaN), IntervalStats.of(delays, timebase, Double.NaN));
    }

    /**
     * Monostable timing over all triggers.
     *
     * @param triggers          active trigger edges seen
     * @param pulses            output pulses timed (triggered and complete)
     * @param ignoredTriggers   triggers during a pulse or while one was awaited
     * @param untriggeredPulses output pulses with no trigger before them
     * @param gaps              gaps on either channel
     * @param pulseWidth        output pulse width statistics
     * @param delay             trigger-to-output delay statistics
     */
    public record MonostableResult(long triggers, long pulses, long ignoredTriggers, long untriggeredPulses,
            long gaps, Measurement.TimeStats pulseWidth, Measurement.TimeStats delay) {
    }
}
