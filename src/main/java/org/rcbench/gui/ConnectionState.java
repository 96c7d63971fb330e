package org.rcbench.gui;

/** Where the window's source is, in words a bench user reads at a glance. */
public enum ConnectionState {
    IDLE("not connected"),
    CONNECTING("connecting"),
    WAITING("waiting for the probe"),
    STREAMING("streaming"),
    RECONNECTING("reconnecting"),
    ENDED("ended"),
    FAILED("failed");

    private final String words;

    ConnectionState(String words) {
        this.words = words;
    }

    /** The state for a status line, e.g. {@code waiting for the probe}. */
    public String words() {
        return words;
    }

    /** True while edges may still arrive. */
    public boolean isLive() {
        return this == CONNECTING || this == WAITING || this == STREAMING || this == RECONNECTING;
    }
}
