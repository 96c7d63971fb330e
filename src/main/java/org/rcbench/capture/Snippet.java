package org.rcbench.capture;

import java.nio.charset.StandardCharsets;

/** Quotes a piece of a file for an error message: one line, control bytes escaped, long text shortened. */
final class Snippet {
    /** Longest quoted text, in characters, before it is shortened with an ellipsis. */
    static final int MAX_CHARS = 48;

    private Snippet() {
    }

    /** {@code "text"} for {@code b[from..to)}, decoded as UTF-8 with bad bytes replaced. */
    static String quote(byte[] b, int from, int to) {
        boolean shortened = false;
        // Decode a little more than needed so a multi-byte character is not cut in the middle.
        if (to - from > MAX_CHARS * 4) {
            to = from + MAX_CHARS * 4;
            shortened = true;
        }
        return quote(new String(b, from, to - from, StandardCharsets.UTF_8), shortened);
    }

    static String quote(String text) {
        return quote(text, false);
    }

    private static String quote(String text, boolean shortened) {
        StringBuilder sb = new StringBuilder(Math.min(text.length(), MAX_CHARS) + 8).append('"');
        int chars = 0;
        for (int i = 0; i < text.length(); i++) {
            if (chars == MAX_CHARS) {
                shortened = true;
                break;
            }
            char c = text.charAt(i);
            switch (c) {
                case '\t' -> sb.append("\\t");
                case '\r' -> sb.append("\\r");
                case '\n' -> sb.append("\\n");
                case '"' -> sb.append("\\\"");
                case '\\' -> sb.append("\\\\");
                default -> {
                    if (c < 0x20 || c == 0x7f) {
                        sb.append(String.format(java.util.Locale.ROOT, "\\x%02x", (int) c));
                    } else {
                        sb.append(c);
                    }
                }
            }
            chars++;
        }
        sb.append('"');
        if (shortened) {
            sb.append("...");
        }
        return sb.toString();
    }
}
