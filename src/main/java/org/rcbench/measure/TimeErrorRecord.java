package org.rcbench.measure;

import java.util.ArrayList;
import java.util.List;

/**
 * Time interval error of the rising edges against the fitted period, kept in bounded memory for
 * MTIE (ITU-T G.810: {@code MTIE(n)} is the largest peak-to-peak time error over any window of
 * {@code n + 1} consecutive edges).
 *
 * <p>The best period is known only at the end, so each edge's error is stored against a reference
 * period {@code R} as {@code u_i = t_i - t_0 - i R} and corrected by {@code -(b - R) i} once the
 * fitted period {@code b} is known. Up to {@code capacity} edges are stored one per slot, which
 * makes MTIE exact. When the record fills, adjacent slots of the same segment are merged into
 * blocks holding the minimum and maximum of their errors (block length doubles each time) and the
 * reference is moved to the current fitted period; a block's correction is then applied at its
 * middle, which is off by at most {@code |b - R| * length / 2} ticks, negligible once {@code R}
 * comes from a million cycles. Windows shorter than a block are no longer reported, and windows are
 * counted in whole blocks: the resolution is reported. Memory: 28 bytes per slot, allocated as
 * the record grows. Not thread-safe.
 */
final class TimeErrorRecord {
    private final int capacity;
    private double reference;
    private long blockLength = 1;
    private int size;
    private double[] min = new double[1024];
    private double[] max = new double[1024];
    private long[] first = new long[1024];
    private int[] count = new int[1024];
    private int[] segment = new int[1024];
    private boolean saturated;

    TimeErrorRecord(int capacity, double referenceTicks) {
        if (capacity < 16) {
            throw new IllegalArgumentException("capacity < 16: " + capacity);
        }
        this.capacity = capacity;
        this.reference = referenceTicks;
    }

    /**
     * Adds edge {@code i} of segment {@code seg} at {@code ticks} from the segment start.
     * {@code currentSlope} supplies the fitted period if the record must be compacted.
     */
    void add(int seg, long i, long ticks, java.util.function.DoubleSupplier currentSlope) {
        if (saturated) {
            return;
        }
        double u = ticks - i * reference;
        int last = size - 1;
        if (last >= 0 && segment[last] == seg && count[last] < blockLength) {
            if (u < min[last]) {
                min[last] = u;
            }
            if (u > max[last]) {
                max[last] = u;
            }
            count[last]++;
            return;
        }
        if (size == capacity) {
            compact(currentSlope.getAsDouble());
            if (size > capacity - capacity / 8) {
                saturated = true;
                return;
            }
            add(seg, i, ticks, currentSlope);
            return;
        }
        if (size == min.length) {
            grow();
        }
        min[size] = u;
        max[size] = u;
        first[size] = i;
        count[size] = 1;
        segment[size] = seg;
        size++;
    }

    /** True when so many segments filled the record that later edges were not kept. */
    boolean saturated() {
        return saturated;
    }

    /** Edges per block: 1 while MTIE is exact. */
    long blockLength() {
        return blockLength;
    }

    private void grow() {
        int n = Math.min(capacity, min.length * 2);
        min = java.util.Arrays.copyOf(min, n);
        max = java.util.Arrays.copyOf(max, n);
        first = java.util.Arrays.copyOf(first, n);
        count = java.util.Arrays.copyOf(count, n);
        segment = java.util.Arrays.copyOf(segment, n);
    }

    private void compact(double newReference) {
        double shift = Double.isFinite(newReference) ? newReference - reference : 0;
        int out = 0;
        for (int k = 0; k < size; k++) {
            double c = shift * middle(k);
            double lo = min[k] - c;
            double hi = max[k] - c;
            if (out > 0 && segment[out - 1] == segment[k] && count[out - 1] < 2 * blockLength
                    && count[out - 1] + count[k] <= 2 * blockLength) {
                int o = out - 1;
                min[o] = Math.min(min[o], lo);
                max[o] = Math.max(max[o], hi);
                count[o] += count[k];
            } else {
                min[out] = lo;
                max[out] = hi;
                first[out] = first[k];
                count[out] = count[k];
                segment[out] = segment[k];
                out++;
            }
        }
        size = out;
        blockLength *= 2;
        reference += shift;
    }

