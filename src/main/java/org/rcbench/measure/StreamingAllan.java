package org.rcbench.measure;

/**
 * Overlapping Allan deviation of the edge phase at octave averaging factors {@code m = 2^k},
 * accumulated as the edges arrive, in constant memory.
 *
 * <p>Level {@code j} keeps the phase (ticks from the segment start) decimated by {@code 2^j} in a
 * ring of 32 samples. The squared second differences {@code (x[i+2m] - 2 x[i+m] + x[i])^2} are
 * taken every sample for {@code m = 1, 2, 4, 8} (fully overlapping, NIST SP 1065 section 5.2.4)
 * and every {@code m/8} samples for larger {@code m} (level {@code log2(m) - 3}, eight samples per
 * {@code m}). Decimating phase is exact for these terms (they read phase at three instants), so
 * the only cost is a little statistical confidence against the fully overlapping estimator, which
 * is {@link org.rcbench.stability.AllanDeviation#strided} with stride {@code max(1, m/8)}. Each
 * cycle costs about five terms; all arithmetic on ticks is exact in {@code long}. Segments (runs
 * between gaps) are accumulated separately and the sums pooled. Not thread-safe.
 */
final class StreamingAllan {
    static final int LEVELS = 40;
    private static final int RING = 32;
    private static final int MASK = RING - 1;
    private static final int FIRST_STRIDED_OCTAVE = 4;

    private final long[] ring = new long[LEVELS * RING];
    private final long[] counts = new long[LEVELS];
    private final double[] sumSquares = new double[LEVELS + 3];
    private final long[] terms = new long[LEVELS + 3];

    /** Starts a new segment: phase continuity is lost. */
    void newSegment() {
        java.util.Arrays.fill(counts, 0);
    }

    /** The phase of sample {@code index} (0, 1, 2 ... within the segment), in ticks from the segment start. */
    void add(long index, long phaseTicks) {
        addLevelZero(phaseTicks);
        int top = index == 0 ? LEVELS - 1 : Math.min(LEVELS - 1, Long.numberOfTrailingZeros(index));
        for (int level = 1; level <= top; level++) {
            long c = counts[level];
            int base = level * RING;
            ring[base + (int) (c & MASK)] = phaseTicks;
            counts[level] = c + 1;
            if (c >= 16) {
                long d = phaseTicks - 2 * ring[base + (int) ((c - 8) & MASK)] + ring[base + (int) ((c - 16) & MASK)];
                double dd = d;
                sumSquares[level + 3] += dd * dd;
                terms[level + 3]++;
            }
        }
    }

    /** Level 0, every sample: lags 1, 2, 4 and 8, written out for speed. */
    private void addLevelZero(long x) {
        long c = counts[0];
        int p = (int) (c & MASK);
        ring[p] = x;
        counts[0] = c + 1;
        if (c >= 16) {
            double d1 = x - 2 * ring[(p - 1) & MASK] + ring[(p - 2) & MASK];
            double d2 = x - 2 * ring[(p - 2) & MASK] + ring[(p - 4) & MASK];
            double d4 = x - 2 * ring[(p - 4) & MASK] + ring[(p - 8) & MASK];
            double d8 = x - 2 * ring[(p - 8) & MASK] + ring[(p - 16) & MASK];
            sumSquares[0] += d1 * d1;
            sumSquares[1] += d2 * d2;
            sumSquares[2] += d4 * d4;
            sumSquares[3] += d8 * d8;
            terms[0]++;
            terms[1]++;
            terms[2]++;
            terms[3]++;
            return;
        }
        for (int k = 0; k < 4; k++) {
            int lag = 1 << k;
            if (c >= 2L * lag) {
                double d = x - 2 * ring[(p - lag) & MASK] + ring[(p - 2 * lag) & MASK];
                sumSquares[k] += d * d;
                terms[k]++;
            }
        }
    }

    /** Octaves {@code k} (so {@code m = 2^k}) that have terms. */
    int octaves() {
        int k = 0;
        while (k < terms.length && terms[k] > 0) {
            k++;
        }
        return k;
    }

    /** Mean squared second difference at {@code m = 2^k}, ticks squared. */
    double meanSquare(int k) {
        return sumSquares[k] / terms[k];
    }

    long terms(int k) {
        return terms[k];
    }

    /** Spacing in samples between successive terms at octave {@code k}. */
    static long stride(int k) {
        return k < FIRST_STRIDED_OCTAVE ? 1 : 1L << (k - 3);
    }

    /** Roughly how many independent second differences octave {@code k} holds: {@code terms * stride / m}. */
    double equivalentTerms(int k) {
        return (double) terms[k] * stride(k) / (1L << k);
    }
}
