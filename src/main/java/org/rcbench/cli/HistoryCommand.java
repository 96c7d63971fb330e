package org.rcbench.cli;

import static org.rcbench.json.JsonNumbers.number;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.rcbench.common.BadInputException;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.PartTrend;
import org.rcbench.history.Projection;
import org.rcbench.history.RunFilter;
import org.rcbench.history.RunSummary;
import org.rcbench.history.TrendAnalysis;
import org.rcbench.report.TrendText;
import org.rcbench.units.SiFormat;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code rcbench history [BOARD|SN]}: the stored runs and the trend of each estimated part.
 *
 * <p>{@code --json} keys: {@code database}, {@code filter}, {@code runs} [{@code id},
 * {@code recorded_utc}, {@code board}, {@code serial}, {@code verdict}, {@code frequency_hz},
 * {@code top_suspect}, {@code note}], {@code trends} [{@code board}, {@code serial}, {@code part},
 * {@code unit}, {@code nominal}, {@code tolerance_minus}, {@code tolerance_plus}, {@code runs},
 * {@code span_years}, {@code slope_per_year}, {@code slope_se_per_year}, {@code slope_p_value},
 * {@code relative_slope_per_year}, {@code points} [{@code run}, {@code recorded_utc}, {@code value},
 * {@code low}, {@code high}], {@code projection} {{@code kind} (leaves_band, not_within_horizon,
 * already_outside, not_significant, too_few_runs, no_tolerance), {@code edge}, {@code crossing_utc},
 * {@code earliest_utc}, {@code latest_utc}, {@code years_from_last_run}, {@code horizon_years},
 * {@code text}}]; numbers not known are null.
 */
@Command(name = "history", mixinStandardHelpOptions = true,
        description = {"List stored checks and the trend of each estimated part.",
            "For each unit and part: the least-squares drift per year with its standard error, and when the fitted"
                + " line leaves the part's tolerance band (with a 95 %% range), or why that is not said."})
