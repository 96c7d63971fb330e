package org.rcbench.gui;

import java.nio.file.Path;
import org.rcbench.common.BadInputException;
import org.rcbench.probe.SessionConfig;
import org.rcbench.serial.SerialPorts;

/** The standard way to make each kind of source. */
public final class Sources {
    private Sources() {
    }

    /**
     * Serial ports through {@link SerialPorts} with the default session settings (reset-on-open
     * probe, reconnect on), capture files replayed at the choice's speed, and simulated boards
     * through {@code simulated} (null when this build has no simulated board).
     */
    public static SourceFactory standard(SourceFactory simulated) {
        return choice -> {
            switch (choice.kind()) {
                case FILE:
                    return new CaptureReplaySource(Path.of(choice.target()), choice.speed());
                case PORT:
                    if (choice.target().isBlank()) {
                        throw new BadInputException("serial port", "choose a port first ('rcbench ports' lists them)");
                    }
                    return new SessionSource(choice.target(),
                            (sink, events) -> SerialPorts.session(choice.target(), SessionConfig.defaults(), sink, events),
                            () -> { });
                case SIMULATED:
                    if (simulated == null) {
                        throw new BadInputException("simulated board", "not in this build; choose a serial port "
                                + "or a capture file");
                    }
                    return simulated.open(choice);
                default:
                    throw new IllegalArgumentException(choice.kind().name());
            }
        };
    }
}
