package org.rcbench.cli;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.diagnose.Checker;
import org.rcbench.diagnose.Diagnosis;
import org.rcbench.diagnose.Observation;
import org.rcbench.diagnose.Observations;
import org.rcbench.diagnose.QuantityCheck;
import org.rcbench.diagnose.TuneResult;
import org.rcbench.diagnose.TuneTarget;
import org.rcbench.diagnose.Tuner;
import org.rcbench.diagnose.Verdict;
import org.rcbench.measure.Measurement;
import org.rcbench.measure.MonostableMeter.MonostableResult;
import org.rcbench.source.LiveReading;
import org.rcbench.tolerance.Prediction;

/**
 * What {@code watch} says about a live reading against the design, from the diagnosis stage: a
 * verdict per quantity ({@link Checker#judge}), the back-solved suspects ({@link Checker#diagnoser})
 * and, for a design with a timing potentiometer, how to turn it back to the nominal ({@link Tuner}).
 * It judges the newest figures (the rolling window of a free-running circuit, so that turning a pot
 * shows at once) and re-solves at most once per reading: the caller asks once per redraw and a
 * reading already judged costs nothing. Not thread-safe: use from the drawing thread.
 */
final class WatchJudge {
    /**
     * The judgement of one reading.
     *
     * @param rows      the compared quantities with their measured value and uncertainty (k = 2), in display order
     * @param verdict   the worst of the rows, or null when nothing was compared
     * @param diagnosis the back-solved parts and suspects, or null when nothing could be solved
     * @param tuning    the potentiometer step to the nominal, or null (no pot, nothing measured)
     * @param tuneError why no tuning step could be given, or null
     */
    record Judgement(List<QuantityCheck> rows, Verdict verdict, Diagnosis diagnosis, TuneResult tuning, String tuneError) {
        /** The row of {@code q}, or null. */
        QuantityCheck row(TimingQuantity q) {
            for (QuantityCheck c : rows) {
                if (c.quantity() == q) {
                    return c;
                }
            }
            return null;
        }
    }

    private final Design design;
    private final Prediction prediction;
    private final Checker checker;
    private final Tuner tuner;
    private LiveReading judged;
    private Judgement last;

    WatchJudge(Design design, Prediction prediction) {
        this.design = design;
        this.prediction = prediction;
        this.checker = Checker.of(design, prediction);
        this.tuner = hasPot(design) ? tunerOrNull(design) : null;
    }

    Prediction prediction() {
        return prediction;
    }

    /** The judgement of {@code r} (computed once per reading). */
    Judgement of(LiveReading r) {
        if (r != judged) {
            last = judge(r);
            judged = r;
        }
        return last;
    }

    private Judgement judge(LiveReading r) {
        Measurement m = r.measurement();
        List<QuantityCheck> rows = new ArrayList<>();
        Observations obs;
        MonostableResult mono = r.monostable();
        if (r.bistable() != null) {
            return new Judgement(rows, null, null, null, null);
        }
        if (mono != null) {
            if (mono.pulses() == 0) {
                return new Judgement(rows, null, null, null, null);
            }
            Measurement.TimeStats w = mono.pulseWidth();
            add(rows, TimingQuantity.PULSE_WIDTH, w.meanSeconds(), 2 * w.standardUncertaintySeconds());
            obs = Observations.pulseWidth(w, Observations.clockShare(m));
        } else {
            Measurement.Rolling roll = m.rolling();
            if (roll.cycles() == 0) {
                return new Judgement(rows, null, null, null, null);
            }
            // The rolling window holds fewer cycles than the whole run: its expanded uncertainty is the
            // whole run's scaled by sqrt(N / n), which over-states the clock's share (never under-states the total).
            double scale = Math.sqrt(Math.max(1.0, (double) m.cycles() / roll.cycles()));
            add(rows, TimingQuantity.FREQUENCY, roll.frequencyHz(), scale * m.frequency().expandedHz());
            add(rows, TimingQuantity.DUTY, roll.duty(), scale * 2 * m.dutyStandardUncertainty());
            add(rows, TimingQuantity.HIGH, roll.highSeconds(), scale * 2 * m.high().standardUncertaintySeconds());
            add(rows, TimingQuantity.LOW, roll.lowSeconds(), scale * 2 * m.low().standardUncertaintySeconds());
            obs = rolling(Observations.of(m, design.circuit().topology()), roll, scale);
        }
        Verdict v = null;
        for (QuantityCheck c : rows) {
            v = v == null ? c.status() : v.worse(c.status());
        }
        Diagnosis d = obs.isEmpty() ? null : checker.diagnoser().diagnose(obs);
        TuneResult tune = null;
        String tuneError = null;
        if (tuner != null && !obs.isEmpty()) {
            try {
                tune = tuner.tune(obs, target());
            } catch (BadInputException e) {
                tuneError = e.what();
            }
        }
        return new Judgement(rows, v, d == null || !d.solved() ? null : d, tune, tuneError);
    }

    private void add(List<QuantityCheck> rows, TimingQuantity q, double measured, double u) {
        QuantityCheck c = checker.judge(q, measured, u);
        if (c != null) {
            rows.add(c);
        }
    }

    /** The whole run's observations moved to the rolling window's means, statistical uncertainty scaled alike. */
    private static Observations rolling(Observations whole, Measurement.Rolling roll, double scale) {
        List<Observation> items = new ArrayList<>();
        for (Observation o : whole.items()) {
            double now = o.quantity() == TimingQuantity.HIGH ? roll.highSeconds()
                    : o.quantity() == TimingQuantity.LOW ? roll.lowSeconds() : o.seconds();
            if (now > 0 && Double.isFinite(now)) {
                items.add(new Observation(o.quantity(), now, o.relativeUncertainty() * scale));
            }
        }
        return new Observations(items, whole.clockRelativeUncertainty());
    }

    /** Back to the nominal of what the first pot sets: a split pot the duty, else the pulse width or the frequency. */
    private TuneTarget target() {
        String pot = tuner.pots().get(0);
        Element e = design.part(pot);
        TimingQuantity q = e != null && e.role() == Role.SPLIT_POT ? TimingQuantity.DUTY
                : design.circuit().topology() == Topology.MONOSTABLE ? TimingQuantity.PULSE_WIDTH : TimingQuantity.FREQUENCY;
        return TuneTarget.of(q, prediction.nominal(q)).withPot(pot);
    }

    private static boolean hasPot(Design d) {
        for (Element e : d.circuit().elements()) {
            if (e.type() == ElementType.POTENTIOMETER) {
                return true;
            }
        }
        return false;
    }

    /** The design's tuner, or null when its potentiometers set no timing (Tuner's one-line refusal). */
    private static Tuner tunerOrNull(Design d) {
        try {
            return Tuner.of(d);
        } catch (BadInputException e) {
            return null;
        }
    }
}
