package org.rcbench.cli;

/** Exit statuses of every {@code rcbench} command, in one place. */
public final class ExitCodes {
    /** The command did its job (a measured board may still have failed its check: see {@link #CHECK_FAILED}). */
    public static final int OK = 0;
    /** A check ran and the board's verdict is fail or stopped. */
    public static final int CHECK_FAILED = 1;
    /** The user gave something rcbench cannot use: bad file, bad value, bad option, unplugged probe. */
    public static final int BAD_INPUT = 2;
    /** A bug or an environment failure rcbench did not expect; the message names it. */
    public static final int INTERNAL = 3;

    private ExitCodes() {
    }
}
