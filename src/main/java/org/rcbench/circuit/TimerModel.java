package org.rcbench.circuit;

import java.util.ArrayList;
import java.util.List;

/**
 * A timer circuit built once from a {@link CircuitSpec} and evaluated many times for arbitrary
 * parameter vectors (part values, latent faults, family parameters).
 *
 * <p>Use: {@code TimerModel m = TimerModels.build(spec); double[] p = m.nominal();
 * p[m.parameters().index("C1")] *= 0.7; m.evaluate(p, timing);}. Evaluation allocates nothing and
 * takes well under a microsecond; models are immutable and may be shared between threads (each
 * thread with its own {@link Timing}).
 *
 * <p>Shared physics: the control pin sees 2/3 of the supply behind 2/3 of one divider section
 * (three equal sections), combined with control-load resistors to ground and the latent control
 * source; the upper threshold is that voltage and the lower threshold half of it. The capacitor
 * node also carries the leakage resistance ({@code leak}) to ground and the input current
 * ({@code family.input_current}) drawn from it, so every segment is {@link RcSegment} with
 * {@code 1/R_th = 1/R_path + 1/R_leak} and {@code Vinf = R_th (V_path/R_path - I_in)}.
 * The propagation delay is added per transition: the capacitor keeps moving along its segment for
 * the delay after crossing a threshold before the next segment starts.
 */
public abstract class TimerModel {
    final CircuitSpec spec;
    final ParameterTable table;
    final int iSupply;
    final int iLeak;
    final int iControlVolts;
    final int iControlOhms;
    final int iDivider;
    final int iHighDrop;
    final int iHighOhms;
    final int iLowVolts;
    final int iLowOhms;
    final int iSat;
    final int iDischargeOhms;
    final int iInputCurrent;
    final int iDelay;
    final Group timing;
    final Group controlLoad;
    final Group outputLoad;

    TimerModel(CircuitSpec spec) {
        this.spec = spec;
        this.table = ParameterTable.of(spec);
        iSupply = table.index(ParameterTable.SUPPLY);
        iLeak = table.index(ParameterTable.LEAK);
        iControlVolts = table.index(ParameterTable.CONTROL_VOLTS);
        iControlOhms = table.index(ParameterTable.CONTROL_OHMS);
        iDivider = table.index(ParameterTable.DIVIDER);
        iHighDrop = table.index(ParameterTable.HIGH_DROP);
        iHighOhms = table.index(ParameterTable.HIGH_OHMS);
        iLowVolts = table.index(ParameterTable.LOW_VOLTS);
        iLowOhms = table.index(ParameterTable.LOW_OHMS);
        iSat = table.index(ParameterTable.SAT);
        iDischargeOhms = table.index(ParameterTable.DISCHARGE_OHMS);
        iInputCurrent = table.index(ParameterTable.INPUT_CURRENT);
        iDelay = table.index(ParameterTable.DELAY);
        timing = group(Role.TIMING);
        controlLoad = group(Role.CONTROL_LOAD);
        outputLoad = group(Role.OUTPUT_LOAD);
    }

    /** The topology this model computes. */
    public final Topology topology() {
        return spec.topology();
    }

    /** The nominal description the model was built from. */
    public final CircuitSpec spec() {
        return spec;
    }

    /** Parameter names, units, kinds, nominal values and indices. */
    public final ParameterTable parameters() {
        return table;
    }

    /** A fresh copy of the nominal parameter vector. */
    public final double[] nominal() {
        return table.nominal();
    }

    /**
     * Evaluates the circuit for parameter vector {@code p} (laid out as {@link #parameters()}) and
     * writes the result into {@code out}. Never throws for physical nonsense: a circuit that cannot
     * run is reported through {@link Timing#runs()} and {@link Timing#reason()}.
     */
    public abstract void evaluate(double[] p, Timing out);

    /** Evaluates into a new holder (allocates; for one-off use). */
    public final Timing evaluate(double[] p) {
        Timing t = new Timing();
        evaluate(p, t);
        return t;
    }

    /** Evaluates at nominal (allocates). */
    public final Timing evaluateNominal() {
        return evaluate(table.nominal());
    }

    // ---- shared pieces ----

    /**
     * The control-pin voltage (V): internal Thevenin source 2/3 Vs behind 2/3 of a divider section,
     * in parallel with the control-load resistors to ground and the latent source
     * ({@code control.volts} behind {@code control.ohms}; 0 Ω is an ideal drive).
     */
    final double controlVolts(double[] p, double vs) {
        double rx = p[iControlOhms];
        if (rx == 0) {
            return p[iControlVolts];
        }
        double gInternal = 1.5 / p[iDivider];
        double gx = conductance(rx);
        double gLoad = controlLoad.parallelConductance(p);
        return (2.0 / 3.0 * vs * gInternal + p[iControlVolts] * gx) / (gInternal + gx + gLoad);
    }

