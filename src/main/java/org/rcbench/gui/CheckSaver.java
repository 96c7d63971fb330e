package org.rcbench.gui;

import java.nio.file.Path;
import java.util.Objects;
import org.rcbench.design.Design;

/** Keeps a finished check (design, measurement, verdict, suspects) in the bench history. */
@FunctionalInterface
public interface CheckSaver {
    /**
     * What a check is made of.
     *
     * @param design  the design checked against, with the user's edits
     * @param frame   the newest live frame: whole-run measurement, clock, recent cycles, trend
     * @param capture the capture file recorded during the check, or null when none was recorded
     * @param probeId the probe's id ("" when unknown)
     */
    record Request(Design design, LiveFrame frame, Path capture, String probeId) {
        public Request {
            Objects.requireNonNull(design, "design");
            Objects.requireNonNull(frame, "frame");
            Objects.requireNonNull(probeId, "probeId");
        }
    }

    /**
     * Checks and saves; returns one line saying where, e.g. {@code check saved as run 42 in ~/.local/share/rcbench/history.db}.
     * Called on the worker thread.
     *
     * @throws org.rcbench.common.BadInputException when it cannot be saved (the window shows why)
     */
    String save(Request request);
}
