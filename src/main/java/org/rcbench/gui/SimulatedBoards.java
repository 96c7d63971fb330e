package org.rcbench.gui;

import java.nio.file.Files;
import java.nio.file.Path;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;

/** Makes simulated-board sources from a choice: its design file (or the default board) and its faults. */
public final class SimulatedBoards implements SourceFactory {
    private final Path defaultDesign;

    /** @param defaultDesign the design simulated when the choice names none */
    public SimulatedBoards(Path defaultDesign) {
        this.defaultDesign = defaultDesign;
    }

    @Override
    public BenchSource open(SourceChoice choice) {
        Path file = choice.target().isBlank() ? defaultDesign : Path.of(choice.target());
        if (file == null || !Files.exists(file)) {
            throw new BadInputException("simulated board", "no design to simulate: give a design file");
        }
        Design d = DesignReader.read(file);
        return new SimulatedBoardSource(d, SimulatedBoardSource.benchSpec(d, choice.fault()), choice.fault());
    }
}
