package org.rcbench.probe;

/** What the host does with the DTR line when it opens a probe's port. */
public enum DtrPolicy {
    /** Raise DTR. Boards with a USB-to-serial bridge wired to reset then reboot; native-USB boards start sending. */
    RAISE,
    /** Keep DTR low, to avoid resetting a board (the driver may still pulse it while opening). */
    HOLD_LOW,
    /** Leave DTR alone: pipes, files, simulated boards. */
    NONE
}
