package org.rcbench.source;

import java.util.Map;
import org.rcbench.edge.Timebase;
import org.rcbench.protocol.Hello;

/**
 * What is known when a source starts streaming, before its first edge.
 *
 * @param source       the source's name
 * @param hello        the probe's hello, or null for a capture file
 * @param timebase     ticks to seconds, with the calibration applied (stored by the host, stored in the
 *                     probe, or the uncalibrated clock's typical uncertainty)
 * @param clockNote    one line saying where the timebase's offset and uncertainty come from
 * @param channelNames channel names by number (from the simulated board or the file; {@code chN} for a port)
 */
public record StreamStart(String source, Hello hello, Timebase timebase, String clockNote,
        Map<Integer, String> channelNames) {
    public StreamStart {
        channelNames = Map.copyOf(channelNames);
    }
}
