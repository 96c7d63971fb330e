package org.rcbench.gui;

/**
 * Something that streams a timer's edges into the window: a serial probe, the simulated board or a
 * capture file replayed in real time. Implementations read on one thread of their own.
 */
public interface BenchSource {
    /** A short name for the status line, e.g. {@code /dev/ttyACM0} or {@code piper-aged.rce}. */
    String name();

    /** Starts reading into {@code sink} on the source's own thread and returns at once. Called once. */
    void start(SourceSink sink);

    /** The design the source is built from (a simulated board's), or null when it has none. */
    default org.rcbench.design.Design design() {
        return null;
    }

    /** Stops reading and waits briefly for the thread to end; idempotent, callable from any thread. */
    void stop();
}
