package org.rcbench.diagnose;

import java.util.List;
import java.util.Objects;
import org.rcbench.design.Design;
import org.rcbench.measure.FrequencyTrend;
import org.rcbench.measure.Measurement;
import org.rcbench.tolerance.Prediction;

/**
 * A board checked against its design: the measurement, the prediction, a verdict per quantity and
 * overall with its reason, the diagnosis, and the period histogram and frequency trend for plots.
 * Immutable; safe to hand to any thread (what a history or report stage stores).
 *
 * @param design      the design checked against
 * @param measurement what was measured
 * @param prediction  what the design should do
 * @param checks      one per compared quantity, in report order
 * @param verdict     the worst of the checks, or {@link Verdict#STOPPED}
 * @param reason      the verdict in one plain line
 * @param diagnosis   the back-solved parts and suspects
 * @param histogram   periods of the newest cycles ({@link PeriodHistogram#EMPTY} when not given)
 * @param trend       decimated frequency against time (null when not given)
 */
public record CheckResult(Design design, Measurement measurement, Prediction prediction, List<QuantityCheck> checks,
        Verdict verdict, String reason, Diagnosis diagnosis, PeriodHistogram histogram, FrequencyTrend trend) {
    public CheckResult {
        Objects.requireNonNull(design, "design");
        Objects.requireNonNull(measurement, "measurement");
        Objects.requireNonNull(prediction, "prediction");
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(diagnosis, "diagnosis");
        checks = List.copyOf(checks);
        histogram = histogram == null ? PeriodHistogram.EMPTY : histogram;
    }

    /** The check of one quantity, or null. */
    public QuantityCheck check(org.rcbench.circuit.TimingQuantity q) {
        for (QuantityCheck c : checks) {
            if (c.quantity() == q) {
                return c;
            }
        }
        return null;
    }
}
