package org.rcbench.history;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.util.List;
import org.rcbench.history.CheckContent.Estimate;
import org.rcbench.history.CheckContent.FrequencyPoint;
import org.rcbench.history.CheckContent.Measured;
import org.rcbench.history.CheckContent.PeriodHistogram;
import org.rcbench.history.CheckContent.Predicted;
import org.rcbench.history.CheckContent.QuantityCheck;
import org.rcbench.history.CheckContent.Suspect;

/** Inserts one run and its rows; the caller holds the write transaction. Stateless. */
final class RunWriter {
    static final ObjectMapper MAPPER = new ObjectMapper();

    private RunWriter() {
    }

    /** Inserts {@code r} (its id is ignored) and returns the new run's id. */
    static long insert(Connection c, RunRecord r) throws SQLException {
        RunContext x = r.context();
        CheckContent k = r.content();
        try (PreparedStatement d = c.prepareStatement("INSERT OR IGNORE INTO design (sha256, content) VALUES (?, ?)")) {
            d.setString(1, x.design().sha256());
            d.setString(2, x.design().text());
            d.executeUpdate();
        }
        long id;
        try (PreparedStatement s = c.prepareStatement("INSERT INTO run (recorded_utc, board, serial, design_name,"
                + " design_sha256, probe_id, firmware, clock_offset_ppm, clock_u_ppm, clock_source, capture_path,"
                + " capture_bytes, capture_sha256, verdict, oscillates, prediction_reason, check_json, note,"
                + " histogram_json, trend_json) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)"
                + " RETURNING id")) {
            int i = 1;
            s.setString(i++, UtcText.format(x.recordedAt()));
            s.setString(i++, x.board());
            s.setString(i++, x.serial());
            s.setString(i++, x.design().name());
            s.setString(i++, x.design().sha256());
            s.setString(i++, x.probe().probeId());
            s.setString(i++, x.probe().firmware());
            s.setDouble(i++, x.probe().clockOffsetPpm());
            real(s, i++, x.probe().clockUncertaintyPpm());
            s.setString(i++, x.probe().calibrationSource());
            s.setString(i++, x.capture() == null ? null : x.capture().path());
            if (x.capture() == null) {
                s.setNull(i++, Types.INTEGER);
            } else {
                s.setLong(i++, x.capture().sizeBytes());
            }
            s.setString(i++, x.capture() == null ? null : x.capture().sha256());
            s.setString(i++, k.verdict());
            if (k.oscillates() == null) {
                s.setNull(i++, Types.INTEGER);
            } else {
                s.setInt(i++, k.oscillates() ? 1 : 0);
            }
            s.setString(i++, k.reason());
            s.setString(i++, json(r.document()));
            s.setString(i++, x.note());
            s.setString(i++, histogramJson(k.histogram()));
            s.setString(i, trendJson(k.trend()));
            try (ResultSet rs = s.executeQuery()) {
                rs.next();
                id = rs.getLong(1);
            }
        }
        measurements(c, id, k.measurements());
        predictions(c, id, k.predictions());
        checks(c, id, k.checks());
        estimates(c, id, k.estimates());
        suspects(c, id, k.suspects());
        try (PreparedStatement s = c.prepareStatement("INSERT INTO ambiguity (run_id, seq, text) VALUES (?, ?, ?)")) {
            for (int j = 0; j < k.ambiguities().size(); j++) {
                s.setLong(1, id);
                s.setInt(2, j);
                s.setString(3, k.ambiguities().get(j));
                s.addBatch();
            }
            s.executeBatch();
        }
        return id;
    }

