package org.rcbench.design;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The line on which each key of a TOML text is written, for error messages only (the document itself
 * is parsed by Jackson, whose tree keeps no positions). Understands table headers ({@code [a.b]},
 * {@code [[a]]}), {@code key = value} lines with bare, quoted and dotted keys, comments, and skips the
 * inside of multi-line strings. A key it cannot place simply has no line.
 */
final class KeyLines {
    private final Map<String, Integer> lines = new HashMap<>();

    private KeyLines() {
    }

    static KeyLines scan(String text) {
        KeyLines k = new KeyLines();
        String[] rows = text.split("\n", -1);
        List<String> table = new ArrayList<>();
        String openString = null;
        for (int i = 0; i < rows.length; i++) {
            String row = rows[i];
            if (openString != null) {
                if (row.contains(openString)) {
                    openString = null;
                }
                continue;
            }
            String t = stripComment(row).strip();
            if (t.isEmpty()) {
                continue;
            }
            if (t.startsWith("[")) {
                boolean array = t.startsWith("[[");
                int end = t.indexOf(array ? "]]" : "]");
                if (end < 0) {
                    continue;
                }
                table = splitKey(t.substring(array ? 2 : 1, end));
                k.put(table, i + 1);
                continue;
            }
            int eq = indexOutsideQuotes(t, '=');
            if (eq <= 0) {
                continue;
            }
            List<String> path = new ArrayList<>(table);
            path.addAll(splitKey(t.substring(0, eq)));
            k.put(path, i + 1);
            String value = t.substring(eq + 1).strip();
            for (String q : new String[] {"\"\"\"", "'''"}) {
                if (value.startsWith(q) && value.indexOf(q, 3) < 0) {
                    openString = q;
                }
            }
        }
        return k;
    }

    /** The 1-based line of the key at dotted {@code path} ({@code parts.R1.role}), or 0 when unknown. */
    int line(String path) {
        Integer l = lines.get(path);
        return l == null ? 0 : l;
    }

    /** Records the line for the path and, if not yet seen, for each enclosing table (its first key). */
    private void put(List<String> path, int line) {
        for (int n = path.size(); n >= 1; n--) {
            lines.putIfAbsent(String.join(".", path.subList(0, n)), line);
        }
    }

    private static List<String> splitKey(String key) {
        List<String> parts = new ArrayList<>();
        StringBuilder cur = new StringBuilder();
        char quote = 0;
        for (int i = 0; i < key.length(); i++) {
            char c = key.charAt(i);
            if (quote != 0) {
                if (c == quote) {
                    quote = 0;
                } else {
                    cur.append(c);
                }
            } else if (c == '"' || c == '\'') {
                quote = c;
            } else if (c == '.') {
                parts.add(cur.toString().strip());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        parts.add(cur.toString().strip());
        return parts;
    }

    private static String stripComment(String row) {
        int hash = indexOutsideQuotes(row, '#');
        return hash < 0 ? row : row.substring(0, hash);
    }

    private static int indexOutsideQuotes(String s, char target) {
        char quote = 0;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (quote != 0) {
                if (c == '\\' && quote == '"') {
                    i++;
                } else if (c == quote) {
                    quote = 0;
                }
            } else if (c == '"' || c == '\'') {
                quote = c;
            } else if (c == target) {
                return i;
            }
        }
        return -1;
    }
}
