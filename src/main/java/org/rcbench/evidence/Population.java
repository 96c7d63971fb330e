package org.rcbench.evidence;

import java.util.List;
import java.util.Objects;
import org.rcbench.design.Design;

/**
 * A seeded population of simulated boards of one design. Each board has every toleranced part
 * drawn uniformly inside its tolerance band and one part of {@link #faultable} moved out of it by
 * {@code m} times its tolerance on that side, {@code m} uniform in {@code [minMultiple, maxMultiple]},
 * the direction random (a loss is capped at -90 %). Immutable; change with the {@code with...} methods.
 *
 * @param name               how the table names it
 * @param design             the board's design
 * @param faultable          designators that may be the faulty part
 * @param minMultiple        smallest fault, in multiples of the part's tolerance
 * @param maxMultiple        largest fault
 * @param boards             how many boards
 * @param seed               seed of every random choice (parts, faults, clock, jitter)
 * @param cycles             cycles captured per board (after power-up)
 * @param jitterFraction     period jitter as a fraction of the nominal period (standard deviation)
 * @param clockOffsetPpm     the probe clock's offset is drawn uniformly in ±this (ppm)
 * @param clockTolerancePpm  the clock tolerance the measurement assumes (rectangular limit, ppm)
 * @param clockHz            the probe's clock
 */
public record Population(String name, Design design, List<String> faultable, double minMultiple, double maxMultiple,
        int boards, long seed, int cycles, double jitterFraction, double clockOffsetPpm, double clockTolerancePpm,
        double clockHz) {
    public Population {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(design, "design");
        faultable = List.copyOf(faultable);
        if (faultable.isEmpty()) {
            throw new IllegalArgumentException("no faultable part");
        }
        if (!(minMultiple > 0 && maxMultiple >= minMultiple)) {
            throw new IllegalArgumentException("bad fault range " + minMultiple + " .. " + maxMultiple);
        }
        if (boards < 1 || cycles < 32) {
            throw new IllegalArgumentException("boards < 1 or cycles < 32: " + boards + ", " + cycles);
        }
    }

    /**
     * Defaults: faults of 3 to 6 tolerances, 200 boards, seed 1, 600 cycles, 0.01 % period jitter,
     * clock offset within ±40 ppm measured as ±50 ppm, a 16 MHz probe.
     */
    public static Population of(String name, Design design, List<String> faultable) {
        return new Population(name, design, faultable, 3, 6, 200, 1, 600, 1e-4, 40, 50, 16e6);
    }

    public Population withBoards(int n) {
        return new Population(name, design, faultable, minMultiple, maxMultiple, n, seed, cycles, jitterFraction,
                clockOffsetPpm, clockTolerancePpm, clockHz);
    }

    public Population withSeed(long s) {
        return new Population(name, design, faultable, minMultiple, maxMultiple, boards, s, cycles, jitterFraction,
                clockOffsetPpm, clockTolerancePpm, clockHz);
    }

    public Population withFaultRange(double min, double max) {
        return new Population(name, design, faultable, min, max, boards, seed, cycles, jitterFraction, clockOffsetPpm,
                clockTolerancePpm, clockHz);
    }

    public Population withName(String n) {
        return new Population(n, design, faultable, minMultiple, maxMultiple, boards, seed, cycles, jitterFraction,
                clockOffsetPpm, clockTolerancePpm, clockHz);
    }
}
