package org.rcbench.capture;

import java.io.ByteArrayInputStream;
import java.io.Closeable;
import java.io.Flushable;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.OpenOption;
import java.nio.file.Path;
import java.util.Map;
import java.util.zip.GZIPOutputStream;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;

/**
 * Writes an rcbench edge-capture file, version 1, as edges arrive.
 *
 * <p>The header is checked by the same rules the reader applies (so whatever this writes reads
 * back) and written at once; {@link #append} then formats each edge into a 64 KiB buffer without
 * allocating. Bytes reach the stream when the buffer fills, on {@link #flush()} and on
 * {@link #close()}. With gzip, {@code flush()} ends a deflate block (a sync flush), so a file cut
 * off after a flush still decompresses up to it. Header values are written as given; the reader
 * strips spaces around them. Not thread-safe: {@link org.rcbench.record.Recorder} adds the locking
 * and timing for live use.
 */
public final class EdgeCaptureWriter implements EdgeWriter, Closeable, Flushable {
    private static final byte[] END_TICK = ("# " + EdgeCaptureFormat.END_TICK + "=").getBytes(StandardCharsets.US_ASCII);

    private final AsciiBuffer out;
    private final boolean[] allowed;
    private long lastTick;
    private long edges;

    private EdgeCaptureWriter(OutputStream stream, byte[] headerText, boolean[] allowed) throws IOException {
        this.allowed = allowed;
        this.out = new AsciiBuffer(stream);
        out.put(headerText);
    }

    /**
     * A writer to {@code out} (which it owns and closes), optionally gzip-compressed.
     *
     * @param header {@code key=value} fields in writing order; must hold a valid
     *               {@link EdgeCaptureFormat#CLOCK_HZ}; see {@link EdgeCaptureFormat#header}
     * @throws IllegalArgumentException when the header would not read back (bad key, value with a
     *                                  line break, missing clock)
     */
    public static EdgeCaptureWriter to(OutputStream out, Map<String, String> header, boolean gzip) throws IOException {
        byte[] text = headerText(header);
        boolean[] allowed = checkHeader(text).allowed; // before anything is written
        return new EdgeCaptureWriter(gzip ? new GZIPOutputStream(out, 1 << 16, true) : out, text, allowed);
    }

    /** A writer to a new or truncated {@code file}; see {@link #to}. */
    public static EdgeCaptureWriter create(Path file, Map<String, String> header, boolean gzip,
            OpenOption... options) throws IOException {
        checkHeader(headerText(header));
        return to(Files.newOutputStream(file, options), header, gzip);
    }

    /**
     * Appends one edge (or gap start, {@code level} {@link EdgeSink#UNKNOWN}). Allocation-free.
     *
     * @throws IllegalArgumentException for a tick below the previous one, a channel outside 0..255
     *                                  or not named in the header, or a level other than 0, 1, -1
     */
    public void append(long tick, int channel, int level) throws IOException {
        if (tick < lastTick || channel < 0 || channel > EdgeCaptureFormat.MAX_CHANNEL || !allowed[channel]
                || level < EdgeSink.UNKNOWN || level > EdgeSink.HIGH) {
            throw new IllegalArgumentException("edge does not fit the capture: tick " + tick + " (previous "
                    + lastTick + "), channel " + channel + ", level " + level);
        }
        out.reserve(AsciiBuffer.SLACK);
        out.putDecimal(tick);
        out.put((byte) ',');
        out.putDecimal(channel);
        out.put((byte) ',');
        out.put(level == EdgeSink.UNKNOWN ? (byte) 'x' : (byte) ('0' + level));
        out.put((byte) '\n');
        lastTick = tick;
        edges++;
    }

    /** Writes the trailer {@code # end_tick=N}: the source vouches for the signal up to tick N. */
    public void end(long endTick) throws IOException {
        if (endTick < lastTick) {
            throw new IllegalArgumentException("end tick " + endTick + " before the last edge's tick " + lastTick);
        }
        out.put(END_TICK);
        out.reserve(AsciiBuffer.SLACK);
        out.putDecimal(endTick);
        out.put((byte) '\n');
    }

    /** Edges appended so far. */
    public long edges() {
        return edges;
    }

    /** Tick of the last edge appended (0 before the first). */
    public long lastTick() {
        return lastTick;
    }

    /** Hands every buffered byte to the stream and flushes it (a sync flush for gzip). */
    @Override
    public void flush() throws IOException {
        out.flush();
    }

    @Override
    public void close() throws IOException {
        out.close();
    }

    /**
     * Copies every edge of {@code source} to {@code out} as an edge capture: its timebase and
     * channel names, then its other header fields whose keys are valid here (VCD's date, version,
     * timescale, comment), then the edges and the end tick. Closes {@code out}, not the source.
     */
    public static void write(Capture source, OutputStream out, boolean gzip) throws IOException {
        Map<String, String> header = EdgeCaptureFormat.header(source.timebase(), source.channels());
        for (Map.Entry<String, String> e : source.header().entrySet()) {
            String key = e.getKey();
            boolean reserved = key.equals(EdgeCaptureFormat.CLOCK_HZ) || key.startsWith(EdgeCaptureFormat.CHANNEL_PREFIX)
                    || key.equals(EdgeCaptureFormat.CALIBRATION_PPM) || key.equals(EdgeCaptureFormat.CALIBRATION_U_PPM);
            if (!reserved && EdgeCaptureFormat.isValidKey(key)) {
                header.putIfAbsent(key, e.getValue().replace('\r', ' ').replace('\n', ' '));
            }
        }
        try (EdgeCaptureWriter w = to(out, header, gzip)) {
            EdgeWriter.copy(source, w, ch -> true);
        }
    }

    private static byte[] headerText(Map<String, String> header) {
        StringBuilder sb = new StringBuilder(EdgeCaptureFormat.MAGIC).append('\n');
        for (Map.Entry<String, String> e : header.entrySet()) {
            String key = e.getKey();
            String value = e.getValue();
            if (!EdgeCaptureFormat.isValidKey(key) || value.indexOf('\n') >= 0 || value.indexOf('\r') >= 0) {
                throw new IllegalArgumentException("header field cannot be written: " + key + "=" + value);
            }
            sb.append("# ").append(key).append('=').append(value).append('\n');
        }
        return sb.append(EdgeCaptureFormat.COLUMNS).append('\n').toString().getBytes(StandardCharsets.UTF_8);
    }

    private static EdgeCaptureHeader checkHeader(byte[] text) throws IOException {
        LineCursor cur = new LineCursor(new ByteInput(new ByteArrayInputStream(text), false), "header");
        try {
            return EdgeCaptureHeader.read(cur, new Warnings());
        } catch (BadInputException e) {
            throw new IllegalArgumentException("header would not read back: " + e.getMessage(), e);
        }
    }
}
