package org.rcbench.capture;

/**
 * Converts probe ticks to VCD time units, exactly whenever the ratio of the two is rational with
 * small terms, so that a capture written to VCD and read back keeps every edge.
 *
 * <p>{@code units = tick * 10^-e / clockHz}. When {@code clockHz} is a whole number the ratio is
 * the fraction {@code num/den} in lowest terms and the result is {@code q*num + round(r*num/den)}
 * with {@code tick = q*den + r}: exact integer arithmetic, rounding half up, monotonic in
 * {@code tick}. Otherwise it falls back to {@code Math.round(tick * ratio)}. Immutable.
 */
final class TickScaler {
    private final long num;
    private final long den;
    private final double ratio;

    TickScaler(double clockHz, VcdTimescale timescale) {
        this.ratio = timescale.clockHz() / clockHz;
        long n = 0;
        long d = 0;
        if (clockHz == Math.rint(clockHz) && clockHz <= 1e15 && clockHz >= 1) {
            long clock = (long) clockHz;
            int e = timescale.exponent();
            n = e <= 0 ? pow10(-e) : 1;
            d = e <= 0 ? clock : clock * pow10(e);
            long g = gcd(n, d);
            n /= g;
            d /= g;
        }
        this.num = n;
        this.den = d;
    }

    /**
     * VCD time of {@code tick}.
     *
     * @throws IllegalArgumentException when the time does not fit in 63 bits at this timescale
     */
    long units(long tick) {
        try {
            if (den > 0) {
                long q = tick / den;
                long r = tick % den;
                long whole = Math.multiplyExact(q, num);
                long part;
                if (r == 0) {
                    part = 0;
                } else if (num <= (Long.MAX_VALUE - den) / den) {
                    // r < den, so r*num + den/2 < den*num + den <= MAX: no overflow.
                    part = (r * num + den / 2) / den;
                } else {
                    part = Math.round((double) r * num / den);
                }
                return Math.addExact(whole, part);
            }
            double v = Math.rint(tick * ratio);
            if (v >= 0x1p63) {
                throw new ArithmeticException("overflow");
            }
            return (long) v;
        } catch (ArithmeticException e) {
            throw new IllegalArgumentException("tick " + tick + " is beyond the range of VCD times at this timescale;"
                    + " choose a coarser one");
        }
    }

    private static long pow10(int k) {
        long v = 1;
        for (int i = 0; i < k; i++) {
            v *= 10;
        }
        return v;
    }

    private static long gcd(long a, long b) {
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return a;
    }
}
