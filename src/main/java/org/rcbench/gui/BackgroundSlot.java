package org.rcbench.gui;

import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Supplier;

/**
 * Runs one job at a time on a worker and hands its result back to the window's thread: a new job
 * is refused while one runs (the caller simply tries again on a later frame), and a result waits
 * in the slot until {@link #take()}. A job's exception becomes its result's {@code problem}.
 *
 * @param <T> the result type
 */
final class BackgroundSlot<T> {
    /** A finished job: its value, or null with the problem in one line. */
    record Outcome<T>(T value, String problem) {
    }

    private final Executor worker;
    private final AtomicBoolean busy = new AtomicBoolean();
    private final AtomicReference<Outcome<T>> done = new AtomicReference<>();

    BackgroundSlot(Executor worker) {
        this.worker = worker;
    }

    /** Starts {@code job} unless one is running; returns whether it started. */
    boolean offer(Supplier<T> job) {
        if (!busy.compareAndSet(false, true)) {
            return false;
        }
        worker.execute(() -> {
            Outcome<T> o;
            try {
                o = new Outcome<>(job.get(), "");
            } catch (RuntimeException e) {
                String m = e.getMessage();
                o = new Outcome<>(null, m == null ? e.getClass().getSimpleName() : m);
            }
            done.set(o);
            busy.set(false);
        });
        return true;
    }

    /** The newest finished outcome not yet taken, or null. */
    Outcome<T> take() {
        return done.getAndSet(null);
    }
}