    private double middle(int k) {
        return first[k] + (count[k] - 1) / 2.0;
    }

    /**
     * Largest peak-to-peak error within one segment, ticks, against fitted period {@code slope};
     * {@code NaN} when empty.
     */
    double wholeMtie(double slope) {
        double best = Double.NaN;
        double delta = slope - reference;
        int k = 0;
        while (k < size) {
            int seg = segment[k];
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (; k < size && segment[k] == seg; k++) {
                double c = delta * middle(k);
                lo = Math.min(lo, min[k] - c);
                hi = Math.max(hi, max[k] - c);
            }
            double pp = hi - lo;
            if (!(best >= pp)) {
                best = pp;
            }
        }
        return best;
    }

    /**
     * MTIE in ticks for each window of {@code windows[w]} cycles ({@code windows[w] + 1} edges)
     * against fitted period {@code slope}: {@code NaN} where no window of that length fits in one
     * segment or the window is shorter than a block. Uses monotonic queues over blocks, O(size) per
     * window.
     */
    double[] windowMtie(double slope, long[] windows) {
        double delta = slope - reference;
        double[] lo = new double[size];
        double[] hi = new double[size];
        for (int k = 0; k < size; k++) {
            double c = delta * middle(k);
            lo[k] = min[k] - c;
            hi[k] = max[k] - c;
        }
        double[] result = new double[windows.length];
        int[] maxQ = new int[Math.max(1, size)];
        int[] minQ = new int[Math.max(1, size)];
        for (int w = 0; w < windows.length; w++) {
            result[w] = slide(lo, hi, windows[w] + 1, maxQ, minQ);
        }
        return result;
    }

    private double slide(double[] lo, double[] hi, long edges, int[] maxQ, int[] minQ) {
        double best = Double.NaN;
        int left = 0;
        long inWindow = 0;
        int maxHead = 0;
        int maxTail = 0;
        int minHead = 0;
        int minTail = 0;
        for (int right = 0; right < size; right++) {
            if (right > 0 && segment[right] != segment[right - 1]) {
                left = right;
                inWindow = 0;
                maxHead = maxTail = minHead = minTail = 0;
            }
            inWindow += count[right];
            while (maxTail > maxHead && hi[maxQ[maxTail - 1]] <= hi[right]) {
                maxTail--;
            }
            maxQ[maxTail++] = right;
            while (minTail > minHead && lo[minQ[minTail - 1]] >= lo[right]) {
                minTail--;
            }
            minQ[minTail++] = right;
            while (inWindow > edges && left <= right) {
                inWindow -= count[left];
                left++;
                while (maxHead < maxTail && maxQ[maxHead] < left) {
                    maxHead++;
                }
                while (minHead < minTail && minQ[minHead] < left) {
                    minHead++;
                }
            }
            // Only windows that are full (as long as asked, to block resolution) count.
            if (left <= right && inWindow + blockLength > edges && inWindow >= Math.min(edges, 2)) {
                double pp = hi[maxQ[maxHead]] - lo[minQ[minHead]];
                if (!(best >= pp)) {
                    best = pp;
                }
            }
        }
        return best;
    }

    /** Octave windows 1, 2, 4 ... cycles up to the longest segment, as a default. */
    long[] octaveWindows() {
        long longest = 0;
        int k = 0;
        while (k < size) {
            int seg = segment[k];
            long edges = 0;
            for (; k < size && segment[k] == seg; k++) {
                edges += count[k];
            }
            longest = Math.max(longest, edges - 1);
        }
        List<Long> out = new ArrayList<>();
        for (long n = 1; n <= longest; n *= 2) {
            if (n + 1 >= blockLength) {
                out.add(n);
            }
        }
        long[] a = new long[out.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = out.get(i);
        }
        return a;
    }
}
