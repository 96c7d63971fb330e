package org.rcbench.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleSupplier;
import org.rcbench.edge.Timebase;
import org.rcbench.stability.StabilityPoint;

/**
 * The accumulators behind a {@link CycleMeter}: every accepted cycle updates them in constant time
 * without allocating, and {@link #build} turns them into a {@link Measurement}. Memory is fixed
 * except for the MTIE record, which grows up to its capacity and then stays there.
 * Not thread-safe.
 */
final class CycleStatistics {
    private final MeterConfig config;
    private final Timebase timebase;
    private final ExactMoments periods = new ExactMoments();
    private final ExactMoments highs = new ExactMoments();
    private final ExactMoments lows = new ExactMoments();
    private final ExactMoments cycleToCycle = new ExactMoments();
    private final StreamingAllan allan = new StreamingAllan();
    private final TrendRecord trend;
    private final RecentCycles recent;
    private final DoubleSupplier slopeNow;
    private FrequencyFit fit;
    private TimeErrorRecord timeError;

    private long reference;
    private int segment = -1;
    private long segmentStart;
    private long index;
    private long previousPeriod = -1;
    private long firstStart = -1;
    private long lastEnd = -1;
    private double driftT;
    private double driftTT;
    private double driftTP;
    private long driftP;

    CycleStatistics(MeterConfig config) {
        this.config = config;
        this.timebase = config.timebase();
        this.trend = new TrendRecord(config.trendCapacity());
        this.recent = new RecentCycles(config.recentCycles());
        this.slopeNow = () -> fit.result().slopeTicks();
        start(0);
    }

    /** Sets the reference period (ticks) learnt by the look-ahead; before any cycle is accepted. */
    void start(long referencePeriodTicks) {
        reference = Math.max(0, referencePeriodTicks);
        fit = new FrequencyFit(reference);
        timeError = new TimeErrorRecord(config.timeErrorCapacity(), reference);
    }

    RecentCycles recent() {
        return recent;
    }

    /** One accepted cycle; {@code afterBreak} when it does not follow the previous one directly. */
    void accept(long start, long high, long low, boolean afterBreak) {
        long period = high + low;
        if (afterBreak || segment < 0) {
            fit.closeSegment();
            allan.newSegment();
            segment++;
            segmentStart = start;
            index = 0;
            fit.add(0, 0);
            allan.add(0, 0);
            timeError.add(segment, 0, 0, slopeNow);
            previousPeriod = -1;
        }
        index++;
        long phase = start + period - segmentStart;
        fit.add(index, phase);
        allan.add(index, phase);
        timeError.add(segment, index, phase, slopeNow);

        periods.add(period);
        highs.add(high);
        lows.add(low);
        if (previousPeriod >= 0) {
            cycleToCycle.add(period - previousPeriod);
        }
        previousPeriod = period;

        if (firstStart < 0) {
            firstStart = start;
        }
        lastEnd = start + period;
        double t = start - firstStart;
        long dp = period - reference;
        driftT += t;
        driftTT += t * t;
        driftTP += t * dp;
        driftP += dp;

        trend.add(start, period);
        recent.add(start, high, low, afterBreak);
    }

    FrequencyTrend trend() {
        int n = trend.size();
        double[] time = new double[n];
        double[] freq = new double[n];
        long[] cycles = new long[n];
        for (int k = 0; k < n; k++) {
            time[k] = trend.middleTick(k) / timebase.ticksPerSecond();
            freq[k] = timebase.ticksPerSecond() / trend.meanPeriod(k);
            cycles[k] = trend.cycles(k);
        }
        return new FrequencyTrend(time, freq, cycles);
    }

    Measurement build(CycleMeter.Counts counts, boolean withWindows, int rollingCycles) {
        double tps = timebase.ticksPerSecond();
        FrequencyFit.Result result = fit.result();
        double periodSd = Math.sqrt(periods.variance());
        Measurement.FrequencyEstimate frequency = NoiseBudget.estimate(result, allan, periodSd, timebase);
        Measurement.TimeStats period = timeStats(periods, frequency.periodStandardUncertaintySeconds());
        Measurement.TimeStats high = timeStats(highs, Double.NaN);
        Measurement.TimeStats low = timeStats(lows, Double.NaN);
        double duty = highs.mean() / periods.mean();
        double uh = IntervalStats.meanUncertaintyTicks(highs);
        double ul = IntervalStats.meanUncertaintyTicks(lows);
        double p = periods.mean();
        double dutyU = Math.sqrt(Math.pow(lows.mean() / (p * p) * uh, 2) + Math.pow(highs.mean() / (p * p) * ul, 2));

        Measurement.TimeError tie = timeError(result, withWindows, frequency.periodSeconds());
        List<StabilityPoint> adev = allanPoints(result.slopeTicks());
        Measurement.Drift drift = WarmUp.analyse(trend, driftSlopePpmPerSecond(), tps);
        Measurement.Irregularities irregular = new Measurement.Irregularities(counts.settlingCycles(),
                counts.glitches(), counts.gaps(), counts.stalls(), counts.stalledTicks() / tps, counts.missedEdges(),
                segment + 1);
        Measurement.Jitter jitter = jitter(tps);
        List<String> warnings = Warnings.of(periods.count(), frequency, jitter, irregular, timeError.saturated());
        double span = firstStart < 0 ? Double.NaN : (lastEnd - firstStart) / tps;
        return new Measurement(config.channel(), periods.count(), counts.edges(), span, frequency, period, high, low,
                duty, dutyU, jitter, tie, adev, drift, irregular,
                Rolling.of(recent, Math.min(rollingCycles, recent.capacity()), tps), warnings);
    }

