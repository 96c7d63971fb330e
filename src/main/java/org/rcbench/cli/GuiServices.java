package org.rcbench.cli;

import java.nio.file.Path;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.HistoryCheckSaver;
import org.rcbench.gui.Sources;
import org.rcbench.probe.CalibrationStore;

/** The stages the bench window calls in this build. */
final class GuiServices {
    private GuiServices() {
    }

    /**
     * Shared sources with the probe calibrations of {@code calibrations}, bands, suspects and the
     * trimmer guide, and checks saved to the history at {@code database}.
     */
    static BenchServices standard(CalibrationStore calibrations, Path database) {
        return BenchServices.standard().withSources(Sources.standard(calibrations))
                .withChecks(new HistoryCheckSaver(database));
    }
}
