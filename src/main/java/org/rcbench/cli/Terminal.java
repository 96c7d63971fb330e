package org.rcbench.cli;

import java.io.PrintWriter;
import java.util.List;

/**
 * Live text on a terminal, or plain appended lines when the output is a file or a pipe. On a
 * terminal a one-line status is redrawn in place with a carriage return, and a block of lines with
 * the ANSI "cursor up" (ESC [ n A) and "erase to end of line" (ESC [ K) sequences of ECMA-48;
 * otherwise each update is printed as new lines (a status line only when it says something new).
 * On a terminal, lines are cut to its width ({@code COLUMNS}, else 100 columns) so that none wraps
 * and the redraw stays in place. Not thread-safe: one thread draws.
 */
final class Terminal {
    private static final String ERASE_LINE = "\u001b[K";

    private final PrintWriter out;
    private final boolean interactive;
    private final int width;
    private int blockLines;
    private boolean statusShown;
    private String lastPlain = "";

    Terminal(PrintWriter out, boolean interactive) {
        this(out, interactive, columns());
    }

    Terminal(PrintWriter out, boolean interactive, int width) {
        this.out = out;
        this.interactive = interactive;
        this.width = width;
    }

    private static int columns() {
        try {
            int c = Integer.parseInt(System.getenv().getOrDefault("COLUMNS", "100").strip());
            return c >= 20 ? c : 100;
        } catch (NumberFormatException e) {
            return 100;
        }
    }

    private String fit(String line) {
        return line.length() < width ? line : line.substring(0, width - 2) + "…";
    }

    /**
     * True when this process talks to a person at a terminal: Java's console exists (standard input
     * and output are both terminals) and {@code TERM} is not {@code dumb}.
     */
    static boolean detect() {
        return System.console() != null && !"dumb".equals(System.getenv("TERM"));
    }

    boolean interactive() {
        return interactive;
    }

    /**
     * Shows a one-line status: redrawn in place on a terminal; otherwise printed when {@code key}
     * (what the line is about, without its ever-changing figures) differs from the last one printed.
     */
    void status(String line, String key) {
        if (interactive) {
            out.print("\r" + fit(line) + ERASE_LINE);
            statusShown = true;
        } else if (!key.equals(lastPlain)) {
            out.println(line);
            lastPlain = key;
        }
        out.flush();
    }

    /** Redraws a block of lines in place on a terminal; otherwise prints it followed by a blank line. */
    void block(List<String> lines) {
        if (interactive) {
            StringBuilder sb = new StringBuilder();
            if (statusShown) {
                sb.append('\r');
            } else if (blockLines > 0) {
                sb.append("\u001b[").append(blockLines).append('A').append('\r');
            }
            for (String l : lines) {
                sb.append(fit(l)).append(ERASE_LINE).append('\n');
            }
            // Erase what is left of a longer previous block.
            for (int i = lines.size(); i < blockLines; i++) {
                sb.append(ERASE_LINE).append('\n');
            }
            int drawn = Math.max(lines.size(), blockLines);
            if (drawn > lines.size()) {
                sb.append("\u001b[").append(drawn - lines.size()).append('A');
            }
            out.print(sb);
            blockLines = lines.size();
            statusShown = false;
        } else {
            for (String l : lines) {
                out.println(l);
            }
            out.println();
        }
        out.flush();
    }

    /** Ends an in-place status line so that what follows starts on its own line. */
    void finish() {
        if (interactive && statusShown) {
            out.println();
            statusShown = false;
        }
        out.flush();
    }

    /** Prints a line of its own (a notice), keeping the in-place display intact below it. */
    void notice(String line) {
        if (interactive && statusShown) {
            out.print("\r" + ERASE_LINE);
            statusShown = false;
        }
        if (interactive && blockLines > 0) {
            blockLines = 0; // the notice scrolls the block up; it is redrawn in full below
        }
        out.println(line);
        out.flush();
    }
}
