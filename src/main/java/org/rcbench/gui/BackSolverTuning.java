package org.rcbench.gui;

import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.diagnose.TuneResult;
import org.rcbench.diagnose.TuneTarget;
import org.rcbench.diagnose.Tuner;

/**
 * The trimmer guide from the diagnosis stage's {@link Tuner}: the wiper's present position from the
 * newest cycles, and where it must go for the target. Without a target the present value of the
 * quantity is the target, so the guide still shows where the wiper is. A tuner is built once per
 * design and reused. Thread-safe.
 */
public final class BackSolverTuning implements TuningSource {
    private volatile Tuner cached;
    private volatile Design cachedFor;

    @Override
    public TuningAdvice tune(Design design, Observed observed, TimingQuantity quantity, double target) {
        Tuner t = tuner(design);
        double goal = Double.isNaN(target) ? present(observed, quantity) : target;
        TuneResult r = t.tune(BackSolverFindings.observations(design, observed), TuneTarget.of(quantity, goal));
        return new TuningAdvice(r.pot(), r.present(), r.wanted(), r.advice());
    }

    private static double present(Observed o, TimingQuantity q) {
        switch (q) {
            case FREQUENCY: return 1 / o.periodSeconds();
            case PERIOD: return o.periodSeconds();
            case DUTY: return o.highSeconds() / o.periodSeconds();
            case HIGH:
            case PULSE_WIDTH: return o.highSeconds();
            case LOW: return o.lowSeconds();
            default: throw new IllegalArgumentException(q.name());
        }
    }

    private Tuner tuner(Design design) {
        Tuner t = cached;
        if (t == null || cachedFor != design) {
            t = Tuner.of(design);
            cached = t;
            cachedFor = design;
        }
        return t;
    }
}
