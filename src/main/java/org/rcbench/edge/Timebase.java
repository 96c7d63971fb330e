package org.rcbench.edge;

/**
 * Converts probe clock ticks to seconds, honouring a known clock offset.
 *
 * <p>{@code seconds = tick / (clockHz * (1 + offsetPpm * 1e-6))}: a probe whose clock runs
 * {@code offsetPpm} fast counts more ticks per true second. {@code tolerancePpm} is the standard
 * uncertainty of that offset (one sigma), carried into the uncertainty budget of every time
 * measurement.
 *
 * @param clockHz      nominal probe clock in hertz, &gt; 0
 * @param offsetPpm    known offset of the probe clock from nominal, in parts per million
 * @param tolerancePpm standard uncertainty of the probe clock after the offset is applied, ppm, &ge; 0
 */
public record Timebase(double clockHz, double offsetPpm, double tolerancePpm) {

    public Timebase {
        if (!(clockHz > 0) || Double.isInfinite(clockHz)) {
            throw new IllegalArgumentException("clockHz <= 0: " + clockHz);
        }
        if (!Double.isFinite(offsetPpm) || Math.abs(offsetPpm) >= 1e6) {
            throw new IllegalArgumentException("offsetPpm out of range: " + offsetPpm);
        }
        if (!(tolerancePpm >= 0) || Double.isInfinite(tolerancePpm)) {
            throw new IllegalArgumentException("tolerancePpm < 0: " + tolerancePpm);
        }
    }

    /** A timebase with no known offset and no stated uncertainty. */
    public static Timebase of(double clockHz) {
        return new Timebase(clockHz, 0, 0);
    }

    /** Effective ticks per true second. */
    public double ticksPerSecond() {
        return clockHz * (1 + offsetPpm * 1e-6);
    }

    /** Duration of one tick in true seconds. */
    public double tickSeconds() {
        return 1.0 / ticksPerSecond();
    }

    /** Converts a tick count (or a difference of ticks) to seconds. */
    public double seconds(long ticks) {
        return ticks / ticksPerSecond();
    }

    public Timebase withOffsetPpm(double ppm) {
        return new Timebase(clockHz, ppm, tolerancePpm);
    }

    public Timebase withTolerancePpm(double ppm) {
        return new Timebase(clockHz, offsetPpm, ppm);
    }
}
