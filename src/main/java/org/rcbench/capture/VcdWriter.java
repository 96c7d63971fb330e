package org.rcbench.capture;

import java.io.Closeable;
import java.io.Flushable;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

/**
 * Writes edges as an IEEE Std 1364-2005 (section 18.2) four-state value change dump of 1-bit wires.
 *
 * <p>Each channel becomes a {@code $var wire 1} in channel order, so reading the file back numbers
 * the channels 0, 1, 2... in the same order. A dotted channel name {@code top.board.out} is written
 * as nested scopes {@code top}, {@code board} and the wire {@code out}; a plain name goes into the
 * scope {@value #DEFAULT_SCOPE}; white space in names becomes {@code _}. Ticks become VCD times at
 * the chosen timescale from the nominal probe clock (the calibration offset is not applied, and is
 * noted in a {@code $comment}); a timescale from {@link VcdTimescale#coarsestExactFor} keeps every
 * tick exact. A gap is written as {@code x}. Only changes are listed, no {@code $dumpvars}. Not
 * thread-safe.
 */
public final class VcdWriter implements EdgeWriter, Closeable, Flushable {
    /** Scope of channels whose names have no dot. */
    public static final String DEFAULT_SCOPE = "capture";

    private final AsciiBuffer out;
    private final TickScaler scaler;
    private final byte[][] codes = new byte[EdgeCaptureFormat.MAX_CHANNEL + 1][];
    private long time = -1;
    private long lastTick;

