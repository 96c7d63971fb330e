package org.rcbench.gui;

import org.rcbench.design.Design;
import org.rcbench.measure.Measurement;

/** Keeps a finished check (design, measurement, verdict) in the bench history. */
@FunctionalInterface
public interface CheckSaver {
    /**
     * Saves a check and returns one line saying where, e.g. {@code check 42 saved to ~/.rcbench/history.db}.
     *
     * @param capture the capture file recorded during the check, or null when none was recorded
     * @throws org.rcbench.common.BadInputException when it cannot be saved (the window shows why)
     */
    String save(Design design, Measurement measurement, Findings findings, java.nio.file.Path capture);
}