    private static void measurements(Connection c, long id, List<Measured> rows) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT OR REPLACE INTO measurement (run_id, seq, quantity,"
                + " value, uncertainty, coverage, unit) VALUES (?, ?, ?, ?, ?, ?, ?)")) {
            for (int j = 0; j < rows.size(); j++) {
                Measured m = rows.get(j);
                s.setLong(1, id);
                s.setInt(2, j);
                s.setString(3, m.quantity());
                real(s, 4, m.value());
                real(s, 5, m.uncertainty());
                real(s, 6, m.coverage());
                s.setString(7, m.unit());
                s.addBatch();
            }
            s.executeBatch();
        }
    }

    private static void predictions(Connection c, long id, List<Predicted> rows) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT OR REPLACE INTO prediction (run_id, seq, quantity,"
                + " nominal, worst_low, worst_high, stat_low, stat_high) VALUES (?, ?, ?, ?, ?, ?, ?, ?)")) {
            for (int j = 0; j < rows.size(); j++) {
                Predicted p = rows.get(j);
                s.setLong(1, id);
                s.setInt(2, j);
                s.setString(3, p.quantity());
                real(s, 4, p.nominal());
                real(s, 5, p.worstLow());
                real(s, 6, p.worstHigh());
                real(s, 7, p.statLow());
                real(s, 8, p.statHigh());
                s.addBatch();
            }
            s.executeBatch();
        }
    }

    private static void checks(Connection c, long id, List<QuantityCheck> rows) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT OR REPLACE INTO quantity_check (run_id, seq, quantity,"
                + " measured, band_low, band_high, status) VALUES (?, ?, ?, ?, ?, ?, ?)")) {
            for (int j = 0; j < rows.size(); j++) {
                QuantityCheck q = rows.get(j);
                s.setLong(1, id);
                s.setInt(2, j);
                s.setString(3, q.quantity());
                real(s, 4, q.measured());
                real(s, 5, q.bandLow());
                real(s, 6, q.bandHigh());
                s.setString(7, q.status());
                s.addBatch();
            }
            s.executeBatch();
        }
    }

    private static void estimates(Connection c, long id, List<Estimate> rows) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT OR REPLACE INTO estimate (run_id, seq, part, value,"
                + " unit, nominal, low, high, tol_minus, tol_plus) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            for (int j = 0; j < rows.size(); j++) {
                Estimate e = rows.get(j);
                s.setLong(1, id);
                s.setInt(2, j);
                s.setString(3, e.part());
                real(s, 4, e.value());
                s.setString(5, e.unit());
                real(s, 6, e.nominal());
                real(s, 7, e.low());
                real(s, 8, e.high());
                real(s, 9, e.tolerance() == null ? Double.NaN : e.tolerance().minusFraction());
                real(s, 10, e.tolerance() == null ? Double.NaN : e.tolerance().plusFraction());
                s.addBatch();
            }
            s.executeBatch();
        }
    }

    private static void suspects(Connection c, long id, List<Suspect> rows) throws SQLException {
        try (PreparedStatement s = c.prepareStatement("INSERT INTO suspect (run_id, rank, part, value, nominal,"
                + " deviation, probability) VALUES (?, ?, ?, ?, ?, ?, ?)")) {
            for (Suspect x : rows) {
                s.setLong(1, id);
                s.setInt(2, x.rank());
                s.setString(3, x.part());
                real(s, 4, x.value());
                real(s, 5, x.nominal());
                real(s, 6, x.deviation());
                real(s, 7, x.probability());
                s.addBatch();
            }
            s.executeBatch();
        }
    }

    /** The stored form of a histogram: {@code {"edges_s": [...], "counts": [...], "below": n, "above": n}}, or null. */
    static String histogramJson(PeriodHistogram h) {
        if (h == null) {
            return null;
        }
        ObjectNode o = MAPPER.createObjectNode();
        ArrayNode e = o.putArray("edges_s");
        for (double x : h.edgesSeconds()) {
            e.add(x);
        }
        ArrayNode n = o.putArray("counts");
        for (long x : h.counts()) {
            n.add(x);
        }
        o.put("below", h.below());
        o.put("above", h.above());
        return json(o);
    }

    /** The stored form of a trend: {@code [{"t_s": t, "frequency_hz": f}, ...]}, or null when empty. */
    static String trendJson(List<FrequencyPoint> trend) {
        if (trend.isEmpty()) {
            return null;
        }
        ArrayNode a = MAPPER.createArrayNode();
        for (FrequencyPoint p : trend) {
            a.addObject().put("t_s", p.tSeconds()).put("frequency_hz", p.frequencyHz());
        }
        return json(a);
    }

    static String json(Object tree) {
        try {
            return MAPPER.writeValueAsString(tree);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("JSON tree cannot be written: " + e.getMessage(), e);
        }
    }

    /** Binds a number, NaN and infinities as SQL NULL (SQLite stores no NaN). */
    static void real(PreparedStatement s, int index, double v) throws SQLException {
        if (Double.isFinite(v)) {
            s.setDouble(index, v);
        } else {
            s.setNull(index, Types.REAL);
        }
    }
}
