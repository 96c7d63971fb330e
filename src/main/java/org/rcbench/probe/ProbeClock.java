package org.rcbench.probe;

import org.rcbench.edge.Timebase;
import org.rcbench.protocol.ClockSource;
import org.rcbench.protocol.Hello;

/**
 * The timebase a probe's hello implies: its nominal clock, its stored calibration if it has one,
 * otherwise no offset and an uncertainty typical of its clock source.
 */
public final class ProbeClock {
    private ProbeClock() {
    }

    /**
     * Half-width in ppm of the offset expected from an uncalibrated clock of this kind. Crystal
     * ±50 ppm and resonator offsets of ~2000 ppm are from rcbench's platform notes (measured boards);
     * the resonator bound ±5000 ppm, internal RC ±10 % and reference ±1 ppm are from memory.
     */
    public static double uncalibratedBoundPpm(ClockSource source) {
        return switch (source) {
            case CRYSTAL -> 50;
            case RESONATOR -> 5000;
            case INTERNAL_RC -> 100_000;
            case REFERENCE -> 1;
            default -> 5000;
        };
    }

    /**
     * Ticks to seconds for this probe: {@code Timebase(clockHz, cal_ppm, cal_u_ppm)} when it is
     * calibrated, else {@code Timebase(clockHz, 0, bound / sqrt(3))} (a rectangular distribution of
     * half-width {@code bound} has standard uncertainty {@code bound / sqrt(3)}, JCGM 100:2008 4.3.7).
     */
    public static Timebase timebase(Hello hello) {
        if (hello.calibrated()) {
            return new Timebase(hello.clockHz(), hello.calibrationPpm(), hello.calibrationUncertaintyPpb() * 1e-3);
        }
        return new Timebase(hello.clockHz(), 0, uncalibratedBoundPpm(hello.clockSource()) / Math.sqrt(3));
    }
}
