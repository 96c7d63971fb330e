package org.rcbench.probe;

import java.io.IOException;

/**
 * Opens a transport to a probe, again after each disconnect. A serial opener looks the device up
 * afresh each time (device names move when a board is plugged back in).
 */
public interface TransportOpener {

    /**
     * Opens the transport. Throws {@link org.rcbench.common.BadInputException} with one line naming
     * the port when it is missing, busy or not permitted.
     */
    ByteTransport open() throws IOException;

    /** What to call the probe's port in messages before it is open. */
    String name();
}
