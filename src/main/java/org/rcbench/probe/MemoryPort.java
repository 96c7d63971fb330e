package org.rcbench.probe;

import org.rcbench.common.BadInputException;

/**
 * A pretend serial port for simulated boards: a {@link TransportOpener} whose {@link #open()}
 * hands the session the host end of the link a probe plugged in with {@link #plugIn()}, and fails
 * like an absent port while nothing is plugged in. {@link #unplug()} pulls the cable. Thread-safe.
 */
public final class MemoryPort implements TransportOpener {
    private final String name;
    private MemoryLink link;
    private boolean taken;

    /** A port called {@code name} in messages, e.g. {@code simulated board}. */
    public MemoryPort(String name) {
        this.name = name;
    }

    /** Plugs a new probe in (pulling any old one) and returns the end it writes to and reads commands from. */
    public synchronized ByteTransport plugIn() {
        if (link != null) {
            link.unplug();
        }
        link = new MemoryLink(name);
        taken = false;
        return link.probeEnd();
    }

    /** Pulls the cable: both ends read -1, bytes in flight are lost. */
    public synchronized void unplug() {
        if (link != null) {
            link.unplug();
            link = null;
        }
    }

    @Override
    public synchronized ByteTransport open() {
        if (link == null || taken) {
            throw new BadInputException(name, "no such port: nothing is plugged in");
        }
        taken = true;
        return link.hostEnd();
    }

    @Override
    public String name() {
        return name;
    }
}
