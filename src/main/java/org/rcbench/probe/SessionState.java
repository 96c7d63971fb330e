package org.rcbench.probe;

/** Where a {@link ProbeSession} is. */
public enum SessionState {
    /** Opening the transport. */
    CONNECTING,
    /** Open; throwing boot noise away and waiting for the probe's hello. */
    WAITING_FOR_HELLO,
    /** Hello received, capture started, edges flowing to the sink. */
    STREAMING,
    /** The transport went away; trying to open it again until the same probe answers. */
    RECONNECTING,
    /** Closed by the host, or the transport ended and reconnecting is off. Final. */
    CLOSED,
    /** Could not open the port or got no hello in time; {@link SessionStatus#line()} says why. Final. */
    FAILED;

    /** True for {@link #CLOSED} and {@link #FAILED}. */
    public boolean isFinal() {
        return this == CLOSED || this == FAILED;
    }
}
