package org.rcbench.measure;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;

/**
 * Count, exact sum, exact sum of squares, minimum and maximum of integer tick values. The mean and
 * variance are computed from the exact sums at read time, so no cancellation can occur however
 * long the capture. Allocation-free per value; not thread-safe.
 */
final class ExactMoments {
    private long count;
    private final ExactSum sum = new ExactSum();
    private final ExactSum sumSquares = new ExactSum();
    private long min = Long.MAX_VALUE;
    private long max = Long.MIN_VALUE;

    void add(long v) {
        count++;
        sum.add(v);
        sumSquares.addProduct(v, v);
        if (v < min) {
            min = v;
        }
        if (v > max) {
            max = v;
        }
    }

    long count() {
        return count;
    }

    /** Mean in ticks; {@code NaN} when empty. */
    double mean() {
        if (count == 0) {
            return Double.NaN;
        }
        return new BigDecimal(sum.value()).divide(BigDecimal.valueOf(count), MathContext.DECIMAL64).doubleValue();
    }

    /** Sample variance (divisor {@code n - 1}) in ticks squared; {@code NaN} for fewer than two values. */
    double variance() {
        if (count < 2) {
            return Double.NaN;
        }
        BigInteger n = BigInteger.valueOf(count);
        BigInteger s = sum.value();
        BigInteger num = n.multiply(sumSquares.value()).subtract(s.multiply(s));
        BigInteger den = n.multiply(BigInteger.valueOf(count - 1));
        return new BigDecimal(num).divide(new BigDecimal(den), MathContext.DECIMAL64).doubleValue();
    }

    /** Mean of squares in ticks squared; {@code NaN} when empty. */
    double meanSquare() {
        if (count == 0) {
            return Double.NaN;
        }
        return new BigDecimal(sumSquares.value()).divide(BigDecimal.valueOf(count), MathContext.DECIMAL64)
                .doubleValue();
    }

    long min() {
        return min;
    }

    long max() {
        return max;
    }
}
