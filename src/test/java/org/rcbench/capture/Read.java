package org.rcbench.capture;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import org.rcbench.edge.Timebase;
import org.rcbench.testing.RecordingSink;

/** Reads a whole capture into memory for a test: header, edges, end tick and warnings. */
record Read(String name, Timebase timebase, Map<String, String> header, Map<Integer, String> channels,
        Map<String, String> skipped, List<RecordingSink.Edge> edges, long endTick, List<String> warnings) {

    static Read of(String text) {
        return of(text.getBytes(StandardCharsets.UTF_8));
    }

    static Read of(byte[] bytes) {
        return of(new ByteArrayInputStream(bytes), "t.rce");
    }

    static Read of(InputStream in) {
        return of(in, "t.vcd");
    }

    static Read of(InputStream in, String name) {
        try (Capture c = CaptureFiles.open(in, name)) {
            RecordingSink sink = new RecordingSink();
            c.streamTo(sink);
            if (sink.endCalls != 1) {
                throw new AssertionError("onEnd called " + sink.endCalls + " times");
            }
            return new Read(c.name(), c.timebase(), c.header(), c.channels(), c.skippedSignals(), sink.edges,
                    sink.endTick, c.warnings());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The edges as {@code tick,channel,level} lines, for readable comparisons. */
    List<String> lines() {
        return edges.stream().map(RecordingSink.Edge::toString).toList();
    }
}
