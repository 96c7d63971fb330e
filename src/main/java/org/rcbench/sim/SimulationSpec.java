package org.rcbench.sim;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * How a {@link VirtualBoard} differs from its design and how it is observed: part faults and latent
 * conditions, timing noise, warm-up, supply ripple, the probe's clock, the seed, and the stimulus
 * for monostables and bistables. Immutable; start from {@link #defaults()} and change with the
 * {@code with...} methods.
 *
 * @param deviations      part faults and latent conditions, applied in order to the design's nominal
 *                        values (a later deviation of the same parameter wins)
 * @param jitterSeconds   white period noise: standard deviation of each period (astable) or pulse
 *                        width (monostable), seconds, &ge; 0. An astable's high and low time each get
 *                        independent Gaussian noise of {@code jitterSeconds / sqrt(2)}, so the period
 *                        has exactly {@code jitterSeconds} and cycle-to-cycle differences {@code sqrt(2)}
 *                        times that
 * @param warmUpFraction  warm-up drift: relative change of every timing interval at power-up, settling
 *                        as {@code 1 + warmUpFraction * exp(-t / warmUpSeconds)}, t from power-up;
 *                        0 for none, in (-1, 1)
 * @param warmUpSeconds   time constant of that settling, &gt; 0
 * @param rippleVolts     supply ripple amplitude (peak, volts, &ge; 0): the supply is
 *                        {@code V + rippleVolts * sin(2 pi rippleHz t)}
 * @param rippleHz        ripple frequency, &gt; 0 when there is ripple
 * @param clockHz         the probe's nominal tick frequency, hertz (the tick size is its inverse)
 * @param clockOffsetPpm  how fast the probe's clock really runs, ppm (positive: more ticks per true second)
 * @param seed            seed of every random choice; equal specs give identical edges
 * @param powerUpSeconds  when the board powers up on the probe's timeline, seconds &ge; 0
 * @param stimulus        trigger pulses (monostable) and button presses (bistable)
 */
public record SimulationSpec(List<Deviation> deviations, double jitterSeconds, double warmUpFraction,
        double warmUpSeconds, double rippleVolts, double rippleHz, double clockHz, double clockOffsetPpm, long seed,
        double powerUpSeconds, Stimulus stimulus) {

    /** The reference probe's 16 MHz clock. */
    public static final double DEFAULT_CLOCK_HZ = 16e6;

    public SimulationSpec {
        deviations = List.copyOf(deviations);
        Objects.requireNonNull(stimulus, "stimulus");
        if (!(jitterSeconds >= 0) || Double.isInfinite(jitterSeconds)) {
            throw new IllegalArgumentException("jitterSeconds < 0: " + jitterSeconds);
        }
        if (!(warmUpFraction > -1 && warmUpFraction < 1)) {
            throw new IllegalArgumentException("warmUpFraction out of (-1, 1): " + warmUpFraction);
        }
        if (!(warmUpSeconds > 0) || Double.isInfinite(warmUpSeconds)) {
            throw new IllegalArgumentException("warmUpSeconds <= 0: " + warmUpSeconds);
        }
        if (!(rippleVolts >= 0) || Double.isInfinite(rippleVolts)) {
            throw new IllegalArgumentException("rippleVolts < 0: " + rippleVolts);
        }
        if (rippleVolts > 0 && (!(rippleHz > 0) || Double.isInfinite(rippleHz))) {
            throw new IllegalArgumentException("rippleHz <= 0 with ripple: " + rippleHz);
        }
        if (!(clockHz > 0) || Double.isInfinite(clockHz)) {
            throw new IllegalArgumentException("clockHz <= 0: " + clockHz);
        }
        if (!(Math.abs(clockOffsetPpm) < 1e6)) {
            throw new IllegalArgumentException("clockOffsetPpm out of range: " + clockOffsetPpm);
        }
        if (!(powerUpSeconds >= 0) || Double.isInfinite(powerUpSeconds)) {
            throw new IllegalArgumentException("powerUpSeconds < 0: " + powerUpSeconds);
        }
    }

    /** No deviations, no noise, a 16 MHz probe clock with no offset, seed 1, power-up 1 ms in. */
    public static SimulationSpec defaults() {
        return new SimulationSpec(List.of(), 0, 0, 1, 0, 50, DEFAULT_CLOCK_HZ, 0, 1, 1e-3, Stimulus.defaults());
    }

    /** True ticks per second of the probe clock: {@code clockHz * (1 + clockOffsetPpm * 1e-6)}. */
    public double ticksPerSecond() {
        return clockHz * (1 + clockOffsetPpm * 1e-6);
    }

    public SimulationSpec withDeviations(List<Deviation> d) {
        return new SimulationSpec(d, jitterSeconds, warmUpFraction, warmUpSeconds, rippleVolts, rippleHz, clockHz,
                clockOffsetPpm, seed, powerUpSeconds, stimulus);
    }

    /** Adds one deviation after the existing ones. */
    public SimulationSpec withDeviation(Deviation d) {
        List<Deviation> all = new ArrayList<>(deviations);
        all.add(d);
        return withDeviations(all);
    }

    /** Sets the supply voltage (a deviation of {@code supply}). */
    public SimulationSpec withSupplyVolts(double volts) {
        return withDeviation(Deviation.absolute("supply", volts));
    }

    public SimulationSpec withJitterSeconds(double rms) {
        return new SimulationSpec(deviations, rms, warmUpFraction, warmUpSeconds, rippleVolts, rippleHz, clockHz,
                clockOffsetPpm, seed, powerUpSeconds, stimulus);
    }

    /** Warm-up drift: every interval starts {@code fraction} longer and settles with time constant {@code seconds}. */
    public SimulationSpec withWarmUp(double fraction, double seconds) {
        return new SimulationSpec(deviations, jitterSeconds, fraction, seconds, rippleVolts, rippleHz, clockHz,
                clockOffsetPpm, seed, powerUpSeconds, stimulus);
    }

    public SimulationSpec withRipple(double volts, double hz) {
        return new SimulationSpec(deviations, jitterSeconds, warmUpFraction, warmUpSeconds, volts, hz, clockHz,
                clockOffsetPpm, seed, powerUpSeconds, stimulus);
    }

    public SimulationSpec withClockHz(double hz) {
        return new SimulationSpec(deviations, jitterSeconds, warmUpFraction, warmUpSeconds, rippleVolts, rippleHz, hz,
                clockOffsetPpm, seed, powerUpSeconds, stimulus);
    }

    public SimulationSpec withClockOffsetPpm(double ppm) {
        return new SimulationSpec(deviations, jitterSeconds, warmUpFraction, warmUpSeconds, rippleVolts, rippleHz,
                clockHz, ppm, seed, powerUpSeconds, stimulus);
    }

    public SimulationSpec withSeed(long s) {
        return new SimulationSpec(deviations, jitterSeconds, warmUpFraction, warmUpSeconds, rippleVolts, rippleHz,
                clockHz, clockOffsetPpm, s, powerUpSeconds, stimulus);
    }

    public SimulationSpec withPowerUpSeconds(double s) {
        return new SimulationSpec(deviations, jitterSeconds, warmUpFraction, warmUpSeconds, rippleVolts, rippleHz,
                clockHz, clockOffsetPpm, seed, s, stimulus);
    }

    public SimulationSpec withStimulus(Stimulus s) {
        return new SimulationSpec(deviations, jitterSeconds, warmUpFraction, warmUpSeconds, rippleVolts, rippleHz,
                clockHz, clockOffsetPpm, seed, powerUpSeconds, s);
    }
}
