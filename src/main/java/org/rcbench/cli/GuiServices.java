package org.rcbench.cli;

import org.rcbench.gui.BenchServices;

/** The stages the bench window calls in this build. */
final class GuiServices {
    private GuiServices() {
    }

    static BenchServices standard() {
        return BenchServices.standard();
    }
}
