package org.rcbench.cli;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

/**
 * Runs an action when the process is asked to stop (Ctrl-C: SIGINT; SIGTERM), and then waits
 * for the command to finish its own closing, at most a few seconds, so that what it was writing is
 * complete on disk. {@link #close()} at the command's end removes the hook (and lets a hook in
 * progress finish waiting).
 */
final class ShutdownGuard implements AutoCloseable {
    private final Thread hook;
    private final CountDownLatch finished = new CountDownLatch(1);
    private volatile boolean triggered;

    ShutdownGuard(Runnable onStop) {
        hook = new Thread(() -> {
            triggered = true;
            onStop.run();
            try {
                finished.await(5, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "rcbench-shutdown");
        Runtime.getRuntime().addShutdownHook(hook);
    }

    /** True once the process was asked to stop. */
    boolean triggered() {
        return triggered;
    }

    @Override
    public void close() {
        finished.countDown();
        try {
            Runtime.getRuntime().removeShutdownHook(hook);
        } catch (IllegalStateException e) {
            // Shutting down already: the hook is running and has just been released.
        }
    }
}
