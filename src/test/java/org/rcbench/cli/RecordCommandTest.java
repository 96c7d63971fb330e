package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;
import org.rcbench.source.DemoDesigns;
import org.rcbench.testing.CliRun;
import org.rcbench.testing.RecordingSink;

/** {@code rcbench record}, in-process, on the simulated board at fast pace. */
class RecordCommandTest {

    static RecordingSink read(Path file) throws Exception {
        RecordingSink sink = new RecordingSink();
        try (Capture c = CaptureFiles.open(file)) {
            c.streamTo(sink);
            assertThat(c.warnings()).isEmpty();
        }
        return sink;
    }

    @Test
    void recordsExactlyTheBoardsEdgesForTheGivenProbeTime(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("piper.rce");
        CliRun r = CliRun.of("record", "--sim", "demo:piper-mk2", "--fault", "C1=-25%", "--jitter", "1us", "--seed", "3",
                "--sim-speed", "fast", "--duration", "5s", "-o", file.toString(), "--db",
                dir.resolve("history.db").toString());
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).startsWith("recorded ").contains(file.toString());
        RecordingSink got = read(file);
        // The truth: the same board straight into a sink, shifted so that its power-up edge is tick 0.
        RecordingSink truth = new RecordingSink();
        SimulationSpec spec = SimulationSpec.defaults().withDeviation(Deviation.parse("C1=-25%"))
                .withJitterSeconds(1e-6).withSeed(3);
        VirtualBoard.of(DemoDesigns.resolve("demo:piper-mk2"), spec).runFor(6, truth);
        long first = truth.edges.get(0).tick();
        long limit = 5 * 16_000_000L;
        List<RecordingSink.Edge> expected = truth.edges.stream().filter(e -> e.tick() - first <= limit)
                .map(e -> new RecordingSink.Edge(e.tick() - first, e.channel(), e.level())).toList();
        assertThat(got.edges).isEqualTo(expected);
        assertThat(got.endTick).isEqualTo(limit);
        String text = Files.readString(file);
        assertThat(text).contains("# simulation=demo:piper-mk2 C1=-25% jitter=1.000µs clock=16000000Hz+0ppm seed=3")
                .contains("# channel.0=output").contains("# probe_id=72636273696d0001")
                .contains("# calibration_u_ppm=");
    }

    @Test
    void theRecordingMeasuresAsTheModelPredicts(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("aged.rce.gz");
        CliRun r = CliRun.of("record", "--sim", "demo:piper-mk2", "--fault", "C1=-25%", "--sim-speed", "fast",
                "--duration", "3s", "--gzip", "-o", file.toString(), "--db", dir.resolve("history.db").toString());
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        CliRun m = CliRun.of("measure", "--json", file.toString());
        assertThat(m.exitCode()).as(m.err()).isEqualTo(ExitCodes.OK);
        double f = new com.fasterxml.jackson.databind.ObjectMapper().readTree(m.out()).get("frequency_hz").asDouble();
        SimulationSpec spec = SimulationSpec.defaults().withDeviation(Deviation.parse("C1=-25%"));
        double predicted = VirtualBoard.of(DemoDesigns.resolve("demo:piper-mk2"), spec).predicted().frequencyHz();
        assertThat(f).isCloseTo(predicted, within(predicted * 1e-6));
    }

    @Test
    void anExistingFileIsNeverReplaced(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("keep.rce");
        Files.writeString(file, "precious");
        CliRun r = CliRun.of("record", "--sim", "demo:piper-mk2", "--sim-speed", "fast", "--duration", "1s", "-o",
                file.toString());
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).isEqualTo("rcbench: " + file + ": already exists; choose another name or add --overwrite\n");
        assertThat(Files.readString(file)).isEqualTo("precious");
    }

    @Test
    void aFaultNamingNoPartIsOneLine(@TempDir Path dir) {
        CliRun r = CliRun.of("record", "--sim", "demo:piper-mk2", "--fault", "C7=-35%", "-o",
                dir.resolve("x.rce").toString());
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).isEqualTo("rcbench: --fault: \"C7=-35%\": Piper Mk2 has no part or parameter \"C7\""
                + " (parts: R1, R2, C1, C2; also leak, control, supply, family.*)\n");
        assertThat(dir.resolve("x.rce")).doesNotExist();
    }

    @Test
    void sourceOptionsConflictOrMisfitAsOneLine(@TempDir Path dir) {
        String out = dir.resolve("x.rce").toString();
        CliRun both = CliRun.of("record", "--sim", "demo:wren", "--port", "/dev/null", "-o", out);
        assertThat(both.err()).isEqualTo("rcbench: source: give one of --port, --sim and --replay\n");
        CliRun misfit = CliRun.of("record", "--port", "/dev/ttyNOPE", "--jitter", "1us", "-o", out);
        assertThat(misfit.err()).isEqualTo("rcbench: --jitter: only for a simulated board (--sim), not with --port\n");
        CliRun demo = CliRun.of("record", "--sim", "demo:nope", "-o", out);
        assertThat(demo.err()).startsWith("rcbench: demo:nope: no such built-in design (demo:piper-mk2, ");
        CliRun ripple = CliRun.of("record", "--sim", "demo:piper-mk2", "--ripple", "0.5V", "-o", out);
        assertThat(ripple.err()).isEqualTo("rcbench: --ripple: \"0.5V\" is not VALUE@VALUE (e.g. 0.5V@100Hz)\n");
        CliRun speed = CliRun.of("record", "--sim", "demo:piper-mk2", "--sim-speed", "warp", "-o", out);
        assertThat(speed.err()).isEqualTo("rcbench: --sim-speed: \"warp\" is not realtime or fast\n");
        for (CliRun r : List.of(both, misfit, demo, ripple, speed)) {
            assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        }
    }

    @Test
    void aMissingPortIsOneLineAndWritesNothing(@TempDir Path dir) {
        Path out = dir.resolve("x.rce");
        CliRun r = CliRun.of("record", "--port", dir.resolve("ttyGONE").toString(), "--probe-type", "stream", "-o",
                out.toString());
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).startsWith("rcbench: " + dir.resolve("ttyGONE") + ": no such port");
        assertThat(out).doesNotExist();
    }

    @Test
    void anUnplugMidRecordingIsReportedAndTheRecordingStaysIntact(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("unplug.rce");
        CliRun r = CliRun.of("record", "--sim", "demo:piper-mk2", "--sim-speed", "fast", "--sim-unplug", "2s:0.5s",
                "--duration", "4s", "-o", file.toString(), "--db", dir.resolve("history.db").toString());
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        RecordingSink got = read(file);
        int gap = 0;
        while (got.edges.get(gap).level() != org.rcbench.edge.EdgeSink.UNKNOWN) {
            gap++;
        }
        // About 2 s of a 690 Hz square wave before the cable came out: 2760 edges, all kept.
        assertThat(gap).isBetween(2700, 2800);
        assertThat(got.edges.stream().filter(e -> e.level() == org.rcbench.edge.EdgeSink.UNKNOWN)).hasSize(1);
        assertThat(got.edges.size() - gap - 1).as("recording resumed after the replug").isGreaterThan(2000);
        assertThat(r.out()).contains("(1 gaps)");
    }
}
