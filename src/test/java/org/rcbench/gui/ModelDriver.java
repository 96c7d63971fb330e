package org.rcbench.gui;

import java.time.Duration;
import java.util.function.BooleanSupplier;

/** Polls a model from the test's thread, as the animation timer would, until a condition holds. */
final class ModelDriver {
    private ModelDriver() {
    }

    /** Polls every 5 ms until {@code done} or the timeout; returns whether {@code done} became true. */
    static boolean pollUntil(BenchModel model, BooleanSupplier done, Duration timeout) throws InterruptedException {
        long deadline = System.nanoTime() + timeout.toNanos();
        while (System.nanoTime() < deadline) {
            model.poll(System.nanoTime());
            if (done.getAsBoolean()) {
                return true;
            }
            Thread.sleep(5);
        }
        model.poll(System.nanoTime());
        return done.getAsBoolean();
    }

    /** Polls once more after the readout interval so the readouts show the newest frame. */
    static void settleReadouts(BenchModel model) throws InterruptedException {
        Thread.sleep(BenchModel.READOUT_NANOS / 1_000_000 + 5);
        model.poll(System.nanoTime());
    }
}
