package org.rcbench.edge;

/**
 * Receives the edges of a capture in time order, as raw probe clock ticks.
 *
 * <p>This is the seam between every source (capture file, VCD file, serial probe, simulated probe)
 * and every consumer (measurement, recorder, live views). Calls are made from one thread, with
 * non-decreasing {@code tick} per channel. Implementations on the hot path must not allocate.
 *
 * <p>A {@code level} of {@link #UNKNOWN} marks a gap: the source lost data from {@code tick} on and
 * the level of that channel is unknown until its next {@link #LOW} or {@link #HIGH} call. No cycle
 * may be measured across a gap.
 */
public interface EdgeSink {
    /** Level after a falling edge. */
    int LOW = 0;
    /** Level after a rising edge. */
    int HIGH = 1;
    /** Start of a gap: the level is unknown from this tick until the next edge. */
    int UNKNOWN = -1;

    /**
     * One edge (or the start of a gap) on one channel.
     *
     * @param tick    probe clock ticks since the capture started, non-negative, non-decreasing
     * @param channel probe channel, 0..255
     * @param level   {@link #LOW}, {@link #HIGH} or {@link #UNKNOWN}
     */
    void onEdge(long tick, int channel, int level);

    /**
     * The source has ended. {@code lastTick} is the last tick the source vouches for (at least the
     * last edge's tick); the default does nothing.
     */
    default void onEnd(long lastTick) {
    }
}