    /**
     * Sets the thresholds in {@code out} and returns false (having stopped {@code out}) when they are
     * unusable: the upper threshold must lie above zero and below the supply.
     */
    final boolean thresholds(double[] p, double vs, Timing out) {
        double vc = controlVolts(p, vs);
        out.upperVolts = vc;
        out.lowerVolts = vc / 2;
        if (!(vc > 0)) {
            out.stop(StopReason.NO_THRESHOLDS, vc, 0);
            return false;
        }
        return true;
    }

    /** Conductance of a resistance, 0 for infinite. */
    static double conductance(double ohms) {
        return ohms == Double.POSITIVE_INFINITY ? 0 : 1 / ohms;
    }

    /**
     * Stops {@code out} with the reason a charge toward {@code vInf} falls short of {@code upper}: the
     * path's own source {@code vSource} is too low, or the input current through the path resistance,
     * or leakage.
     */
    static void stopCharging(Timing out, double vSource, double pathOhms, double inputAmps, double vInf,
            double upper) {
        if (!(vSource > upper)) {
            out.stop(StopReason.CHARGE_STALLS, vSource, upper);
        } else if (inputAmps > 0 && !(vSource - inputAmps * pathOhms > upper)) {
            out.stop(StopReason.INPUT_CURRENT, vInf, upper);
        } else if (vInf < vSource - inputAmps * pathOhms) {
            out.stop(StopReason.LEAKAGE, vInf, upper);
        } else {
            out.stop(StopReason.CHARGE_STALLS, vInf, upper);
        }
    }

    /**
     * Completes a free-running cycle with one exponential segment per phase. Charge: asymptote
     * {@code vInfC}, time constant {@code tauC}; discharge: {@code vInfD}, {@code tauD}. Handles the
     * propagation delay as overshoot and computes the first high time from 0 V.
     */
    static void cycle(Timing out, double tauC, double vInfC, double tauD, double vInfD, double delay) {
        double upper = out.upperVolts;
        double lower = out.lowerVolts;
        double vOver = RcSegment.voltageAfter(tauC, vInfC, upper, delay);
        double vUnder = RcSegment.voltageAfter(tauD, vInfD, lower, delay);
        double high = delay + RcSegment.time(tauC, vInfC, Math.min(vUnder, lower), upper);
        double low = delay + RcSegment.time(tauD, vInfD, Math.max(vOver, upper), lower);
        double first = delay + RcSegment.time(tauC, vInfC, 0, upper);
        out.cycle(high, low, first);
    }

    Group group(Role role) {
        List<Element> parts = spec.withRole(role);
        int[] v = new int[parts.size()];
        int[] w = new int[parts.size()];
        for (int i = 0; i < v.length; i++) {
            Element e = parts.get(i);
            v[i] = table.index(e.designator());
            w[i] = e.type() == ElementType.POTENTIOMETER ? table.index(e.designator() + ParameterTable.WIPER_SUFFIX) : -1;
        }
        return new Group(v, w);
    }

    int diodeIndex(Role role) {
        List<Element> d = spec.withRole(role);
        return d.isEmpty() ? -1 : table.index(d.get(0).designator());
    }

    DiodeLaw diodeLaw(Role role) {
        List<Element> d = spec.withRole(role);
        return d.isEmpty() ? DiodeLaw.fixed() : d.get(0).diode();
    }

    /** Parameter indices of the parts with one role; a potentiometer in a resistor role is a rheostat. */
    static final class Group {
        final int[] values;
        final int[] wipers;

        Group(int[] values, int[] wipers) {
            this.values = values;
            this.wipers = wipers;
        }

        /** Series resistance (Ω): the sum, a rheostat counting wiper × end-to-end value. */
        double series(double[] p) {
            double s = 0;
            for (int i = 0; i < values.length; i++) {
                s += wipers[i] < 0 ? p[values[i]] : p[wipers[i]] * p[values[i]];
            }
            return s;
        }

        /** Total of parallel capacitances (F). */
        double sum(double[] p) {
            double s = 0;
            for (int i = 0; i < values.length; i++) {
                s += p[values[i]];
            }
            return s;
        }

        /** Conductance (S) of the parts in parallel. */
        double parallelConductance(double[] p) {
            double g = 0;
            for (int i = 0; i < values.length; i++) {
                double r = wipers[i] < 0 ? p[values[i]] : p[wipers[i]] * p[values[i]];
                g += conductance(r);
            }
            return g;
        }

        boolean isEmpty() {
            return values.length == 0;
        }

        List<Integer> indices() {
            List<Integer> l = new ArrayList<>();
            for (int v : values) {
                l.add(v);
            }
            return l;
        }
    }
}
