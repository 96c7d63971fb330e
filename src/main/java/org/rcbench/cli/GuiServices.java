package org.rcbench.cli;

import java.nio.file.Path;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.PredictedExpectations;
import org.rcbench.gui.SimulatedBoards;
import org.rcbench.gui.Sources;

/** The stages the bench window calls in this build. */
final class GuiServices {
    private GuiServices() {
    }

    static BenchServices standard() {
        return BenchServices.standard()
                .withSources(Sources.standard(new SimulatedBoards(Path.of("captures", "piper-mk2.toml"))))
                .withExpectations(new PredictedExpectations());
    }
}
