package org.rcbench.gui;

import org.rcbench.measure.Measurement;

/**
 * The mean high and low time the diagnosis and the trimmer guide work from, over the averaging
 * window the user chose (so a part swapped or a knob turned shows within that window), with
 * standard uncertainties of the means. Over the whole run these are the core's figures; over the
 * newest {@code n} cycles they are recomputed from the frame's recent cycles by the core's rule
 * for a mean interval: the spread over root n, or, when the readings spread over less than a tick,
 * that plus the single-reading quantization floor tick/sqrt(6) (check-values.md: variance q²/6
 * per interval). Neither includes the probe clock, which is {@code clockRelative} for all alike.
 *
 * @param cycles        cycles averaged
 * @param highSeconds   mean high time
 * @param highU         its standard uncertainty without the clock, seconds
 * @param lowSeconds    mean low time
 * @param lowU          its standard uncertainty without the clock, seconds
 * @param clockRelative the probe clock's relative standard uncertainty
 * @param measurement   the whole-run measurement the frame carried
 */
public record Observed(long cycles, double highSeconds, double highU, double lowSeconds, double lowU,
        double clockRelative, Measurement measurement) {

    /** The figures of {@code frame} over the newest {@code window} cycles, or the whole run for {@link ReadingsModel#WHOLE_RUN}. */
    public static Observed of(LiveFrame frame, int window) {
        Measurement m = frame.measurement();
        double clock = frame.timebase().tolerancePpm() * 1e-6;
        if (window == ReadingsModel.WHOLE_RUN || frame.recentCount() == 0) {
            return new Observed(m.cycles(), m.high().meanSeconds(), withoutClock(m.high(), clock), m.low().meanSeconds(),
                    withoutClock(m.low(), clock), clock, m);
        }
        int n = Math.min(window, frame.recentCount());
        int from = frame.recentCount() - n;
        double tps = frame.timebase().ticksPerSecond();
        double[] h = meanAndU(frame.highTicks(), from, n);
        double[] l = meanAndU(frame.lowTicks(), from, n);
        return new Observed(n, h[0] / tps, h[1] / tps, l[0] / tps, l[1] / tps, clock, m);
    }

    /** Mean and standard uncertainty of the mean, in ticks, of {@code n} values from {@code from}. */
    static double[] meanAndU(long[] ticks, int from, int n) {
        double sum = 0;
        for (int i = from; i < from + n; i++) {
            sum += ticks[i];
        }
        double mean = sum / n;
        double ss = 0;
        for (int i = from; i < from + n; i++) {
            double d = ticks[i] - mean;
            ss += d * d;
        }
        double var = n >= 2 ? ss / (n - 1) : 0;
        double stat = var / n;
        return new double[] {mean, Math.sqrt(var >= 1 ? stat : stat + 1.0 / 6)};
    }

    /** The core's standard uncertainty with the clock's share ({@code mean · clock}, added in quadrature) taken out. */
    private static double withoutClock(Measurement.TimeStats s, double clock) {
        double u = s.standardUncertaintySeconds();
        double c = s.meanSeconds() * clock;
        return Math.sqrt(Math.max(0, u * u - c * c));
    }

    /** The mean period, seconds. */
    public double periodSeconds() {
        return highSeconds + lowSeconds;
    }
}
