package org.rcbench.diagnose;

import java.util.List;

/**
 * An explanation to be tested: which faults are present (none, one, or a pair), with the log of
 * its prior odds against "no fault", {@code sum ln(p / (1 - p))} over its faults (independent
 * faults). Immutable.
 */
record Hypothesis(List<Fault> faults, double logPriorOdds) {
    Hypothesis {
        faults = List.copyOf(faults);
    }

    static Hypothesis of(List<Fault> faults) {
        double odds = 0;
        for (Fault f : faults) {
            odds += Math.log(f.probability() / (1 - f.probability()));
        }
        return new Hypothesis(faults, odds);
    }

    /** Whether the other timer family is assumed. */
    boolean otherFamily() {
        for (Fault f : faults) {
            if (f.kind() == FaultKind.FAMILY) {
                return true;
            }
        }
        return false;
    }

    /** The fault on parameter {@code name}, or null. */
    Fault faultOn(String name) {
        for (Fault f : faults) {
            if (f.name().equals(name)) {
                return f;
            }
        }
        return null;
    }

    /** The labels joined with " and ", or "no fault". */
    String label() {
        if (faults.isEmpty()) {
            return "no fault";
        }
        StringBuilder sb = new StringBuilder();
        for (Fault f : faults) {
            sb.append(sb.length() == 0 ? "" : " and ").append(f.label());
        }
        return sb.toString();
    }
}
