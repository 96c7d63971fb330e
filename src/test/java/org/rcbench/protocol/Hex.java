package org.rcbench.protocol;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/** Hex text to bytes and back, and the fenced example blocks of {@code firmware-notes/protocol.md}. */
final class Hex {
    static final Path DOCUMENT = Path.of("firmware-notes", "protocol.md");

    private Hex() {
    }

    static byte[] parse(String hex) {
        String digits = hex.replaceAll("\\s+", "");
        byte[] out = new byte[digits.length() / 2];
        for (int i = 0; i < out.length; i++) {
            out[i] = (byte) Integer.parseInt(digits.substring(2 * i, 2 * i + 2), 16);
        }
        return out;
    }

    static String format(byte[] b) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < b.length; i++) {
            if (i > 0) {
                sb.append(' ');
            }
            sb.append(String.format(Locale.ROOT, "%02x", b[i] & 0xFF));
        }
        return sb.toString();
    }

    /** Fenced blocks of the document with an info string {@code KIND NAME}, by name, in document order. */
    static Map<String, String> blocks(String kind) throws IOException {
        Map<String, String> found = new LinkedHashMap<>();
        String fence = "```" + kind + " ";
        String[] lines = Files.readString(DOCUMENT).split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].startsWith(fence)) {
                String name = lines[i].substring(fence.length()).trim();
                StringBuilder body = new StringBuilder();
                for (i++; !lines[i].startsWith("```"); i++) {
                    body.append(lines[i]).append('\n');
                }
                found.put(name, body.toString());
            }
        }
        return found;
    }
}
