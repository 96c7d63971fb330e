package org.rcbench.gui;

/**
 * How one live reading stands against the design, as a word that reads without colour. The view
 * adds a shape and a colour-blind-safe colour for each.
 */
public enum ReadingState {
    /** No measured value yet. */
    WAITING("waiting"),
    /** The value is still moving (warm-up, start-up) or too few cycles are in. */
    SETTLING("settling"),
    /** Inside the statistical band. */
    IN_BAND("in band"),
    /** Outside the statistical band but inside the worst case. */
    MARGINAL("marginal"),
    /** Outside the worst case (or outside the only band known). */
    OUTSIDE("outside"),
    /** A nominal value is known but no band. */
    NOMINAL_ONLY("no band"),
    /** No design, or the design does not predict this quantity. */
    UNPREDICTED("no design");

    private final String words;

    ReadingState(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }

    /**
     * The state of measured value {@code v} against {@code e} (null when nothing is expected).
     * Waiting beats everything; settling beats any comparison, since a moving value is not yet the
     * board's value.
     */
    public static ReadingState of(double v, Expected e, boolean settling) {
        if (Double.isNaN(v)) {
            return WAITING;
        }
        if (settling) {
            return SETTLING;
        }
        if (e == null || Double.isNaN(e.nominal())) {
            return UNPREDICTED;
        }
        if (e.hasStatistical() && e.inStatistical(v)) {
            return IN_BAND;
        }
        if (e.hasWorstCase()) {
            return e.inWorstCase(v) ? MARGINAL : OUTSIDE;
        }
        if (e.hasStatistical()) {
            return OUTSIDE;
        }
        return NOMINAL_ONLY;
    }
}
