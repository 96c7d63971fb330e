package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.history.Fixtures;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.TrendAnalysis;
import org.rcbench.testing.CliRun;

class HistoryCommandTest {
    static final Instant T0 = Instant.parse("2021-01-01T00:00:00Z");

    @TempDir
    Path dir;

    /** Unit SN-9: C1 estimated 100, 98, 96, 94 nF at yearly runs (-2 nF a year, exactly); one other unit. */
    static Path drifting(Path dir) {
        Path db = dir.resolve("h.db");
        try (HistoryStore store = HistoryStore.open(db)) {
            for (int i = 0; i < 4; i++) {
                store.saveRun(Fixtures.run("SN-9", TrendAnalysis.at(T0, i), 1e-7 - 2e-9 * i));
            }
            store.saveRun(Fixtures.run("SN-10", T0, 1e-7));
        }
        return db;
    }

    @Test
    void listsTheUnitsRunsAndProjectsItsDriftingPart() {
        Path db = drifting(dir);
        CliRun run = CliRun.of("history", "SN-9", "--db", db.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).contains("4 runs of \"SN-9\" in " + db)
                .contains("run  checked (UTC)     board        serial  verdict")
                .contains("1  2021-01-01 00:00  TestBoard-A  SN-9    marginal  1.0000 kHz  C1")
                .doesNotContain("SN-10");
        // slope -2 nF a year; 90 nF (100 nF - 10 %) is reached 5 mean years after the first run:
        // 2021-01-01 + 1826.2 days = 2026-01-01 (arithmetic).
        assertThat(run.out()).contains("TestBoard-A SN-9")
                .contains("C1 (nominal 100.0 nF ±10 %): 4 runs over 3.0 years, -2.000 nF a year")
                .contains("leaves its band (90.00 nF) around 2026-01");
        assertThat(run.out()).contains("R2 (nominal 10.00 kΩ ±1 %)").contains("no drift shown");
    }

    @Test
    void jsonHasRunsAndTrendsWithTheFittedNumbers() throws Exception {
        Path db = drifting(dir);
        CliRun run = CliRun.of("history", "testboard-a", "--json", "--db", db.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode o = new ObjectMapper().readTree(run.out());
        assertThat(o.path("runs")).hasSize(5);
        assertThat(o.path("runs").get(0).path("verdict").asText()).isEqualTo("marginal");
        JsonNode c1 = null;
        for (JsonNode t : o.path("trends")) {
            if (t.path("serial").asText().equals("SN-9") && t.path("part").asText().equals("C1")) {
                c1 = t;
            }
        }
        assertThat(c1).isNotNull();
        assertThat(c1.path("slope_per_year").asDouble()).isCloseTo(-2e-9, within(1e-20));
        assertThat(c1.path("relative_slope_per_year").asDouble()).isCloseTo(-0.02, within(1e-12));
        assertThat(c1.path("points")).hasSize(4);
        assertThat(c1.path("projection").path("kind").asText()).isEqualTo("leaves_band");
        assertThat(c1.path("projection").path("years_from_last_run").asDouble()).isCloseTo(2.0, within(1e-6));
        assertThat(c1.path("projection").path("edge").asDouble()).isCloseTo(9e-8, within(1e-20));
    }

    @Test
    void aMissingHistoryIsNotAnError() {
        CliRun run = CliRun.of("history", "--db", dir.resolve("none.db").toString());
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).startsWith("No history at ");
        assertThat(Files.exists(dir.resolve("none.db"))).isFalse();
    }

    @Test
    void aFileThatIsNotAHistoryIsOneLineAndExitTwo() throws Exception {
        Path file = dir.resolve("junk.db");
        Files.writeString(file, "not a database ".repeat(100));
        CliRun run = CliRun.of("history", "--db", file.toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).isEqualTo("rcbench: " + file + ": not a history database (the file is not SQLite)\n");
    }

    @Test
    void aHistoryLockedBeyondTheWaitIsOneLineAndExitTwo() throws Exception {
        Path file = dir.resolve("busy.db");
        try (Connection other = DriverManager.getConnection("jdbc:sqlite:" + file);
                Statement s = other.createStatement()) {
            s.execute("BEGIN EXCLUSIVE"); // another program holds the file while rcbench needs to set it up
            CliRun run = CliRun.of("history", "--db", file.toString(), "--db-wait", "0.2");
            assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(run.err()).isEqualTo("rcbench: " + file + ": the history is locked by another rcbench that is"
                    + " writing to it; gave up after 0.2 s (try again when it has finished)\n");
            s.execute("ROLLBACK");
        }
        assertThat(CliRun.of("history", "--db", file.toString()).exitCode()).isZero();
    }

    @Test
    void badLimitIsRefused() {
        CliRun run = CliRun.of("history", "--limit", "0", "--db", dir.resolve("x.db").toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).isEqualTo("rcbench: --limit: must be at least 1, not 0\n");
    }
}
