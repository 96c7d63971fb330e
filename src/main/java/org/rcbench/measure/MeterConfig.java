package org.rcbench.measure;

import java.util.List;
import java.util.Objects;
import org.rcbench.edge.Timebase;

/**
 * How a {@link CycleMeter} reads one channel. Immutable; change with the {@code with...} methods.
 *
 * @param channel           the probe channel measured, 0..255; edges of other channels are ignored
 * @param timebase          ticks to seconds, with the probe clock's offset and standard uncertainty
 * @param lookAheadCycles   cycles buffered at the start before anything is counted, to learn the
 *                          typical high and low time (their medians) and to recognise settling
 * @param glitchFraction    a high or low pulse shorter than this fraction of the typical one is a
 *                          glitch (runt): its two edges are dropped and the neighbours merge
 * @param stallPeriods      no edge for more than this many typical periods is a stall: reported,
 *                          and no cycle spans it
 * @param settleTolerance   at the start, cycles whose period, high or low differ from the typical
 *                          by more than this fraction (or six robust standard deviations, or two
 *                          ticks, whichever is largest) are settling and excluded
 * @param recentCycles      ring of recent cycles kept for live views, a power of two
 * @param rollingCycles     default window of the rolling figures, at most {@code recentCycles}
 * @param timeErrorCapacity edges kept one by one for MTIE before merging into blocks
 * @param trendCapacity     points of the decimated frequency trend, even
 * @param mtieWindowsCycles MTIE window lengths in cycles; empty for octaves 1, 2, 4 ...
 */
public record MeterConfig(int channel, Timebase timebase, int lookAheadCycles, double glitchFraction,
        double stallPeriods, double settleTolerance, int recentCycles, int rollingCycles,
        int timeErrorCapacity, int trendCapacity, List<Long> mtieWindowsCycles) {

    public MeterConfig {
        Objects.requireNonNull(timebase, "timebase");
        if (channel < 0 || channel > 255) {
            throw new IllegalArgumentException("channel out of 0..255: " + channel);
        }
        if (lookAheadCycles < 3 || lookAheadCycles > 1024) {
            throw new IllegalArgumentException("lookAheadCycles out of 3..1024: " + lookAheadCycles);
        }
        if (!(glitchFraction >= 0 && glitchFraction < 1)) {
            throw new IllegalArgumentException("glitchFraction out of [0, 1): " + glitchFraction);
        }
        if (!(stallPeriods > 1) || Double.isInfinite(stallPeriods)) {
            throw new IllegalArgumentException("stallPeriods <= 1: " + stallPeriods);
        }
        if (!(settleTolerance > 0 && settleTolerance < 1)) {
            throw new IllegalArgumentException("settleTolerance out of (0, 1): " + settleTolerance);
        }
        if (recentCycles < 2 || Integer.bitCount(recentCycles) != 1) {
            throw new IllegalArgumentException("recentCycles not a power of two: " + recentCycles);
        }
        if (rollingCycles < 2 || rollingCycles > recentCycles) {
            throw new IllegalArgumentException("rollingCycles out of 2..recentCycles: " + rollingCycles);
        }
        if (timeErrorCapacity < 16) {
            throw new IllegalArgumentException("timeErrorCapacity < 16: " + timeErrorCapacity);
        }
        if (trendCapacity < 4 || trendCapacity % 2 != 0) {
            throw new IllegalArgumentException("trendCapacity not even and >= 4: " + trendCapacity);
        }
        mtieWindowsCycles = List.copyOf(mtieWindowsCycles);
        for (long w : mtieWindowsCycles) {
            if (w < 1) {
                throw new IllegalArgumentException("MTIE window < 1 cycle: " + w);
            }
        }
    }

    /** Defaults: 16 look-ahead cycles, glitches below 20 %, stalls beyond 8 periods, settling beyond 2 %. */
    public static MeterConfig of(int channel, Timebase timebase) {
        return new MeterConfig(channel, timebase, 16, 0.2, 8, 0.02, 4096, 256, 1 << 20, 1024, List.of());
    }

    public MeterConfig withChannel(int c) {
        return new MeterConfig(c, timebase, lookAheadCycles, glitchFraction, stallPeriods, settleTolerance,
                recentCycles, rollingCycles, timeErrorCapacity, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withTimebase(Timebase t) {
        return new MeterConfig(channel, t, lookAheadCycles, glitchFraction, stallPeriods, settleTolerance,
                recentCycles, rollingCycles, timeErrorCapacity, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withLookAheadCycles(int n) {
        return new MeterConfig(channel, timebase, n, glitchFraction, stallPeriods, settleTolerance,
                recentCycles, rollingCycles, timeErrorCapacity, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withGlitchFraction(double f) {
        return new MeterConfig(channel, timebase, lookAheadCycles, f, stallPeriods, settleTolerance,
                recentCycles, rollingCycles, timeErrorCapacity, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withStallPeriods(double p) {
        return new MeterConfig(channel, timebase, lookAheadCycles, glitchFraction, p, settleTolerance,
                recentCycles, rollingCycles, timeErrorCapacity, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withSettleTolerance(double t) {
        return new MeterConfig(channel, timebase, lookAheadCycles, glitchFraction, stallPeriods, t,
                recentCycles, rollingCycles, timeErrorCapacity, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withRecentCycles(int n) {
        return new MeterConfig(channel, timebase, lookAheadCycles, glitchFraction, stallPeriods, settleTolerance,
                n, Math.min(rollingCycles, n), timeErrorCapacity, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withRollingCycles(int n) {
        return new MeterConfig(channel, timebase, lookAheadCycles, glitchFraction, stallPeriods, settleTolerance,
                recentCycles, n, timeErrorCapacity, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withTimeErrorCapacity(int n) {
        return new MeterConfig(channel, timebase, lookAheadCycles, glitchFraction, stallPeriods, settleTolerance,
                recentCycles, rollingCycles, n, trendCapacity, mtieWindowsCycles);
    }

    public MeterConfig withTrendCapacity(int n) {
        return new MeterConfig(channel, timebase, lookAheadCycles, glitchFraction, stallPeriods, settleTolerance,
                recentCycles, rollingCycles, timeErrorCapacity, n, mtieWindowsCycles);
    }

    public MeterConfig withMtieWindowsCycles(List<Long> windows) {
        return new MeterConfig(channel, timebase, lookAheadCycles, glitchFraction, stallPeriods, settleTolerance,
                recentCycles, rollingCycles, timeErrorCapacity, trendCapacity, windows);
    }
}
