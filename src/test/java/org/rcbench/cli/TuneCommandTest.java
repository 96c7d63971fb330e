package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.design.DesignReader;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.testing.CliRun;
import org.rcbench.testing.SimCaptures;

/** {@code rcbench tune} on a simulated pot PWM (check-values.md: R1 = 1k, pot 100k, C = 10n, 5 V). */
class TuneCommandTest {
    static final String PWM = "rcbench_design = 1\n[timer]\ntopology = \"pwm-pot\"\nfamily = \"cmos\"\nsupply = \"5 V\"\n"
            + "[parts.R1]\nrole = \"charge\"\nvalue = \"1k0\"\ntolerance = \"1%\"\nkind = \"metal-film\"\n"
            + "[parts.VR1]\nrole = \"split-pot\"\nvalue = \"100k\"\ntolerance = \"20%\"\nkind = \"cermet\"\nwiper = 0.5\n"
            + "[parts.C1]\nrole = \"timing\"\nvalue = \"10n\"\ntolerance = \"5%\"\nkind = \"film\"\n"
            + "[parts.D1]\nrole = \"charge-diode\"\nkind = \"silicon\"\n[parts.D2]\nrole = \"discharge-diode\"\nkind = \"silicon\"\n";

    @TempDir
    Path dir;

    private Path[] board() throws IOException {
        Path d = dir.resolve("pwm.toml");
        Files.writeString(d, PWM);
        Path cap = dir.resolve("pwm.rce");
        SimCaptures.write(cap, DesignReader.read(d), SimulationSpec.defaults()
                .withDeviation(Deviation.parse("VR1.wiper=0.25")).withJitterSeconds(1e-8).withSeed(2), 0.3);
        return new Path[] {d, cap};
    }

    @Test
    void saysWhereTheWiperIsAndWhereToTurnIt() throws IOException {
        Path[] b = board();
        CliRun run = CliRun.of("tune", b[1].toString(), "--design", b[0].toString(), "--duty", "50%",
                "--travel-degrees", "270", "--json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode j = new ObjectMapper().readTree(run.out());
        assertThat(j.get("pot").asText()).isEqualTo("VR1");
        assertThat(j.get("wiper").asDouble()).isCloseTo(0.25, within(0.02));
        assertThat(j.get("reachable").asBoolean()).isTrue();
        assertThat(j.get("reached").asDouble()).isCloseTo(0.5, within(1e-3));
        assertThat(j.get("change").asDouble()).isPositive();
        CliRun text = CliRun.of("tune", b[1].toString(), "--design", b[0].toString(), "--duty", "0.5");
        assertThat(text.exitCode()).isZero();
        assertThat(text.out()).startsWith("VR1's wiper is now at about 0.25").contains("move it to");
    }

    @Test
    void exactlyOneTargetAndAPotAreRequired() throws IOException {
        Path[] b = board();
        CliRun two = CliRun.of("tune", b[1].toString(), "--design", b[0].toString(), "--duty", "0.5", "--frequency", "1k");
        assertThat(two.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        CliRun none = CliRun.of("tune", b[1].toString(), "--design", b[0].toString());
        assertThat(none.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        Path astable = dir.resolve("astable.toml");
        Files.writeString(astable, CheckCommandTest.ASTABLE);
        CliRun noPot = CliRun.of("tune", b[1].toString(), "--design", astable.toString(), "--frequency", "1k");
        assertThat(noPot.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(noPot.err()).contains("no potentiometer");
        CliRun width = CliRun.of("tune", b[1].toString(), "--design", b[0].toString(), "--pulse-width", "10ms");
        assertThat(width.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(width.err()).contains("only a monostable has a pulse width");
    }

    // check-values.md, pot PWM: the duty is linear in the wiper (0.2574 at 0.25, 0.5050 at 0.5), so a
    // wiper at 0.6 is 0.10 of the travel from the design's 0.5; the demo Lumen's VR1 has travel =
    // "270 deg" in its design file, so that is 27°.
    @Test
    void liveFromASimulatedBoardWithTheTravelFromTheDesign() {
        CliRun run = CliRun.of("tune", "--sim", "demo:lumen-dm1", "--fault", "VR1.wiper=0.6", "--duty", "0.4959",
                "--db", dir.resolve("history.db").toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).startsWith("VR1's wiper is now at about 0.60").contains("move it to 0.50")
                .contains("by 0.10 of the travel (about 27° of its 270° travel)");
    }
}
