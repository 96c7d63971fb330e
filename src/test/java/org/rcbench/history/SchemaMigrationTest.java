package org.rcbench.history;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A file written at schema version 1 (no note, no plot columns, no calibrations) opens as version 2 with nothing lost. */
class SchemaMigrationTest {
    private static final Instant T0 = Instant.parse("2023-02-01T10:00:00Z");

    @Test
    void versionOneFileIsMigratedForwardKeepingItsRuns(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("v1.db");
        String doc = RunWriter.json(Fixtures.check());
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement s = c.createStatement()) {
            s.execute("BEGIN IMMEDIATE");
            Schema.migrate(c, 1, file.toString());
            s.execute("COMMIT");
            assertThat(Schema.version(c)).isEqualTo(1);
            // Rows as the version-1 writer stored them.
            DesignRef d = Fixtures.design();
            try (PreparedStatement p = c.prepareStatement("INSERT INTO design VALUES (?, ?)")) {
                p.setString(1, d.sha256());
                p.setString(2, d.text());
                p.executeUpdate();
            }
            try (PreparedStatement p = c.prepareStatement("INSERT INTO run (recorded_utc, board, serial, design_name,"
                    + " design_sha256, probe_id, firmware, clock_offset_ppm, clock_u_ppm, clock_source, verdict,"
                    + " oscillates, prediction_reason, check_json) VALUES (?, 'TestBoard-A', 'SN-1', 'board-a.toml', ?,"
                    + " 'probe-7', 'fw 1.0', 3.0, 1.0, 'capture header', 'marginal', 1, 'runs', ?)")) {
                p.setString(1, UtcText.format(T0));
                p.setString(2, d.sha256());
                p.setString(3, doc);
                p.executeUpdate();
            }
            s.executeUpdate("INSERT INTO measurement VALUES (1, 0, 'frequency_hz', 1000.0, 0.04, 2, 'Hz')");
            s.executeUpdate("INSERT INTO estimate VALUES (1, 0, 'C1', 9.5e-8, 'F', 1e-7, 9.3e-8, 9.7e-8, 0.1, 0.1)");
            s.executeUpdate("INSERT INTO suspect VALUES (1, 1, 'C1', 9.5e-8, 1e-7, -0.05, 0.81)");
            try (ResultSet rs = s.executeQuery("SELECT count(*) FROM pragma_table_info('run') WHERE name = 'note'")) {
                assertThat(rs.getInt(1)).isZero(); // version 1 really has no note column
            }
        }

        try (HistoryStore store = HistoryStore.open(file)) {
            assertThat(store.schemaVersion()).isEqualTo(2);
            RunRecord old = store.run(1).orElseThrow();
            assertThat(old.context().note()).isNull();
            assertThat(old.context().serial()).isEqualTo("SN-1");
            assertThat(old.content().measurement("frequency_hz").orElseThrow().uncertainty()).isEqualTo(0.04);
            assertThat(old.content().suspects().get(0).probability()).isEqualTo(0.81);
            // The plot data, kept only inside the version-1 document, is now in its own columns.
            assertThat(old.content().histogram().counts()).containsExactly(10, 1800, 2100, 89);
            assertThat(old.content().trend()).extracting(CheckContent.FrequencyPoint::frequencyHz)
                    .containsExactly(1000.2, 999.9, 999.8);
            // What version 2 adds works on the migrated file.
            long id = store.saveRun(RunRecord.of(Fixtures.checkWithC1(9.4e-8), Fixtures.context("SN-1", T0.plusSeconds(3600)).withNote("swapped C2")));
            assertThat(store.run(id).orElseThrow().context().note()).isEqualTo("swapped C2");
            store.saveCalibration(ProbeCalibration.of("probe-7", 3.5, 0.5, "1 Hz reference", T0));
            assertThat(store.latestCalibration("probe-7")).isPresent();
            assertThat(store.partTrends("SN-1").get(0).points()).hasSize(2);
            assertThat(store.integrityCheck()).isEqualTo("ok");
        }
        try (HistoryStore again = HistoryStore.open(file)) {
            assertThat(again.runs(RunFilter.ALL)).hasSize(2); // a second open migrates nothing
        }
    }
}
