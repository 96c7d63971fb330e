package org.rcbench.measure;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * Least-squares fit of rising-edge tick against cycle index, with one intercept per segment (a
 * segment is a run of cycles between gaps or stalls, whose cycle count across the break is unknown)
 * and a common slope: the mean period in ticks.
 *
 * <p>Points are {@code (i, u_i)} with {@code u_i = t_i - t_0 - i * reference}, {@code t} in ticks
 * and {@code reference} a whole number of ticks close to the period, so the sums stay small; they
 * are kept exactly in 128 bits ({@link ExactSum}), and the centred sums
 * {@code Sxx = n(n^2-1)/12}, {@code Sxy = sum(i u) - (n-1)/2 sum(u)}, {@code Syy = sum(u^2) - (sum u)^2/n}
 * are formed in 60-digit decimal arithmetic when read, so the residual sum of squares
 * {@code Syy - Sxy^2/Sxx} is exact however long the capture (a plain double sum would lose it to
 * cancellation after some thousands of cycles). Pooled over segments as in an analysis of
 * covariance. Allocation-free per point; allocation when a segment closes and on reading.
 * Not thread-safe.
 */
final class FrequencyFit {
    private static final MathContext MC = new MathContext(60);

    private final long reference;
    private long n;
    private final ExactSum sumU = new ExactSum();
    private final ExactSum sumIU = new ExactSum();
    private final ExactSum sumUU = new ExactSum();

    private BigDecimal pooledSxx = BigDecimal.ZERO;
    private BigDecimal pooledSxy = BigDecimal.ZERO;
    private BigDecimal pooledSyy = BigDecimal.ZERO;
    private long closedPoints;
    private int closedSegments;
    private double closedRandomWalkSum;
    private double closedFloorWeightSum;

    FrequencyFit(long referenceTicks) {
        this.reference = referenceTicks;
    }

    long reference() {
        return reference;
    }

    /** Adds point {@code i} (0, 1, 2 ... within the open segment) at {@code ticksFromSegmentStart}. */
    void add(long i, long ticksFromSegmentStart) {
        long u = ticksFromSegmentStart - i * reference;
        n++;
        sumU.add(u);
        sumIU.addProduct(i, u);
        sumUU.addProduct(u, u);
    }

    /** Ends the open segment; the next {@link #add} with {@code i = 0} starts another. */
    void closeSegment() {
        if (n >= 2) {
            BigDecimal[] c = centred();
            pooledSxx = pooledSxx.add(c[0], MC);
            pooledSxy = pooledSxy.add(c[1], MC);
            pooledSyy = pooledSyy.add(c[2], MC);
            closedPoints += n;
            closedSegments++;
            closedRandomWalkSum += randomWalkSum(n);
            double sxx = c[0].doubleValue();
            closedFloorWeightSum += sxx * sxx / (6.0 * (n - 1) * (n - 1));
        }
        n = 0;
        sumU.reset();
        sumIU.reset();
        sumUU.reset();
    }

    /** The fit so far, including the open segment. */
    Result result() {
        BigDecimal sxx = pooledSxx;
        BigDecimal sxy = pooledSxy;
        BigDecimal syy = pooledSyy;
        long points = closedPoints;
        int segments = closedSegments;
        double rw = closedRandomWalkSum;
        double floorWeights = closedFloorWeightSum;
        if (n >= 2) {
            BigDecimal[] c = centred();
            sxx = sxx.add(c[0], MC);
            sxy = sxy.add(c[1], MC);
            syy = syy.add(c[2], MC);
            points += n;
            segments++;
            rw += randomWalkSum(n);
            double s = c[0].doubleValue();
            floorWeights += s * s / (6.0 * (n - 1) * (n - 1));
        }
        if (segments == 0 || sxx.signum() == 0) {
            return new Result(Double.NaN, Double.NaN, 0, 0, 0, 0, 0);
        }
        BigDecimal slopeOffset = sxy.divide(sxx, MC);
        double slope = reference + slopeOffset.doubleValue();
        double ssr = syy.subtract(sxy.multiply(slopeOffset, MC), MC).doubleValue();
        double sxxD = sxx.doubleValue();
        return new Result(slope, Math.max(0, ssr), points, segments, sxxD, rw, floorWeights / (sxxD * sxxD));
    }

    /** {@code [Sxx, Sxy, Syy]} of the open segment. */
    private BigDecimal[] centred() {
        BigDecimal nn = BigDecimal.valueOf(n);
        BigDecimal su = new BigDecimal(sumU.value());
        BigDecimal sxx = nn.multiply(nn.multiply(nn).subtract(BigDecimal.ONE)).divide(BigDecimal.valueOf(12), MC);
        BigDecimal sxy = new BigDecimal(sumIU.value())
                .subtract(su.multiply(BigDecimal.valueOf(n - 1)).divide(BigDecimal.valueOf(2), MC), MC);
        BigDecimal syy = new BigDecimal(sumUU.value()).subtract(su.multiply(su).divide(nn, MC), MC);
        return new BigDecimal[] {sxx, sxy, syy};
    }

    /**
     * {@code sum_k (sum_{i>k} (i - mean i))^2 = n (n^4 - 1) / 120} for {@code n} points: the factor
     * by which a random walk of unit steps (white frequency noise) enters the slope's variance as
     * {@code sigma^2 * sum / Sxx^2}, which for one segment gives {@code 6 (n^2+1) / (5 n (n^2-1))}
     * (derived; uses {@code sum_{j=1}^{n-1} j^2 (n-j)^2 = n(n^4-1)/30}).
     */
    static double randomWalkSum(long n) {
        double d = n;
        return d * (d * d * d * d - 1) / 120.0;
    }

    /**
     * The fit.
     *
     * @param slopeTicks          mean period in ticks per cycle ({@code NaN} with fewer than two points)
     * @param residualSumSquares  residual sum of squares, ticks squared
     * @param points              points fitted
     * @param segments            segments (one intercept each)
     * @param sxx                 pooled {@code Sxx}, cycles squared
     * @param randomWalkSum       pooled {@link #randomWalkSum(long)}
     * @param floorVariance       slope variance in ticks^2 per cycle^2 from one uniform tick error at
     *                            each end of every segment, {@code sum_s (Sxx_s/Sxx)^2 / (6 (n_s-1)^2)}
     */
    record Result(double slopeTicks, double residualSumSquares, long points, int segments, double sxx,
            double randomWalkSum, double floorVariance) {
    }
}
