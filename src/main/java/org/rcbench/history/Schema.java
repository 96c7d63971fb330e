package org.rcbench.history;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import org.rcbench.common.BadInputException;

/**
 * The history file's tables, one migration per schema version, and the version stamp.
 *
 * <p>The version is SQLite's {@code PRAGMA user_version} (0 for a new file); {@code PRAGMA
 * application_id} marks the file as rcbench's ({@value #APPLICATION_ID}, "RCBH"). Migrations run in
 * order inside the caller's write transaction, so a file is at one version or the next, never
 * between. Version 1: runs with their rows and the check document. Version 2 adds the operator's
 * note, the stored period histogram and frequency trend of each run (filled in for older runs from
 * their check document), and probe clock calibrations. Stateless.
 */
final class Schema {
    /** The version this code writes. */
    static final int CURRENT = 2;
    /** {@code PRAGMA application_id} of an rcbench history file: "RCBH" in ASCII. */
    static final int APPLICATION_ID = 0x52434248;

    private static final List<List<String>> MIGRATIONS = List.of(
            List.of( // to version 1
                    "CREATE TABLE design (sha256 TEXT PRIMARY KEY, content TEXT NOT NULL)",
                    "CREATE TABLE run (id INTEGER PRIMARY KEY, recorded_utc TEXT NOT NULL, board TEXT NOT NULL,"
                            + " serial TEXT, design_name TEXT NOT NULL, design_sha256 TEXT NOT NULL REFERENCES design(sha256),"
                            + " probe_id TEXT, firmware TEXT, clock_offset_ppm REAL NOT NULL, clock_u_ppm REAL,"
                            + " clock_source TEXT, capture_path TEXT, capture_bytes INTEGER, capture_sha256 TEXT,"
                            + " verdict TEXT NOT NULL CHECK (verdict IN ('pass', 'marginal', 'fail', 'stopped')),"
                            + " oscillates INTEGER, prediction_reason TEXT, check_json TEXT NOT NULL)",
                    "CREATE INDEX run_board ON run (board COLLATE NOCASE, recorded_utc)",
                    "CREATE INDEX run_serial ON run (serial, recorded_utc)",
                    "CREATE TABLE measurement (run_id INTEGER NOT NULL REFERENCES run(id) ON DELETE CASCADE,"
                            + " seq INTEGER NOT NULL, quantity TEXT NOT NULL, value REAL, uncertainty REAL,"
                            + " coverage REAL, unit TEXT NOT NULL, PRIMARY KEY (run_id, quantity))",
                    "CREATE TABLE prediction (run_id INTEGER NOT NULL REFERENCES run(id) ON DELETE CASCADE,"
                            + " seq INTEGER NOT NULL, quantity TEXT NOT NULL, nominal REAL, worst_low REAL,"
                            + " worst_high REAL, stat_low REAL, stat_high REAL, PRIMARY KEY (run_id, quantity))",
                    "CREATE TABLE quantity_check (run_id INTEGER NOT NULL REFERENCES run(id) ON DELETE CASCADE,"
                            + " seq INTEGER NOT NULL, quantity TEXT NOT NULL, measured REAL, band_low REAL,"
                            + " band_high REAL, status TEXT NOT NULL, PRIMARY KEY (run_id, quantity))",
                    "CREATE TABLE estimate (run_id INTEGER NOT NULL REFERENCES run(id) ON DELETE CASCADE,"
                            + " seq INTEGER NOT NULL, part TEXT NOT NULL, value REAL, unit TEXT NOT NULL, nominal REAL,"
                            + " low REAL, high REAL, tol_minus REAL, tol_plus REAL, PRIMARY KEY (run_id, part))",
                    "CREATE INDEX estimate_part ON estimate (part)",
                    "CREATE TABLE suspect (run_id INTEGER NOT NULL REFERENCES run(id) ON DELETE CASCADE,"
                            + " rank INTEGER NOT NULL, part TEXT NOT NULL, value REAL, nominal REAL, deviation REAL,"
                            + " probability REAL, PRIMARY KEY (run_id, rank))",
                    "CREATE TABLE ambiguity (run_id INTEGER NOT NULL REFERENCES run(id) ON DELETE CASCADE,"
                            + " seq INTEGER NOT NULL, text TEXT NOT NULL, PRIMARY KEY (run_id, seq))"),
            List.of( // to version 2
                    "ALTER TABLE run ADD COLUMN note TEXT",
                    "ALTER TABLE run ADD COLUMN histogram_json TEXT",
                    "ALTER TABLE run ADD COLUMN trend_json TEXT",
                    "CREATE TABLE probe_calibration (id INTEGER PRIMARY KEY, probe_id TEXT NOT NULL,"
                            + " offset_ppm REAL NOT NULL, uncertainty_ppm REAL NOT NULL, reference TEXT NOT NULL,"
                            + " measured_utc TEXT NOT NULL)",
                    "CREATE INDEX probe_calibration_latest ON probe_calibration (probe_id, measured_utc, id)"));

