package org.rcbench.history;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.rcbench.history.CheckContent.Estimate;
import org.rcbench.history.CheckContent.FrequencyPoint;
import org.rcbench.history.CheckContent.Measured;
import org.rcbench.history.CheckContent.PeriodHistogram;
import org.rcbench.history.CheckContent.Predicted;
import org.rcbench.history.CheckContent.QuantityCheck;
import org.rcbench.history.CheckContent.Suspect;
import org.rcbench.units.Tolerance;

/** Reads runs and their rows back. Stateless; the caller serialises use of the connection. */
final class RunReader {
    private static final String MATCH = " WHERE (? IS NULL OR r.serial = ? OR r.board = ? COLLATE NOCASE)";

    private RunReader() {
    }

    static Optional<RunRecord> run(Connection c, long id) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("SELECT r.*, d.content FROM run r JOIN design d"
                + " ON d.sha256 = r.design_sha256 WHERE r.id = ?")) {
            s.setLong(1, id);
            try (ResultSet rs = s.executeQuery()) {
                if (!rs.next()) {
                    return Optional.empty();
                }
                DesignRef design = new DesignRef(rs.getString("design_name"), rs.getString("content"),
                        rs.getString("design_sha256"));
                ProbeInfo probe = new ProbeInfo(rs.getString("probe_id"), rs.getString("firmware"),
                        rs.getDouble("clock_offset_ppm"), real(rs, "clock_u_ppm"), rs.getString("clock_source"));
                String capturePath = rs.getString("capture_path");
                CaptureRef capture = capturePath == null ? null
                        : new CaptureRef(capturePath, rs.getLong("capture_bytes"), rs.getString("capture_sha256"));
                RunContext context = new RunContext(rs.getString("board"), rs.getString("serial"), design, probe,
                        capture, rs.getString("note"), UtcText.parse(rs.getString("recorded_utc")));
                JsonNode doc = tree(rs.getString("check_json"));
                int osc = rs.getInt("oscillates");
                Boolean oscillates = rs.wasNull() ? null : osc != 0;
                String reason = rs.getString("prediction_reason");
                String verdict = rs.getString("verdict");
                PeriodHistogram histogram = histogram(rs.getString("histogram_json"));
                List<FrequencyPoint> trend = trend(rs.getString("trend_json"));
                CheckContent content = new CheckContent(verdict, measurements(c, id), predictions(c, id),
                        oscillates, reason, checks(c, id), estimates(c, id), suspects(c, id), ambiguities(c, id),
                        histogram, trend);
                return Optional.of(new RunRecord(id, context, content, doc));
            }
        }
    }

    /** The id of the run saved last, or 0 when there is none. */
    static long lastId(Connection c) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("SELECT max(id) FROM run"); ResultSet rs = s.executeQuery()) {
            rs.next();
            return rs.getLong(1); // 0 for NULL
        }
    }

    static List<RunSummary> summaries(Connection c, RunFilter f) throws SQLException {
        String sql = "SELECT * FROM (SELECT r.id, r.recorded_utc, r.board, r.serial, r.verdict, r.note,"
                + " (SELECT m.value FROM measurement m WHERE m.run_id = r.id AND m.quantity = 'frequency_hz') AS f,"
                + " (SELECT s.part FROM suspect s WHERE s.run_id = r.id AND s.rank = 1) AS top"
                + " FROM run r" + MATCH + " ORDER BY r.recorded_utc DESC, r.id DESC LIMIT ?)"
                + " ORDER BY recorded_utc, id";
        List<RunSummary> out = new ArrayList<>();
        try (PreparedStatement s = c.prepareStatement(sql)) {
            bindMatch(s, f.boardOrSerial());
            s.setInt(4, f.limit());
            try (ResultSet rs = s.executeQuery()) {
                while (rs.next()) {
                    out.add(new RunSummary(rs.getLong("id"), UtcText.parse(rs.getString("recorded_utc")),
                            rs.getString("board"), rs.getString("serial"), rs.getString("verdict"), real(rs, "f"),
                            rs.getString("top"), rs.getString("note")));
                }
            }
        }
        return out;
    }

    /**
     * One trend per (board, serial, part) among the runs {@code boardOrSerial} matches (null: all),
     * points in time order. The nominal and tolerance are the latest run's.
     */
    static List<PartTrend> trends(Connection c, String boardOrSerial) throws SQLException {
        String sql = "SELECT r.board, r.serial, e.part, e.unit, e.value, e.low, e.high, e.nominal, e.tol_minus, e.tol_plus,"
                + " r.id, r.recorded_utc FROM estimate e JOIN run r ON r.id = e.run_id" + MATCH
                + " ORDER BY r.board COLLATE NOCASE, r.serial, e.part, r.recorded_utc, r.id";
        List<PartTrend> out = new ArrayList<>();
        try (PreparedStatement s = c.prepareStatement(sql)) {
            bindMatch(s, boardOrSerial);
            try (ResultSet rs = s.executeQuery()) {
                String board = null;
                String serial = null;
                String part = null;
                String unit = null;
                double nominal = Double.NaN;
                Tolerance tolerance = null;
                List<PartTrend.Point> points = new ArrayList<>();
                while (rs.next()) {
                    String b = rs.getString(1);
                    String sn = rs.getString(2);
                    String p = rs.getString(3);
                    if (part != null && !(b.equalsIgnoreCase(board) && Objects.equals(sn, serial)
                            && p.equals(part))) {
                        out.add(new PartTrend(board, serial, part, unit, nominal, tolerance, points));
                        points = new ArrayList<>();
                    }
                    board = b;
                    serial = sn;
                    part = p;
                    unit = rs.getString(4);
                    nominal = real(rs, "nominal");
                    tolerance = tolerance(rs);
                    points.add(new PartTrend.Point(rs.getLong(11), UtcText.parse(rs.getString(12)), real(rs, "value"),
                            real(rs, "low"), real(rs, "high")));
                }
                if (part != null) {
                    out.add(new PartTrend(board, serial, part, unit, nominal, tolerance, points));
                }
            }
        }
        return out;
    }

    private static void bindMatch(PreparedStatement s, String text) throws SQLException {
        s.setString(1, text);
        s.setString(2, text);
        s.setString(3, text);
    }

    private static List<Measured> measurements(Connection c, long id) throws SQLException {
        return list(c, "SELECT * FROM measurement WHERE run_id = ? ORDER BY seq", id,
                rs -> new Measured(rs.getString("quantity"), real(rs, "value"), real(rs, "uncertainty"),
                        real(rs, "coverage"), rs.getString("unit")));
    }

    private static List<Predicted> predictions(Connection c, long id) throws SQLException {
        return list(c, "SELECT * FROM prediction WHERE run_id = ? ORDER BY seq", id,
                rs -> new Predicted(rs.getString("quantity"), real(rs, "nominal"), real(rs, "worst_low"),
                        real(rs, "worst_high"), real(rs, "stat_low"), real(rs, "stat_high")));
    }

    private static List<QuantityCheck> checks(Connection c, long id) throws SQLException {
        return list(c, "SELECT * FROM quantity_check WHERE run_id = ? ORDER BY seq", id,
                rs -> new QuantityCheck(rs.getString("quantity"), real(rs, "measured"), real(rs, "band_low"),
                        real(rs, "band_high"), rs.getString("status")));
    }

    private static List<Estimate> estimates(Connection c, long id) throws SQLException {
        return list(c, "SELECT * FROM estimate WHERE run_id = ? ORDER BY seq", id,
                rs -> new Estimate(rs.getString("part"), real(rs, "value"), rs.getString("unit"),
                        real(rs, "nominal"), real(rs, "low"), real(rs, "high"), tolerance(rs)));
    }

    private static List<Suspect> suspects(Connection c, long id) throws SQLException {
        return list(c, "SELECT * FROM suspect WHERE run_id = ? ORDER BY rank", id,
                rs -> new Suspect(rs.getInt("rank"), rs.getString("part"), real(rs, "value"), real(rs, "nominal"),
                        real(rs, "deviation"), real(rs, "probability")));
    }

    private static List<String> ambiguities(Connection c, long id) throws SQLException {
        return list(c, "SELECT text FROM ambiguity WHERE run_id = ? ORDER BY seq", id, rs -> rs.getString(1));
    }

    /** Maps one result row. */
    interface Row<T> {
        T map(ResultSet rs) throws SQLException;
    }

    /** Every row of {@code sql} with its one parameter bound to {@code id}. */
    static <T> List<T> list(Connection c, String sql, long id, Row<T> row) throws SQLException {
        List<T> out = new ArrayList<>();
        try (PreparedStatement s = c.prepareStatement(sql)) {
            s.setLong(1, id);
            try (ResultSet rs = s.executeQuery()) {
                while (rs.next()) {
                    out.add(row.map(rs));
                }
            }
        }
        return out;
    }

    static PeriodHistogram histogram(String json) {
        if (json == null) {
            return null;
        }
        JsonNode o = tree(json);
        double[] e = new double[o.path("edges_s").size()];
        for (int i = 0; i < e.length; i++) {
            e[i] = o.path("edges_s").get(i).doubleValue();
        }
        long[] n = new long[o.path("counts").size()];
        for (int i = 0; i < n.length; i++) {
            n[i] = o.path("counts").get(i).longValue();
        }
        return new PeriodHistogram(e, n, o.path("below").asLong(0), o.path("above").asLong(0));
    }

    static List<FrequencyPoint> trend(String json) {
        List<FrequencyPoint> out = new ArrayList<>();
        if (json != null) {
            for (JsonNode p : tree(json)) {
                out.add(new FrequencyPoint(p.path("t_s").doubleValue(), p.path("frequency_hz").doubleValue()));
            }
        }
        return out;
    }

    static JsonNode tree(String json) {
        try {
            return RunWriter.MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("stored JSON does not parse: " + e.getOriginalMessage(), e);
        }
    }

    /** The estimate row's tolerance, null when not stored. */
    static Tolerance tolerance(ResultSet rs) throws SQLException {
        double minus = real(rs, "tol_minus");
        double plus = real(rs, "tol_plus");
        return Double.isNaN(minus) || Double.isNaN(plus) ? null : new Tolerance(minus, plus);
    }

    /** A nullable REAL column as a double, NaN for NULL. */
    static double real(ResultSet rs, String column) throws SQLException {
        double v = rs.getDouble(column);
        return rs.wasNull() ? Double.NaN : v;
    }
}
