package org.rcbench.tolerance;

import java.util.List;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;

/** Which quantities a topology predicts. */
public final class Quantities {
    private Quantities() {
    }

    /**
     * Astables: frequency, period, high, low, duty, first high. Monostable: pulse width (also as the
     * high time) and first pulse, plus period, frequency, low and duty when the design gives a trigger
     * interval. Bistable: none.
     */
    public static List<TimingQuantity> of(CircuitSpec spec) {
        Topology t = spec.topology();
        if (t == Topology.BISTABLE) {
            return List.of();
        }
        if (t == Topology.MONOSTABLE) {
            if (spec.trigger().intervalSeconds() > 0) {
                return List.of(TimingQuantity.PULSE_WIDTH, TimingQuantity.HIGH, TimingQuantity.FIRST_HIGH,
                        TimingQuantity.PERIOD, TimingQuantity.FREQUENCY, TimingQuantity.LOW, TimingQuantity.DUTY);
            }
            return List.of(TimingQuantity.PULSE_WIDTH, TimingQuantity.HIGH, TimingQuantity.FIRST_HIGH);
        }
        return List.of(TimingQuantity.FREQUENCY, TimingQuantity.PERIOD, TimingQuantity.HIGH, TimingQuantity.LOW,
                TimingQuantity.DUTY, TimingQuantity.FIRST_HIGH);
    }
}
