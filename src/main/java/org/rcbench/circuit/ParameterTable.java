package org.rcbench.circuit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalInt;
import org.rcbench.units.Unit;

/**
 * The names, units, kinds and nominal values of a model's parameter vector, with the index of each
 * name. Immutable and thread-safe.
 *
 * <p>Names: a part's designator ({@code R1}: ohms; {@code C1}: farads; {@code VR1}: end-to-end ohms;
 * {@code D1}: forward drop in volts), {@code VR1.wiper} (fraction), and the latent and family names
 * listed as constants below.
 */
public final class ParameterTable {
    /** Supply voltage (V). */
    public static final String SUPPLY = "supply";
    /** Leakage resistance across the timing capacitor (Ω); +∞ means none. */
    public static final String LEAK = "leak";
    /** Voltage of an extra Thevenin source on the control pin (V); pair with {@link #CONTROL_OHMS}. */
    public static final String CONTROL_VOLTS = "control.volts";
    /** Resistance of that source (Ω); +∞ means nothing connected, 0 an ideal drive. A load to ground is volts 0. */
    public static final String CONTROL_OHMS = "control.ohms";
    public static final String DIVIDER = "family.divider";
    public static final String HIGH_DROP = "family.high_drop";
    public static final String HIGH_OHMS = "family.high_ohms";
    public static final String LOW_VOLTS = "family.low";
    public static final String LOW_OHMS = "family.low_ohms";
    public static final String SAT = "family.sat";
    public static final String DISCHARGE_OHMS = "family.discharge_ohms";
    public static final String INPUT_CURRENT = "family.input_current";
    public static final String DELAY = "family.delay";
    /** Suffix of a potentiometer's wiper parameter. */
    public static final String WIPER_SUFFIX = ".wiper";

    private final String[] names;
    private final Unit[] units;
    private final ParameterKind[] kinds;
    private final double[] nominal;
    private final Map<String, Integer> index;

    ParameterTable(List<String> names, List<Unit> units, List<ParameterKind> kinds, double[] nominal) {
        this.names = names.toArray(new String[0]);
        this.units = units.toArray(new Unit[0]);
        this.kinds = kinds.toArray(new ParameterKind[0]);
        this.nominal = nominal.clone();
        Map<String, Integer> m = new HashMap<>();
        for (int i = 0; i < this.names.length; i++) {
            if (m.put(this.names[i], i) != null) {
                throw new IllegalArgumentException("duplicate parameter " + this.names[i]);
            }
        }
        this.index = Collections.unmodifiableMap(m);
    }

    /** Builds the table for a spec: parts in order, then latent, then family parameters. */
    static ParameterTable of(CircuitSpec spec) {
        List<String> n = new ArrayList<>();
        List<Unit> u = new ArrayList<>();
        List<ParameterKind> k = new ArrayList<>();
        List<Double> v = new ArrayList<>();
        for (Element e : spec.elements()) {
            add(n, u, k, v, e.designator(), e.type().unit(), ParameterKind.PART, e.value());
            if (e.type() == ElementType.POTENTIOMETER) {
                add(n, u, k, v, e.designator() + WIPER_SUFFIX, Unit.NONE, ParameterKind.WIPER, e.wiper());
            }
        }
        ControlPin cp = spec.control();
        add(n, u, k, v, SUPPLY, Unit.VOLT, ParameterKind.LATENT, spec.supplyVolts());
        add(n, u, k, v, LEAK, Unit.OHM, ParameterKind.LATENT, Double.POSITIVE_INFINITY);
        boolean driven = cp.mode() == ControlPin.Mode.DRIVEN;
        add(n, u, k, v, CONTROL_VOLTS, Unit.VOLT, ParameterKind.LATENT, driven ? cp.driveVolts() : 0);
        add(n, u, k, v, CONTROL_OHMS, Unit.OHM, ParameterKind.LATENT, driven ? cp.driveOhms() : Double.POSITIVE_INFINITY);
        FamilyParameters f = spec.familyParameters();
        add(n, u, k, v, DIVIDER, Unit.OHM, ParameterKind.FAMILY, f.dividerOhms());
        add(n, u, k, v, HIGH_DROP, Unit.VOLT, ParameterKind.FAMILY, f.outputHighDropVolts());
        add(n, u, k, v, HIGH_OHMS, Unit.OHM, ParameterKind.FAMILY, f.outputHighOhms());
        add(n, u, k, v, LOW_VOLTS, Unit.VOLT, ParameterKind.FAMILY, f.outputLowVolts());
        add(n, u, k, v, LOW_OHMS, Unit.OHM, ParameterKind.FAMILY, f.outputLowOhms());
        add(n, u, k, v, SAT, Unit.VOLT, ParameterKind.FAMILY, f.dischargeSatVolts());
        add(n, u, k, v, DISCHARGE_OHMS, Unit.OHM, ParameterKind.FAMILY, f.dischargeOhms());
        add(n, u, k, v, INPUT_CURRENT, Unit.AMPERE, ParameterKind.FAMILY, f.inputCurrentAmps());
        add(n, u, k, v, DELAY, Unit.SECOND, ParameterKind.FAMILY, f.delaySeconds());
        double[] nom = new double[v.size()];
        for (int i = 0; i < nom.length; i++) {
            nom[i] = v.get(i);
        }
        return new ParameterTable(n, u, k, nom);
    }

    private static void add(List<String> n, List<Unit> u, List<ParameterKind> k, List<Double> v, String name,
            Unit unit, ParameterKind kind, double value) {
        n.add(name);
        u.add(unit);
        k.add(kind);
        v.add(value);
    }

    /** The number of parameters. */
    public int size() {
        return names.length;
    }

    /** The index of {@code name}; throws {@link IllegalArgumentException} naming it when there is none. */
    public int index(String name) {
        Integer i = index.get(name);
        if (i == null) {
            throw new IllegalArgumentException("no parameter " + name + " (have " + Arrays.toString(names) + ")");
        }
        return i;
    }

    /** The index of {@code name}, or empty. */
    public OptionalInt find(String name) {
        Integer i = index.get(name);
        return i == null ? OptionalInt.empty() : OptionalInt.of(i);
    }

    public String name(int i) {
        return names[i];
    }

    public Unit unit(int i) {
        return units[i];
    }

    public ParameterKind kind(int i) {
        return kinds[i];
    }

    /** The nominal value of parameter {@code i}. */
    public double nominal(int i) {
        return nominal[i];
    }

    /** A fresh copy of the nominal vector, to be changed and evaluated. */
    public double[] nominal() {
        return nominal.clone();
    }

    /** All names in index order. */
    public List<String> names() {
        return List.of(names);
    }

    /** Writes a family's parameters into {@code p} (e.g. to test a "wrong timer family" hypothesis). */
    public void applyFamily(double[] p, FamilyParameters f) {
        p[index(DIVIDER)] = f.dividerOhms();
        p[index(HIGH_DROP)] = f.outputHighDropVolts();
        p[index(HIGH_OHMS)] = f.outputHighOhms();
        p[index(LOW_VOLTS)] = f.outputLowVolts();
        p[index(LOW_OHMS)] = f.outputLowOhms();
        p[index(SAT)] = f.dischargeSatVolts();
        p[index(DISCHARGE_OHMS)] = f.dischargeOhms();
        p[index(INPUT_CURRENT)] = f.inputCurrentAmps();
        p[index(DELAY)] = f.delaySeconds();
    }
}
