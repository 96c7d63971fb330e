package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.diagnose.Words;
import org.rcbench.json.PredictionJson;
import org.rcbench.tolerance.Band;
import org.rcbench.tolerance.Prediction;
import org.rcbench.tolerance.Predictor;
import org.rcbench.units.Unit;
import org.rcbench.units.ValueCode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code rcbench predict DESIGN}: what the design should do, with worst-case and statistical bands. */
@Command(name = "predict", mixinStandardHelpOptions = true,
        description = {"Predict a design's timing: nominal, worst case over the tolerances, and the 95 %% band from a"
            + " Monte Carlo run (JCGM 101), with warnings where the design leaves practical limits."})
public final class PredictCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DESIGN", description = "Design file (TOML).")
    Path design;

    @Option(names = "--json", description = "Print the prediction as JSON.")
    boolean json;

    @Option(names = "--draws", paramLabel = "N", defaultValue = "100000",
            description = "Monte Carlo draws (default: ${DEFAULT-VALUE}).")
    int draws;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Monte Carlo seed (default: ${DEFAULT-VALUE}).")
    long seed;

    @Override
    public Integer call() {
        if (draws < 1) {
            throw new org.rcbench.common.BadInputException("--draws", "must be 1 or more, not " + draws);
        }
        Design d = DesignReader.read(design);
        Prediction p = new Predictor(draws, seed).predict(d);
        PrintWriter out = spec.commandLine().getOut();
        if (json) {
            out.println(PredictionJson.write(p));
        } else {
            out.print(text(p));
        }
        out.flush();
        return ExitCodes.OK;
    }

    /** The readable report. */
    static String text(Prediction p) {
        StringBuilder sb = new StringBuilder();
        Design d = p.design();
        sb.append(d.title()).append("  (").append(d.source()).append(")\n");
        sb.append(String.format(Locale.ROOT, "%s, %s timer, %s supply; thresholds %s and %s%n",
                d.circuit().topology().fileName(), d.circuit().family().fileName(),
                ValueCode.formatSi(d.circuit().supplyVolts(), Unit.VOLT, 4), volts(p.lowerVolts()), volts(p.upperVolts())));
        if (!p.runs()) {
            sb.append("DOES NOT RUN: ").append(p.reason()).append('\n');
        } else if (!p.oscillates()) {
            sb.append("runs: ").append(p.reason()).append('\n');
        } else {
            sb.append("runs: oscillates\n");
        }
        if (!p.quantities().isEmpty() && p.runs()) {
            sb.append('\n');
            sb.append(String.format(Locale.ROOT, "%-12s %-12s %-27s %-27s %s%n", "", "nominal", "worst case",
                    "95 % (Monte Carlo)", "u (GUM)"));
            for (TimingQuantity q : p.quantities()) {
                if (q == TimingQuantity.HIGH && p.quantities().contains(TimingQuantity.PULSE_WIDTH)) {
                    continue;
                }
                double nom = p.nominal(q);
                Double u = p.standardUncertainty().get(q);
                sb.append(String.format(Locale.ROOT, "%-12s %-12s %-27s %-27s %s%n", label(q), Words.value(q, nom),
                        Words.band(q, p.worstCase(q)), Words.band(q, p.statistical(q)),
                        u == null || Double.isNaN(u) ? "—" : relative(u, nom, q)));
            }
            sb.append(String.format(Locale.ROOT, "%nMonte Carlo: %d draws, seed %d, %d stopped%n", p.monteCarlo().draws(),
                    p.monteCarlo().seed(), p.monteCarlo().stopped()));
        }
        if (!p.warnings().isEmpty()) {
            sb.append("\nwarnings:\n");
            for (String w : p.warnings()) {
                sb.append("  - ").append(w).append('\n');
            }
        }
        return sb.toString();
    }

    private static String label(TimingQuantity q) {
        switch (q) {
            case FREQUENCY: return "frequency";
            case PERIOD: return "period";
            case HIGH: return "high";
            case LOW: return "low";
            case DUTY: return "duty";
            case FIRST_HIGH: return "first high";
            case PULSE_WIDTH: return "pulse width";
            default: return q.jsonKey();
        }
    }

    private static String relative(double u, double nominal, TimingQuantity q) {
        if (q == TimingQuantity.DUTY) {
            return String.format(Locale.ROOT, "%.2f %% pts", u * 100);
        }
        return String.format(Locale.ROOT, "%.2f %%", 100 * u / Math.abs(nominal));
    }

    private static String volts(double v) {
        return Double.isFinite(v) ? String.format(Locale.ROOT, "%.3f V", v) : "—";
    }
}
