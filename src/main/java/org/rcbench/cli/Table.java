package org.rcbench.cli;

import java.io.PrintWriter;
import java.util.List;

/** Prints rows of text as aligned columns, the first row as the header. Stateless. */
final class Table {
    private Table() {
    }

    /** Prints {@code rows}; {@code right[i]} aligns column i to the right. Trailing blanks are trimmed. */
    static void print(PrintWriter out, List<String[]> rows, boolean[] right) {
        int cols = rows.get(0).length;
        int[] width = new int[cols];
        for (String[] r : rows) {
            for (int i = 0; i < cols; i++) {
                width[i] = Math.max(width[i], r[i].codePointCount(0, r[i].length()));
            }
        }
        for (String[] r : rows) {
            StringBuilder sb = new StringBuilder("  ");
            for (int i = 0; i < cols; i++) {
                String pad = " ".repeat(width[i] - r[i].codePointCount(0, r[i].length()));
                sb.append(right[i] ? pad + r[i] : r[i] + pad).append(i + 1 < cols ? "  " : "");
            }
            out.println(sb.toString().stripTrailing());
        }
    }
}
