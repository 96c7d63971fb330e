package org.rcbench.protocol;

import java.io.IOException;
import java.io.InputStream;
import org.rcbench.edge.EdgeSink;

/**
 * Decodes a probe's byte stream, binary or text, into edges for an {@link EdgeSink} and events
 * for a {@link ProbeEvents} listener, marking every lost or corrupted stretch as a gap.
 *
 * <p>In {@link Mode#AUTO} the first bytes are read both ways: the first frame with a good CRC
 * selects binary, the first valid {@code E}, {@code T}, {@code D} or {@code H} line selects text;
 * bytes before that are boot noise, counted as discarded. Bytes may arrive in chunks of any size:
 * the same stream fed whole, byte by byte or in random pieces gives the same calls.
 *
 * <p>Gaps: a CRC error, a stretch of garbage, a skipped sequence number, a rise of the probe's
 * dropped-edge total, a malformed frame, a bad text line, a probe reset and {@link #markGap}
 * each put {@link EdgeSink#UNKNOWN} at the last delivered tick on every channel whose level was
 * known, before any later edge. Ticks delivered are non-negative and non-decreasing whatever the
 * input; nothing the bytes contain makes this class throw.
 *
 * <p>Not thread-safe: one thread feeds it. Allocation-free per edge.
 */
public final class StreamDecoder {

    /** What the probe speaks. */
    public enum Mode { AUTO, BINARY, TEXT }

    private final ProbeEvents events;
    private final Timeline timeline;
    private final FrameReader frames;
    private final BinaryInterpreter binary;
    private final TextLineReader text;
    private Mode mode;
    private long bytes;

    /** A decoder that detects the mode from the first bytes. */
    public StreamDecoder(EdgeSink sink, ProbeEvents events) {
        this(sink, events, Mode.AUTO);
    }

    /** A decoder fixed to {@code mode} ({@link Mode#AUTO} detects). */
    public StreamDecoder(EdgeSink sink, ProbeEvents events, Mode mode) {
        this.events = events;
        this.timeline = new Timeline(sink, events);
        this.binary = new BinaryInterpreter(timeline, events);
        this.text = new TextLineReader(timeline, events);
        this.frames = new FrameReader(new FrameReader.Handler() {
            @Override
            public void onFrame(int type, int seq, byte[] buf, int off, int len) {
                if (StreamDecoder.this.mode == Mode.AUTO) {
                    select(Mode.BINARY);
                }
                binary.onFrame(type, seq, buf, off, len);
            }

            @Override
            public void onDiscard(Trouble why, int n) {
                binary.onDiscard(why, n);
            }
        });
        this.mode = mode;
        binary.quiet = mode == Mode.AUTO;
        text.quiet = mode == Mode.AUTO;
    }

    /** The mode in use: {@link Mode#AUTO} until the first frame or line decides. */
    public Mode mode() {
        return mode;
    }

    /** Feeds {@code len} bytes from {@code off}. */
    public void feed(byte[] b, int off, int len) {
        bytes += len;
        int i = off;
        int end = off + len;
        while (mode == Mode.AUTO && i < end) {
            byte x = b[i++];
            frames.accept(x);
            if (mode == Mode.AUTO && text.accept(x)) {
                select(Mode.TEXT);
            }
        }
        if (mode == Mode.BINARY) {
            frames.accept(b, i, end - i);
        } else {
            for (; i < end; i++) {
                text.accept(b[i]);
            }
        }
    }

    /** Feeds all of {@code b}. */
    public void feed(byte[] b) {
        feed(b, 0, b.length);
    }

    /** Reads {@code in} to its end, feeding every byte, then calls {@link #end()}. */
    public void decodeAll(InputStream in) throws IOException {
        byte[] buf = new byte[8192];
        for (int n; (n = in.read(buf)) >= 0; ) {
            feed(buf, 0, n);
        }
        end();
    }

    private void select(Mode chosen) {
        mode = chosen;
        binary.quiet = false;
        text.quiet = false;
        events.onMode(chosen);
    }

    /**
     * Marks a gap now on every channel with a known level (the transport went away, the host
     * paused reading); a partial frame or line is thrown away first.
     */
    public void markGap(Trouble why) {
        if (mode == Mode.TEXT) {
            text.flushPartial();
        } else {
            frames.flushPartial();
        }
        timeline.gap(why);
    }

    /**
     * Starts a new timeline segment after a reconnect: the probe's clock and sequence are
     * forgotten, and its next event is placed {@code advanceTicks} after the last tick delivered
     * (the host's estimate of the time that passed, in probe ticks). Call {@link #markGap} first.
     */
    public void restartTimeline(long advanceTicks) {
        timeline.restart(advanceTicks);
        binary.restart();
        text.restart();
    }

    /** Calls {@link EdgeSink#onEnd(long)} with the last tick delivered or vouched for. */
    public void end() {
        timeline.end();
    }

    /** The last tick delivered or vouched for by the probe (0 before anything arrived). */
    public long lastTick() {
        return timeline.lastTick();
    }

    /** A snapshot of the counters (allocates one small record). */
    public DecoderCounters counters() {
        boolean isText = mode == Mode.TEXT;
        return new DecoderCounters(bytes, frames.framesOk, frames.crcErrors,
                isText ? text.resyncs : frames.resyncs,
                isText ? text.bytesDiscarded : frames.bytesDiscarded,
                binary.sequenceGaps, binary.framesMissed, binary.overruns + text.overruns, binary.malformed,
                binary.unknownFrames, isText ? text.linesOk : 0, isText ? text.linesBad : 0, timeline.edges,
                timeline.gapMarks, timeline.probeRestarts, binary.adcSamples, binary.adcDropped);
    }

    /** Bytes held in a frame or line that has not ended yet. */
    public long pendingBytes() {
        return mode == Mode.TEXT ? text.pendingBytes() : frames.pendingBytes();
    }
}
