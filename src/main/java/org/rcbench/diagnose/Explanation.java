package org.rcbench.diagnose;

import java.util.List;
import java.util.Map;

/**
 * One tested explanation of the measurement, with its posterior probability. Immutable.
 *
 * @param faults      the faults assumed (empty: every part inside its band)
 * @param label       the faults in words ({@code "C1"}, {@code "R1 and leakage across C1"}, {@code "no fault"})
 * @param probability posterior probability among all explanations tested
 * @param logEvidence Laplace log evidence including prior odds, up to a constant common to all explanations
 * @param misfit      the fit's profile cost: whitened data residuals squared plus the healthy parts'
 *                    prior terms (a chi-square-like figure; about the number of measured quantities or
 *                    less for an explanation that fits)
 * @param faultValues the MAP value of each faulty parameter in its own unit (ohms, farads, volts), by name
 */
public record Explanation(List<Fault> faults, String label, double probability, double logEvidence, double misfit,
        Map<String, Double> faultValues) {
    public Explanation {
        faults = List.copyOf(faults);
        faultValues = Map.copyOf(faultValues);
    }

    /** Whether this is the "every part inside its band" explanation. */
    public boolean isNoFault() {
        return faults.isEmpty();
    }
}
