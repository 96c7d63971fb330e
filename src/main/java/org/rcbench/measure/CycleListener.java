package org.rcbench.measure;

/**
 * Receives every cycle a {@link CycleMeter} forms, in order, as it forms it: the same cycles the
 * meter measures (rising edge to rising edge, glitches merged away, never across a gap, a stall or
 * a lost edge), plus the settling cycles it sets aside, told apart by {@link #SETTLING}. Called on
 * the meter's thread with primitives only, so a listener that stores into primitive arrays keeps
 * the per-edge path free of allocation. Cycles held in the meter's look-ahead are reported when the
 * look-ahead ends (after its first {@code lookAheadCycles} cycles, or at the end of the stream).
 */
@FunctionalInterface
public interface CycleListener {
    /** The cycle is start-up settling: set aside, not in the measurement. */
    int SETTLING = 1;
    /** No cycle ended at this cycle's rising edge: it is the first after the start, a gap, a stall or a lost edge. */
    int NEW_RUN = 2;
    /** A glitch (runt pulse) was removed inside this cycle; its edges were merged into their neighbours. */
    int GLITCH_REMOVED = 4;

    /** A listener that ignores every cycle. */
    CycleListener NONE = (startTick, highTicks, lowTicks, flags) -> { };

    /**
     * One cycle, in ticks of the meter's timebase.
     *
     * @param startTick tick of the cycle's rising edge
     * @param highTicks rising to falling edge
     * @param lowTicks  falling edge to the next rising edge (the period is {@code highTicks + lowTicks})
     * @param flags     {@link #SETTLING}, {@link #NEW_RUN}, {@link #GLITCH_REMOVED}, or'ed; 0 for a plain measured cycle
     */
    void onCycle(long startTick, long highTicks, long lowTicks, int flags);
}
