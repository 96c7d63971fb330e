package org.rcbench.gui;

import org.rcbench.design.Design;

/**
 * Names the drifted part from a measurement and a design. Called off the window's thread a few
 * times a second; implementations must be thread-safe.
 */
@FunctionalInterface
public interface DiagnosisSource {
    /**
     * What the timing {@code observed} says about {@code design}'s parts; never null.
     *
     * @throws IllegalArgumentException or {@link org.rcbench.common.BadInputException} when this
     *                                  design cannot be diagnosed (the panel shows the message)
     */
    Findings diagnose(Design design, Observed observed);
}
