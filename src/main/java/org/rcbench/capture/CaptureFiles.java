package org.rcbench.capture;

import java.io.IOException;
import java.io.InputStream;
import java.io.SequenceInputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Map;
import java.util.zip.GZIPInputStream;
import java.util.zip.ZipException;
import org.rcbench.common.BadInputException;

/**
 * Opens capture files of either kind, plain or gzip-compressed, recognised by their content.
 *
 * <p>Gzip is recognised by its magic bytes {@code 1f 8b} (RFC 1952), whatever the file is called.
 * The decompressed (or plain) content is an rcbench edge capture if its first line starts with
 * {@code #}, and an IEEE 1364 value change dump if its first non-blank character is {@code $};
 * anything else is refused. Stateless and thread-safe; each returned {@link Capture} is not.
 */
public final class CaptureFiles {
    private CaptureFiles() {
    }

    /**
     * Opens {@code file} and reads its header.
     *
     * @throws BadInputException {@code file: no such file} and the like, or {@code file:line: what}
     *                           for a bad header
     */
    public static Capture open(Path file) throws IOException {
        String name = file.toString();
        if (Files.isDirectory(file)) {
            throw new BadInputException(name, "is a folder, not a capture file");
        }
        InputStream in;
        try {
            in = Files.newInputStream(file);
        } catch (NoSuchFileException e) {
            throw new BadInputException(name, "no such file", e);
        } catch (AccessDeniedException e) {
            throw new BadInputException(name, "permission denied", e);
        }
        return open(in, name);
    }

    /**
     * Reads a capture from {@code in} (which the returned capture owns and closes); {@code name}
     * is used in messages. On an error in the header the stream is closed before the exception
     * leaves.
     */
    public static Capture open(InputStream in, String name) throws IOException {
        try {
            return detect(in, name);
        } catch (IOException | RuntimeException e) {
            try {
                in.close();
            } catch (IOException suppressed) {
                e.addSuppressed(suppressed);
            }
            throw e;
        }
    }

    private static Capture detect(InputStream raw, String name) throws IOException {
        ByteInput in = new ByteInput(raw, false);
        in.request(2);
        if (in.limit - in.pos >= 2 && (in.buf[0] & 0xff) == 0x1f && (in.buf[1] & 0xff) == 0x8b) {
            InputStream again = new SequenceInputStream(
                    new java.io.ByteArrayInputStream(in.buf, 0, in.limit), raw);
            InputStream unzipped;
            try {
                unzipped = new GZIPInputStream(again, ByteInput.WINDOW_BYTES);
            } catch (ZipException | java.io.EOFException e) {
                throw new BadInputException(name + ":1", "corrupt gzip data (" + e.getMessage() + ")", e);
            }
            in = new ByteInput(unzipped, true);
        }
        try {
            in.request(64);
        } catch (ZipException e) {
            throw new BadInputException(name + ":1", "corrupt gzip data (" + e.getMessage() + ")", e);
        }
        int i = in.pos;
        if (i + 3 <= in.limit && (in.buf[i] & 0xff) == 0xef && (in.buf[i + 1] & 0xff) == 0xbb
                && (in.buf[i + 2] & 0xff) == 0xbf) {
            i += 3; // UTF-8 byte-order mark
        }
        if (i < in.limit && in.buf[i] == '#') {
            return new EdgeCaptureReader(in, name);
        }
        while (i < in.limit && isBlank(in.buf[i])) {
            i++;
        }
        if (i < in.limit && in.buf[i] == '$') {
            return new VcdReader(in, name);
        }
        if (in.limit == in.pos) {
            throw new BadInputException(name + ":1", "empty file: expected the first line \""
                    + EdgeCaptureFormat.MAGIC + "\" or an IEEE 1364 VCD header");
        }
        int lineEnd = in.pos;
        while (lineEnd < in.limit && in.buf[lineEnd] != '\n' && in.buf[lineEnd] != '\r') {
            lineEnd++;
        }
        throw new BadInputException(name + ":1", "not a capture file: expected the first line \""
                + EdgeCaptureFormat.MAGIC + "\" or an IEEE 1364 VCD header, found "
                + Snippet.quote(in.buf, in.pos, lineEnd));
    }

    /**
     * The channel number {@code spec} names in {@code capture}: a channel number, a full channel
     * name, or the last dotted part of exactly one name ({@code out} for {@code top.board.out}).
     *
     * @throws BadInputException naming the capture when no single 1-bit channel matches, saying
     *                           why (unknown, ambiguous, or a signal that is not a 1-bit wire)
     */
    public static int selectChannel(Capture capture, String spec) {
        return selectChannel(capture.name(), capture.channels(), capture.skippedSignals(), spec);
    }

    /**
     * As {@link #selectChannel(Capture, String)} for any named channels: those of the source called
     * {@code where} (a live probe's, a simulated board's), with {@code skipped} the signals it holds
     * that are not 1-bit wires (name to description; empty for a probe).
     */
    public static int selectChannel(String where, Map<Integer, String> channels, Map<String, String> skipped,
            String spec) {
        String s = spec.strip();
        if (!s.isEmpty() && s.length() <= 3 && s.chars().allMatch(c -> c >= '0' && c <= '9')) {
            int ch = Integer.parseInt(s);
            if (ch <= EdgeCaptureFormat.MAX_CHANNEL && (channels.isEmpty() || channels.containsKey(ch))) {
                return ch;
            }
            throw new BadInputException(where, "no channel " + ch + " (channels: "
                    + describe(channels) + ")");
        }
        Integer found = null;
        int suffixMatches = 0;
        for (Map.Entry<Integer, String> e : channels.entrySet()) {
            if (e.getValue().equals(s)) {
                return e.getKey();
            }
            if (e.getValue().endsWith("." + s)) {
                found = e.getKey();
                suffixMatches++;
            }
        }
        if (suffixMatches == 1) {
            return found;
        }
        if (suffixMatches > 1) {
            throw new BadInputException(where, "channel name " + Snippet.quote(s)
                    + " matches several channels; give the full name (channels: " + describe(channels) + ")");
        }
        for (Map.Entry<String, String> e : skipped.entrySet()) {
            if (e.getKey().equals(s) || e.getKey().endsWith("." + s)) {
                throw new BadInputException(where, e.getKey() + " is " + e.getValue()
                        + "; only 1-bit wires can be measured");
            }
        }
        throw new BadInputException(where, "no channel named " + Snippet.quote(s) + " (channels: "
                + describe(channels) + ")");
    }

    private static String describe(Map<Integer, String> channels) {
        if (channels.isEmpty()) {
            return "none named";
        }
        StringBuilder sb = new StringBuilder();
        for (Map.Entry<Integer, String> e : channels.entrySet()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(e.getKey()).append('=').append(e.getValue());
        }
        return sb.toString();
    }

    /** {@code 0, 1, 3}: the channel numbers for a message. */
    static String listChannels(Map<Integer, String> channels) {
        StringBuilder sb = new StringBuilder();
        for (Integer ch : channels.keySet()) {
            sb.append(sb.length() == 0 ? "" : ", ").append(ch);
        }
        return sb.toString();
    }

    private static boolean isBlank(byte c) {
        return c == ' ' || c == '\t' || c == '\r' || c == '\n' || c == '\f' || c == 0x0b;
    }
}
