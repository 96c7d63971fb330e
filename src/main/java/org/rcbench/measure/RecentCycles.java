package org.rcbench.measure;

/**
 * Ring buffer of the most recent accepted cycles (start tick, high ticks, low ticks, and whether a
 * break precedes the cycle) for live views: a waveform strip, a period histogram, rolling figures.
 * Allocation-free per cycle; not thread-safe.
 */
final class RecentCycles {
    private final long[] start;
    private final long[] high;
    private final long[] low;
    private final boolean[] afterBreak;
    private final int mask;
    private long written;

    /** @param capacity a power of two */
    RecentCycles(int capacity) {
        if (capacity < 2 || Integer.bitCount(capacity) != 1) {
            throw new IllegalArgumentException("capacity not a power of two >= 2: " + capacity);
        }
        start = new long[capacity];
        high = new long[capacity];
        low = new long[capacity];
        afterBreak = new boolean[capacity];
        mask = capacity - 1;
    }

    void add(long startTick, long highTicks, long lowTicks, boolean breakBefore) {
        int k = (int) (written & mask);
        start[k] = startTick;
        high[k] = highTicks;
        low[k] = lowTicks;
        afterBreak[k] = breakBefore;
        written++;
    }

    int capacity() {
        return mask + 1;
    }

    /** Cycles held, at most the capacity. */
    int size() {
        return (int) Math.min(written, mask + 1);
    }

    /**
     * Copies the newest {@code min(size(), arrays' length)} cycles, oldest first, into the arrays;
     * returns how many were copied.
     */
    int copyTo(long[] startTicks, long[] highTicks, long[] lowTicks) {
        int n = Math.min(size(), Math.min(startTicks.length, Math.min(highTicks.length, lowTicks.length)));
        for (int j = 0; j < n; j++) {
            int k = (int) ((written - n + j) & mask);
            startTicks[j] = start[k];
            highTicks[j] = high[k];
            lowTicks[j] = low[k];
        }
        return n;
    }

    /** Index-free access for the rolling figures: cycle {@code j} back from the newest (0 = newest). */
    long highBack(int j) {
        return high[(int) ((written - 1 - j) & mask)];
    }

    long lowBack(int j) {
        return low[(int) ((written - 1 - j) & mask)];
    }

    boolean breakBeforeBack(int j) {
        return afterBreak[(int) ((written - 1 - j) & mask)];
    }
}
