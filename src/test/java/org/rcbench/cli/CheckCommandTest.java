package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.design.DesignReader;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.testing.CliRun;
import org.rcbench.testing.SimCaptures;

/** {@code rcbench check} on captures written from simulated boards. */
class CheckCommandTest {
    static final String ASTABLE = "rcbench_design = 1\n[board]\nname = \"Test astable\"\n[timer]\n"
            + "topology = \"astable\"\nfamily = \"bipolar\"\nsupply = \"9 V\"\n"
            + "[parts.R1]\nrole = \"charge\"\nvalue = \"4k7\"\ntolerance = \"5%\"\nkind = \"carbon-film\"\n"
            + "[parts.R2]\nrole = \"shared\"\nvalue = \"10k\"\ntolerance = \"5%\"\nkind = \"carbon-film\"\n"
            + "[parts.C1]\nrole = \"timing\"\nvalue = \"10n\"\ntolerance = \"5%\"\nkind = \"film\"\n";
    static final String MONOSTABLE = "rcbench_design = 1\n[timer]\ntopology = \"monostable\"\nfamily = \"bipolar\"\n"
            + "supply = \"5 V\"\n[trigger]\ninterval = \"300 ms\"\n"
            + "[parts.R1]\nrole = \"charge\"\nvalue = \"100k\"\ntolerance = \"1%\"\nkind = \"metal-film\"\n"
            + "[parts.C1]\nrole = \"timing\"\nvalue = \"1u\"\ntolerance = \"20%\"\nkind = \"aluminium-electrolytic\"\n";

    @TempDir
    Path dir;

    private Path design(String text) throws IOException {
        Path p = dir.resolve("board.toml");
        Files.writeString(p, text);
        return p;
    }

    private Path capture(Path design, double seconds, String... deviations) throws IOException {
        List<Deviation> devs = new ArrayList<>();
        for (String s : deviations) {
            devs.add(Deviation.parse(s));
        }
        Path file = dir.resolve("board.rce");
        SimCaptures.write(file, DesignReader.read(design),
                SimulationSpec.defaults().withDeviations(devs).withJitterSeconds(2e-8).withSeed(5), seconds);
        return file;
    }

