package org.rcbench.picker;

import java.util.Map;
import org.rcbench.design.Design;
import org.rcbench.tolerance.Prediction;

/**
 * One proposed part set.
 *
 * @param design       the parts as a design (write it with {@link org.rcbench.design.DesignText})
 * @param errors       relative error of each target at nominal, by target name ({@code frequency},
 *                     {@code duty}, {@code pulse width}, {@code duty at wiper 0}, {@code duty at wiper 1})
 * @param worstError   the largest absolute relative error of any target
 * @param spread       relative GUM standard uncertainty of the main quantity (frequency or pulse width)
 *                     under the chosen tolerances
 * @param score        the rank key: {@code worstError + 2 × spread} (lower is better)
 * @param prediction   the full prediction with worst-case and statistical bands
 */
public record Candidate(Design design, Map<String, Double> errors, double worstError, double spread, double score,
        Prediction prediction) {
    /** The part values in one line, e.g. {@code R1=6k8 R2=13k C1=47n}. */
    public String parts() {
        return design.notes();
    }
}
