package org.rcbench.circuit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;

/**
 * Warnings for designs that leave a timer family's practical range. Each limit is common practice
 * unless a source is named; none of them stops the prediction.
 */
public final class PracticalRange {
    /** Charge resistors below this load the discharge transistor heavily (common practice, no source). */
    public static final double MIN_CHARGE_OHMS = 1e3;
    /** Above this, board leakage and stray capacitance dominate even for CMOS parts (common practice, no source). */
    public static final double MAX_TIMING_OHMS = 20e6;

    private PracticalRange() {
    }

    /** The warnings for {@code spec} given its nominal evaluation {@code nominal}. */
    public static List<String> check(CircuitSpec spec, Timing nominal) {
        List<String> w = new ArrayList<>();
        FamilyParameters f = spec.familyParameters();
        double vs = spec.supplyVolts();
        if (vs < f.minSupplyVolts() || vs > f.maxSupplyVolts()) {
            w.add(String.format(Locale.ROOT, "supply %s is outside the %s family's range %s to %s",
                    volts(vs), spec.family().fileName(), volts(f.minSupplyVolts()), volts(f.maxSupplyVolts())));
        }
        Topology t = spec.topology();
        for (Element e : spec.elements()) {
            if (e.role() == Role.TIMING && e.kind().isClass2Ceramic()) {
                w.add(e.designator() + " is a class-2 ceramic (" + e.kind().fileName().toUpperCase(Locale.ROOT)
                        + ") used as a timing capacitor: its capacitance moves with temperature ("
                        + e.kind().temperatureBand() + " over its EIA-198 range), DC bias and age; use film or C0G");
            }
            if (e.role() == Role.TIMING && e.kind() == PartKind.ALUMINIUM_ELECTROLYTIC) {
                w.add(e.designator() + " is an aluminium electrolytic timing capacitor: wide tolerance, leakage and"
                        + " loss of capacitance with age make timing drift (common practice)");
            }
        }
        // The charge resistor is what limits the discharge transistor's current (and, output-fed, the
        // output's load): common practice keeps it at about 1 kΩ or more.
        Role limiting = t == Topology.OUTPUT_FED ? Role.FEEDBACK : Role.CHARGE;
        double rCharge = 0;
        for (Element e : spec.withRole(limiting)) {
            rCharge += e.type() == ElementType.POTENTIOMETER ? e.wiper() * e.value() : e.value();
        }
        if (t != Topology.BISTABLE && rCharge > 0 && rCharge < MIN_CHARGE_OHMS) {
            w.add(String.format(Locale.ROOT, "%s resistance %s is under about 1 kΩ: %s (common practice: 1 kΩ or more)",
                    limiting.fileName(), ohms(rCharge), t == Topology.OUTPUT_FED ? "it loads the output heavily"
                            : "the discharge transistor sinks " + amps(vs / rCharge) + " from the supply"));
        }
        double total = 0;
        for (Element e : spec.elements()) {
            Role r = e.role();
            if (r == Role.CHARGE || r == Role.SHARED || r == Role.FEEDBACK || r == Role.SPLIT_POT) {
                total += e.type() == ElementType.POTENTIOMETER && r != Role.SPLIT_POT ? e.wiper() * e.value() : e.value();
            }
        }
        double limit = Math.min(MAX_TIMING_OHMS, f.maxInputCurrentAmps() > 0 ? vs / (3 * f.maxInputCurrentAmps()) : MAX_TIMING_OHMS);
        if (total > limit) {
            w.add(String.format(Locale.ROOT, "timing resistance %s exceeds about %s (Vs / (3 × %s maximum threshold current),"
                    + " common practice): the threshold current may stop the timer", ohms(total), ohms(limit),
                    amps(f.maxInputCurrentAmps())));
        }
        if (nominal.runs() && t.isFreeRunning() && nominal.frequencyHz() > f.practicalMaxHz()) {
            w.add(String.format(Locale.ROOT, "%s timing is above about %s, where %s timers lose accuracy"
                    + " (common practice, no source)", ValueCode.formatSi(nominal.frequencyHz(), Unit.HERTZ, 4),
                    ValueCode.formatSi(f.practicalMaxHz(), Unit.HERTZ, 3), spec.family().fileName()));
        }
        if (nominal.runs() && t == Topology.MONOSTABLE && nominal.pulseWidthSeconds() < 1 / f.practicalMaxHz()) {
            w.add(String.format(Locale.ROOT, "a %s pulse is shorter than about %s, where %s timers lose accuracy"
                    + " (common practice, no source)", ValueCode.formatSi(nominal.pulseWidthSeconds(), Unit.SECOND, 4),
                    ValueCode.formatSi(1 / f.practicalMaxHz(), Unit.SECOND, 3), spec.family().fileName()));
        }
        if (t == Topology.MONOSTABLE && nominal.runs() && spec.trigger().widthSeconds() > 0) {
            double tripped = nominal.pulseWidthSeconds() - f.delaySeconds();
            if (spec.trigger().widthSeconds() >= tripped) {
                w.add("the trigger is held low for as long as the pulse or longer: the output stays high until the"
                        + " trigger is released, so the pulse width follows the trigger, not R and C");
            }
        }
        if (t == Topology.PWM_POT) {
            for (Element e : spec.withRole(Role.SPLIT_POT)) {
                if (e.wiper() == 0 || e.wiper() == 1) {
                    w.add(e.designator() + " wiper is at the end of its track: "
                            + (e.wiper() == 1 ? "no resistance is left in the discharge path" : "the charge path is R1 alone"));
                }
            }
        }
        return w;
    }

    private static String volts(double v) {
        return ValueCode.formatSi(v, Unit.VOLT, 3);
    }

    private static String ohms(double v) {
        return ValueCode.formatSi(v, Unit.OHM, 3);
    }

    private static String amps(double v) {
        return ValueCode.formatSi(v, Unit.AMPERE, 3);
    }
}
