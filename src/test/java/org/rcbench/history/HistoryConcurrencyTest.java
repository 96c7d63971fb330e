package org.rcbench.history;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Several processes on one real history file: concurrent writers lose nothing, and a writer killed
 * with SIGKILL ({@link Process#destroyForcibly()} on Linux) inside its transaction leaves a
 * consistent file without the partial run.
 */
class HistoryConcurrencyTest {
    private static final int RUNS_EACH = 100;

    @TempDir
    Path dir;

    @ParameterizedTest
    @ValueSource(strings = {"wal", "delete"})
    void twoWriterProcessesAtOnceLoseNoRun(String journal) throws Exception {
        Path db = dir.resolve("shared.db");
        StoreOptions options = StoreOptions.DEFAULTS;
        List<String> jvm = new ArrayList<>();
        if (journal.equals("delete")) {
            Path mounts = dir.resolve("mounts");
            Files.writeString(mounts, "server:/x " + dir.toRealPath() + " nfs rw 0 0\n");
            options = options.withMountTable(mounts);
            jvm.add("-Drcbench.test.mounts=" + mounts);
        }
        Process a = child(jvm, "save", db.toString(), "UNIT-A", Integer.toString(RUNS_EACH));
        Process b = child(jvm, "save", db.toString(), "UNIT-B", Integer.toString(RUNS_EACH));
        try (HistoryStore viewer = HistoryStore.open(db, options)) { // a third user, as the bench window would be
            assertThat(viewer.journalMode()).isEqualTo(journal);
            for (Process p : List.of(a, b)) {
                try (OutputStream go = p.getOutputStream()) {
                    go.write("go\n".getBytes(StandardCharsets.US_ASCII));
                }
            }
            int seen = 0;
            while (a.isAlive() || b.isAlive()) {
                int now = viewer.runs(RunFilter.ALL).size();
                assertThat(now).isGreaterThanOrEqualTo(seen); // runs only ever appear, whole
                seen = now;
                Thread.sleep(20);
            }
            assertThat(finish(a)).isEqualTo("saved " + RUNS_EACH);
            assertThat(finish(b)).isEqualTo("saved " + RUNS_EACH);
            List<RunSummary> all = viewer.runs(RunFilter.ALL);
            assertThat(all).hasSize(2 * RUNS_EACH);
            assertThat(viewer.runs(RunFilter.of("UNIT-A"))).hasSize(RUNS_EACH);
            assertThat(viewer.runs(RunFilter.of("UNIT-B"))).hasSize(RUNS_EACH);
            assertThat(new HashSet<>(all.stream().map(RunSummary::id).toList())).hasSize(2 * RUNS_EACH);
            for (RunSummary s : all) {
                RunRecord r = viewer.run(s.id()).orElseThrow();
                assertThat(r.content().estimates()).hasSize(2); // every run complete with its rows
                assertThat(r.content().measurements()).isNotEmpty();
            }
            assertThat(viewer.integrityCheck()).isEqualTo("ok");
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"wal", "delete"})
    void aWriterKilledInsideItsTransactionLeavesAConsistentFile(String journal) throws Exception {
        Path db = dir.resolve("killed.db");
        StoreOptions options = StoreOptions.DEFAULTS;
        List<String> jvm = new ArrayList<>();
        if (journal.equals("delete")) {
            // a mount table that puts the folder on NFS: the rollback journal is used
            Path mounts = dir.resolve("mounts");
            Files.writeString(mounts, "server:/x " + dir.toRealPath() + " nfs rw 0 0\n");
            options = options.withMountTable(mounts);
            jvm.add("-Drcbench.test.mounts=" + mounts);
        }
        Process p = child(jvm, "hold", db.toString(), "5");
        String line;
        try (BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
            line = out.readLine(); // blocks until the child is inside the transaction
            assertThat(line).isEqualTo("inside");
            if (journal.equals("wal")) {
                try (HistoryStore meanwhile = HistoryStore.open(db, options)) {
                    assertThat(meanwhile.runs(RunFilter.ALL)).hasSize(5); // the open transaction is invisible
                }
            } else {
                assertThat(Files.exists(dir.resolve("killed.db-journal"))).isTrue(); // mid-transaction
            }
            p.destroyForcibly();
            assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
        } finally {
            p.destroyForcibly();
        }
        assertThat(p.exitValue()).isEqualTo(137); // 128 + SIGKILL: really killed, not ended
        try (HistoryStore after = HistoryStore.open(db, options)) {
            assertThat(after.journalMode()).isEqualTo(journal);
            assertThat(after.integrityCheck()).isEqualTo("ok");
            assertThat(after.runs(RunFilter.ALL)).hasSize(5).extracting(RunSummary::serial).containsOnly("HELD");
            assertThat(after.runs(RunFilter.of("PARTIAL"))).isEmpty();
            assertThat(after.partTrends("PARTIAL")).isEmpty();
            // and it takes new runs
            assertThat(after.saveRun(Fixtures.run("NEXT", java.time.Instant.now(), 1e-7))).isEqualTo(6);
        }
    }

    private static Process child(String... args) throws IOException {
        return child(List.of(), args);
    }

    private static Process child(List<String> jvmOptions, String... args) throws IOException {
        String java = System.getProperty("java.home") + File.separator + "bin" + File.separator + "java";
        List<String> cmd = new ArrayList<>(List.of(java));
        cmd.addAll(jvmOptions);
        cmd.addAll(List.of("-cp", System.getProperty("java.class.path"), HistoryChildMain.class.getName()));
        cmd.addAll(List.of(args));
        return new ProcessBuilder(cmd).redirectError(ProcessBuilder.Redirect.INHERIT).start();
    }

    private static String finish(Process p) throws Exception {
        assertThat(p.waitFor(120, TimeUnit.SECONDS)).isTrue();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertThat(p.exitValue()).as(out).isZero();
        return out;
    }
}
