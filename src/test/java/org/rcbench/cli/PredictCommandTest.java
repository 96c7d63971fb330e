package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.testing.CliRun;

class PredictCommandTest {
    @TempDir
    Path dir;

    private static final String ASTABLE = String.join("\n",
            "[board]", "name = \"Bench\"",
            "[timer]", "topology = \"astable\"", "family = \"bipolar\"", "supply = \"5 V\"",
            "[family]", "divider = \"5k\"", "output_high_drop = 0", "output_high_ohms = 0", "output_low = 0",
            "output_low_ohms = 0", "discharge_sat = 0", "input_current = 0", "delay = 0",
            "[parts.R1]", "role = \"charge\"", "value = \"1k\"", "tolerance = \"1%\"",
            "[parts.R2]", "role = \"shared\"", "value = \"10k\"", "tolerance = \"1%\"",
            "[parts.C1]", "role = \"timing\"", "value = \"10n\"", "tolerance = \"5%\"", "");

    private Path write(String name, String text) throws Exception {
        Path p = dir.resolve(name);
        Files.writeString(p, text);
        return p;
    }

    // The idealised astable of check-values.md: f = 6869.976 Hz, duty 0.5238095; the GUM worked case's
    // tolerances give the period band 138.346-152.839 us (Monte Carlo).
    @Test
    void jsonHasTheStableKeysAndTheNumbers() throws Exception {
        CliRun run = CliRun.of("predict", write("a.toml", ASTABLE).toString(), "--json");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.OK);
        JsonNode j = new ObjectMapper().readTree(run.out());
        List<String> keys = new ArrayList<>();
        j.fieldNames().forEachRemaining(keys::add);
        assertThat(keys).contains("nominal", "worst_case", "statistical", "oscillates", "reason", "warnings");
        for (String table : new String[] {"nominal", "worst_case", "statistical"}) {
            List<String> q = new ArrayList<>();
            j.get(table).fieldNames().forEachRemaining(q::add);
            assertThat(q).containsExactly("frequency_hz", "period_s", "high_s", "low_s", "duty", "first_high_s");
        }
        assertThat(j.get("nominal").get("frequency_hz").asDouble()).isBetween(6869.97, 6869.98);
        assertThat(j.get("nominal").get("duty").asDouble()).isBetween(0.5238094, 0.5238096);
        JsonNode period = j.get("statistical").get("period_s");
        assertThat(period.isArray()).isTrue();
        assertThat(period.get(0).asDouble()).isBetween(138.31e-6, 138.38e-6);
        assertThat(period.get(1).asDouble()).isBetween(152.80e-6, 152.87e-6);
        assertThat(j.get("worst_case").get("period_s").get(0).asDouble()).isLessThan(period.get(0).asDouble());
        assertThat(j.get("oscillates").asBoolean()).isTrue();
        assertThat(j.get("reason").isNull()).isTrue();
        assertThat(j.get("warnings").isArray()).isTrue();
    }

    @Test
    void readableOutputSaysWhetherItRuns() throws Exception {
        CliRun run = CliRun.of("predict", write("a.toml", ASTABLE).toString(), "--draws", "2000");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.OK);
        assertThat(run.out()).contains("Bench", "runs: oscillates", "frequency", "6.870 kHz", "worst case");
    }

    // check-values.md: leakage stops the astable when R_L <= 2 (Ra + Rb); here the monostable's
    // constant input current (9 V, 1M, 10u, 3 uA) stops it: the JSON says so and gives the reason.
    @Test
    void aStoppedCircuitReportsTheReason() throws Exception {
        String mono = String.join("\n", "[timer]", "topology = \"monostable\"", "family = \"bipolar\"", "supply = 9",
                "[family]", "input_current = \"3 uA\"", "discharge_sat = 0", "delay = 0",
                "[parts.R1]", "role = \"charge\"", "value = \"1M\"", "tolerance = \"1%\"",
                "[parts.C1]", "role = \"timing\"", "value = \"10u\"", "tolerance = \"5%\"", "");
        CliRun run = CliRun.of("predict", write("m.toml", mono).toString(), "--json", "--draws", "1000");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.OK);
        JsonNode j = new ObjectMapper().readTree(run.out());
        assertThat(j.get("oscillates").asBoolean()).isFalse();
        assertThat(j.get("runs").asBoolean()).isFalse();
        assertThat(j.get("reason").asText()).contains("threshold input current");
        assertThat(j.get("nominal").get("pulse_width_s").isNull()).isTrue();
    }

    @Test
    void aBadDesignIsOneLineAndExitTwo() throws Exception {
        CliRun run = CliRun.of("predict", write("bad.toml", ASTABLE.replace("\"1k\"", "\"4k7k\"")).toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err().strip()).startsWith("rcbench: ").contains("bad.toml:").contains("parts.R1.value")
                .contains("\"4k7k\"").doesNotContain("\n").doesNotContain("at org.");
    }

    @Test
    void aMissingDesignIsOneLine() {
        CliRun run = CliRun.of("predict", dir.resolve("none.toml").toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err().strip()).endsWith("none.toml: no such file");
    }
}
