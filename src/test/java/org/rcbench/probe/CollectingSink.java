package org.rcbench.probe;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;
import org.rcbench.edge.EdgeSink;

/** Collects edges from another thread as "tick channel level" lines ("?" for a gap). */
final class CollectingSink implements EdgeSink {
    private final List<String> calls = new ArrayList<>();
    private long lastTick = -1;
    private boolean monotonic = true;
    private volatile boolean ended;

    @Override
    public synchronized void onEdge(long tick, int channel, int level) {
        monotonic &= tick >= lastTick && tick >= 0;
        lastTick = tick;
        calls.add(tick + " " + channel + " " + (level == UNKNOWN ? "?" : Integer.toString(level)));
    }

    @Override
    public void onEnd(long tick) {
        ended = true;
    }

    synchronized List<String> calls() {
        return new ArrayList<>(calls);
    }

    synchronized int size() {
        return calls.size();
    }

    synchronized boolean monotonic() {
        return monotonic;
    }

    boolean ended() {
        return ended;
    }

    /** Waits up to 10 s for {@code condition}; false if it never held. */
    static boolean await(BooleanSupplier condition) throws InterruptedException {
        long deadline = System.nanoTime() + 10_000_000_000L;
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > deadline) {
                return false;
            }
            Thread.sleep(10);
        }
        return true;
    }
}
