package org.rcbench.diagnose;

import java.util.ArrayList;
import java.util.List;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.ControlPin;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.ParameterKind;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.Role;
import org.rcbench.circuit.TimerFamily;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.design.Design;
import org.rcbench.units.Tolerance;

/**
 * The back-solving problem of one design, built once: the circuit model, which parameters the
 * solver moves and their healthy priors, the faults it considers, and the model uncertainty that
 * the timer family's typical figures and the supply's tolerance leave in every prediction.
 * Immutable and thread-safe.
 *
 * <p>Model uncertainty: family parameters are typical figures recalled from memory
 * ({@link TimerFamily}) and the supply has a tolerance, so the predicted log quantities carry a
 * covariance {@code S U S^T}, with {@code S} the sensitivities of {@code ln q} to each such
 * parameter at nominal (finite differences) and {@code U} their variances (GUM linear propagation,
 * JCGM 100:2008, 5.1). The spreads assumed are listed in {@link #NUISANCE_SPREADS} (common practice,
 * no source).
 */
final class DiagnosisModel {
    /** Rectangular half-widths, as fractions of the value, of the family parameters' uncertainty (common practice, no source). */
    static final Object[][] NUISANCE_SPREADS = {
        {ParameterTable.DIVIDER, 0.20},
        {ParameterTable.HIGH_DROP, 0.30},
        {ParameterTable.HIGH_OHMS, 0.50},
        {ParameterTable.LOW_VOLTS, 0.50},
        {ParameterTable.LOW_OHMS, 0.50},
        {ParameterTable.SAT, 0.50},
        {ParameterTable.DISCHARGE_OHMS, 0.50},
        {ParameterTable.INPUT_CURRENT, 1.00},
        {ParameterTable.DELAY, 0.50},
    };
    /** Leakage fault prior on {@code ln(R_leak / R_timing)}: median 30 times the timing resistance, sd 1.2 (common practice, no source). */
    static final Prior LEAK_PRIOR = Prior.normal(Math.log(30), 1.2);
    /** Control-load fault prior on {@code ln(R_load / R_pin)}: median 3 times the pin's own source resistance (common practice, no source). */
    static final Prior CONTROL_PRIOR = Prior.normal(Math.log(3), 1.2);
    /**
     * Prior chance of a control-pin load the design does not show, heavy enough to matter (a leaky
     * bypass capacitor, a solder bridge, flux residue): rarer than a resistor out of tolerance
     * (common practice, no source).
     */
    static final double CONTROL_PROBABILITY = 0.005;
    /** Prior chance that the other timer family is fitted (common practice, no source). */
    static final double FAMILY_PROBABILITY = 0.01;
    /** Prior on a wiper's logit: a broad spread about the design's position (a logistic-like sd, nearly flat over the travel). */
    static final double WIPER_LOGIT_SD = 1.8;

    final Design design;
    final TimerModel model;
    final ParameterTable table;
    final List<TimingQuantity> quantities;
    /** Parts and wipers, with their healthy priors, in parameter order. */
    final List<Coordinate> healthy;
    final List<Fault> faults;
    final TimerFamily otherFamily;
    final double[] base;
    final double[] otherBase;
    final double[][] modelCovariance;
    final double[][] otherModelCovariance;
    final double leakReference;
    final double controlReference;

