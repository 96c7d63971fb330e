package org.rcbench.sim;

import java.util.Random;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.Timing;

/**
 * The moment-to-moment conditions of a simulated board: the circuit model at the supply of the
 * moment (mean supply plus ripple), the warm-up factor and the timing noise. Shared by the board's
 * processes; not thread-safe; allocation-free after construction.
 */
final class Conditions {
    private final TimerModel model;
    private final double[] p;
    private final int iSupply;
    private final double supplyVolts;
    private final double rippleVolts;
    private final double rippleRadiansPerSecond;
    private final double warmFraction;
    private final double warmSeconds;
    private final double powerUp;
    private final double jitterSeconds;
    private final Random noise;
    private final Timing steady = new Timing();
    private final Timing moment = new Timing();

    /**
     * @param model  the circuit, or null for a reference oscillator (then only noise is used)
     * @param p      the parameter vector with the deviations applied (copied)
     */
    Conditions(TimerModel model, double[] p, SimulationSpec spec, Random noise) {
        this.model = model;
        this.p = p == null ? null : p.clone();
        this.iSupply = model == null ? -1 : model.parameters().index(ParameterTable.SUPPLY);
        this.supplyVolts = model == null ? Double.NaN : p[iSupply];
        this.rippleVolts = spec.rippleVolts();
        this.rippleRadiansPerSecond = 2 * Math.PI * spec.rippleHz();
        this.warmFraction = spec.warmUpFraction();
        this.warmSeconds = spec.warmUpSeconds();
        this.powerUp = spec.powerUpSeconds();
        this.jitterSeconds = spec.jitterSeconds();
        this.noise = noise;
        if (model != null) {
            model.evaluate(this.p, steady);
        }
    }

    /** The timing at the mean supply (no ripple). Shared holder: do not keep. */
    Timing steady() {
        return steady;
    }

    /**
     * The timing with the supply of board time {@code t}: {@code V + rippleVolts sin(2 pi f t)}. The
     * model is evaluated once per call (under a microsecond); without ripple the steady timing is
     * returned. Shared holder, valid until the next call.
     */
    Timing at(double t) {
        if (rippleVolts == 0) {
            return steady;
        }
        p[iSupply] = supplyVolts + rippleVolts * Math.sin(rippleRadiansPerSecond * t);
        model.evaluate(p, moment);
        return moment;
    }

    /** True when every call of {@link #at} gives the same timing. */
    boolean constant() {
        return rippleVolts == 0;
    }

    /** The warm-up factor at board time {@code t}: {@code 1 + a exp(-(t - t_on) / tau)}. */
    double warm(double t) {
        return warmFraction == 0 ? 1 : 1 + warmFraction * Math.exp(-(t - powerUp) / warmSeconds);
    }

    /** The period noise's standard deviation, seconds. */
    double jitterSeconds() {
        return jitterSeconds;
    }

    /** One draw of Gaussian noise with standard deviation {@code sigma} (0 draws nothing). */
    double noise(double sigma) {
        return sigma == 0 ? 0 : sigma * noise.nextGaussian();
    }

    /**
     * {@code seconds} stretched by warm-up at time {@code t} plus noise of {@code sigma}, kept above
     * a thousandth of itself so that no interval becomes zero or negative however large the noise.
     */
    double interval(double seconds, double t, double sigma) {
        double base = seconds * warm(t);
        return Math.max(base * 1e-3, base + noise(sigma));
    }
}
