package org.rcbench.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.TimerFamily;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.circuit.Topology;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.DesignText;
import org.rcbench.diagnose.Words;
import org.rcbench.picker.Candidate;
import org.rcbench.picker.PartPicker;
import org.rcbench.picker.PickRequest;
import org.rcbench.tolerance.Prediction;
import org.rcbench.units.PreferredSeries;
import org.rcbench.units.Tolerance;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code rcbench design}: propose part sets from preferred series for a target timing. */
@Command(name = "design", mixinStandardHelpOptions = true,
        description = {"Propose timing parts from preferred-value series for a target frequency and duty, pulse"
            + " width, or PWM duty range; ranked by predicted error and spread, each with its bands."})
public final class DesignCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Option(names = "--topology", required = true, paramLabel = "NAME",
            description = "monostable, astable, astable-one-diode, astable-two-diode, astable-output-fed or pwm-pot.")
    String topology;

    @Option(names = "--family", defaultValue = "bipolar", paramLabel = "NAME", description = "bipolar or cmos (default: ${DEFAULT-VALUE}).")
    String family;

    @Option(names = "--supply", required = true, paramLabel = "VOLTS", converter = ValueConverters.Voltage.class,
            description = "Supply voltage, e.g. 9 or 9V.")
    double supply;

    @Option(names = "--frequency", paramLabel = "HZ", converter = ValueConverters.Frequency.class,
            description = "Target frequency, e.g. 1k or 1.2 kHz (astables, PWM).")
    Double frequency;

    @Option(names = "--duty", paramLabel = "FRACTION", converter = ValueConverters.Fraction.class,
            description = "Target duty cycle, e.g. 0.6 or 60%% (astables).")
    Double duty;

    @Option(names = "--pulse", paramLabel = "SECONDS", converter = ValueConverters.Time.class,
            description = "Target pulse width, e.g. 5 or 150m (monostable).")
    Double pulse;

    @Option(names = "--duty-min", paramLabel = "FRACTION", converter = ValueConverters.Fraction.class,
            defaultValue = "0.05", description = "PWM duty with the wiper at the discharge end (default: ${DEFAULT-VALUE}).")
    double dutyMin;

    @Option(names = "--duty-max", paramLabel = "FRACTION", converter = ValueConverters.Fraction.class,
            defaultValue = "0.95", description = "PWM duty with the wiper at the charge end (default: ${DEFAULT-VALUE}).")
    double dutyMax;

    @Option(names = "--series", paramLabel = "E24", converter = ValueConverters.Series.class, defaultValue = "E24",
            description = "Series for resistors (default: ${DEFAULT-VALUE}).")
    PreferredSeries series;

    @Option(names = "--cap-series", paramLabel = "E6", converter = ValueConverters.Series.class, defaultValue = "E6",
            description = "Series for the timing capacitor (default: ${DEFAULT-VALUE}).")
    PreferredSeries capSeries;

    @Option(names = "--tolerance", paramLabel = "PERCENT", converter = ValueConverters.ToleranceBand.class,
            description = "Resistor tolerance (default: the series' usual one, e.g. 5%% for E24).")
    Tolerance tolerance;

    @Option(names = "--cap-tolerance", paramLabel = "PERCENT", converter = ValueConverters.ToleranceBand.class,
            defaultValue = "10%", description = "Capacitor tolerance (default: ${DEFAULT-VALUE}).")
    Tolerance capTolerance;

    @Option(names = "--pot-tolerance", paramLabel = "PERCENT", converter = ValueConverters.ToleranceBand.class,
            defaultValue = "20%", description = "Potentiometer tolerance (default: ${DEFAULT-VALUE}).")
    Tolerance potTolerance;

    @Option(names = "--diode", paramLabel = "KIND", defaultValue = "silicon",
            description = "silicon or schottky (default: ${DEFAULT-VALUE}).")
    String diode;

    @Option(names = "--min-resistance", paramLabel = "OHMS", converter = ValueConverters.Resistance.class,
            defaultValue = "1k", description = "Smallest timing resistor (default: ${DEFAULT-VALUE}; common practice).")
    double minOhms;

    @Option(names = "--max-resistance", paramLabel = "OHMS", converter = ValueConverters.Resistance.class,
            description = "Largest timing resistor (default: from the family's threshold current).")
    Double maxOhms;

    @Option(names = "--min-cap", paramLabel = "FARADS", converter = ValueConverters.Capacitance.class,
            defaultValue = "100p", description = "Smallest timing capacitor (default: ${DEFAULT-VALUE}).")
    double minFarads;

    @Option(names = "--max-cap", paramLabel = "FARADS", converter = ValueConverters.Capacitance.class,
            defaultValue = "100u", description = "Largest timing capacitor (default: ${DEFAULT-VALUE}).")
    double maxFarads;

    @Option(names = "--count", paramLabel = "N", defaultValue = "5", description = "Candidates to list (default: ${DEFAULT-VALUE}).")
    int count;

    @Option(names = "--save", paramLabel = "FILE", description = "Write the best candidate as a design file.")
    Path save;

    @Override
    public Integer call() throws IOException {
        Topology top = Topology.fromFileName(topology);
        if (top == null) {
            throw new BadInputException("--topology", "unknown topology \"" + topology + "\" (one of "
                    + Topology.spellings() + ")");
        }
        TimerFamily fam = TimerFamily.fromFileName(family);
        if (fam == null) {
            throw new BadInputException("--family", "unknown timer family \"" + family + "\" (bipolar or cmos)");
        }
        PartKind d = PartKind.fromFileName(diode);
        if (d != PartKind.SILICON && d != PartKind.SCHOTTKY) {
            throw new BadInputException("--diode", "\"" + diode + "\" is not a diode kind (silicon or schottky)");
        }
        if (count < 1) {
            throw new BadInputException("--count", "must be 1 or more");
        }
        Tolerance rTol = tolerance != null ? tolerance
                : Tolerance.symmetric(Double.isNaN(series.usualTolerance()) ? 0.2 : series.usualTolerance());
        PickRequest req = PickRequest.of(top, fam, supply)
                .withSeries(series, capSeries).withTolerances(rTol, capTolerance, potTolerance).withDiode(d)
                .withResistorRange(minOhms, maxOhms == null ? Double.NaN : maxOhms)
                .withCapacitorRange(minFarads, maxFarads).withDutyRange(dutyMin, dutyMax).withCount(count);
        if (frequency != null) {
            req = req.withFrequencyHz(frequency);
        }
        if (duty != null) {
            req = req.withDuty(duty);
        }
        if (pulse != null) {
            req = req.withPulseSeconds(pulse);
        }
        PartPicker.Result result = PartPicker.pick(req);
        PrintWriter out = spec.commandLine().getOut();
        out.print(text(req, rTol, result));
        if (save != null && !result.candidates().isEmpty()) {
            Design best = result.candidates().get(0).design();
            Files.writeString(save, DesignText.toToml(best), StandardCharsets.UTF_8);
            out.println("wrote the first candidate to " + save);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static String text(PickRequest r, Tolerance rTol, PartPicker.Result result) {
        StringBuilder sb = new StringBuilder();
        sb.append(String.format(Locale.ROOT, "%s, %s timer, %s V: %s%n", r.topology().fileName(), r.family().fileName(),
                trim(r.supplyVolts()), goal(r)));
        sb.append(String.format(Locale.ROOT, "resistors %s %s, capacitor %s %s%n%n", r.resistorSeries(), rTol,
                r.capacitorSeries(), r.capacitorTolerance()));
        TimingQuantity main = r.topology() == Topology.MONOSTABLE ? TimingQuantity.PULSE_WIDTH : TimingQuantity.FREQUENCY;
        int rank = 1;
        for (Candidate c : result.candidates()) {
            Prediction p = c.prediction();
            sb.append(String.format(Locale.ROOT, "%d. %s%n", rank++, c.parts()));
            StringBuilder errs = new StringBuilder();
            for (Map.Entry<String, Double> e : c.errors().entrySet()) {
                errs.append(errs.length() == 0 ? "" : ", ").append(e.getKey()).append(' ')
                        .append(String.format(Locale.ROOT, "%+.2f %%", e.getValue() * 100));
            }
            sb.append(String.format(Locale.ROOT, "   %s %s", label(main), Words.value(main, p.nominal(main))));
            if (p.quantities().contains(TimingQuantity.DUTY) && r.topology() != Topology.MONOSTABLE) {
                sb.append(", duty ").append(Words.value(TimingQuantity.DUTY, p.nominal(TimingQuantity.DUTY)));
            }
            sb.append(String.format(Locale.ROOT, "; error %s; spread %.2f %% (1 σ)%n", errs, c.spread() * 100));
            sb.append(String.format(Locale.ROOT, "   worst case %s; 95 %% %s%n",
                    Words.band(main, p.worstCase(main)), Words.band(main, p.statistical(main))));
            for (String w : p.warnings()) {
                sb.append("   note: ").append(w).append('\n');
            }
        }
        for (String n : result.notes()) {
            sb.append("note: ").append(n).append('\n');
        }
        return sb.toString();
    }

    private static String label(TimingQuantity q) {
        return q == TimingQuantity.PULSE_WIDTH ? "pulse width" : "frequency";
    }

    private static String goal(PickRequest r) {
        switch (r.topology()) {
            case MONOSTABLE:
                return "pulse " + Words.value(TimingQuantity.PULSE_WIDTH, r.pulseSeconds());
            case PWM_POT:
                return String.format(Locale.ROOT, "%s, duty %.0f %% to %.0f %%",
                        Words.value(TimingQuantity.FREQUENCY, r.frequencyHz()), r.dutyMin() * 100, r.dutyMax() * 100);
            case OUTPUT_FED:
                return Words.value(TimingQuantity.FREQUENCY, r.frequencyHz());
            default:
                return Words.value(TimingQuantity.FREQUENCY, r.frequencyHz())
                        + (Double.isNaN(r.duty()) ? "" : String.format(Locale.ROOT, " at %.1f %% duty", r.duty() * 100));
        }
    }

    private static String trim(double v) {
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
