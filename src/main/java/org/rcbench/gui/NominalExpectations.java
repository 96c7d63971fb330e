package org.rcbench.gui;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.rcbench.circuit.TimerModel;
import org.rcbench.circuit.TimerModels;
import org.rcbench.circuit.Timing;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;

/**
 * Expectations from the circuit model at nominal part values only, without bands: what the window
 * shows when no tolerance analysis is wired in. Thread-safe.
 */
public final class NominalExpectations implements ExpectationSource {
    static final List<TimingQuantity> SHOWN = List.of(TimingQuantity.FREQUENCY, TimingQuantity.PERIOD,
            TimingQuantity.DUTY, TimingQuantity.HIGH, TimingQuantity.LOW, TimingQuantity.PULSE_WIDTH);

    @Override
    public Expectation expect(Design design) {
        TimerModel model = TimerModels.build(design.circuit());
        Timing t = model.evaluateNominal();
        Map<TimingQuantity, Expected> values = new EnumMap<>(TimingQuantity.class);
        for (TimingQuantity q : SHOWN) {
            double v = t.value(q);
            if (!Double.isNaN(v)) {
                values.put(q, Expected.nominalOnly(v));
            }
        }
        String reason = t.reasonText();
        return new Expectation(values, t.runs(), reason == null ? "" : reason, "nominal values only, no bands",
                List.of());
    }
}
