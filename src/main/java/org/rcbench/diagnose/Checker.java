package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.design.Design;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.FrequencyTrend;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MonostableMeter.MonostableResult;
import org.rcbench.tolerance.Band;
import org.rcbench.tolerance.Prediction;
import org.rcbench.tolerance.Predictor;

/**
 * Checks measurements of one board against its design: {@code Checker c = Checker.of(design);
 * CheckResult r = c.check(measurement);}. The prediction (worst case, Monte Carlo) is computed once
 * when the checker is made; each check then compares and diagnoses in milliseconds, so a live view
 * can call it on every update.
 *
 * <p>Verdict per quantity ({@link QuantityCheck#status}): inside the statistical band pass, inside
 * the worst case marginal, else fail; overall the worst of them, or stopped when no complete cycle
 * (or pulse) was measured, with the causes the model knows ({@link StopCauses}). Compared: frequency,
 * period, high and low time and duty for the free-running circuits, the pulse width for a
 * monostable. Thread-safe and immutable.
 */
public final class Checker {
    private final Design design;
    private final Prediction prediction;
    private final Diagnoser diagnoser;

    private Checker(Design design, Prediction prediction) {
        this.design = design;
        this.prediction = prediction;
        this.diagnoser = Diagnoser.of(design);
    }

    /** A checker with the default prediction ({@link Predictor}: 100 000 Monte Carlo draws, seed 1). */
    public static Checker of(Design design) {
        return new Checker(design, new Predictor().predict(design));
    }

    /** A checker with a prediction made elsewhere (e.g. with other draws). */
    public static Checker of(Design design, Prediction prediction) {
        return new Checker(design, prediction);
    }

    public Design design() {
        return design;
    }

    public Prediction prediction() {
        return prediction;
    }

    public Diagnoser diagnoser() {
        return diagnoser;
    }

    /** Checks a measurement (no histogram or trend). */
    public CheckResult check(Measurement m) {
        return check(m, null, null, null);
    }

    /** Checks a meter's current snapshot with its histogram and trend; call from the thread that feeds the meter. */
    public CheckResult check(CycleMeter meter) {
        return check(meter.snapshot(), null, PeriodHistogram.of(meter), meter.trend());
    }

    /**
     * Checks a measurement; for a monostable measured with its trigger channel, {@code mono} gives the
     * pulse width (otherwise the output's high time is taken as the pulse width).
     */
    public CheckResult check(Measurement m, MonostableResult mono, PeriodHistogram histogram, FrequencyTrend trend) {
        boolean monostable = design.circuit().topology() == Topology.MONOSTABLE;
        Measurement.TimeStats width = monostable ? (mono != null ? mono.pulseWidth() : m.high()) : null;
        boolean running = monostable ? width.count() > 0 : m.cycles() > 0;
        if (!running) {
            String why = stoppedReason(m, monostable);
            Diagnosis d = Diagnosis.unsolved(Observations.of(m, design.circuit().topology()), why);
            return new CheckResult(design, m, prediction, List.of(), Verdict.STOPPED, why, d, histogram, trend);
        }
        List<QuantityCheck> checks = new ArrayList<>();
        if (monostable) {
            add(checks, TimingQuantity.PULSE_WIDTH, width.meanSeconds(), 2 * width.standardUncertaintySeconds());
        } else {
            Measurement.FrequencyEstimate f = m.frequency();
            add(checks, TimingQuantity.FREQUENCY, f.frequencyHz(), f.expandedHz());
            add(checks, TimingQuantity.PERIOD, f.periodSeconds(), 2 * f.periodStandardUncertaintySeconds());
            add(checks, TimingQuantity.HIGH, m.high().meanSeconds(), 2 * m.high().standardUncertaintySeconds());
            add(checks, TimingQuantity.LOW, m.low().meanSeconds(), 2 * m.low().standardUncertaintySeconds());
            add(checks, TimingQuantity.DUTY, m.duty(), 2 * m.dutyStandardUncertainty());
        }
        Verdict v = Verdict.PASS;
        QuantityCheck worst = null;
        for (QuantityCheck c : checks) {
            if (worst == null || c.status().ordinal() > worst.status().ordinal()) {
                worst = c;
            }
            v = v.worse(c.status());
        }
        Diagnosis d = monostable && mono != null
                ? diagnoser.diagnose(Observations.pulseWidth(width, Observations.clockShare(m)))
                : diagnoser.diagnose(m);
        return new CheckResult(design, m, prediction, checks, checks.isEmpty() ? Verdict.FAIL : v,
                reason(v, worst), d, histogram, trend);
    }

    private void add(List<QuantityCheck> out, TimingQuantity q, double measured, double u) {
        QuantityCheck c = judge(q, measured, u);
        if (c != null) {
            out.add(c);
        }
    }

    /**
     * One quantity against the prediction, by the rules of {@link QuantityCheck#status} (what a
     * live view judges its newest figures by); null when the prediction has no band for {@code q}
     * or {@code measured} is not a number.
     *
     * @param u the expanded uncertainty (k = 2) of {@code measured}, or NaN
     */
    public QuantityCheck judge(TimingQuantity q, double measured, double u) {
        if (!prediction.quantities().contains(q) || !Double.isFinite(measured)) {
            return null;
        }
        Band stat = prediction.statistical(q);
        Band wc = prediction.worstCase(q);
        return new QuantityCheck(q, measured, u, prediction.nominal(q), stat, wc, QuantityCheck.status(measured, stat, wc));
    }

    private String reason(Verdict v, QuantityCheck worst) {
        if (worst == null) {
            return "nothing to compare: the prediction has none of the measured quantities";
        }
        String what = Words.name(worst.quantity()) + " " + Words.value(worst.quantity(), worst.measured());
        switch (v) {
            case PASS:
                return "every quantity is inside its 95 % band";
            case MARGINAL:
                return what + " is outside the 95 % band " + Words.band(worst.quantity(), worst.statistical())
                        + " but inside the worst case " + Words.band(worst.quantity(), worst.worstCase());
            default:
                return what + " is outside the worst case " + Words.band(worst.quantity(), worst.worstCase())
                        + (prediction.runs() ? "" : " (the design as given should not run: " + prediction.reason() + ")");
        }
    }

    private String stoppedReason(Measurement m, boolean monostable) {
        StringBuilder sb = new StringBuilder(monostable ? "not running: no complete output pulse was measured"
                : "not running: no complete cycle was measured");
        sb.append(m.edges() == 0 ? " (no edge on channel " + m.channel() + ")"
                : " (" + m.edges() + (m.edges() == 1 ? " edge" : " edges") + " on channel " + m.channel() + ")");
        if (!prediction.runs()) {
            sb.append("; the design itself should not run: ").append(prediction.reason());
        } else {
            String causes = StopCauses.describe(diagnoser.model());
            if (!causes.isEmpty()) {
                sb.append("; ").append(causes);
            }
        }
        return sb.toString();
    }
}
