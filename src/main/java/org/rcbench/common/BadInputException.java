package org.rcbench.common;

import java.util.Objects;

/**
 * A problem the user can cause and fix: a bad file, a bad value, an unplugged probe.
 *
 * <p>The message is one line of the form {@code where: what is wrong}, for example
 * {@code board.toml: parts.R1.value: "4k7k" is not a resistance}. The command line prints exactly
 * {@link #getMessage()} and exits with status 2; no stack trace is shown.
 */
public class BadInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String where;
    private final String what;

    /**
     * @param where the file, file and line, key or port the problem was found at (never null)
     * @param what  what is wrong, in plain words (never null)
     */
    public BadInputException(String where, String what) {
        super(where.isEmpty() ? what : where + ": " + what);
        this.where = Objects.requireNonNull(where, "where");
        this.what = Objects.requireNonNull(what, "what");
    }

    public BadInputException(String where, String what, Throwable cause) {
        this(where, what);
        initCause(cause);
    }

    /** The place the problem was found, e.g. {@code capture.txt:17}. */
    public String where() {
        return where;
    }

    /** What is wrong, without the place. */
    public String what() {
        return what;
    }
}