    /**
     * Writes the header at once.
     *
     * @param out       destination, owned and closed by this writer
     * @param timebase  the clock the ticks count
     * @param timescale VCD time unit
     * @param channels  channel number to name, written in iteration order
     * @param date      text for {@code $date}, or null to leave it out
     */
    public VcdWriter(OutputStream out, Timebase timebase, VcdTimescale timescale, Map<Integer, String> channels,
            String date) throws IOException {
        this.out = new AsciiBuffer(out);
        this.scaler = new TickScaler(timebase.clockHz(), timescale);
        StringBuilder h = new StringBuilder();
        if (date != null) {
            h.append("$date\n    ").append(oneLine(date)).append("\n$end\n");
        }
        String version = VcdWriter.class.getPackage().getImplementationVersion();
        h.append("$version\n    rcbench ").append(version == null ? "development" : version).append("\n$end\n");
        h.append("$comment\n    ticks of a ").append(EdgeCaptureFormat.formatNumber(timebase.clockHz()))
                .append(" Hz probe clock");
        if (timebase.offsetPpm() != 0) {
            h.append(" (calibration_ppm=").append(EdgeCaptureFormat.formatNumber(timebase.offsetPpm()))
                    .append(" not applied)");
        }
        h.append("\n$end\n");
        h.append("$timescale ").append(timescale.text()).append(" $end\n");
        List<String> open = new ArrayList<>();
        int index = 0;
        for (Map.Entry<Integer, String> e : channels.entrySet()) {
            int ch = e.getKey();
            if (ch < 0 || ch > EdgeCaptureFormat.MAX_CHANNEL) {
                throw new IllegalArgumentException("channel outside 0.." + EdgeCaptureFormat.MAX_CHANNEL + ": " + ch);
            }
            List<String> path = path(e.getValue(), ch);
            List<String> scopes = path.subList(0, path.size() - 1);
            int common = 0;
            while (common < open.size() && common < scopes.size() && open.get(common).equals(scopes.get(common))) {
                common++;
            }
            while (open.size() > common) {
                h.append("$upscope $end\n");
                open.remove(open.size() - 1);
            }
            for (int i = common; i < scopes.size(); i++) {
                h.append("$scope module ").append(scopes.get(i)).append(" $end\n");
                open.add(scopes.get(i));
            }
            codes[ch] = code(index++);
            h.append("$var wire 1 ").append(new String(codes[ch], StandardCharsets.US_ASCII)).append(' ')
                    .append(path.get(path.size() - 1)).append(" $end\n");
        }
        for (int i = 0; i < open.size(); i++) {
            h.append("$upscope $end\n");
        }
        h.append("$enddefinitions $end\n");
        this.out.put(h.toString().getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Appends one change of a declared channel at {@code tick}. Allocation-free.
     *
     * @throws IllegalArgumentException for an undeclared channel, a tick before the previous one, a
     *                                  bad level, or a time beyond 2^63-1 units
     */
    public void append(long tick, int channel, int level) throws IOException {
        if (channel < 0 || channel > EdgeCaptureFormat.MAX_CHANNEL || codes[channel] == null || tick < lastTick
                || level < EdgeSink.UNKNOWN || level > EdgeSink.HIGH) {
            throw new IllegalArgumentException("edge does not fit the dump: tick " + tick + " (previous " + lastTick
                    + "), channel " + channel + ", level " + level);
        }
        lastTick = tick;
        timeAt(tick);
        byte[] code = codes[channel];
        out.reserve(AsciiBuffer.SLACK + code.length);
        out.put(level == EdgeSink.UNKNOWN ? (byte) 'x' : (byte) ('0' + level));
        for (byte b : code) {
            out.put(b);
        }
        out.put((byte) '\n');
    }

    /** Writes a final {@code #time} for {@code endTick} so readers know how long the dump lasts. */
    public void end(long endTick) throws IOException {
        if (endTick < lastTick) {
            throw new IllegalArgumentException("end tick " + endTick + " before the last edge's tick " + lastTick);
        }
        lastTick = endTick;
        timeAt(endTick);
    }

    private void timeAt(long tick) throws IOException {
        long t = scaler.units(tick);
        if (t != time) {
            time = t;
            out.reserve(AsciiBuffer.SLACK);
            out.put((byte) '#');
            out.putDecimal(t);
            out.put((byte) '\n');
        }
    }

    @Override
    public void flush() throws IOException {
        out.flush();
    }

    @Override
    public void close() throws IOException {
        out.close();
    }

    /** Copies every edge of {@code source}'s named channels; see {@link #write(Capture, OutputStream, VcdTimescale, Map)}. */
    public static void write(Capture source, OutputStream out, VcdTimescale timescale) throws IOException {
        if (source.channels().isEmpty()) {
            throw new BadInputException(source.name(), "names no channels; say which channels to write to VCD");
        }
        write(source, out, timescale, source.channels());
    }

    /**
     * Copies the edges of {@code channels} (number to name) from {@code source} to a VCD on
     * {@code out}, dropping other channels; ends with the source's end time. Closes {@code out}, not
     * the source.
     *
     * @throws BadInputException naming the source when a tick is beyond the VCD time range
     */
    public static void write(Capture source, OutputStream out, VcdTimescale timescale,
            Map<Integer, String> channels) throws IOException {
        Map<Integer, String> chosen = new LinkedHashMap<>(channels);
        String date = source.header().getOrDefault("date", source.header().get(EdgeCaptureFormat.STARTED));
        try (VcdWriter w = new VcdWriter(out, source.timebase(), timescale, chosen, date)) {
            boolean[] wanted = new boolean[EdgeCaptureFormat.MAX_CHANNEL + 1];
            for (int ch : chosen.keySet()) {
                wanted[ch] = true;
            }
            EdgeWriter.copy(source, w, ch -> wanted[ch]);
        } catch (IllegalArgumentException e) {
            throw new BadInputException(source.name(), e.getMessage(), e);
        }
    }

    /**
     * Identifier code number {@code i}: one printable character {@code !}..{@code ~} other than
     * {@code $} (which other tools may take for a keyword), then two, and so on.
     */
    static byte[] code(int i) {
        StringBuilder sb = new StringBuilder();
        int v = i;
        do {
            sb.append(CODE_CHARS.charAt(v % CODE_CHARS.length()));
            v = v / CODE_CHARS.length() - 1;
        } while (v >= 0);
        return sb.toString().getBytes(StandardCharsets.US_ASCII);
    }

    private static final String CODE_CHARS = codeChars();

    private static String codeChars() {
        StringBuilder sb = new StringBuilder();
        for (char c = '!'; c <= '~'; c++) {
            if (c != '$') {
                sb.append(c);
            }
        }
        return sb.toString();
    }

    private static List<String> path(String name, int channel) {
        List<String> parts = new ArrayList<>();
        for (String part : name.split("\\.", -1)) {
            String clean = part.strip().replaceAll("\\s+", "_");
            parts.add(clean.isEmpty() || clean.startsWith("$") ? "_" + clean : clean);
        }
        if (name.isBlank()) {
            parts = new ArrayList<>(List.of("ch" + channel));
        }
        if (parts.size() == 1) {
            parts.add(0, DEFAULT_SCOPE);
        }
        return parts;
    }

    private static String oneLine(String text) {
        return text.replace('\r', ' ').replace('\n', ' ').replace("$end", "(end)");
    }
}