    private Measurement.TimeStats timeStats(ExactMoments m, double uncertaintyOverride) {
        return IntervalStats.of(m, timebase, uncertaintyOverride);
    }

    private Measurement.Jitter jitter(double tps) {
        double var = periods.variance();
        double c2cMs = cycleToCycle.meanSquare();
        double q2 = 1.0;
        double correctedVar = var - q2 / 6;
        double correctedC2c = c2cMs - q2 / 2;
        double c2cMax = cycleToCycle.count() == 0 ? Double.NaN
                : Math.max(Math.abs(cycleToCycle.min()), Math.abs(cycleToCycle.max())) / tps;
        double pp = periods.count() == 0 ? Double.NaN : (periods.max() - periods.min()) / tps;
        return new Measurement.Jitter(Math.sqrt(var) / tps, pp, Math.sqrt(c2cMs) / tps, c2cMax,
                Math.sqrt(Math.max(0, correctedVar)) / tps, Math.sqrt(Math.max(0, correctedC2c)) / tps,
                Math.sqrt(q2 / 6) / tps, correctedVar <= 0, correctedC2c <= 0);
    }

    private Measurement.TimeError timeError(FrequencyFit.Result result, boolean withWindows, double periodSeconds) {
        double tps = timebase.ticksPerSecond();
        double slope = result.slopeTicks();
        if (!(slope > 0)) {
            return new Measurement.TimeError(Double.NaN, Double.NaN, List.of(), timeError.blockLength());
        }
        double tieRms = Math.sqrt(result.residualSumSquares() / result.points()) / tps;
        double mtie = timeError.wholeMtie(slope) / tps;
        List<Measurement.MtiePoint> windows = new ArrayList<>();
        if (withWindows) {
            long[] w = config.mtieWindowsCycles().isEmpty() ? timeError.octaveWindows()
                    : config.mtieWindowsCycles().stream().mapToLong(Long::longValue).toArray();
            double[] values = timeError.windowMtie(slope, w);
            for (int k = 0; k < w.length; k++) {
                if (!Double.isNaN(values[k])) {
                    windows.add(new Measurement.MtiePoint(w[k], w[k] * periodSeconds, values[k] / tps));
                }
            }
        }
        return new Measurement.TimeError(tieRms, mtie, windows, timeError.blockLength());
    }

    /** Octave overlapping ADEV points holding at least two independent second differences. */
    private List<StabilityPoint> allanPoints(double slopeTicks) {
        List<StabilityPoint> points = new ArrayList<>();
        if (!(slopeTicks > 0)) {
            return points;
        }
        double tau0 = slopeTicks / timebase.ticksPerSecond();
        for (int k = 0; k < allan.octaves(); k++) {
            if (allan.equivalentTerms(k) < 2) {
                break;
            }
            double m = 1L << k;
            double adev = Math.sqrt(allan.meanSquare(k) / (2 * m * m * slopeTicks * slopeTicks));
            points.add(new StabilityPoint(m * tau0, adev, allan.terms(k)));
        }
        return points;
    }

    /**
     * Least-squares slope of period against time over the accepted cycles, ppm of the mean period
     * per second. Periods are summed as offsets from the reference (exact, small) and times as
     * doubles from the first cycle; the centred sums lose only a few bits.
     */
    private double driftSlopePpmPerSecond() {
        long n = periods.count();
        if (n < 3) {
            return Double.NaN;
        }
        double stt = driftTT - driftT * driftT / n;
        double stp = driftTP - driftT * (double) driftP / n;
        if (!(stt > 0)) {
            return Double.NaN;
        }
        return stp / stt / periods.mean() * 1e6 * timebase.ticksPerSecond();
    }
}
