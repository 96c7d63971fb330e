package org.rcbench.history;

/**
 * Which runs to list: all, or those whose board name (any case) or serial equals a text; newest
 * last, at most {@code limit} of the newest. Immutable; change with {@code with...}.
 *
 * @param boardOrSerial a board name or serial number, or null for every run
 * @param limit         most runs returned (the newest), &ge; 1
 */
public record RunFilter(String boardOrSerial, int limit) {
    /** Every run, up to a million. */
    public static final RunFilter ALL = new RunFilter(null, 1_000_000);

    public RunFilter {
        if (limit < 1) {
            throw new IllegalArgumentException("limit < 1: " + limit);
        }
        boardOrSerial = boardOrSerial == null || boardOrSerial.isBlank() ? null : boardOrSerial.strip();
    }

    /** Runs of the board named {@code text} or of the unit with serial {@code text}. */
    public static RunFilter of(String text) {
        return ALL.withBoardOrSerial(text);
    }

    public RunFilter withBoardOrSerial(String text) {
        return new RunFilter(text, limit);
    }

    public RunFilter withLimit(int n) {
        return new RunFilter(boardOrSerial, n);
    }
}
