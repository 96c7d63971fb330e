package org.rcbench.history;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.common.BadInputException;
import org.rcbench.history.CheckContent.Estimate;
import org.rcbench.history.CheckContent.Measured;
import org.rcbench.units.Tolerance;

class HistoryStoreTest {
    private static final Instant T0 = Instant.parse("2024-05-01T08:00:00Z");

    @TempDir
    Path dir;

    @Test
    void savedRunReadsBackWithEveryField() throws Exception {
        Path capture = dir.resolve("cap.rce");
        Files.writeString(capture, "# rcbench edges v1\n# clock_hz=16000000\ntick,channel,level\n", StandardCharsets.UTF_8);
        RunContext ctx = Fixtures.context("SN-1", T0).withNote("after reflow").withCapture(CaptureRef.of(capture));
        RunRecord saved = RunRecord.of(Fixtures.check(), ctx);
        try (HistoryStore store = HistoryStore.open(dir.resolve("sub/folder/h.db"))) {
            long id = store.saveRun(saved);
            assertThat(id).isEqualTo(1);
            RunRecord back = store.run(id).orElseThrow();
            assertThat(back.id()).isEqualTo(id);
            assertThat(back.context()).isEqualTo(ctx);
            assertThat(back.context().capture().sizeBytes()).isEqualTo(Files.size(capture));
            // SHA-256 of the bytes, recomputed independently through the JDK.
            assertThat(back.context().capture().sha256()).isEqualTo(java.util.HexFormat.of().formatHex(
                    java.security.MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(capture))));
            assertThat(back.content()).isEqualTo(saved.content());
            assertThat(back.document()).isEqualTo(Fixtures.check());
            assertThat(back.content().verdict()).isEqualTo("marginal");
            assertThat(back.content().suspects()).extracting(CheckContent.Suspect::part).containsExactly("C1", "R2");
            assertThat(back.content().histogram().counts()).containsExactly(10, 1800, 2100, 89);
            assertThat(back.content().trend()).hasSize(3);
        }
    }

    @Test
    void measurementsCarryExpandedUncertaintiesAndUnits() {
        CheckContent c = CheckDocument.parse(Fixtures.check());
        assertThat(c.measurement("frequency_hz").orElseThrow()).isEqualTo(new Measured("frequency_hz", 1000.0, 0.04, 2, "Hz"));
        // period from the frequency's relative uncertainty: U(T) = T U(f) / f = 0.001 * 0.04 / 1000 (GUM 5.1.2)
        assertThat(c.measurement("period_s").orElseThrow().uncertainty()).isCloseTo(4.0e-8, within(1e-20));
        // a standard uncertainty doubled to k = 2
        assertThat(c.measurement("high_s").orElseThrow().uncertainty()).isCloseTo(4.0e-9, within(1e-20));
        assertThat(c.measurement("duty").orElseThrow().uncertainty()).isCloseTo(4.0e-4, within(1e-15));
        assertThat(c.measurement("cycles").orElseThrow().unit()).isEqualTo("count");
        assertThat(c.measurement("drift_ppm_per_s").orElseThrow().unit()).isEqualTo("ppm/s");
        assertThat(c.measurement("adev_tau_0.002_s").orElseThrow().value()).isEqualTo(1.1e-4);
        assertThat(c.measurement("frequency_u_hz")).isEmpty();
        assertThat(c.measurement("channel")).isEmpty();
        assertThat(c.measurement("tie_rms_s").orElseThrow().uncertainty()).isNaN();
        assertThat(c.estimates()).extracting(Estimate::tolerance).containsExactly(Tolerance.symmetric(0.1), Tolerance.symmetric(0.01));
    }

    @Test
    void listsRunsOfOneBoardOrSerialOldestFirst() {
        try (HistoryStore store = HistoryStore.open(dir.resolve("h.db"))) {
            store.saveRun(Fixtures.run("SN-2", T0.plusSeconds(60), 1e-7));
            store.saveRun(Fixtures.run("SN-1", T0, 1e-7));
            store.saveRun(RunRecord.of(Fixtures.check(), RunContext.of("OtherBoard", Fixtures.design())
                    .withRecordedAt(T0.plusSeconds(30))));
            assertThat(store.runs(RunFilter.ALL)).extracting(RunSummary::serial).containsExactly("SN-1", null, "SN-2");
            assertThat(store.runs(RunFilter.of("SN-2"))).extracting(RunSummary::id).containsExactly(1L);
            assertThat(store.runs(RunFilter.of("testboard-a"))).extracting(RunSummary::id).containsExactly(2L, 1L);
            assertThat(store.runs(RunFilter.ALL.withLimit(1))).extracting(RunSummary::id).containsExactly(1L);
            RunSummary s = store.runs(RunFilter.of("OtherBoard")).get(0);
            assertThat(s.frequencyHz()).isEqualTo(1000.0);
            assertThat(s.topSuspect()).isEqualTo("C1");
            assertThat(s.verdict()).isEqualTo("marginal");
            assertThat(store.last().orElseThrow().id()).isEqualTo(3);
            assertThat(store.run(99)).isEmpty();
        }
    }

    @Test
    void emptyHistoryHasNoLastRun() {
        try (HistoryStore store = HistoryStore.open(dir.resolve("h.db"))) {
            assertThat(store.last()).isEmpty();
            assertThat(store.runs(RunFilter.ALL)).isEmpty();
            assertThat(store.schemaVersion()).isEqualTo(Schema.CURRENT);
            assertThat(store.journalMode()).isEqualTo("wal");
            assertThat(store.warnings()).isEmpty();
        }
    }

    @Test
    void partTrendsFollowOneUnitInTimeOrder() {
        try (HistoryStore store = HistoryStore.open(dir.resolve("h.db"))) {
            store.saveRun(Fixtures.run("SN-1", T0.plusSeconds(200), 9.6e-8));
            store.saveRun(Fixtures.run("SN-1", T0, 1.0e-7));
            store.saveRun(Fixtures.run("SN-2", T0.plusSeconds(100), 8e-8));
            List<PartTrend> trends = store.partTrends("SN-1");
            assertThat(trends).extracting(PartTrend::part).containsExactly("C1", "R2");
            PartTrend c1 = trends.get(0);
            assertThat(c1.points()).extracting(PartTrend.Point::value).containsExactly(1.0e-7, 9.6e-8);
            assertThat(c1.nominal()).isEqualTo(1e-7);
            assertThat(c1.tolerance()).isEqualTo(Tolerance.symmetric(0.1));
            assertThat(c1.unit()).isEqualTo("F");
            assertThat(store.partTrends("TestBoard-A")).hasSize(4);
            assertThat(store.partTrend("TestBoard-A", "SN-2", "C1").orElseThrow().points()).hasSize(1);
        }
    }

    @Test
    void latestCalibrationIsTheMostRecentOfThatProbe() {
        try (HistoryStore store = HistoryStore.open(dir.resolve("h.db"))) {
            store.saveCalibration(ProbeCalibration.of("probe-7", 40.0, 2.0, "1 Hz reference", T0));
            store.saveCalibration(ProbeCalibration.of("probe-7", 42.5, 1.0, "10 MHz reference", T0.plusSeconds(86400)));
            store.saveCalibration(ProbeCalibration.of("probe-9", -1800, 5, "1 Hz reference", T0.plusSeconds(2 * 86400)));
            ProbeCalibration latest = store.latestCalibration("probe-7").orElseThrow();
            assertThat(latest.offsetPpm()).isEqualTo(42.5);
            assertThat(latest.reference()).isEqualTo("10 MHz reference");
            assertThat(latest.measuredAt()).isEqualTo(T0.plusSeconds(86400));
            assertThat(store.calibrations("probe-7")).hasSize(2);
            assertThat(store.latestCalibration("probe-0")).isEmpty();
        }
    }

    @Test
    void networkFileSystemGetsTheRollbackJournalAndAWarning() throws Exception {
        Path mounts = dir.resolve("mounts");
        Files.writeString(mounts, "/dev/sda1 / ext4 rw 0 0\nserver:/export " + dir.toRealPath() + " nfs4 rw 0 0\n");
        try (HistoryStore store = HistoryStore.open(dir.resolve("h.db"), StoreOptions.DEFAULTS.withMountTable(mounts))) {
            assertThat(store.journalMode()).isEqualTo("delete");
            assertThat(store.warnings()).singleElement().asString().contains("nfs4").contains("rollback journal");
            store.saveRun(Fixtures.run("SN-1", T0, 1e-7));
            assertThat(store.runs(RunFilter.ALL)).hasSize(1);
        }
    }

    @Test
    void aFileThatIsNotSqliteIsRefusedInOneLine() throws Exception {
        Path file = dir.resolve("notes.txt");
        Files.writeString(file, "this is not a database, just some text that is long enough to have a header".repeat(20));
        assertThatThrownBy(() -> HistoryStore.open(file)).isInstanceOf(BadInputException.class)
                .hasMessage(file + ": not a history database (the file is not SQLite)");
    }

    @Test
    void anotherApplicationsDatabaseIsRefused() throws Exception {
        Path file = dir.resolve("other.db");
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement s = c.createStatement()) {
            s.executeUpdate("CREATE TABLE contacts (name TEXT)");
        }
        assertThatThrownBy(() -> HistoryStore.open(file)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("not an rcbench history");
    }

    @Test
    void aNewerSchemaIsRefusedNotDowngraded() throws Exception {
        Path file = dir.resolve("h.db");
        HistoryStore.open(file).close();
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file); Statement s = c.createStatement()) {
            s.executeUpdate("PRAGMA user_version = 9");
        }
        assertThatThrownBy(() -> HistoryStore.open(file)).isInstanceOf(BadInputException.class)
                .hasMessageContaining("newer rcbench (history schema version 9; this rcbench knows up to 2)");
    }

    @Test
    void aWriterLockedOutBeyondTheTimeoutFailsWithOneClearLine() throws Exception {
        Path file = dir.resolve("h.db");
        try (HistoryStore store = HistoryStore.open(file, StoreOptions.DEFAULTS.withBusyTimeoutMillis(300));
                Connection other = DriverManager.getConnection("jdbc:sqlite:" + file);
                Statement s = other.createStatement()) {
            store.saveRun(Fixtures.run("SN-1", T0, 1e-7));
            s.execute("BEGIN IMMEDIATE");
            s.executeUpdate("UPDATE run SET note = 'held' WHERE id = 1");
            // The reader is not blocked by the other writer (WAL) ...
            assertThat(store.runs(RunFilter.ALL)).hasSize(1);
            // ... a second writer waits the timeout, then gives up with one line.
            assertThatThrownBy(() -> store.saveRun(Fixtures.run("SN-1", T0, 1e-7)))
                    .isInstanceOf(BadInputException.class)
                    .hasMessage(file + ": the history is locked by another rcbench that is writing to it;"
                            + " gave up after 0.3 s (try again when it has finished)");
            s.execute("ROLLBACK");
            assertThat(store.saveRun(Fixtures.run("SN-1", T0, 1e-7))).isEqualTo(2);
        }
    }

    @Test
    void aDocumentWithoutVerdictIsRefused() {
        var doc = Fixtures.check();
        doc.remove("verdict");
        assertThatThrownBy(() -> RunRecord.of(doc, Fixtures.context("SN-1", T0)))
                .isInstanceOf(BadInputException.class)
                .hasMessage("check result: verdict must be one of pass, marginal, fail, stopped, found none");
    }

    @Test
    void tolerancesTheDocumentLeavesOutComeFromTheRunsDesign() {
        var doc = Fixtures.check();
        ((com.fasterxml.jackson.databind.node.ObjectNode) doc.path("estimates").path("C1")).remove("tolerance");
        ((com.fasterxml.jackson.databind.node.ObjectNode) doc.path("estimates").path("R2")).remove("tolerance_pct");
        ((com.fasterxml.jackson.databind.node.ObjectNode) doc.path("estimates").path("R2")).put("tolerance", "+3/-1%");
        RunRecord r = RunRecord.of(doc, RunContext.of("TestBoard-A", DesignRef.of("a.toml", Fixtures.DESIGN_TEXT)));
        // C1 from the design's "+50/-20%"; R2 as the document states it (text), not the design's 2 %.
        assertThat(r.content().estimates()).extracting(Estimate::tolerance)
                .containsExactly(new Tolerance(0.2, 0.5), new Tolerance(0.01, 0.03));
        // A design text that does not parse leaves it unknown.
        RunRecord old = RunRecord.of(doc, Fixtures.context("SN-1", T0));
        assertThat(old.content().estimates().get(0).tolerance()).isNull();
    }
}
