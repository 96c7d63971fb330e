package org.rcbench.gui;

import org.rcbench.diagnose.QuantityCheck;
import org.rcbench.diagnose.Verdict;
import org.rcbench.tolerance.Band;

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
     * board's value. With a band, the verdict rule is the diagnosis stage's
     * ({@link QuantityCheck#status}: inside the statistical band passes, inside the worst case is
     * marginal, else it fails); with only a nominal value there is nothing to judge against.
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
        if (!e.hasStatistical() && !e.hasWorstCase()) {
            return NOMINAL_ONLY;
        }
        Verdict verdict = QuantityCheck.status(v, new Band(e.statLow(), e.statHigh()),
                new Band(e.worstLow(), e.worstHigh()));
        switch (verdict) {
            case PASS: return IN_BAND;
            case MARGINAL: return MARGINAL;
            default: return OUTSIDE;
        }
    }
}
