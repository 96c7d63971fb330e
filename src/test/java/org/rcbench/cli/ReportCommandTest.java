package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.ProbeCalibration;
import org.rcbench.testing.CliRun;

class ReportCommandTest {
    @TempDir
    Path dir;

    @Test
    void reportOfARunGoesToTheFileWithThisUnitsPartHistory() throws Exception {
        Path db = HistoryCommandTest.drifting(dir);
        try (HistoryStore store = HistoryStore.open(db)) {
            store.saveCalibration(ProbeCalibration.of("probe-7", 12.0, 1.0, "1 Hz reference", HistoryCommandTest.T0));
        }
        Path out = dir.resolve("run3.html");
        CliRun run = CliRun.of("report", "3", "-o", out.toString(), "--db", db.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.err()).isEqualTo("rcbench: report of run 3 written to " + out + "\n");
        assertThat(run.out()).isEmpty();
        Document doc = Jsoup.parse(Files.readString(out, StandardCharsets.UTF_8));
        assertThat(doc.title()).isEqualTo("Test record: TestBoard-A SN-9, run 3");
        assertThat(doc.getElementById("verdict").selectFirst(".word").text()).isEqualTo("marginal");
        // the part history is of unit SN-9 only: 4 runs, not the other unit's one
        assertThat(doc.getElementById("plots").text()).contains("C1 (nominal 100.0 nF ±10 %): 4 runs over 3.0 years");
        assertThat(doc.getElementById("probe").text()).contains("+12 ppm ± 1 ppm against 1 Hz reference");
        assertThat(Files.list(dir).filter(p -> p.toString().endsWith(".part"))).isEmpty();
    }

    @Test
    void lastRunToStdout() {
        Path db = HistoryCommandTest.drifting(dir);
        CliRun run = CliRun.of("report", "--last", "--db", db.toString());
        assertThat(run.exitCode()).isZero();
        assertThat(run.out()).startsWith("<!DOCTYPE html>").contains("<title>Test record: TestBoard-A SN-10, run 5</title>");
    }

    @Test
    void unknownRunIsOneLineAndExitTwo() {
        Path db = HistoryCommandTest.drifting(dir);
        CliRun run = CliRun.of("report", "42", "--db", db.toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).isEqualTo("rcbench: " + db + ": no run 42 (the last run stored is 5)\n");
    }

    @Test
    void runOrLastIsRequired() {
        Path db = HistoryCommandTest.drifting(dir);
        CliRun run = CliRun.of("report", "--db", db.toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).isEqualTo("rcbench: give either a run number or --last\n");
    }

    @Test
    void missingHistoryIsOneLineAndExitTwo() {
        Path db = dir.resolve("nothing.db");
        CliRun run = CliRun.of("report", "--last", "--db", db.toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).isEqualTo("rcbench: " + db + ": no history here yet (rcbench check --save creates it)\n");
    }
}
