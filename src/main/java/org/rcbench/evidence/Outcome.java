package org.rcbench.evidence;

/**
 * What the diagnosis said about one simulated board.
 *
 * @param faulty          the part that was moved out of tolerance
 * @param deviation       by how much, {@code value / nominal - 1}
 * @param multiple        in multiples of its tolerance on that side
 * @param topSuspect      the diagnosis's most probable suspect
 * @param topProbability  its probability
 * @param ambiguous       whether the diagnosis said the measurement cannot decide
 * @param noFaultLeads    whether "every part inside its band" was the most probable explanation
 */
public record Outcome(String faulty, double deviation, double multiple, String topSuspect, double topProbability,
        boolean ambiguous, boolean noFaultLeads) {

    /** The top suspect is the faulty part. */
    public boolean correct() {
        return faulty.equals(topSuspect);
    }

    /** A wrong top suspect presented without any doubt: not ambiguous, not led by "no fault", probability at least 0.5. */
    public boolean confidentlyWrong() {
        return !correct() && !ambiguous && !noFaultLeads && topProbability >= 0.5;
    }
}
