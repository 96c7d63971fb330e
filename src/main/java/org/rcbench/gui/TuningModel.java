package org.rcbench.gui;

import java.util.List;
import java.util.Locale;
import java.util.concurrent.Executor;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.units.ValueCode;

/**
 * The trimmer guide for designs with a potentiometer: a target the user types, and a gauge of where
 * the wiper is, where it must go and which way to turn. Re-solved at the readings' rate so it
 * follows a hand on the knob. Window thread only; the solving runs on the worker.
 */
public final class TuningModel {
    /** Time between tuning solutions: as often as the readings refresh. */
    static final long INTERVAL_NANOS = 100_000_000L;
    /** The guide follows the newest this many cycles, so it keeps up with a hand on the knob. */
    public static final int WINDOW_CYCLES = 64;

    private final TuningSource source;
    private final BackgroundSlot<TuningAdvice> slot;
    private final ReadOnlyBooleanWrapper applicable = new ReadOnlyBooleanWrapper(this, "applicable");
    private final ReadOnlyStringWrapper part = new ReadOnlyStringWrapper(this, "part", "");
    private final ReadOnlyObjectWrapper<TimingQuantity> quantity =
            new ReadOnlyObjectWrapper<>(this, "quantity", TimingQuantity.FREQUENCY);
    private final ReadOnlyStringWrapper targetText = new ReadOnlyStringWrapper(this, "targetText", "");
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper(this, "problem", "");
    private final ReadOnlyDoubleWrapper present = new ReadOnlyDoubleWrapper(this, "present", Double.NaN);
    private final ReadOnlyDoubleWrapper wanted = new ReadOnlyDoubleWrapper(this, "wanted", Double.NaN);
    private final ReadOnlyStringWrapper advice = new ReadOnlyStringWrapper(this, "advice", "");
    private double target = Double.NaN;
    private long lastRun = Long.MIN_VALUE / 2;
    private long lastSerial = -1;

    /** @param source the tuning solver, or null when this build has none */
    TuningModel(TuningSource source, Executor worker) {
        this.source = source;
        this.slot = new BackgroundSlot<>(worker);
    }

    /** True when the design has a potentiometer to tune. */
    public ReadOnlyBooleanProperty applicableProperty() {
        return applicable.getReadOnlyProperty();
    }

    /** The potentiometer's designator. */
    public ReadOnlyStringProperty partProperty() {
        return part.getReadOnlyProperty();
    }

    /** The quantity the target is for. */
    public ReadOnlyObjectProperty<TimingQuantity> quantityProperty() {
        return quantity.getReadOnlyProperty();
    }

    /** The target as typed. */
    public ReadOnlyStringProperty targetTextProperty() {
        return targetText.getReadOnlyProperty();
    }

    /** Why the typed target does not read, or why no guide can be shown; "" when fine. */
    public ReadOnlyStringProperty problemProperty() {
        return problem.getReadOnlyProperty();
    }

    /** Where the wiper is now, 0..1 of the track (NaN when unknown). */
    public ReadOnlyDoubleProperty presentProperty() {
        return present.getReadOnlyProperty();
    }

    /** Where the wiper must go, 0..1 (NaN when no target or out of reach). */
    public ReadOnlyDoubleProperty wantedProperty() {
        return wanted.getReadOnlyProperty();
    }

    /** Which way and how far to turn, in words. */
    public ReadOnlyStringProperty adviceProperty() {
        return advice.getReadOnlyProperty();
    }

    /** The quantities a target may be given for in this design's topology. */
    public List<TimingQuantity> choices(Design d) {
        if (d != null && d.circuit().topology() == Topology.MONOSTABLE) {
            return List.of(TimingQuantity.PULSE_WIDTH);
        }
        return List.of(TimingQuantity.FREQUENCY, TimingQuantity.DUTY, TimingQuantity.PERIOD);
    }

    /** Sets the quantity to tune and clears the target. */
    public void setQuantity(TimingQuantity q) {
        quantity.set(q);
        setTarget(targetText.get());
    }

    /** The user typed a target: {@code 1 kHz}, {@code 35 %}, {@code 1.2 ms}. */
    public void setTarget(String text) {
        targetText.set(text);
        String t = text.strip();
        if (t.isEmpty()) {
            target = Double.NaN;
            problem.set("");
            wanted.set(Double.NaN);
            return;
        }
        try {
            target = parseTarget(quantity.get(), t);
            problem.set("");
        } catch (BadInputException e) {
            target = Double.NaN;
            problem.set("target: " + e.getMessage());
        }
        lastSerial = -1;
    }

    /** The target in its unit (duty as a fraction); NaN when none. */
    public double target() {
        return target;
    }

    static double parseTarget(TimingQuantity q, String t) {
        if (q == TimingQuantity.DUTY) {
            String n = t.endsWith("%") ? t.substring(0, t.length() - 1).strip() : t;
            double v = ValueCode.parseValue(n, org.rcbench.units.Unit.NONE);
            double f = t.endsWith("%") || v > 1 ? v / 100 : v;
            if (!(f > 0 && f < 1)) {
                throw new BadInputException("", "a duty cycle lies between 0 and 100 %, not \"" + t + "\"");
            }
            return f;
        }
        return ValueCode.parsePositive(t, q.unit());
    }

    /** Follows a new design: applicable when it has a potentiometer. */
    void designChanged(Design d) {
        Element pot = d == null ? null : potentiometer(d);
        applicable.set(pot != null);
        part.set(pot == null ? "" : pot.designator());
        if (pot != null && !choices(d).contains(quantity.get())) {
            quantity.set(choices(d).get(0));
        }
        present.set(pot == null ? Double.NaN : present.get());
        if (pot != null && source == null) {
            problem.set("the trimmer guide needs the diagnosis stage, which this window was not given");
        }
        lastSerial = -1;
    }

    static Element potentiometer(Design d) {
        for (Element e : d.circuit().elements()) {
            if (e.type() == ElementType.POTENTIOMETER) {
                return e;
            }
        }
        return null;
    }

    void maybeRun(long now, Design design, LiveFrame frame) {
        if (source == null || !applicable.get() || design == null || frame == null
                || frame.measurement().cycles() == 0) {
            return;
        }
        if (frame.serial() == lastSerial || now - lastRun < INTERVAL_NANOS) {
            return;
        }
        TimingQuantity q = quantity.get();
        double t = target;
        Observed o = Observed.of(frame, WINDOW_CYCLES);
        if (slot.offer(() -> source.tune(design, o, q, t))) {
            lastRun = now;
            lastSerial = frame.serial();
        }
    }

    void poll() {
        BackgroundSlot.Outcome<TuningAdvice> o = slot.take();
        if (o == null) {
            return;
        }
        if (o.value() == null) {
            advice.set("");
            problem.set("cannot guide: " + o.problem());
            return;
        }
        TuningAdvice a = o.value();
        present.set(a.presentWiper());
        wanted.set(Double.isNaN(target) ? Double.NaN : a.targetWiper());
        advice.set(Double.isNaN(target) ? String.format(Locale.ROOT, "wiper at %.2f of the track; type a target",
                a.presentWiper()) : a.advice());
        if (problem.get().startsWith("cannot guide")) {
            problem.set("");
        }
    }
}
