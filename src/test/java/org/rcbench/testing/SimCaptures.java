package org.rcbench.testing;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import org.rcbench.capture.EdgeCaptureFormat;
import org.rcbench.capture.EdgeCaptureWriter;
import org.rcbench.capture.EdgeWriter;
import org.rcbench.design.Design;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;

/** Writes a simulated board's edges to an rcbench capture file, as a recorder would. */
public final class SimCaptures {
    private SimCaptures() {
    }

    /** Simulates {@code design} with {@code spec} for {@code seconds} into {@code file}; returns the board. */
    public static VirtualBoard write(Path file, Design design, SimulationSpec spec, double seconds) throws IOException {
        VirtualBoard board = VirtualBoard.of(design, spec);
        try (EdgeCaptureWriter w = EdgeCaptureWriter.create(file,
                EdgeCaptureFormat.header(board.timebase(), board.channelNames()), false)) {
            board.runFor(seconds, EdgeWriter.sink(w, ch -> true));
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        return board;
    }
}