    @Test
    void healthyBoardPassesWithTheVerdictFirst() throws IOException {
        Path d = design(ASTABLE);
        CliRun run = CliRun.of("check", capture(d, 0.3).toString(), "--design", d.toString(), "--draws", "20000");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).startsWith("PASS  Test astable: every quantity is inside its 95 % band");
        assertThat(run.out()).contains("frequency").contains("95 % band").contains("worst case")
                .contains("Diagnosis: No part needs to be outside its band");
    }

    @Test
    void agedCapacitorFailsNamesC1AndExitsOne() throws IOException {
        Path d = design(ASTABLE);
        CliRun run = CliRun.of("check", capture(d, 0.3, "C1=-35%").toString(), "--design", d.toString(),
                "--draws", "20000");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(run.out()).startsWith("FAIL  Test astable: frequency");
        assertThat(run.out()).contains("C1 at 6.5").contains("is the likely fault");
    }

    @Test
    void jsonCarriesTheMeasureKeysAndTheCheck() throws IOException {
        Path d = design(ASTABLE);
        CliRun run = CliRun.of("check", capture(d, 0.3, "C1=-35%").toString(), "--design", d.toString(),
                "--draws", "20000", "--json");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.CHECK_FAILED);
        JsonNode j = new ObjectMapper().readTree(run.out());
        for (String key : new String[] {"cycles", "frequency_hz", "frequency_u_hz", "period_s", "high_s", "low_s",
            "duty", "period_jitter_rms_s", "allan", "drift_ppm_per_s", "settling_cycles", "glitches", "gaps",
            "prediction", "verdict", "checks", "estimates", "suspects", "ambiguities", "histogram", "trend"}) {
            assertThat(j.has(key)).as(key).isTrue();
        }
        assertThat(j.get("verdict").asText()).isEqualTo("fail");
        assertThat(j.get("prediction").get("nominal").has("frequency_hz")).isTrue();
        JsonNode f = j.get("checks").get("frequency_hz");
        assertThat(f.get("status").asText()).isEqualTo("fail");
        assertThat(f.get("band").size()).isEqualTo(2);
        assertThat(f.get("measured").asDouble()).isCloseTo(j.get("frequency_hz").asDouble(), within(1e-9));
        JsonNode c1 = j.get("estimates").get("C1");
        assertThat(c1.get("unit").asText()).isEqualTo("F");
        assertThat(c1.get("nominal").asDouble()).isCloseTo(10e-9, within(1e-18));
        assertThat(c1.get("value").asDouble()).isCloseTo(6.5e-9, within(0.4e-9));
        assertThat(c1.get("low").asDouble()).isLessThan(c1.get("value").asDouble());
        JsonNode top = j.get("suspects").get(0);
        assertThat(top.get("part").asText()).isEqualTo("C1");
        assertThat(top.get("deviation").asDouble()).isCloseTo(-0.35, within(0.04));
        assertThat(top.get("probability").asDouble()).isGreaterThan(0.5);
        assertThat(j.get("estimates").get("R1").get("unit").asText()).isEqualTo("ohm");
        long sum = 0;
        for (JsonNode c : j.get("histogram").get("counts")) {
            sum += c.asLong();
        }
        assertThat(sum).isPositive();
        assertThat(j.get("histogram").get("edges_s").size()).isEqualTo(j.get("histogram").get("counts").size() + 1);
        assertThat(j.get("trend").get(0).has("t_s")).isTrue();
        assertThat(j.get("trend").get(0).has("frequency_hz")).isTrue();
        assertThat(j.get("diagnosis").get("summary").asText()).contains("C1");
        assertThat(j.get("estimates").get("C1").get("tolerance_plus").asDouble()).isCloseTo(0.05, within(1e-12));
        // The history stage reads this document as it is (issue 4 keys); it must accept it whole.
        var rows = org.rcbench.history.CheckDocument.parse(j);
        assertThat(rows.verdict()).isEqualTo("fail");
        assertThat(rows.suspects().get(0).part()).isEqualTo("C1");
    }

    @Test
    void boardThatDoesNotRunIsStopped() throws IOException {
        Path d = design(ASTABLE);
        CliRun run = CliRun.of("check", capture(d, 0.1, "leak=1k").toString(), "--design", d.toString(),
                "--draws", "2000", "--json");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.CHECK_FAILED);
        JsonNode j = new ObjectMapper().readTree(run.out());
        assertThat(j.get("verdict").asText()).isEqualTo("stopped");
        assertThat(j.get("verdict_reason").asText()).startsWith("not running");
    }

    @Test
    void monostableRAgainstCIsReportedAmbiguous() throws IOException {
        Path d = design(MONOSTABLE);
        CliRun run = CliRun.of("check", capture(d, 3.5, "R1=-31%").toString(), "--design", d.toString(),
                "--trigger-channel", "trigger", "--draws", "20000");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(run.out()).contains("pulse width").contains("What the measurement cannot tell")
                .contains("R1·C1 (the pulse width) is 31");
    }

    @Test
    void bistableDesignAndMissingDesignAreBadInput() throws IOException {
        Path d = design(ASTABLE);
        Path cap = capture(d, 0.05);
        CliRun missing = CliRun.of("check", cap.toString(), "--design", dir.resolve("none.toml").toString());
        assertThat(missing.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(missing.err().strip().lines().count()).isEqualTo(1);
        Path latch = dir.resolve("latch.toml");
        Files.writeString(latch, "rcbench_design = 1\n[timer]\ntopology = \"bistable\"\nfamily = \"bipolar\"\nsupply = \"5 V\"\n");
        CliRun bistable = CliRun.of("check", cap.toString(), "--design", latch.toString());
        assertThat(bistable.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(bistable.err()).contains("no timing to check");
    }
}
