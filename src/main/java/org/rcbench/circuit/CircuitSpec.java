package org.rcbench.circuit;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Everything the circuit models need at nominal: topology, timer family and its parameters, supply,
 * the parts, the control pin and (for monostables) the trigger. Immutable.
 *
 * @param topology       which circuit
 * @param family         the timer family named in the design
 * @param familyParameters the family's parameters after the design's overrides
 * @param supplyVolts    supply voltage (V)
 * @param elements       the parts, in the design's order
 * @param control        the control pin's wiring
 * @param trigger        the monostable's trigger, or {@link Trigger#UNSPECIFIED}
 */
public record CircuitSpec(Topology topology, TimerFamily family, FamilyParameters familyParameters,
        double supplyVolts, List<Element> elements, ControlPin control, Trigger trigger) {
    public CircuitSpec {
        Objects.requireNonNull(topology, "topology");
        Objects.requireNonNull(family, "family");
        Objects.requireNonNull(familyParameters, "familyParameters");
        Objects.requireNonNull(control, "control");
        Objects.requireNonNull(trigger, "trigger");
        if (!(supplyVolts > 0) || Double.isInfinite(supplyVolts)) {
            throw new IllegalArgumentException("supplyVolts not positive: " + supplyVolts);
        }
        elements = List.copyOf(elements);
    }

    /** A spec with the family's default parameters, open control pin and no trigger details. */
    public static CircuitSpec of(Topology topology, TimerFamily family, double supplyVolts, List<Element> elements) {
        return new CircuitSpec(topology, family, family.defaults(), supplyVolts, elements, ControlPin.open(),
                Trigger.UNSPECIFIED);
    }

    /** The parts with {@code role}, in order. */
    public List<Element> withRole(Role role) {
        List<Element> out = new ArrayList<>();
        for (Element e : elements) {
            if (e.role() == role) {
                out.add(e);
            }
        }
        return out;
    }

    /** The part called {@code designator}, or null. */
    public Element element(String designator) {
        for (Element e : elements) {
            if (e.designator().equals(designator)) {
                return e;
            }
        }
        return null;
    }

    public CircuitSpec withFamilyParameters(FamilyParameters f) {
        return new CircuitSpec(topology, family, f, supplyVolts, elements, control, trigger);
    }

    public CircuitSpec withSupplyVolts(double v) {
        return new CircuitSpec(topology, family, familyParameters, v, elements, control, trigger);
    }

    public CircuitSpec withElements(List<Element> e) {
        return new CircuitSpec(topology, family, familyParameters, supplyVolts, e, control, trigger);
    }

    public CircuitSpec withControl(ControlPin c) {
        return new CircuitSpec(topology, family, familyParameters, supplyVolts, elements, c, trigger);
    }

    public CircuitSpec withTrigger(Trigger t) {
        return new CircuitSpec(topology, family, familyParameters, supplyVolts, elements, control, t);
    }

    /** A copy where part {@code designator} has value {@code value}. */
    public CircuitSpec withValue(String designator, double value) {
        List<Element> out = new ArrayList<>(elements.size());
        boolean found = false;
        for (Element e : elements) {
            if (e.designator().equals(designator)) {
                out.add(e.withValue(value));
                found = true;
            } else {
                out.add(e);
            }
        }
        if (!found) {
            throw new IllegalArgumentException("no part " + designator);
        }
        return withElements(out);
    }
}
