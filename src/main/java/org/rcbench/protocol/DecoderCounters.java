package org.rcbench.protocol;

/**
 * What a {@link StreamDecoder} has seen so far. All counts start at zero and never decrease.
 *
 * @param bytes           bytes fed
 * @param framesOk        binary frames with a good CRC (of any type, including unknown or malformed ones)
 * @param crcErrors       delimited binary frames whose CRC did not match
 * @param resyncs         stretches of bytes thrown away before framing was regained (bad frames, garbage, bad lines)
 * @param bytesDiscarded  bytes in those stretches
 * @param sequenceGaps    times the frame sequence number skipped
 * @param framesMissed    frames missing in those skips (modulo 256 per skip)
 * @param overruns        edges the probe reported it could not timestamp
 * @param malformed       frames with a good CRC but an impossible payload
 * @param unknownFrames   frames with a good CRC and a type this host does not know (ignored)
 * @param linesOk         text-mode lines understood
 * @param linesBad        text-mode lines not understood
 * @param edges           edges delivered to the sink
 * @param gapMarks        {@code UNKNOWN} levels delivered to the sink (one per affected channel)
 * @param probeRestarts   probe resets or backward clock jumps seen
 * @param adcSamples      ADC samples delivered to the listener
 * @param adcDropped      ADC samples the probe reported lost
 */
public record DecoderCounters(long bytes, long framesOk, long crcErrors, long resyncs, long bytesDiscarded,
        long sequenceGaps, long framesMissed, long overruns, long malformed, long unknownFrames, long linesOk,
        long linesBad, long edges, long gapMarks, long probeRestarts, long adcSamples, long adcDropped) {

    /** True when nothing was lost or corrupted. */
    public boolean clean() {
        return crcErrors == 0 && resyncs == 0 && sequenceGaps == 0 && overruns == 0 && malformed == 0
                && linesBad == 0 && probeRestarts == 0;
    }

    /** One line for status displays, e.g. {@code 1234 edges, 2 CRC errors, 3 resyncs (41 bytes), 0 gaps, 0 overruns}. */
    public String summary() {
        return edges + " edges, " + (framesOk + linesOk) + " frames, " + crcErrors + " CRC errors, "
                + resyncs + " resyncs (" + bytesDiscarded + " bytes), " + sequenceGaps + " sequence gaps, "
                + overruns + " overruns";
    }
}
