package org.rcbench.sim;

/**
 * Pending edges of a simulated board, earliest first: a binary min-heap on (time, insertion order)
 * in parallel primitive arrays, so that edges scheduled for the same instant come out in the order
 * they were scheduled. Grows by doubling (rarely: a board keeps a handful pending); otherwise
 * allocation-free. Not thread-safe.
 */
final class EventQueue {
    private double[] times = new double[64];
    private long[] order = new long[64];
    private int[] channels = new int[64];
    private int[] levels = new int[64];
    private int size;
    private long added;

    boolean isEmpty() {
        return size == 0;
    }

    /** Time of the earliest pending edge, +inf when none. */
    double peekTime() {
        return size == 0 ? Double.POSITIVE_INFINITY : times[0];
    }

    int peekChannel() {
        return channels[0];
    }

    int peekLevel() {
        return levels[0];
    }

    void add(double time, int channel, int level) {
        if (size == times.length) {
            grow();
        }
        int i = size++;
        long seq = added++;
        // Sift up: move parents that come later down into the hole.
        while (i > 0) {
            int parent = (i - 1) >>> 1;
            if (!before(time, seq, times[parent], order[parent])) {
                break;
            }
            move(parent, i);
            i = parent;
        }
        set(i, time, seq, channel, level);
    }

    /** Removes the earliest pending edge (read it first with the peek methods). */
    void pop() {
        size--;
        if (size == 0) {
            return;
        }
        double t = times[size];
        long s = order[size];
        int c = channels[size];
        int l = levels[size];
        int i = 0;
        while (true) {
            int child = 2 * i + 1;
            if (child >= size) {
                break;
            }
            if (child + 1 < size && before(times[child + 1], order[child + 1], times[child], order[child])) {
                child++;
            }
            if (!before(times[child], order[child], t, s)) {
                break;
            }
            move(child, i);
            i = child;
        }
        set(i, t, s, c, l);
    }

    private static boolean before(double t1, long s1, double t2, long s2) {
        return t1 < t2 || (t1 == t2 && s1 < s2);
    }

    private void move(int from, int to) {
        times[to] = times[from];
        order[to] = order[from];
        channels[to] = channels[from];
        levels[to] = levels[from];
    }

    private void set(int i, double t, long s, int c, int l) {
        times[i] = t;
        order[i] = s;
        channels[i] = c;
        levels[i] = l;
    }

    private void grow() {
        int n = times.length * 2;
        times = java.util.Arrays.copyOf(times, n);
        order = java.util.Arrays.copyOf(order, n);
        channels = java.util.Arrays.copyOf(channels, n);
        levels = java.util.Arrays.copyOf(levels, n);
    }
}
