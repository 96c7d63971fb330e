package org.rcbench.diagnose;

import java.util.List;

/**
 * What the back-solver concluded from one measurement. Immutable; safe to hand to any thread.
 *
 * @param observations       what was fitted
 * @param explanations       every explanation tested, most probable first
 * @param suspects           every fault considered, most probable first, with the value it would take
 * @param estimates          the back-solved part values (and wiper positions) with 95 % intervals
 * @param ambiguities        where the measurement cannot decide, in plain words
 * @param noFaultProbability posterior probability that every part is inside its band
 * @param fitsWell           false when even the best explanation misfits the measurement (a fault
 *                           outside the model: wrong topology in the design, a broken part, a noisy supply)
 * @param summary            one plain line: the finding, or why there is none
 */
public record Diagnosis(Observations observations, List<Explanation> explanations, List<Suspect> suspects,
        List<Estimate> estimates, List<Ambiguity> ambiguities, double noFaultProbability, boolean fitsWell,
        String summary) {
    public Diagnosis {
        explanations = List.copyOf(explanations);
        suspects = List.copyOf(suspects);
        estimates = List.copyOf(estimates);
        ambiguities = List.copyOf(ambiguities);
    }

    /** A diagnosis with nothing solved, and why. */
    public static Diagnosis unsolved(Observations o, String why) {
        return new Diagnosis(o, List.of(), List.of(), List.of(), List.of(), Double.NaN, false, why);
    }

    /** Whether anything was solved. */
    public boolean solved() {
        return !explanations.isEmpty();
    }

    /** Whether the measurement leaves the leading suspect in doubt (any ambiguity was found). */
    public boolean ambiguous() {
        return !ambiguities.isEmpty();
    }

    /** The most probable explanation, or null when nothing was solved. */
    public Explanation best() {
        return explanations.isEmpty() ? null : explanations.get(0);
    }

    /** The most probable suspect, or null. */
    public Suspect topSuspect() {
        return suspects.isEmpty() ? null : suspects.get(0);
    }

    /** The estimate of {@code name}, or null. */
    public Estimate estimate(String name) {
        for (Estimate e : estimates) {
            if (e.name().equals(name)) {
                return e;
            }
        }
        return null;
    }

    /** The suspect called {@code name}, or null. */
    public Suspect suspect(String name) {
        for (Suspect s : suspects) {
            if (s.name().equals(name)) {
                return s;
            }
        }
        return null;
    }
}
