package org.rcbench.diagnose;

import java.util.Locale;

/** How a measured quantity, or a whole board, compares with its prediction. Ordered from best to worst. */
public enum Verdict {
    /** Inside the statistical band (the Monte Carlo 95 % interval of the design's tolerances). */
    PASS,
    /** Outside the statistical band but inside the worst case over the tolerances. */
    MARGINAL,
    /** Outside the worst case. */
    FAIL,
    /** Not running: no complete cycle (or pulse) was measured. */
    STOPPED;

    /** The JSON spelling: {@code pass}, {@code marginal}, {@code fail}, {@code stopped}. */
    public String fileName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The worse of the two. */
    public Verdict worse(Verdict other) {
        return other.ordinal() > ordinal() ? other : this;
    }

    /** Whether a check with this verdict should make {@code rcbench check} exit with a failure status. */
    public boolean failed() {
        return this == FAIL || this == STOPPED;
    }
}
