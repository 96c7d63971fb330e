package org.rcbench.gui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Executor;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.Topology;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.picker.Candidate;
import org.rcbench.picker.PartPicker;
import org.rcbench.picker.PickRequest;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * The part-picking helper beside the design: targets typed in the design's own terms (frequency
 * and duty, pulse width, or a PWM's duty range), candidate part sets from the preferred series
 * ({@link PartPicker}, on the worker), and taking one into the design. Window thread only.
 */
public final class PickerModel {
    /** One candidate as the helper lists it. */
    public record Option(String parts, String summary, Candidate candidate) {
    }

    private final DesignModel design;
    private final BackgroundSlot<PartPicker.Result> slot;
    private final ObservableList<Option> options = FXCollections.observableArrayList();
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper(this, "problem", "");
    private final ReadOnlyStringWrapper notes = new ReadOnlyStringWrapper(this, "notes", "");
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(this, "busy");

    PickerModel(DesignModel design, Executor worker) {
        this.design = design;
        this.slot = new BackgroundSlot<>(worker);
    }

    public ObservableList<Option> options() {
        return FXCollections.unmodifiableObservableList(options);
    }

    public ReadOnlyStringProperty problemProperty() {
        return problem.getReadOnlyProperty();
    }

    /** The picker's notes about the request, one per line. */
    public ReadOnlyStringProperty notesProperty() {
        return notes.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty busyProperty() {
        return busy.getReadOnlyProperty();
    }

    /** The targets the design's topology needs, as labels for the entry fields. */
    public List<String> targetsFor(Design d) {
        if (d == null) {
            return List.of();
        }
        switch (d.circuit().topology()) {
            case MONOSTABLE: return List.of("pulse width");
            case OUTPUT_FED: return List.of("frequency");
            case PWM_POT: return List.of("frequency", "lowest duty", "highest duty");
            case BISTABLE: return List.of();
            default: return List.of("frequency", "duty");
        }
    }

    /**
     * Looks for part sets reaching {@code targets} (texts in the order of {@link #targetsFor}) with
     * the design's topology, family and supply, E24 resistors and E6 capacitors.
     */
    public void find(List<String> targets) {
        Design d = design.design();
        if (d == null) {
            problem.set("load a design first");
            return;
        }
        PickRequest r;
        try {
            r = request(d, targets);
        } catch (BadInputException e) {
            problem.set(e.getMessage());
            return;
        }
        if (slot.offer(() -> PartPicker.pick(r))) {
            busy.set(true);
            problem.set("");
            notes.set("");
        }
    }

    /** Takes the chosen candidate's values into the design, part by part. */
    public void apply(Option o) {
        Design d = design.design();
        if (d == null) {
            return;
        }
        design.use(merge(d, o.candidate().design()));
        design.markEdited();
    }

    void poll() {
        BackgroundSlot.Outcome<PartPicker.Result> o = slot.take();
        if (o == null) {
            return;
        }
        busy.set(false);
        if (o.value() == null) {
            problem.set(o.problem());
            options.clear();
            return;
        }
        List<Option> list = new ArrayList<>();
        for (Candidate c : o.value().candidates()) {
            list.add(new Option(c.parts(), summary(c), c));
        }
        options.setAll(list);
        notes.set(String.join("\n", o.value().notes()));
        if (list.isEmpty()) {
            problem.set("no part set found; see the notes");
        }
    }

    static PickRequest request(Design d, List<String> t) {
        CircuitSpec c = d.circuit();
        PickRequest r = PickRequest.of(c.topology(), c.family(), c.supplyVolts());
        switch (c.topology()) {
            case MONOSTABLE:
                return r.withPulseSeconds(ValueCode.parsePositive(need(t, 0, "pulse width"), Unit.SECOND));
            case OUTPUT_FED:
                return r.withFrequencyHz(ValueCode.parsePositive(need(t, 0, "frequency"), Unit.HERTZ));
            case PWM_POT:
                return r.withFrequencyHz(ValueCode.parsePositive(need(t, 0, "frequency"), Unit.HERTZ))
                        .withDutyRange(TuningModel.parseTarget(TimingQuantity.DUTY, need(t, 1, "lowest duty")),
                                TuningModel.parseTarget(TimingQuantity.DUTY, need(t, 2, "highest duty")));
            case BISTABLE:
                throw new BadInputException("part picker", "a bistable has no timing parts to pick");
            default:
                return r.withFrequencyHz(ValueCode.parsePositive(need(t, 0, "frequency"), Unit.HERTZ))
                        .withDuty(TuningModel.parseTarget(TimingQuantity.DUTY, need(t, 1, "duty")));
        }
    }

    private static String need(List<String> t, int i, String name) {
        if (i >= t.size() || t.get(i).isBlank()) {
            throw new BadInputException(name, "give a target");
        }
        return t.get(i).strip();
    }

    /**
     * The design with the candidate's values and tolerances: each candidate part goes to the design's
     * part of the same designator and role, else to its only part of that role.
     */
    static Design merge(Design d, Design candidate) {
        Design out = d;
        Map<String, org.rcbench.design.PartSpread> spreads = new java.util.HashMap<>(d.spreads());
        for (Element e : candidate.circuit().elements()) {
            Element target = d.part(e.designator());
            if (target == null || target.role() != e.role()) {
                List<Element> same = d.circuit().withRole(e.role());
                target = same.size() == 1 ? same.get(0) : null;
            }
            if (target == null || target.type() != e.type()) {
                continue;
            }
            out = out.withValue(target.designator(), e.value());
            spreads.put(target.designator(), candidate.spread(e.designator()));
        }
        return new Design(out.source(), out.boardName(), out.revision(), out.notes(), out.circuit(), spreads,
                out.supplyTolerance(), out.ambient());
    }

    private static String summary(Candidate c) {
        TimingQuantity main = c.design().circuit().topology() == Topology.MONOSTABLE ? TimingQuantity.PULSE_WIDTH
                : TimingQuantity.FREQUENCY;
        var p = c.prediction();
        StringBuilder sb = new StringBuilder(Formats.shortValue(main, p.nominal(main)));
        if (p.quantities().contains(TimingQuantity.DUTY) && main == TimingQuantity.FREQUENCY) {
            sb.append(", duty ").append(Formats.shortValue(TimingQuantity.DUTY, p.nominal(TimingQuantity.DUTY)));
        }
        sb.append(String.format(Locale.ROOT, "; worst target error %.2f %%, spread %.2f %% (1 σ)", c.worstError() * 100,
                c.spread() * 100));
        var wc = p.worstCase(main);
        if (wc.isDefined()) {
            sb.append("; worst case ").append(Formats.range(main, wc.low(), wc.high()));
        }
        return sb.toString();
    }
}
