package org.rcbench.cli;

import java.util.function.BooleanSupplier;
import org.rcbench.source.DurationGate;
import org.rcbench.source.LiveSource;

/**
 * The wait of every live command, on the command's thread: runs until the duration gate closes
 * (probe time), the source ends, the user stops (Ctrl-C), {@code enough} says so, or, for a source
 * that runs in real time, the wall clock passes the duration by three seconds (a silent or absent
 * probe sends no time at all). Calls {@code step} about every {@code stepMillis}.
 */
final class LiveLoop {
    /** Why the loop ended. */
    enum End { DURATION, SOURCE_ENDED, STOPPED, ENOUGH, WALL_CLOCK }

    private static final double WALL_GRACE_SECONDS = 3;

    private LiveLoop() {
    }

    static End run(LiveSource src, DurationGate gate, ShutdownGuard guard, SourceOptions source, Double seconds,
            long stepMillis, BooleanSupplier enough, Runnable step) throws InterruptedException {
        long begun = System.nanoTime();
        while (true) {
            if (gate.await(stepMillis)) {
                return End.DURATION;
            }
            if (src.ended()) {
                return End.SOURCE_ENDED;
            }
            if (guard.triggered()) {
                return End.STOPPED;
            }
            if (enough.getAsBoolean()) {
                return End.ENOUGH;
            }
            step.run();
            if (seconds != null && !source.fast() && (System.nanoTime() - begun) * 1e-9 > seconds + WALL_GRACE_SECONDS) {
                return End.WALL_CLOCK;
            }
        }
    }
}