public final class HistoryCommand implements Callable<Integer> {
    private static final DateTimeFormatter MINUTE =
            DateTimeFormatter.ofPattern("uuuu-MM-dd HH:mm", Locale.ROOT).withZone(ZoneOffset.UTC);
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "BOARD|SN",
            description = "Only runs of this board name (any case) or this serial number.")
    String boardOrSerial;

    @Option(names = "--json", description = "Print one JSON object instead of text.")
    boolean json;

    @Option(names = "--limit", paramLabel = "N", defaultValue = "100",
            description = "List at most the newest N runs (default: ${DEFAULT-VALUE}); trends use every run.")
    int limit;

    @Option(names = "--horizon", paramLabel = "YEARS", defaultValue = "10",
            description = "How far ahead to project a part leaving its band (default: ${DEFAULT-VALUE} years).")
    double horizonYears;

    @Mixin
    DatabaseOption database;

    @Override
    public Integer call() throws Exception {
        if (limit < 1) {
            throw new BadInputException("--limit", "must be at least 1, not " + limit);
        }
        if (!(horizonYears > 0) || horizonYears > 1000) {
            throw new BadInputException("--horizon", "must be more than 0 and at most 1000 years, not " + horizonYears);
        }
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!database.exists()) {
            if (json) {
                out.println(MAPPER.writeValueAsString(document(List.of(), List.of())));
            } else {
                out.println("No history at " + database.path() + " yet: rcbench check ... --save creates it.");
            }
            return ExitCodes.OK;
        }
        List<RunSummary> runs;
        List<TrendAnalysis> trends = new ArrayList<>();
        try (HistoryStore store = database.open(err)) {
            runs = store.runs(RunFilter.of(boardOrSerial).withLimit(limit));
            for (PartTrend t : store.partTrends(boardOrSerial)) {
                trends.add(t.analyse(horizonYears));
            }
        }
        if (json) {
            out.println(MAPPER.writeValueAsString(document(runs, trends)));
        } else {
            text(out, runs, trends);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private void text(PrintWriter out, List<RunSummary> runs, List<TrendAnalysis> trends) {
        String which = boardOrSerial == null ? "" : " of \"" + boardOrSerial + "\"";
        if (runs.isEmpty()) {
            out.println("No runs" + which + " stored in " + database.path() + ".");
            return;
        }
        out.println(runs.size() + (runs.size() == 1 ? " run" : " runs") + which + " in " + database.path()
                + (runs.size() == limit ? " (the newest " + limit + ")" : "") + ":");
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"run", "checked (UTC)", "board", "serial", "verdict", "frequency", "top suspect", "note"});
        for (RunSummary r : runs) {
            rows.add(new String[] {Long.toString(r.id()), MINUTE.format(r.recordedAt()), r.board(),
                dash(r.serial()), r.verdict(), Double.isFinite(r.frequencyHz()) ? SiFormat.format(r.frequencyHz(), "Hz", 5) : "—",
                dash(r.topSuspect()), r.note() == null ? "" : r.note().replace('\n', ' ')});
        }
        Table.print(out, rows, new boolean[] {true, false, false, false, false, true, false, false});
        if (trends.isEmpty()) {
            return;
        }
        out.println();
        out.println(String.format(Locale.ROOT, "Part trends (least-squares line through each unit's estimates;"
                + " projections look %s years ahead):", trim(horizonYears)));
        String unit = null;
        for (TrendAnalysis a : trends) {
            String u = a.trend().board() + " " + (a.trend().serial() == null ? "(no serial)" : a.trend().serial());
            if (!u.equals(unit)) {
                unit = u;
                out.println("  " + u);
            }
            out.println("    " + TrendText.describe(a));
        }
    }

    private ObjectNode document(List<RunSummary> runs, List<TrendAnalysis> trends) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("database", database.path().toAbsolutePath().toString());
        if (boardOrSerial == null) {
            o.putNull("filter");
        } else {
            o.put("filter", boardOrSerial);
        }
        ArrayNode rs = o.putArray("runs");
        for (RunSummary r : runs) {
            ObjectNode x = rs.addObject();
            x.put("id", r.id());
            x.put("recorded_utc", r.recordedAt().toString());
            x.put("board", r.board());
            x.put("serial", r.serial());
            x.put("verdict", r.verdict());
            number(x, "frequency_hz", r.frequencyHz());
            x.put("top_suspect", r.topSuspect());
            x.put("note", r.note());
        }
        ArrayNode ts = o.putArray("trends");
        for (TrendAnalysis a : trends) {
            PartTrend t = a.trend();
            ObjectNode x = ts.addObject();
            x.put("board", t.board());
            x.put("serial", t.serial());
            x.put("part", t.part());
            x.put("unit", t.unit());
            number(x, "nominal", t.nominal());
            number(x, "tolerance_minus", t.tolerance() == null ? Double.NaN : t.tolerance().minusFraction());
            number(x, "tolerance_plus", t.tolerance() == null ? Double.NaN : t.tolerance().plusFraction());
            x.put("runs", a.runs());
            number(x, "span_years", a.spanYears());
            number(x, "slope_per_year", a.slopePerYear());
            number(x, "slope_se_per_year", a.slopeStdErrPerYear());
            number(x, "slope_p_value", a.slopePValue());
            number(x, "relative_slope_per_year", a.relativeSlopePerYear());
            ArrayNode pts = x.putArray("points");
            for (PartTrend.Point p : t.points()) {
                ObjectNode q = pts.addObject();
                q.put("run", p.runId());
                q.put("recorded_utc", p.recordedAt().toString());
                number(q, "value", p.value());
                number(q, "low", p.low());
                number(q, "high", p.high());
            }
            Projection p = a.projection();
            ObjectNode j = x.putObject("projection");
            j.put("kind", p.kind().name().toLowerCase(Locale.ROOT));
            number(j, "edge", p.edge());
            j.put("crossing_utc", p.crossing() == null ? null : p.crossing().toString());
            j.put("earliest_utc", p.earliest() == null ? null : p.earliest().toString());
            j.put("latest_utc", p.latest() == null ? null : p.latest().toString());
            number(j, "years_from_last_run", p.yearsFromLastRun());
            j.put("horizon_years", p.horizonYears());
            j.put("text", TrendText.describe(a));
        }
        return o;
    }

    private static String dash(String s) {
        return s == null ? "—" : s;
    }

    private static String trim(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }
}
