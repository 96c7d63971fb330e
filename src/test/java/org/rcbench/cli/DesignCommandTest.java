package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.testing.CliRun;

class DesignCommandTest {
    @TempDir
    Path dir;

    @Test
    void listsCandidatesAndSavesTheBest() {
        Path out = dir.resolve("best.toml");
        CliRun run = CliRun.of("design", "--topology", "astable", "--frequency", "1k", "--duty", "0.6", "--supply", "9",
                "--family", "cmos", "--series", "E24", "--count", "3", "--save", out.toString());
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCodes.OK);
        assertThat(run.out()).contains("1. R1=", "2. R1=", "3. R1=", "worst case", "95 %", "wrote the first candidate");
        Design d = DesignReader.read(out);
        assertThat(d.circuit().family().fileName()).isEqualTo("cmos");
        assertThat(d.circuit().supplyVolts()).isEqualTo(9);
    }

    @Test
    void pulseWidthForMonostables() {
        CliRun run = CliRun.of("design", "--topology", "monostable", "--pulse", "150m", "--supply", "12", "--count", "1");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(ExitCodes.OK);
        assertThat(run.out()).contains("pulse 150.0 ms", "1. R1=");
    }

    // picocli value converters quote the bad text.
    @Test
    void badValuesAreQuoted() {
        CliRun run = CliRun.of("design", "--topology", "astable", "--frequency", "4k7k", "--duty", "0.6", "--supply", "9");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).contains("\"4k7k\" is not a frequency");
        CliRun duty = CliRun.of("design", "--topology", "astable", "--frequency", "1k", "--duty", "1.5", "--supply", "9");
        assertThat(duty.err()).contains("\"1.5\" is not between 0 and 1");
    }

    @Test
    void unknownTopologyIsOneLine() {
        CliRun run = CliRun.of("design", "--topology", "astabel", "--frequency", "1k", "--supply", "9");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err().strip()).startsWith("rcbench: --topology: unknown topology \"astabel\"");
    }

    @Test
    void aPlainAstableBelowHalfDutyPointsToTheDiodeVersions() {
        CliRun run = CliRun.of("design", "--topology", "astable", "--frequency", "1k", "--duty", "40%", "--supply", "9");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).contains("astable-two-diode");
    }
}
