package org.rcbench.gui;

import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;

/**
 * Finds where a potentiometer's wiper is and where it must go. Called off the window's thread
 * several times a second; implementations must be thread-safe and fast.
 */
@FunctionalInterface
public interface TuningSource {
    /**
     * Where the wiper of {@code design}'s potentiometer is, judged from {@code observed}, and where
     * it must be for {@code quantity} to read {@code target} (its unit; duty as a fraction; NaN when
     * no target is given: then only the present position matters).
     */
    TuningAdvice tune(Design design, Observed observed, TimingQuantity quantity, double target);
}
