package org.rcbench.measure;

import java.math.BigInteger;

/**
 * A 128-bit two's-complement accumulator of 64-bit values and products, so that sums of ticks,
 * squared ticks and index-times-ticks stay exact over any realistic capture. Overflow of the
 * 128-bit range throws {@link ArithmeticException} rather than wrapping. Not thread-safe.
 */
final class ExactSum {
    private long lo;
    private long hi;

    /** Adds {@code v}. */
    void add(long v) {
        long r = lo + v;
        // Unsigned carry out of the low word; v's high word is its sign extension.
        long carry = Long.compareUnsigned(r, lo) < 0 ? 1 : 0;
        hi = Math.addExact(hi, (v >> 63) + carry);
        lo = r;
    }

    /** Adds the exact product {@code a * b}. */
    void addProduct(long a, long b) {
        long pl = a * b;
        long ph = Math.multiplyHigh(a, b);
        long r = lo + pl;
        long carry = Long.compareUnsigned(r, lo) < 0 ? 1 : 0;
        hi = Math.addExact(hi, ph + carry);
        lo = r;
    }

    void reset() {
        lo = 0;
        hi = 0;
    }

    BigInteger value() {
        BigInteger low = BigInteger.valueOf(lo >>> 1).shiftLeft(1).or(BigInteger.valueOf(lo & 1));
        return BigInteger.valueOf(hi).shiftLeft(64).add(low);
    }
}
