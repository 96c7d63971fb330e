package org.rcbench.capture;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeMap;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.Timebase;

/**
 * The header of an edge-capture file, from the magic line to the column line inclusive.
 *
 * <p>Rules: an optional UTF-8 byte-order mark; line 1 is {@link EdgeCaptureFormat#MAGIC}; then any
 * mix of blank lines, {@code # key=value} fields and {@code #} comments (a {@code #} line whose text
 * has no {@code =} or whose key is not made of letters, digits, {@code _ . -}); then the column line
 * {@link EdgeCaptureFormat#COLUMNS}. Keys are case-sensitive; a repeated key is an error; unknown
 * keys are kept. Header lines must be valid UTF-8. Immutable once read.
 */
final class EdgeCaptureHeader {
    final Map<String, String> fields;
    final Map<Integer, String> channels;
    /** Channels the data may use: those named in the header, or all when none is named. */
    final boolean[] allowed = new boolean[EdgeCaptureFormat.MAX_CHANNEL + 1];
    final Timebase timebase;

    private EdgeCaptureHeader(Map<String, String> fields, Map<Integer, String> channels, Timebase timebase) {
        this.fields = fields;
        this.channels = channels;
        this.timebase = timebase;
        for (int ch = 0; ch < allowed.length; ch++) {
            allowed[ch] = channels.isEmpty() || channels.containsKey(ch);
        }
    }

    /** Reads the header; leaves the cursor at the first line after the column line. */
    static EdgeCaptureHeader read(LineCursor cur, Warnings warnings) throws IOException {
        readMagic(cur);
        Map<String, String> fields = new LinkedHashMap<>();
        Map<String, Long> keyLines = new HashMap<>();
        Map<Integer, String> channels = new TreeMap<>();
        double clockHz = Double.NaN;
        double offsetPpm = 0;
        double uPpm = 0;
        for (;;) {
            if (!cur.locate()) {
                throw new BadInputException(cur.where(), "file ends before the column line "
                        + EdgeCaptureFormat.COLUMNS);
            }
            if (cur.start == cur.end) {
                cur.consume();
                continue;
            }
            if (cur.equalsAscii(EdgeCaptureFormat.COLUMNS)) {
                if (Double.isNaN(clockHz)) {
                    throw new BadInputException(cur.where(), "no " + EdgeCaptureFormat.CLOCK_HZ
                            + " in the header (add a line \"# clock_hz=<probe clock in Hz>\" above this one)");
                }
                cur.consume();
                return new EdgeCaptureHeader(Collections.unmodifiableMap(fields),
                        Collections.unmodifiableMap(new LinkedHashMap<>(channels)),
                        new Timebase(clockHz, offsetPpm, uPpm));
            }
            if (cur.in.buf[cur.start] != '#') {
                String what = isDigit(cur.in.buf[cur.start])
                        ? "data line before the column line " + EdgeCaptureFormat.COLUMNS + ": "
                        : "expected a \"# key=value\" header line or the column line "
                                + EdgeCaptureFormat.COLUMNS + ", found ";
                throw new BadInputException(cur.where(), what + cur.quoted());
            }
            String text = decode(cur, cur.start + 1, cur.end).strip();
            int eq = text.indexOf('=');
            String key = eq < 0 ? "" : text.substring(0, eq).strip();
            if (!EdgeCaptureFormat.isValidKey(key)) {
                cur.consume(); // a comment
                continue;
            }
            String value = text.substring(eq + 1).strip();
            Long first = keyLines.putIfAbsent(key, cur.line);
            if (first != null) {
                throw new BadInputException(cur.where(), "header key " + key + " given twice (first on line "
                        + first + ")");
            }
            fields.put(key, value);
            switch (key) {
                case EdgeCaptureFormat.CLOCK_HZ -> clockHz = number(cur, key, value, 0, true,
                        "a positive number of hertz");
                case EdgeCaptureFormat.CALIBRATION_PPM -> offsetPpm = number(cur, key, value, -1e6, false,
                        "a number of ppm between -1000000 and 1000000");
                case EdgeCaptureFormat.CALIBRATION_U_PPM -> uPpm = number(cur, key, value, 0, false,
                        "a number of ppm, zero or more");
                case EdgeCaptureFormat.STARTED -> checkTimestamp(cur, value, warnings);
                default -> {
                    if (key.startsWith(EdgeCaptureFormat.CHANNEL_PREFIX)) {
                        channels.put(channelNumber(cur, key), value);
                    }
                }
            }
            cur.consume();
        }
    }