    private DiagnosisModel(Design design) {
        this.design = design;
        CircuitSpec spec = design.circuit();
        this.model = TimerModels.build(spec);
        this.table = model.parameters();
        this.quantities = quantities(spec.topology());
        this.base = model.nominal();
        this.otherFamily = spec.family() == TimerFamily.BIPOLAR ? TimerFamily.CMOS : TimerFamily.BIPOLAR;
        this.otherBase = base.clone();
        table.applyFamily(otherBase, otherFamily.defaults());
        List<Coordinate> coords = new ArrayList<>();
        List<Fault> fs = new ArrayList<>();
        for (int i = 0; i < table.size(); i++) {
            if (table.kind(i) == ParameterKind.PART) {
                addPart(i, coords, fs);
            } else if (table.kind(i) == ParameterKind.WIPER && sensitive(i)) {
                double w = base[i];
                coords.add(Coordinate.wiper(table.name(i), i,
                        Prior.normal(Coordinate.logit(w), WIPER_LOGIT_SD)));
            }
        }
        this.leakReference = timingResistance(spec);
        this.controlReference = 2.0 / 3.0 * base[table.index(ParameterTable.DIVIDER)];
        if (!quantities.isEmpty()) {
            fs.add(new Fault(FaultKind.LEAKAGE, ParameterTable.LEAK, "leakage across " + timingCapacitors(spec),
                    LEAK_PRIOR, leakProbability(spec)));
            if (spec.control().mode() != ControlPin.Mode.DRIVEN) {
                fs.add(new Fault(FaultKind.CONTROL_LOAD, ParameterTable.CONTROL_OHMS, "a load on the control pin",
                        CONTROL_PRIOR, CONTROL_PROBABILITY));
            }
            fs.add(new Fault(FaultKind.FAMILY, otherFamily.fileName(), "a " + otherFamily.fileName() + " timer fitted",
                    null, FAMILY_PROBABILITY));
        }
        this.healthy = List.copyOf(coords);
        this.faults = List.copyOf(fs);
        this.modelCovariance = nuisanceCovariance(base);
        this.otherModelCovariance = nuisanceCovariance(otherBase);
    }

    static DiagnosisModel of(Design design) {
        return new DiagnosisModel(design);
    }

    /** The quantities a topology is fitted on. */
    static List<TimingQuantity> quantities(Topology t) {
        if (t == Topology.MONOSTABLE) {
            return List.of(TimingQuantity.PULSE_WIDTH);
        }
        if (t.isFreeRunning()) {
            return List.of(TimingQuantity.HIGH, TimingQuantity.LOW);
        }
        return List.of();
    }

    private void addPart(int i, List<Coordinate> coords, List<Fault> fs) {
        String name = table.name(i);
        Element e = design.part(name);
        if (e == null || e.role() == Role.OTHER || e.role() == Role.CONTROL_BYPASS || !(base[i] > 0) || !sensitive(i)) {
            return;
        }
        KindModel km = KindModel.of(e.kind(), e.type());
        Tolerance tol = design.spread(name).tolerance();
        if (e.type() == ElementType.DIODE && tol.equals(Tolerance.NONE)) {
            tol = Tolerance.symmetric(KindModel.DEFAULT_DIODE_TOLERANCE);
        }
        double[] band = km.healthyBand(tol);
        coords.add(Coordinate.log(name, i, base[i], Prior.band(band[0], band[1])));
        FaultKind kind = e.type() == ElementType.DIODE ? FaultKind.DIODE : FaultKind.PART;
        fs.add(new Fault(kind, name, name, km.faultPrior(), km.faultProbability()));
    }

    /** Whether any fitted quantity moves when parameter {@code i} moves by 1e-4 of its value. */
    private boolean sensitive(int i) {
        if (quantities.isEmpty()) {
            return false;
        }
        Timing t0 = model.evaluate(base);
        double[] p = base.clone();
        double h = p[i] == 0 ? 1e-4 : 1e-4 * Math.abs(p[i]);
        p[i] = p[i] + (table.kind(i) == ParameterKind.WIPER && p[i] + h > 1 ? -h : h);
        Timing t1 = model.evaluate(p);
        if (!t0.runs() || !t1.runs()) {
            return true;
        }
        for (TimingQuantity q : quantities) {
            double a = t0.value(q);
            double b = t1.value(q);
            if (Math.abs(b - a) > 1e-9 * Math.abs(a)) {
                return true;
            }
        }
        return false;
    }

    /** The nominal total of the timing resistances, the reference for a leakage resistance (Ω). */
    private static double timingResistance(CircuitSpec spec) {
        double r = 0;
        for (Element e : spec.elements()) {
            if ((e.type() == ElementType.RESISTOR || e.type() == ElementType.POTENTIOMETER)
                    && (e.role() == Role.CHARGE || e.role() == Role.SHARED || e.role() == Role.DISCHARGE
                    || e.role() == Role.FEEDBACK || e.role() == Role.SPLIT_POT)) {
                r += e.value();
            }
        }
        return r > 0 ? r : 1e4;
    }

