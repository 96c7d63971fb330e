package org.rcbench.gui;

import java.util.Map;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * What a {@link BenchSource} feeds: the clock once it is known (always before the first edge of a
 * connection), the edges and gaps, the end, and status snapshots. Every call comes from the
 * source's own thread; implementations must not block it.
 */
public interface SourceSink extends EdgeSink {
    /**
     * The source's timestamp clock and channel names are known; edges follow. May be called again
     * after a reconnect with the same probe (same clock).
     */
    void onClock(Timebase timebase, Map<Integer, String> channels);

    /** The source's state changed, or a few times a second while it runs. */
    void onStatus(SourceStatus status);
}
