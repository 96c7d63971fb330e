package org.rcbench.measure;

/**
 * Mean period against time, decimated to at most {@code capacity} points: each point covers
 * {@code blockLength} consecutive accepted cycles, and when the record fills, neighbouring points
 * merge pairwise and the block length doubles. Feeds the frequency-versus-time trend and the
 * warm-up analysis. Allocation-free per cycle; not thread-safe.
 */
final class TrendRecord {
    private final long[] startTick;
    private final long[] endTick;
    private final long[] cycles;
    private final long[] periodSum;
    private int size;
    private long blockLength = 1;

    TrendRecord(int capacity) {
        if (capacity < 4 || capacity % 2 != 0) {
            throw new IllegalArgumentException("capacity not an even number >= 4: " + capacity);
        }
        startTick = new long[capacity];
        endTick = new long[capacity];
        cycles = new long[capacity];
        periodSum = new long[capacity];
    }

    void add(long start, long periodTicks) {
        int last = size - 1;
        if (last >= 0 && cycles[last] < blockLength) {
            cycles[last]++;
            periodSum[last] += periodTicks;
            endTick[last] = start + periodTicks;
            return;
        }
        if (size == startTick.length) {
            merge();
        }
        startTick[size] = start;
        endTick[size] = start + periodTicks;
        cycles[size] = 1;
        periodSum[size] = periodTicks;
        size++;
    }

    private void merge() {
        int half = size / 2;
        for (int k = 0; k < half; k++) {
            int a = 2 * k;
            startTick[k] = startTick[a];
            endTick[k] = endTick[a + 1];
            cycles[k] = cycles[a] + cycles[a + 1];
            periodSum[k] = periodSum[a] + periodSum[a + 1];
        }
        size = half;
        blockLength *= 2;
    }

    int size() {
        return size;
    }

    long cycles(int k) {
        return cycles[k];
    }

    /** Mean period of point {@code k}, ticks. */
    double meanPeriod(int k) {
        return (double) periodSum[k] / cycles[k];
    }

    /** Middle of point {@code k} in ticks since the capture started. */
    double middleTick(int k) {
        return (startTick[k] + (double) endTick[k]) / 2.0;
    }

    long blockLength() {
        return blockLength;
    }
}
