package org.rcbench.design;

import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.ElementType;
import org.rcbench.units.Tolerance;

/**
 * One board's design: its name, the circuit at nominal ({@link CircuitSpec}) and how each value may
 * spread. Immutable.
 *
 * @param source          where it came from (a file name, or a description such as "design command")
 * @param boardName       the board's name
 * @param revision        its revision, possibly empty
 * @param notes           free text, possibly empty
 * @param circuit         topology, family, supply and parts at nominal
 * @param spreads         tolerance, distribution and tempco by designator (parts without spread are exact)
 * @param supplyTolerance the supply's tolerance band ({@link Tolerance#NONE} when exact)
 * @param ambient         the ambient range, or null when not given
 * @param travels         potentiometers' mechanical travel by designator (for tuning advice), possibly empty
 */
public record Design(String source, String boardName, String revision, String notes, CircuitSpec circuit,
        Map<String, PartSpread> spreads, Tolerance supplyTolerance, Ambient ambient, Map<String, PotTravel> travels) {
    public Design {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(boardName, "boardName");
        Objects.requireNonNull(circuit, "circuit");
        Objects.requireNonNull(supplyTolerance, "supplyTolerance");
        revision = revision == null ? "" : revision;
        notes = notes == null ? "" : notes;
        spreads = Map.copyOf(new TreeMap<>(spreads));
        for (String d : spreads.keySet()) {
            if (circuit.element(d) == null) {
                throw new IllegalArgumentException("spread for unknown part " + d);
            }
        }
        travels = Map.copyOf(new TreeMap<>(travels));
        for (String d : travels.keySet()) {
            if (circuit.element(d) == null || circuit.element(d).type() != ElementType.POTENTIOMETER) {
                throw new IllegalArgumentException("travel for a part that is no potentiometer: " + d);
            }
        }
    }

    /** A design without potentiometer travels. */
    public Design(String source, String boardName, String revision, String notes, CircuitSpec circuit,
            Map<String, PartSpread> spreads, Tolerance supplyTolerance, Ambient ambient) {
        this(source, boardName, revision, notes, circuit, spreads, supplyTolerance, ambient, Map.of());
    }

    /** The mechanical travel of potentiometer {@code designator}, or null when the design does not give it. */
    public PotTravel travel(String designator) {
        return travels.get(designator);
    }

    /** The spread of {@code designator}, or an exact spread when none is recorded. */
    public PartSpread spread(String designator) {
        PartSpread s = spreads.get(designator);
        return s == null ? PartSpread.rectangular(Tolerance.NONE) : s;
    }

    /** The board name with its revision, e.g. {@code Piper Mk2}. */
    public String title() {
        return revision.isEmpty() ? boardName : boardName + " " + revision;
    }

    public Design withCircuit(CircuitSpec c) {
        return new Design(source, boardName, revision, notes, c, spreads, supplyTolerance, ambient, travels);
    }

    /** A copy where potentiometer {@code designator} has mechanical travel {@code travel}. */
    public Design withTravel(String designator, PotTravel travel) {
        Map<String, PotTravel> t = new TreeMap<>(travels);
        t.put(designator, travel);
        return new Design(source, boardName, revision, notes, circuit, spreads, supplyTolerance, ambient, t);
    }

    /** A copy where part {@code designator} has nominal {@code value}. */
    public Design withValue(String designator, double value) {
        return withCircuit(circuit.withValue(designator, value));
    }

    /** The part called {@code designator}, or null. */
    public Element part(String designator) {
        return circuit.element(designator);
    }
}
