package org.rcbench.probe;

/**
 * Receives status snapshots: on every state change, and about four times a second while waiting
 * for a hello or for the probe to come back. Called on the session's reader thread: hand the
 * snapshot over (a GUI with {@code Platform.runLater} or a volatile field), do not block.
 */
@FunctionalInterface
public interface SessionListener {
    void onStatus(SessionStatus status);
}
