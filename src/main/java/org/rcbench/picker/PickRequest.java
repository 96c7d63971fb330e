package org.rcbench.picker;

import java.util.Objects;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.TimerFamily;
import org.rcbench.circuit.Topology;
import org.rcbench.units.PreferredSeries;
import org.rcbench.units.Tolerance;

/**
 * What the part picker is asked for. Times in seconds, frequency in hertz, duty as a fraction; NaN
 * for "not given". Immutable; change with {@code with...}.
 *
 * @param topology           the circuit to design
 * @param family             the timer family
 * @param supplyVolts        supply voltage (V)
 * @param frequencyHz        target frequency (astables, PWM)
 * @param duty               target duty (astables)
 * @param pulseSeconds       target pulse width (monostable)
 * @param dutyMin            lowest duty of the PWM (wiper at the discharge end)
 * @param dutyMax            highest duty of the PWM (wiper at the charge end); >= 0.99 means no end-stop resistor
 * @param resistorSeries     series for fixed resistors
 * @param capacitorSeries    series for the timing capacitor
 * @param resistorTolerance  tolerance of the resistors
 * @param capacitorTolerance tolerance of the capacitor
 * @param potTolerance       tolerance of the potentiometer track
 * @param diode              diode kind (SILICON or SCHOTTKY) for topologies with diodes
 * @param minOhms            smallest timing resistor allowed
 * @param maxOhms            largest timing resistor allowed (NaN: the family's limit from its threshold current)
 * @param minFarads          smallest timing capacitor considered
 * @param maxFarads          largest timing capacitor considered
 * @param count              how many candidates to return
 * @param draws              Monte Carlo draws for each returned candidate's band
 */
public record PickRequest(Topology topology, TimerFamily family, double supplyVolts, double frequencyHz, double duty,
        double pulseSeconds, double dutyMin, double dutyMax, PreferredSeries resistorSeries,
        PreferredSeries capacitorSeries, Tolerance resistorTolerance, Tolerance capacitorTolerance,
        Tolerance potTolerance, PartKind diode, double minOhms, double maxOhms, double minFarads, double maxFarads,
        int count, int draws) {
    public PickRequest {
        Objects.requireNonNull(topology, "topology");
        Objects.requireNonNull(family, "family");
        Objects.requireNonNull(resistorSeries, "resistorSeries");
        Objects.requireNonNull(capacitorSeries, "capacitorSeries");
        Objects.requireNonNull(resistorTolerance, "resistorTolerance");
        Objects.requireNonNull(capacitorTolerance, "capacitorTolerance");
        Objects.requireNonNull(potTolerance, "potTolerance");
        Objects.requireNonNull(diode, "diode");
        if (count < 1) {
            throw new IllegalArgumentException("count < 1: " + count);
        }
    }

    /**
     * A request with the usual defaults: E24 resistors at the series' usual ±5 %, E6 capacitors at
     * ±10 %, pots ±20 %, silicon diodes, resistors from 1 kΩ (common practice), capacitors from 100 pF to
     * 100 µF (common practice: above stray capacitance, below where electrolytics are the only choice),
     * PWM duty 5 % to 95 %, five candidates, 20 000 draws each.
     */
    public static PickRequest of(Topology topology, TimerFamily family, double supplyVolts) {
        return new PickRequest(topology, family, supplyVolts, Double.NaN, Double.NaN, Double.NaN, 0.05, 0.95,
                PreferredSeries.E24, PreferredSeries.E6, Tolerance.symmetric(0.05), Tolerance.symmetric(0.10),
                Tolerance.symmetric(0.20), PartKind.SILICON, 1e3, Double.NaN, 100e-12, 100e-6, 5, 20_000);
    }

    public PickRequest withFrequencyHz(double v) {
        return new PickRequest(topology, family, supplyVolts, v, duty, pulseSeconds, dutyMin, dutyMax, resistorSeries,
                capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, diode, minOhms, maxOhms, minFarads,
                maxFarads, count, draws);
    }

    public PickRequest withDuty(double v) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, v, pulseSeconds, dutyMin, dutyMax,
                resistorSeries, capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, diode, minOhms,
                maxOhms, minFarads, maxFarads, count, draws);
    }

    public PickRequest withPulseSeconds(double v) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, v, dutyMin, dutyMax, resistorSeries,
                capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, diode, minOhms, maxOhms, minFarads,
                maxFarads, count, draws);
    }

    public PickRequest withDutyRange(double min, double max) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, pulseSeconds, min, max, resistorSeries,
                capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, diode, minOhms, maxOhms, minFarads,
                maxFarads, count, draws);
    }

    public PickRequest withSeries(PreferredSeries resistors, PreferredSeries capacitors) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, pulseSeconds, dutyMin, dutyMax,
                resistors, capacitors, resistorTolerance, capacitorTolerance, potTolerance, diode, minOhms, maxOhms,
                minFarads, maxFarads, count, draws);
    }

    public PickRequest withTolerances(Tolerance resistors, Tolerance capacitors, Tolerance pots) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, pulseSeconds, dutyMin, dutyMax,
                resistorSeries, capacitorSeries, resistors, capacitors, pots, diode, minOhms, maxOhms, minFarads,
                maxFarads, count, draws);
    }

    public PickRequest withDiode(PartKind d) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, pulseSeconds, dutyMin, dutyMax,
                resistorSeries, capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, d, minOhms, maxOhms,
                minFarads, maxFarads, count, draws);
    }

    public PickRequest withResistorRange(double min, double max) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, pulseSeconds, dutyMin, dutyMax,
                resistorSeries, capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, diode, min, max,
                minFarads, maxFarads, count, draws);
    }

    public PickRequest withCapacitorRange(double min, double max) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, pulseSeconds, dutyMin, dutyMax,
                resistorSeries, capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, diode, minOhms,
                maxOhms, min, max, count, draws);
    }

    public PickRequest withCount(int c) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, pulseSeconds, dutyMin, dutyMax,
                resistorSeries, capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, diode, minOhms,
                maxOhms, minFarads, maxFarads, c, draws);
    }

    public PickRequest withDraws(int d) {
        return new PickRequest(topology, family, supplyVolts, frequencyHz, duty, pulseSeconds, dutyMin, dutyMax,
                resistorSeries, capacitorSeries, resistorTolerance, capacitorTolerance, potTolerance, diode, minOhms,
                maxOhms, minFarads, maxFarads, count, d);
    }
}
