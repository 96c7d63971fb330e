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
        int top = index == 0 ? LEVELS - 1 : Math.min(LEVELS - 1, Long.numberOfTrailingZeros(index));
        for (int level = 0; level <= top; level++) {
            long c = counts[level];
            int base = level * RING;
            ring[base + (int) (c & MASK)] = phaseTicks;
            counts[level] = c + 1;
            if (level == 0) {
                term(0, base, c, 1, phaseTicks);
                term(1, base, c, 2, phaseTicks);
                term(2, base, c, 4, phaseTicks);
                term(3, base, c, 8, phaseTicks);
            } else {
                term(level + 3, base, c, 8, phaseTicks);
            }
        }
    }

    private void term(int octave, int base, long c, int lag, long x) {
        if (c >= 2L * lag) {
            long d = x - 2 * ring[base + (int) ((c - lag) & MASK)] + ring[base + (int) ((c - 2L * lag) & MASK)];
            double dd = d;
            sumSquares[octave] += dd * dd;
            terms[octave]++;
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
