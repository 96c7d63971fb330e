package org.rcbench.gui;

import org.rcbench.edge.Timebase;
import org.rcbench.measure.FrequencyTrend;
import org.rcbench.measure.Measurement;

/**
 * One immutable picture of the live measurement, built on the source's thread and handed to the
 * window: the figures, the newest cycles for the waveform strip and the histogram, and the trend.
 * The arrays belong to this frame alone; nobody writes them after it is published.
 *
 * @param serial        increases by one with every frame of a pipeline
 * @param timebase      ticks to seconds
 * @param measurement   the whole-run and rolling figures (rolling over {@code rollingCycles})
 * @param rollingCycles the averaging window the rolling figures used
 * @param startTicks    start tick of each recent cycle, oldest first, valid in {@code [0, recentCount)}
 * @param highTicks     high time of each recent cycle in ticks
 * @param lowTicks      low time of each recent cycle in ticks
 * @param recentCount   how many recent cycles the arrays hold
 * @param trend         frequency against time since the start
 * @param steady        the newest cycles agree with the ones before them (see {@link Steadiness})
 * @param latestTick    the newest tick seen on any channel
 * @param builtNanos    {@link System#nanoTime()} when the frame was built
 * @param ended         the source has ended: this is the final frame
 */
public record LiveFrame(long serial, Timebase timebase, Measurement measurement, int rollingCycles, long[] startTicks,
        long[] highTicks, long[] lowTicks, int recentCount, FrequencyTrend trend, boolean steady, long latestTick,
        long builtNanos, boolean ended) {

    /** Period of recent cycle {@code i} in seconds. */
    public double periodSeconds(int i) {
        return (highTicks[i] + lowTicks[i]) / timebase.ticksPerSecond();
    }
}
