package org.rcbench.measure;

import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Times a timer wired as a latch with push buttons: the response from a set press to the output
 * rising and from a reset press to the output falling, and contact bounce on the inputs.
 *
 * <p>A press starts at an input's first active edge (falling by default: a button pulling the
 * input low). Every further edge on that input within {@code bounceWindowTicks} of the press's
 * (or the release's) first edge is a bounce, counted and otherwise ignored. A press whose output is already at its target
 * level is counted as causing no change and is not timed; an output change with no press awaiting
 * it is counted as spontaneous. Allocation-free per edge; not thread-safe.
 */
public final class BistableMeter implements EdgeSink {
    private final Input set;
    private final Input reset;
    private final int outputChannel;
    private final Timebase timebase;
    private final ExactMoments setResponse = new ExactMoments();
    private final ExactMoments resetResponse = new ExactMoments();
    private int outputLevel = UNKNOWN;
    private long spontaneous;
    private long noChange;
    private long gaps;

    /**
     * @param resetChannel      the reset input, or -1 when only set is wired
     * @param activeLevel       {@link #LOW} when a press pulls the input low
     * @param bounceWindowTicks edges within this many ticks after a press's first edge are bounces
     */
    public BistableMeter(int setChannel, int resetChannel, int outputChannel, int activeLevel,
            long bounceWindowTicks, Timebase timebase) {
        if (setChannel == outputChannel || resetChannel == outputChannel || setChannel == resetChannel) {
            throw new IllegalArgumentException("set, reset and output channels must differ: " + setChannel + ", "
                    + resetChannel + ", " + outputChannel);
        }
        if (bounceWindowTicks < 0) {
            throw new IllegalArgumentException("bounceWindowTicks < 0: " + bounceWindowTicks);
        }
        this.set = new Input(setChannel, activeLevel, bounceWindowTicks, HIGH);
        this.reset = new Input(resetChannel, activeLevel, bounceWindowTicks, LOW);
        this.outputChannel = outputChannel;
        this.timebase = timebase;
    }

    @Override
    public void onEdge(long tick, int channel, int level) {
        if (channel == outputChannel) {
            onOutput(tick, level);
        } else if (channel == set.channel) {
            onInput(set, tick, level);
        } else if (channel == reset.channel) {
            onInput(reset, tick, level);
        }
    }

    private void onInput(Input in, long tick, int level) {
        if (level == UNKNOWN) {
            gaps++;
            in.windowStart = -1;
            in.awaiting = -1;
            return;
        }
        if (in.windowStart >= 0 && tick - in.windowStart <= in.bounceWindow) {
            in.bounces++;
            return;
        }
        // A press or a release opens a bounce window; releases bounce too.
        in.windowStart = tick;
        if (level != in.activeLevel) {
            return;
        }
        in.presses++;
        if (outputLevel == in.target) {
            noChange++;
        } else {
            in.awaiting = tick;
        }
    }

    private void onOutput(long tick, int level) {
        if (level == UNKNOWN) {
            gaps++;
            outputLevel = UNKNOWN;
            set.awaiting = -1;
            reset.awaiting = -1;
            return;
        }
        if (level == outputLevel) {
            return;
        }
        if (outputLevel == UNKNOWN) {
            // The first known level is a state, not a change.
            outputLevel = level;
            return;
        }
        outputLevel = level;
        Input cause = level == HIGH ? set : reset;
        if (cause.awaiting >= 0) {
            (level == HIGH ? setResponse : resetResponse).add(tick - cause.awaiting);
            cause.awaiting = -1;
        } else {
            spontaneous++;
        }
    }

    /** Figures so far. */
    public BistableResult result() {
        return new BistableResult(set.presses, reset.presses, set.bounces, reset.bounces, noChange, spontaneous,
                gaps, IntervalStats.of(setResponse, timebase, Double.NaN),
                IntervalStats.of(resetResponse, timebase, Double.NaN));
    }

    private static final class Input {
        final int channel;
        final int activeLevel;
        final long bounceWindow;
        final int target;
        long windowStart = -1;
        long awaiting = -1;
        long presses;
        long bounces;

        Input(int channel, int activeLevel, long bounceWindow, int target) {
            this.channel = channel;
            this.activeLevel = activeLevel;
            this.bounceWindow = bounceWindow;
            this.target = target;
        }
    }

    /**
     * Latch timing.
     *
     * @param setPresses    presses of the set input
     * @param resetPresses  presses of the reset input
     * @param setBounces    extra edges on the set input within the bounce window
     * @param resetBounces  extra edges on the reset input within the bounce window
     * @param noChange      presses when the output was already at the pressed state
     * @param spontaneous   output changes no press accounts for
     * @param gaps          gaps on any of the channels
     * @param setResponse   set-press-to-output-rise statistics
     * @param resetResponse reset-press-to-output-fall statistics
     */
    public record BistableResult(long setPresses, long resetPresses, long setBounces, long resetBounces,
            long noChange, long spontaneous, long gaps, Measurement.TimeStats setResponse,
            Measurement.TimeStats resetResponse) {
    }
}
