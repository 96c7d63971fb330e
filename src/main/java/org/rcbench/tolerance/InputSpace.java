package org.rcbench.tolerance;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.TimerModel;
import org.rcbench.design.Ambient;
import org.rcbench.design.Design;
import org.rcbench.design.Distribution;
import org.rcbench.design.PartSpread;
import org.rcbench.design.Tempco;
import org.rcbench.units.Tolerance;

/**
 * The uncertain inputs of a design and how they map onto a model's parameter vector.
 *
 * <p>From a {@link Design}: each part with a tolerance becomes an input over its band; the supply
 * over its tolerance; when the design gives an ambient range, one shared {@code ambient} input (so
 * every part sees the same temperature in a draw), an input per tempco band ({@code R1.tempco}, in
 * 1/K) and, for class-2 ceramic timing parts, a factor over the EIA-198 band of the dielectric
 * ({@code C1.temperature}; the whole code range is applied, which is conservative for a narrower
 * ambient). A part's parameter is then {@code value × (1 + tc (T - T_ref)) × factor}.
 *
 * <p>Immutable; {@link #apply} is allocation-free and thread-safe for distinct output arrays.
 */
public final class InputSpace {
    private final TimerModel model;
    private final double[] base;
    private final List<UncertainInput> inputs;
    private final int[] target;
    private final int[] valueInput;
    private final int[] tcInput;
    private final double[] tcFixed;
    private final int[] factorInput;
    private final int ambientInput;
    private final double referenceCelsius;

    private InputSpace(TimerModel model, double[] base, List<UncertainInput> inputs, List<int[]> entries,
            List<Double> fixed, int ambientInput, double referenceCelsius) {
        this.model = model;
        this.base = base.clone();
        this.inputs = List.copyOf(inputs);
        int n = entries.size();
        target = new int[n];
        valueInput = new int[n];
        tcInput = new int[n];
        factorInput = new int[n];
        tcFixed = new double[n];
        for (int k = 0; k < n; k++) {
            int[] e = entries.get(k);
            target[k] = e[0];
            valueInput[k] = e[1];
            tcInput[k] = e[2];
            factorInput[k] = e[3];
            tcFixed[k] = fixed.get(k);
        }
        this.ambientInput = ambientInput;
        this.referenceCelsius = referenceCelsius;
    }

    /** The inputs of {@code design} for {@code model} (built from the same design). */
    public static InputSpace of(Design design, TimerModel model) {
        Builder b = new Builder(model, model.nominal());
        ParameterTable t = model.parameters();
        Ambient ambient = design.ambient();
        boolean temperatureMatters = false;
        for (Element e : design.circuit().elements()) {
            Tempco tc = design.spread(e.designator()).tempco();
            temperatureMatters |= (tc != null && (tc.centreppmPerKelvin() != 0 || tc.halfWidthPpmPerKelvin() > 0))
                    || (e.kind().isClass2Ceramic() && e.role() == org.rcbench.circuit.Role.TIMING);
        }
        if (!temperatureMatters) {
            ambient = null;
        }
        if (ambient != null) {
            b.ambient = b.add(new UncertainInput("ambient", ambient.referenceCelsius(), ambient.minCelsius(),
                    ambient.maxCelsius(), Distribution.RECTANGULAR));
            b.reference = ambient.referenceCelsius();
        }
        for (Element e : design.circuit().elements()) {
            PartSpread s = design.spread(e.designator());
            int idx = t.index(e.designator());
            double nom = e.value();
            Tolerance tol = s.tolerance();
            int vi = -1;
            if (tol.minusFraction() > 0 || tol.plusFraction() > 0) {
                vi = b.add(new UncertainInput(e.designator(), nom, tol.low(nom), tol.high(nom), s.distribution()));
            }
            int ti = -1;
            double fixed = 0;
            int fi = -1;
            if (ambient != null) {
                Tempco tc = s.tempco();
                if (tc != null && tc.halfWidthPpmPerKelvin() > 0) {
                    ti = b.add(new UncertainInput(e.designator() + ".tempco", tc.centreppmPerKelvin() * 1e-6,
                            tc.lowPpm() * 1e-6, tc.highPpm() * 1e-6, Distribution.RECTANGULAR));
                } else if (tc != null) {
                    fixed = tc.centreppmPerKelvin() * 1e-6;
                }
                PartKind k = e.kind();
                if (k.isClass2Ceramic() && e.role() == org.rcbench.circuit.Role.TIMING) {
                    Tolerance band = k.temperatureBand();
                    fi = b.add(new UncertainInput(e.designator() + ".temperature", 1, band.low(1), band.high(1),
                            Distribution.RECTANGULAR));
                }
            }
            if (vi >= 0 || ti >= 0 || fixed != 0 || fi >= 0) {
                b.entry(idx, vi, ti, fi, fixed);
            }
        }
        Tolerance st = design.supplyTolerance();
        if (st.minusFraction() > 0 || st.plusFraction() > 0) {
            double vs = design.circuit().supplyVolts();
            b.direct(t.index(ParameterTable.SUPPLY), new UncertainInput("supply", vs, st.low(vs), st.high(vs),
                    Distribution.RECTANGULAR));
        }
        return b.build();
    }

