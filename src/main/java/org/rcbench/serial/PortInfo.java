package org.rcbench.serial;

import java.util.List;

/**
 * A serial port as listed by {@link SerialPorts#list()}.
 *
 * @param path        the device path to open, e.g. {@code /dev/ttyACM0}
 * @param description what the driver calls it
 * @param usbId       {@code vvvv:pppp:serial}, or "" for ports without a USB identity
 * @param stableLinks {@code /dev/serial/by-id} links that point to it (names that survive replugging)
 * @param access      whether this user may open it, and what to do if not
 */
public record PortInfo(String path, String description, String usbId, List<String> stableLinks,
        PortAccess.Verdict access) {
}