    private static String timingCapacitors(CircuitSpec spec) {
        List<Element> caps = spec.withRole(Role.TIMING);
        StringBuilder sb = new StringBuilder();
        for (Element c : caps) {
            sb.append(sb.length() == 0 ? "" : "/").append(c.designator());
        }
        return sb.length() == 0 ? "the timing capacitor" : sb.toString();
    }

    /**
     * Prior chance of leakage across the timing capacitor that matters for the timing, by the
     * capacitor's kind: electrolytics have a stated leakage current and it grows with age (5 %),
     * tantalum 3 %, class-2 ceramics 0.3 %, film and C0G parts with their gigaohm insulation 0.1 %,
     * unstated kinds 1 % (common practice, no source).
     */
    static double leakProbability(CircuitSpec spec) {
        double p = 0.001;
        for (Element c : spec.withRole(Role.TIMING)) {
            PartKind k = c.kind();
            double q = k == PartKind.ALUMINIUM_ELECTROLYTIC ? 0.05 : k == PartKind.TANTALUM ? 0.03
                    : k.isClass2Ceramic() ? 0.003 : k == PartKind.UNSPECIFIED ? 0.01 : 0.001;
            p = Math.max(p, q);
        }
        return p;
    }

    /** {@code S U S^T} over the family parameters and the supply, at parameter vector {@code at}. */
    private double[][] nuisanceCovariance(double[] at) {
        int n = quantities.size();
        double[][] cov = new double[n][n];
        if (n == 0) {
            return cov;
        }
        Timing t0 = model.evaluate(at);
        if (!t0.runs()) {
            return cov;
        }
        List<double[]> spreads = new ArrayList<>();
        for (Object[] s : NUISANCE_SPREADS) {
            int i = table.index((String) s[0]);
            spreads.add(new double[] {i, (Double) s[1] * Math.abs(at[i]) / Math.sqrt(3)});
        }
        Tolerance st = design.supplyTolerance();
        int iSupply = table.index(ParameterTable.SUPPLY);
        spreads.add(new double[] {iSupply, at[iSupply] * (st.minusFraction() + st.plusFraction()) / Math.sqrt(12)});
        double[] p = at.clone();
        for (double[] s : spreads) {
            int i = (int) s[0];
            double u = s[1];
            if (!(u > 0)) {
                continue;
            }
            double h = 1e-3 * u;
            p[i] = at[i] + h;
            Timing t1 = model.evaluate(p);
            p[i] = at[i];
            if (!t1.runs()) {
                continue;
            }
            double[] sens = new double[n];
            for (int a = 0; a < n; a++) {
                TimingQuantity q = quantities.get(a);
                sens[a] = (Math.log(t1.value(q)) - Math.log(t0.value(q))) / h * u;
            }
            for (int a = 0; a < n; a++) {
                for (int b = 0; b < n; b++) {
                    cov[a][b] += sens[a] * sens[b];
                }
            }
        }
        return cov;
    }

    /** The healthy coordinate of parameter {@code name}, or null. */
    Coordinate coordinate(String name) {
        for (Coordinate c : healthy) {
            if (c.name().equals(name)) {
                return c;
            }
        }
        return null;
    }

    /** The solver coordinate a latent fault frees. */
    Coordinate latentCoordinate(Fault f) {
        switch (f.kind()) {
            case LEAKAGE:
                return Coordinate.log(f.name(), table.index(f.name()), leakReference, f.prior());
            case CONTROL_LOAD:
                return Coordinate.log(f.name(), table.index(f.name()), controlReference, f.prior());
            default:
                throw new IllegalArgumentException("not a latent fault: " + f);
        }
    }

    /** The tolerance band (as fractions) a part was given, or NONE. */
    Tolerance tolerance(String designator) {
        Element e = design.part(designator);
        Tolerance t = design.spread(designator).tolerance();
        if (e != null && e.type() == ElementType.DIODE && t.equals(Tolerance.NONE)) {
            return Tolerance.symmetric(KindModel.DEFAULT_DIODE_TOLERANCE);
        }
        return t;
    }
}
