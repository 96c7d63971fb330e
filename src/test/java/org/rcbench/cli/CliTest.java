package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.rcbench.testing.CliRun;

class CliTest {
    @Test
    void unknownOptionIsOneLineAndExitTwo() {
        CliRun run = CliRun.of("--no-such-option");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).startsWith("rcbench: Unknown option: '--no-such-option'");
        assertThat(run.err()).doesNotContain("at org.");
    }

    @Test
    void noArgumentsPrintsUsage() {
        CliRun run = CliRun.of();
        assertThat(run.exitCode()).isEqualTo(ExitCodes.OK);
        assertThat(run.out()).contains("Usage: rcbench");
    }
}
