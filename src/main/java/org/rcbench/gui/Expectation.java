package org.rcbench.gui;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.rcbench.circuit.TimingQuantity;

/**
 * What a design should do, as the window shows it beside the readings. Immutable.
 *
 * @param values   expected value and bands per quantity the topology has
 * @param runs     whether the circuit does its job at nominal
 * @param reason   why it does not, or ""
 * @param basis    how the bands were found, in words (e.g. "bands: Monte Carlo 95 % and worst case")
 * @param warnings plain-language warnings about the design
 */
public record Expectation(Map<TimingQuantity, Expected> values, boolean runs, String reason, String basis,
        List<String> warnings) {
    public Expectation {
        values = values.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(values));
        Objects.requireNonNull(reason, "reason");
        Objects.requireNonNull(basis, "basis");
        warnings = List.copyOf(warnings);
    }

    /** The expectation for {@code q}, or null when the topology does not have it. */
    public Expected of(TimingQuantity q) {
        return values.get(q);
    }
}
