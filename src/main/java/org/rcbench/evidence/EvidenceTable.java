package org.rcbench.evidence;

import java.util.List;
import java.util.Locale;

/** The readable table of population results: one block per population, one row per faulty part. Stateless. */
public final class EvidenceTable {
    private EvidenceTable() {
    }

    /** The header and rule. */
    public static String header() {
        return String.format(Locale.ROOT, "%-54s %6s %9s %10s %10s %9s  %s%n", "population (fault 3-6× tolerance unless"
                + " stated)", "boards", "correct", "ambiguous", "conf.wrong", "no fault", "goal") + "-".repeat(112) + "\n";
    }

    /** The rows of one result; {@code goal} is printed with whether it is met. */
    public static String rows(StudyResult r, StandardPopulations.Goal goal) {
        StringBuilder sb = new StringBuilder();
        StudyResult.Row total = r.total();
        String label = total.label();
        Population p = r.population();
        if (p.minMultiple() != 3 || p.maxMultiple() != 6) {
            label += String.format(Locale.ROOT, " [%.3g-%.3g×]", p.minMultiple(), p.maxMultiple());
        }
        sb.append(row(label, total)).append(goal == null ? "" : "  " + goal(goal, total)).append('\n');
        for (StudyResult.Row row : r.byPart()) {
            sb.append(row(row.label(), row)).append('\n');
        }
        return sb.toString();
    }

    /** Whether {@code row} meets {@code goal}. */
    public static boolean met(StandardPopulations.Goal goal, StudyResult.Row row) {
        boolean noWrong = row.confidentlyWrong() == 0;
        return goal == StandardPopulations.Goal.CORRECT_95 ? noWrong && row.correctRate() >= 0.95 : noWrong;
    }

    private static String goal(StandardPopulations.Goal goal, StudyResult.Row row) {
        String what = goal == StandardPopulations.Goal.CORRECT_95 ? ">= 95 % correct, none confidently wrong"
                : "none confidently wrong";
        return what + (met(goal, row) ? ": met" : ": NOT MET");
    }

    private static String row(String label, StudyResult.Row w) {
        return String.format(Locale.ROOT, "%-54s %6d %8.1f%% %9.1f%% %9.1f%% %8.1f%%", label, w.boards(),
                100 * w.correctRate(), 100 * w.ambiguousRate(), 100 * w.confidentlyWrongRate(), 100 * w.noFaultRate());
    }

    /** Definitions printed under the table. */
    public static List<String> notes() {
        return List.of(
                "correct: the top suspect (the fault with the largest probability) is the part that was moved.",
                "ambiguous: the diagnosis says the measurement cannot decide (another explanation fits as well).",
                "conf.wrong: a wrong top suspect stated without doubt (not ambiguous, probability >= 0.5).",
                "no fault: 'every part inside its band' was the most probable explanation.",
                "Each board: every toleranced part uniform in its band, one moved out by the stated multiple, probe"
                        + " clock 16 MHz off by up to ±40 ppm (measured as ±50 ppm), 0.01 % period jitter, 600 cycles.");
    }
}