    private Schema() {
    }

    /** The file's schema version. */
    static int version(Connection c) throws SQLException {
        return pragmaInt(c, "user_version");
    }

    /**
     * Brings the file from its version up to {@code target} inside the caller's write transaction.
     *
     * @throws BadInputException naming {@code where} when the file is someone else's SQLite database
     *                           or was written by a newer rcbench
     */
    static void migrate(Connection c, int target, String where) throws SQLException {
        int version = version(c);
        int appId = pragmaInt(c, "application_id");
        if (version == 0 && appId == 0 && tableCount(c) > 0) {
            throw new BadInputException(where, "is an SQLite database but not an rcbench history (it has tables of its own)");
        }
        if (appId != 0 && appId != APPLICATION_ID) {
            throw new BadInputException(where, "is an SQLite database of another application (application_id "
                    + appId + "), not an rcbench history");
        }
        if (version > CURRENT) {
            throw new BadInputException(where, "was written by a newer rcbench (history schema version " + version
                    + "; this rcbench knows up to " + CURRENT + "): use that version or a copy of the file");
        }
        try (Statement s = c.createStatement()) {
            for (int v = version; v < target; v++) {
                for (String sql : MIGRATIONS.get(v)) {
                    s.executeUpdate(sql);
                }
                if (v + 1 == 2) {
                    backfillPlots(c);
                }
                s.executeUpdate("PRAGMA user_version = " + (v + 1));
            }
            if (version < target && appId == 0) {
                s.executeUpdate("PRAGMA application_id = " + APPLICATION_ID);
            }
        }
    }

    /** Version 1 kept the plot data only inside the check document: copy it into the new columns. */
    private static void backfillPlots(Connection c) throws SQLException {
        ObjectMapper mapper = new ObjectMapper();
        List<long[]> ids = new ArrayList<>();
        List<String[]> plots = new ArrayList<>();
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("SELECT id, check_json FROM run")) {
            while (rs.next()) {
                try {
                    JsonNode doc = mapper.readTree(rs.getString(2));
                    CheckContent content = CheckDocument.parse(doc);
                    String h = RunWriter.histogramJson(content.histogram());
                    String t = RunWriter.trendJson(content.trend());
                    if (h != null || t != null) {
                        ids.add(new long[] {rs.getLong(1)});
                        plots.add(new String[] {h, t});
                    }
                } catch (java.io.IOException | BadInputException e) {
                    // A document this version cannot read keeps its text; it just has no plots.
                }
            }
        }
        try (PreparedStatement u = c.prepareStatement("UPDATE run SET histogram_json = ?, trend_json = ? WHERE id = ?")) {
            for (int i = 0; i < ids.size(); i++) {
                u.setString(1, plots.get(i)[0]);
                u.setString(2, plots.get(i)[1]);
                u.setLong(3, ids.get(i)[0]);
                u.executeUpdate();
            }
        }
    }

    private static int tableCount(Connection c) throws SQLException {
        try (Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT count(*) FROM sqlite_master WHERE type = 'table'")) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    static int pragmaInt(Connection c, String pragma) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA " + pragma)) {
            return rs.next() ? rs.getInt(1) : 0;
        }
    }

    static String pragmaText(Connection c, String pragma) throws SQLException {
        try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA " + pragma)) {
            return rs.next() ? rs.getString(1) : "";
        }
    }
}
