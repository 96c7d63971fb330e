package org.rcbench.diagnose;

import java.util.List;

/**
 * A place where the measurement cannot decide: explanations that fit it equally well. Immutable.
 *
 * @param between    the explanations' labels, the most probable first
 * @param structural true when timing alone can never separate them (their effects on the measured
 *                   quantities are proportional), false when only this measurement's precision and
 *                   the other parts' tolerances blur them
 * @param determined what the measurement does fix, e.g. {@code "R1·C1 (the pulse width) is 31 % low"}
 * @param separate   the extra measurement that would separate them
 * @param text       the whole statement in plain words
 */
public record Ambiguity(List<String> between, boolean structural, String determined, String separate, String text) {
    public Ambiguity {
        between = List.copyOf(between);
    }
}
