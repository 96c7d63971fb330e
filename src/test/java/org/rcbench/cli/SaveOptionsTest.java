package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.history.DesignRef;
import org.rcbench.history.Digests;
import org.rcbench.history.Fixtures;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.RunRecord;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine;

/**
 * {@link SaveOptions} used as the check command will use it, through a stand-in command that takes
 * its check document from a file (the shape fixture) instead of computing it.
 */
class SaveOptionsTest {
    @TempDir
    Path dir;

    @Command(name = "check-stand-in")
    static final class CheckStandIn implements Callable<Integer> {
        @CommandLine.Spec
        CommandLine.Model.CommandSpec spec;

        @Parameters(index = "0")
        Path capture;

        @Option(names = "--design", required = true)
        Path design;

        @Option(names = "--result", required = true)
        Path result;

        @Mixin
        SaveOptions save;

        @Override
        public Integer call() throws Exception {
            save.validate();
            JsonNode doc = new ObjectMapper().readTree(result.toFile());
            spec.commandLine().getOut().println(doc.path("verdict").asText());
            if (save.requested()) {
                try (Capture c = CaptureFiles.open(capture)) {
                    save.save(doc, new SaveOptions.Request("TestBoard-A", DesignRef.of(design.getFileName().toString(),
                            Files.readString(design)), capture, SaveOptions.probeOf(c, c.timebase(), "capture header")),
                            spec.commandLine().getErr());
                }
            }
            return ExitCodes.OK;
        }
    }

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        PrintWriter o = new PrintWriter(out, true, StandardCharsets.UTF_8);
        PrintWriter e = new PrintWriter(err, true, StandardCharsets.UTF_8);
        CommandLine cl = Cli.commandLine(o, e);
        cl.addSubcommand(new CheckStandIn());
        // settings given before a subcommand is added do not reach it: hand Cli's on again
        cl.setOut(o).setErr(e).setExecutionExceptionHandler(cl.getExecutionExceptionHandler())
                .setParameterExceptionHandler(cl.getParameterExceptionHandler());
        int code = cl.execute(args);
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private Path[] files() throws Exception {
        StringBuilder sb = new StringBuilder("# rcbench edges v1\n# clock_hz=1000000\n# calibration_ppm=20\n"
                + "# calibration_u_ppm=2\n# probe=probe-3\n# firmware=0.9.1\n# channel.0=out\ntick,channel,level\n");
        for (int i = 0; i < 101; i++) {
            sb.append(1000L * i).append(",0,1\n").append(1000L * i + 400).append(",0,0\n");
        }
        Path capture = dir.resolve("c.rce");
        Files.writeString(capture, sb.toString());
        Path design = dir.resolve("board-a.toml");
        Files.writeString(design, "# design under test\n");
        var doc = Fixtures.check();
        Path result = dir.resolve("result.json");
        Files.writeString(result, doc.toString());
        return new Path[] {capture, design, result};
    }

    @Test
    void saveStoresTheRunWithItsContextAndTheDocumentsPlots() throws Exception {
        Path[] f = files();
        Path db = dir.resolve("h.db");
        Run r = run("check-stand-in", f[0].toString(), "--design", f[1].toString(), "--result", f[2].toString(), "--save",
                "--serial", "SN-77", "--note", "first article", "--db", db.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).isEqualTo("marginal\n");
        assertThat(r.err()).isEqualTo("rcbench: saved as run 1 in " + db.toAbsolutePath() + "\n");
        try (HistoryStore store = HistoryStore.open(db)) {
            RunRecord run = store.last().orElseThrow();
            assertThat(run.context().serial()).isEqualTo("SN-77");
            assertThat(run.context().note()).isEqualTo("first article");
            assertThat(run.context().board()).isEqualTo("TestBoard-A");
            assertThat(run.context().design().name()).isEqualTo("board-a.toml");
            assertThat(run.context().design().sha256()).isEqualTo(Digests.sha256("# design under test\n"));
            assertThat(run.context().capture().path()).isEqualTo(f[0].toAbsolutePath().toString());
            assertThat(run.context().probe().probeId()).isEqualTo("probe-3");
            assertThat(run.context().probe().firmware()).isEqualTo("0.9.1");
            assertThat(run.context().probe().clockOffsetPpm()).isEqualTo(20);
            assertThat(run.context().probe().clockUncertaintyPpm()).isEqualTo(2);
            // The plots are the document's own (what the check computed), not recomputed from the capture.
            assertThat(run.content().histogram().counts()).containsExactly(10, 1800, 2100, 89);
            assertThat(run.content().histogram().edgesSeconds()).containsExactly(0.00098, 0.00099, 0.001, 0.00101, 0.00102);
            assertThat(run.content().trend()).extracting(p -> p.frequencyHz()).containsExactly(1000.2, 999.9, 999.8);
        }
    }

    @Test
    void aNoteWithoutSaveIsRefusedRatherThanLost() throws Exception {
        Path[] f = files();
        Run r = run("check-stand-in", f[0].toString(), "--design", f[1].toString(), "--result", f[2].toString(),
                "--note", "will it be kept?");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).isEqualTo("rcbench: --note: is stored only with --save\n");
    }
}
