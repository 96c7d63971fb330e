package org.rcbench.measure;

import org.rcbench.edge.Timebase;

/** Turns exact tick moments into {@link Measurement.TimeStats} with a standard uncertainty. Stateless. */
final class IntervalStats {
    private IntervalStats() {
    }

    /**
     * Statistics in seconds; {@code uncertaintyOverride} (seconds) replaces the computed standard
     * uncertainty unless it is {@code NaN}. All {@code NaN} when empty.
     */
    static Measurement.TimeStats of(ExactMoments m, Timebase timebase, double uncertaintyOverride) {
        double tps = timebase.ticksPerSecond();
        if (m.count() == 0) {
            return new Measurement.TimeStats(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double mean = m.mean();
        double u = uncertaintyOverride;
        if (Double.isNaN(u)) {
            double stat = meanUncertaintyTicks(m);
            double clock = mean * timebase.tolerancePpm() * 1e-6;
            u = Math.sqrt(stat * stat + clock * clock) / tps;
        }
        double sd = m.count() >= 2 ? Math.sqrt(m.variance()) / tps : Double.NaN;
        return new Measurement.TimeStats(m.count(), mean / tps, sd, m.min() / tps, m.max() / tps, u);
    }

    /**
     * Standard uncertainty of a mean interval in ticks, without the probe clock: the spread over
     * root n when the readings spread over a tick or more (quantization then averages), else that
     * plus the single-reading floor tick/sqrt(6) (identical readings share one quantization error,
     * so nothing averages; check-values.md: variance q^2/6 per interval).
     */
    static double meanUncertaintyTicks(ExactMoments m) {
        double var = m.count() >= 2 ? m.variance() : 0;
        double stat = var / m.count();
        return Math.sqrt(var >= 1 ? stat : stat + 1.0 / 6);
    }
}
