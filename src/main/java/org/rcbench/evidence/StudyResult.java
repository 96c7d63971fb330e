package org.rcbench.evidence;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** The outcomes of one population, with its rates. Immutable. */
public record StudyResult(Population population, List<Outcome> outcomes) {
    public StudyResult {
        outcomes = List.copyOf(outcomes);
    }

    /** One row of the table: counts over a subset of the boards. */
    public record Row(String label, int boards, int correct, int ambiguous, int confidentlyWrong, int noFaultLeads) {
        public double correctRate() {
            return boards == 0 ? Double.NaN : (double) correct / boards;
        }

        public double ambiguousRate() {
            return boards == 0 ? Double.NaN : (double) ambiguous / boards;
        }

        public double confidentlyWrongRate() {
            return boards == 0 ? Double.NaN : (double) confidentlyWrong / boards;
        }

        public double noFaultRate() {
            return boards == 0 ? Double.NaN : (double) noFaultLeads / boards;
        }
    }

    /** All boards. */
    public Row total() {
        return row(population.name(), outcomes);
    }

    /** One row per faulty part, in the population's order. */
    public List<Row> byPart() {
        Map<String, List<Outcome>> m = new LinkedHashMap<>();
        for (String p : population.faultable()) {
            m.put(p, new ArrayList<>());
        }
        for (Outcome o : outcomes) {
            m.get(o.faulty()).add(o);
        }
        List<Row> rows = new ArrayList<>();
        for (Map.Entry<String, List<Outcome>> e : m.entrySet()) {
            rows.add(row("  " + e.getKey() + " faulty", e.getValue()));
        }
        return rows;
    }

    private static Row row(String label, List<Outcome> os) {
        int c = 0;
        int a = 0;
        int w = 0;
        int n = 0;
        for (Outcome o : os) {
            c += o.correct() ? 1 : 0;
            a += o.ambiguous() ? 1 : 0;
            w += o.confidentlyWrong() ? 1 : 0;
            n += o.noFaultLeads() ? 1 : 0;
        }
        return new Row(label, os.size(), c, a, w, n);
    }
}
