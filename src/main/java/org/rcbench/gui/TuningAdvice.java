package org.rcbench.gui;

import java.util.Objects;

/**
 * Where a potentiometer's wiper is and where it must go, for the trimmer guide.
 *
 * @param part         the potentiometer's designator
 * @param presentWiper the wiper position the measurement implies, 0..1 (NaN when unknown)
 * @param targetWiper  the position that gives the target, 0..1 (NaN when the target is out of reach)
 * @param advice       which way and how far to turn, in words, e.g. {@code turn toward the charge end by 0.08 of the track}
 */
public record TuningAdvice(String part, double presentWiper, double targetWiper, String advice) {
    public TuningAdvice {
        Objects.requireNonNull(part, "part");
        Objects.requireNonNull(advice, "advice");
    }
}