    /** A builder starting from {@code base} parameters with no uncertain inputs. */
    public static Builder builder(TimerModel model, double[] base) {
        return new Builder(model, base);
    }

    /** Adds inputs by hand: a parameter spread over a band (e.g. a wiper over its whole travel). */
    public static final class Builder {
        private final TimerModel model;
        private final double[] base;
        private final List<UncertainInput> inputs = new ArrayList<>();
        private final List<int[]> entries = new ArrayList<>();
        private final List<Double> fixed = new ArrayList<>();
        private int ambient = -1;
        private double reference = Ambient.DEFAULT_REFERENCE_CELSIUS;

        private Builder(TimerModel model, double[] base) {
            this.model = model;
            this.base = base.clone();
        }

        int add(UncertainInput in) {
            inputs.add(in);
            return inputs.size() - 1;
        }

        void entry(int target, int value, int tc, int factor, double fixedTc) {
            entries.add(new int[] {target, value, tc, factor});
            fixed.add(fixedTc);
        }

        void direct(int target, UncertainInput in) {
            entry(target, add(in), -1, -1, 0);
        }

        /** Spreads model parameter {@code name} over [low, high] with {@code d}. */
        public Builder parameter(String name, double low, double high, Distribution d) {
            int idx = model.parameters().index(name);
            direct(idx, new UncertainInput(name, base[idx], low, high, d));
            return this;
        }

        public InputSpace build() {
            return new InputSpace(model, base, inputs, entries, fixed, ambient, reference);
        }
    }

    /** The model the inputs feed. */
    public TimerModel model() {
        return model;
    }

    /** The number of inputs. */
    public int size() {
        return inputs.size();
    }

    public List<UncertainInput> inputs() {
        return inputs;
    }

    public UncertainInput input(int i) {
        return inputs.get(i);
    }

    /** A fresh copy of the parameter vector the inputs are written into. */
    public double[] baseParameters() {
        return base.clone();
    }

    /** The inputs' nominal values. */
    public double[] nominalInputs() {
        double[] x = new double[inputs.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = inputs.get(i).nominal();
        }
        return x;
    }

    /** The inputs' expectations (band middles). */
    public double[] expectationInputs() {
        double[] x = new double[inputs.size()];
        for (int i = 0; i < x.length; i++) {
            x[i] = inputs.get(i).expectation();
        }
        return x;
    }

    /**
     * Writes the parameters for input values {@code x} into {@code params}, which must start as a copy
     * of {@link #baseParameters()} (only the mapped entries are overwritten). Allocation-free.
     */
    public void apply(double[] x, double[] params) {
        for (int k = 0; k < target.length; k++) {
            double v = valueInput[k] >= 0 ? x[valueInput[k]] : base[target[k]];
            double tc = tcInput[k] >= 0 ? x[tcInput[k]] : tcFixed[k];
            if (tc != 0 && ambientInput >= 0) {
                v *= 1 + tc * (x[ambientInput] - referenceCelsius);
            }
            if (factorInput[k] >= 0) {
                v *= x[factorInput[k]];
            }
            params[target[k]] = v;
        }
    }

    @Override
    public String toString() {
        return "InputSpace" + Arrays.toString(inputs.toArray());
    }
}
