package org.rcbench.gui;

import org.rcbench.design.Design;

/**
 * Turns a design into what the readings should be. Implementations may take a while (a Monte Carlo
 * run), so the model calls them off the window's thread; they must be thread-safe.
 */
@FunctionalInterface
public interface ExpectationSource {
    /** What {@code design} should do; never null. */
    Expectation expect(Design design);
}
