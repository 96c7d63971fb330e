package org.rcbench.measure;

/**
 * Robust running estimate of the typical high, low and period over the most recent cycles: the
 * medians of the last {@value #SIZE} cycles, recomputed every {@value #EVERY} cycles by
 * quickselect on scratch arrays. A median ignores a minority of odd cycles (power-up, glitches that
 * slipped through, a stall), and recomputing it every few dozen cycles lets it follow a frequency
 * that is being tuned. Allocation-free; not thread-safe.
 */
final class RecentMedians {
    static final int SIZE = 63;
    static final int EVERY = 128;

    private final long[] highs = new long[SIZE];
    private final long[] lows = new long[SIZE];
    private final long[] scratch = new long[SIZE];
    private int filled;
    private int next;
    private int sinceUpdate;
    private long high;
    private long low;

    /** Seeds the estimate directly (from the look-ahead). */
    void seed(long typicalHigh, long typicalLow) {
        high = typicalHigh;
        low = typicalLow;
    }

    void add(long highTicks, long lowTicks) {
        highs[next] = highTicks;
        lows[next] = lowTicks;
        next = next + 1 == SIZE ? 0 : next + 1;
        if (filled < SIZE) {
            filled++;
        }
        if (++sinceUpdate >= EVERY && filled >= SIZE / 2) {
            sinceUpdate = 0;
            high = median(highs, filled, scratch);
            low = median(lows, filled, scratch);
        }
    }

    long high() {
        return high;
    }

    long low() {
        return low;
    }

    long period() {
        return high + low;
    }

    /** Median of the first {@code n} values (the upper median for even {@code n}), using {@code scratch}. */
    static long median(long[] values, int n, long[] scratch) {
        System.arraycopy(values, 0, scratch, 0, n);
        return select(scratch, 0, n - 1, n / 2);
    }

    private static long select(long[] a, int left, int right, int k) {
        while (left < right) {
            long pivot = a[(left + right) >>> 1];
            int i = left;
            int j = right;
            while (i <= j) {
                while (a[i] < pivot) {
                    i++;
                }
                while (a[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    long t = a[i];
                    a[i] = a[j];
                    a[j] = t;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                right = j;
            } else if (k >= i) {
                left = i;
            } else {
                return a[k];
            }
        }
        return a[left];
    }
}
