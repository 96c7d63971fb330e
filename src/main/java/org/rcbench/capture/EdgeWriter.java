package org.rcbench.capture;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.function.IntPredicate;
import org.rcbench.edge.EdgeSink;

/**
 * What a capture-format writer does ({@link EdgeCaptureWriter}, {@link VcdWriter}): append edges in
 * tick order, then the end. With {@link #sink} and {@link #copy} any edge source can stream into one.
 */
public interface EdgeWriter {
    /** Writes one edge (level {@link EdgeSink#UNKNOWN} for a gap). */
    void append(long tick, int channel, int level) throws IOException;

    /** Writes the end of the capture at {@code endTick}. */
    void end(long endTick) throws IOException;

    /**
     * An edge sink writing the edges of the {@code channels} accepted, and the end, to {@code w}. An
     * I/O error comes out of the sink as an {@link UncheckedIOException}; the caller unwraps it.
     */
    static EdgeSink sink(EdgeWriter w, IntPredicate channels) {
        return new EdgeSink() {
            @Override
            public void onEdge(long tick, int channel, int level) {
                if (channels.test(channel)) {
                    try {
                        w.append(tick, channel, level);
                    } catch (IOException e) {
                        throw new UncheckedIOException(e);
                    }
                }
            }

            @Override
            public void onEnd(long lastTick) {
                try {
                    w.end(lastTick);
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
        };
    }

    /** Streams {@code source}'s edges of the {@code channels} accepted, and its end, to {@code w}. */
    static void copy(Capture source, EdgeWriter w, IntPredicate channels) throws IOException {
        try {
            source.streamTo(sink(w, channels));
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }
}