    private static void readMagic(LineCursor cur) throws IOException {
        if (!cur.locate()) {
            throw new BadInputException(cur.where(), "empty file: expected the first line \""
                    + EdgeCaptureFormat.MAGIC + "\"");
        }
        byte[] b = cur.in.buf;
        if (cur.end - cur.start >= 3 && (b[cur.start] & 0xff) == 0xef && (b[cur.start + 1] & 0xff) == 0xbb
                && (b[cur.start + 2] & 0xff) == 0xbf) {
            cur.start += 3; // UTF-8 byte-order mark
        }
        if (cur.equalsAscii(EdgeCaptureFormat.MAGIC)) {
            cur.consume();
            return;
        }
        String prefix = "# rcbench edges v";
        String line = new String(b, cur.start, cur.end - cur.start, StandardCharsets.UTF_8).strip();
        if (line.startsWith(prefix) && line.length() > prefix.length()) {
            throw new BadInputException(cur.where(), "capture format version " + Snippet.quote(
                    line.substring(prefix.length() - 1)) + " is not one this rcbench reads (v1)");
        }
        throw new BadInputException(cur.where(), "not an rcbench edge capture: the first line must be \""
                + EdgeCaptureFormat.MAGIC + "\", found " + cur.quoted());
    }

    /** Value of a numeric key, at least {@code min} (above it when {@code exclusive}), below 1e6 for ppm. */
    private static double number(LineCursor cur, String key, String value, double min, boolean exclusive,
            String expected) {
        double v = EdgeCaptureFormat.parseDecimal(value);
        boolean ok = !Double.isNaN(v) && (exclusive ? v > min : v >= min)
                && (key.equals(EdgeCaptureFormat.CLOCK_HZ) || Math.abs(v) < 1e6);
        if (!ok) {
            throw new BadInputException(cur.where(), key + " must be " + expected + ", found "
                    + Snippet.quote(value));
        }
        return v;
    }

    private static int channelNumber(LineCursor cur, String key) {
        String digits = key.substring(EdgeCaptureFormat.CHANNEL_PREFIX.length());
        boolean ok = !digits.isEmpty() && digits.length() <= 3;
        for (int i = 0; ok && i < digits.length(); i++) {
            ok = isDigit((byte) digits.charAt(i));
        }
        int ch = ok ? Integer.parseInt(digits) : -1;
        if (ch < 0 || ch > EdgeCaptureFormat.MAX_CHANNEL) {
            throw new BadInputException(cur.where(), "channel key " + Snippet.quote(key)
                    + " must be channel.N with N from 0 to " + EdgeCaptureFormat.MAX_CHANNEL);
        }
        return ch;
    }

    private static void checkTimestamp(LineCursor cur, String value, Warnings warnings) {
        try {
            OffsetDateTime.parse(value);
            return;
        } catch (DateTimeParseException e) {
            // try the other ISO-8601 forms
        }
        try {
            Instant.parse(value);
            return;
        } catch (DateTimeParseException e) {
            // try the local form
        }
        try {
            LocalDateTime.parse(value);
        } catch (DateTimeParseException e) {
            warnings.add(cur.where(), "started " + Snippet.quote(value)
                    + " is not an ISO-8601 date and time; kept as text");
        }
    }

    private static String decode(LineCursor cur, int from, int to) {
        try {
            return StandardCharsets.UTF_8.newDecoder().decode(ByteBuffer.wrap(cur.in.buf, from, to - from))
                    .toString();
        } catch (CharacterCodingException e) {
            throw new BadInputException(cur.where(), "header line is not valid UTF-8: " + cur.quoted());
        }
    }

    static boolean isDigit(byte c) {
        return c >= '0' && c <= '9';
    }
}
