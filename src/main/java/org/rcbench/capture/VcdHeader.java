package org.rcbench.capture;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.rcbench.common.BadInputException;

/**
 * The declarations of a value change dump, up to and including {@code $enddefinitions $end}
 * (IEEE Std 1364-2005 section 18.2).
 *
 * <p>{@code $date}, {@code $version}, {@code $comment} and {@code $timescale} go to the header
 * map; {@code $scope}/{@code $upscope} build the dotted path of each variable; each {@code $var}
 * of a logic type (wire, reg, tri..., and SystemVerilog logic/bit) and size 1 becomes the next
 * channel, numbered from 0 in declaration order. A second {@code $var} with an identifier code
 * already seen is an alias of the same signal and adds no channel. Vectors, reals, integers and
 * events are listed as skipped signals; their value changes are read and ignored. Immutable once
 * read.
 */
final class VcdHeader {
    /** Identifier value for a declared signal that is not a channel. */
    static final int SKIPPED = -1;

    private static final Set<String> LOGIC_TYPES = Set.of("wire", "reg", "tri", "triand", "trior", "trireg",
            "tri0", "tri1", "wand", "wor", "supply0", "supply1", "uwire", "logic", "bit");

    final Map<String, String> fields = new LinkedHashMap<>();
    final Map<Integer, String> channels = new LinkedHashMap<>();
    final Map<String, String> skipped = new LinkedHashMap<>();
    final VcdIds ids = new VcdIds();
    VcdTimescale timescale;

    private final List<String> scopes = new ArrayList<>();
    private int comments;

    static VcdHeader read(VcdTokens t, Warnings warnings) throws IOException {
        VcdHeader h = new VcdHeader();
        h.readDeclarations(t, warnings);
        return h;
    }

    private void readDeclarations(VcdTokens t, Warnings warnings) throws IOException {
        for (;;) {
            if (!t.next()) {
                throw new BadInputException(t.where(), "file ends inside the header (no $enddefinitions)");
            }
            String where = t.where();
            if (t.in.buf[t.start] != '$') {
                throw new BadInputException(where, "expected a $ keyword in the header, found " + t.quoted());
            }
            String keyword = t.text();
            switch (keyword) {
                case "$date" -> fields.put("date", String.join(" ", untilEnd(t, keyword)));
                case "$version" -> fields.put("version", String.join(" ", untilEnd(t, keyword)));
                case "$comment" -> {
                    comments++;
                    fields.put(comments == 1 ? "comment" : "comment." + comments, String.join(" ", untilEnd(t, keyword)));
                }
                case "$timescale" -> {
                    String text = String.join(" ", untilEnd(t, keyword));
                    if (timescale != null) {
                        throw new BadInputException(where, "second $timescale (the first said " + timescale.text() + ")");
                    }
                    try {
                        timescale = VcdTimescale.parse(text);
                    } catch (IllegalArgumentException e) {
                        throw new BadInputException(where, e.getMessage());
                    }
                    fields.put("timescale", timescale.text());
                }
                case "$scope" -> {
                    List<String> args = untilEnd(t, keyword);
                    if (args.size() != 2) {
                        throw new BadInputException(where, "$scope needs a scope type and a name, found "
                                + Snippet.quote(String.join(" ", args)));
                    }
                    scopes.add(args.get(1));
                }
                case "$upscope" -> {
                    untilEnd(t, keyword);
                    if (scopes.isEmpty()) {
                        throw new BadInputException(where, "$upscope without a matching $scope");
                    }
                    scopes.remove(scopes.size() - 1);
                }
                case "$var" -> declare(untilEnd(t, keyword), where, warnings);
                case "$enddefinitions" -> {
                    untilEnd(t, keyword);
                    if (timescale == null) {
                        throw new BadInputException(where, "no $timescale in the header, so VCD times cannot be"
                                + " turned into seconds");
                    }
                    return;
                }
                case "$dumpvars", "$dumpall", "$dumpon", "$dumpoff" ->
                    throw new BadInputException(where, keyword + " before $enddefinitions");
                default -> {
                    untilEnd(t, keyword);
                    warnings.add(where, "unknown header command " + Snippet.quote(keyword) + " skipped");
                }
            }
        }
    }

    /** {@code $var type size code reference [bit-select] $end}. */
    private void declare(List<String> args, String where, Warnings warnings) {
        if (args.size() < 4) {
            throw new BadInputException(where, "$var needs a type, a size, an identifier code and a name, found "
                    + Snippet.quote(String.join(" ", args)));
        }
        String type = args.get(0);
        int size = parseSize(args.get(1), where);
        byte[] code = args.get(2).getBytes(StandardCharsets.UTF_8);
        String path = path(String.join("", args.subList(3, args.size())));
        int existing = ids.get(code, 0, code.length);
        if (existing != VcdIds.NOT_FOUND) {
            return; // an alias of a signal already declared
        }
        String reason = null;
        if (!LOGIC_TYPES.contains(type)) {
            reason = ("aeiou".indexOf(type.charAt(0)) >= 0 ? "an " : "a ") + type + " variable";
        } else if (size != 1) {
            reason = (size == 8 || size == 11 || size == 18 ? "an " : "a ") + size + "-bit vector";
        } else if (channels.size() > EdgeCaptureFormat.MAX_CHANNEL) {
            reason = "beyond the first " + (EdgeCaptureFormat.MAX_CHANNEL + 1) + " 1-bit wires";
            warnings.add(where, "more than " + (EdgeCaptureFormat.MAX_CHANNEL + 1) + " 1-bit wires; "
                    + path + " is not read");
        }
        if (reason != null) {
            skipped.put(path, reason);
            ids.putIfAbsent(code, SKIPPED);
            return;
        }
        int ch = channels.size();
        channels.put(ch, path);
        ids.putIfAbsent(code, ch);
    }

    private static int parseSize(String text, String where) {
        boolean digits = !text.isEmpty() && text.length() <= 9;
        for (int i = 0; digits && i < text.length(); i++) {
            digits = text.charAt(i) >= '0' && text.charAt(i) <= '9';
        }
        int size = digits ? Integer.parseInt(text) : 0;
        if (size < 1) {
            throw new BadInputException(where, "$var size must be a whole number of bits, 1 or more, found "
                    + Snippet.quote(text));
        }
        return size;
    }

    private String path(String reference) {
        if (scopes.isEmpty()) {
            return reference;
        }
        return String.join(".", scopes) + "." + reference;
    }

    /**
     * The tokens after a keyword up to its {@code $end}. Free-text commands ({@code $date},
     * {@code $version}, {@code $comment}, unknown ones) may contain {@code $} words; in the others
     * a {@code $} word means the {@code $end} is missing.
     */
    static List<String> untilEnd(VcdTokens t, String keyword) throws IOException {
        String where = t.where();
        boolean freeText = switch (keyword) {
            case "$var", "$scope", "$upscope", "$timescale", "$enddefinitions" -> false;
            default -> true;
        };
        List<String> args = new ArrayList<>();
        for (;;) {
            if (!t.next()) {
                throw new BadInputException(where, keyword + " has no closing $end");
            }
            if (t.is("$end")) {
                return args;
            }
            boolean codeOfVar = keyword.equals("$var") && args.size() == 2; // a code may begin with $
            if (!freeText && !codeOfVar && t.in.buf[t.start] == '$') {
                throw new BadInputException(where, keyword + " has no closing $end (found " + t.quoted()
                        + " on line " + t.tokenLine + ")");
            }
            args.add(t.text());
        }
    }

    Map<String, String> fieldsView() {
        return Collections.unmodifiableMap(fields);
    }
}
