package org.rcbench.cli;

import org.rcbench.gui.BenchServices;
import org.rcbench.gui.Sources;
import org.rcbench.probe.CalibrationStore;

/** The stages the bench window calls in this build. */
final class GuiServices {
    private GuiServices() {
    }

    /** Shared sources with the probe calibrations of {@code calibrations}, bands from the tolerance stage. */
    static BenchServices standard(CalibrationStore calibrations) {
        return BenchServices.standard().withSources(Sources.standard(calibrations));
    }
}
