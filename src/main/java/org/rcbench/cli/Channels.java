package org.rcbench.cli;

import java.util.Map;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.source.StreamStart;

/**
 * The named channels of a capture file or of a live stream, for choosing one by number or name.
 *
 * @param where   the source's name, for messages
 * @param names   channel names by number (may be empty)
 * @param skipped signals the source holds that are not 1-bit wires, name to description (a VCD's buses)
 */
record Channels(String where, Map<Integer, String> names, Map<String, String> skipped) {
    static Channels of(Capture capture) {
        return new Channels(capture.name(), capture.channels(), capture.skippedSignals());
    }

    static Channels of(StreamStart start) {
        return new Channels(start.source(), start.channelNames(), Map.of());
    }

    /** The channel {@code spec} names; see {@link CaptureFiles#selectChannel(Capture, String)}. */
    int select(String spec) {
        return CaptureFiles.selectChannel(where, names, skipped, spec);
    }
}
