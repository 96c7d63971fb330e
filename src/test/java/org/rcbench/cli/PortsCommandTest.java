package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.testing.CliRun;

class PortsCommandTest {
    @Test
    void aMissingDeviceIsOneLineAndExitTwo(@TempDir Path dir) {
        String device = dir.resolve("ttyACM3").toString();
        CliRun run = CliRun.of("ports", device);
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).isEqualTo("rcbench: " + device + ": no such port: is the probe plugged in?\n");
    }

    @Test
    void anAccessibleDeviceIsReportedOk() {
        // /dev/null exists on every Linux machine and anyone may read and write it.
        CliRun run = CliRun.of("ports", "/dev/null");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.OK);
        assertThat(run.out()).startsWith("/dev/null  ok: you may open it");
    }

    @Test
    void listingNeverFails() {
        CliRun run = CliRun.of("ports");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.OK);
        assertThat(run.out()).satisfiesAnyOf(
                out -> assertThat(out).startsWith("no serial ports found"),
                out -> assertThat(out).contains("Open a probe by path or by USB id"));
    }
}
