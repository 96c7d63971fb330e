package org.rcbench.history;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Instant;

/**
 * A separate process using the history, for {@link HistoryConcurrencyTest}. Test use only.
 *
 * <pre>
 * save DB SERIAL N   wait for a line on stdin, then save N runs of SERIAL one by one; print "saved N"
 * hold DB N          save N runs of unit HELD, then insert one more inside a write transaction,
 *                    print "inside" and sleep there until killed
 * -Drcbench.test.mounts=FILE  consult FILE as the mount table (to force the rollback journal)
 * </pre>
 */
public final class HistoryChildMain {
    private HistoryChildMain() {
    }

    public static void main(String[] args) throws Exception {
        Path db = Path.of(args[1]);
        int n = Integer.parseInt(args[args.length - 1]);
        Instant t0 = Instant.parse("2024-01-01T00:00:00Z");
        String mounts = System.getProperty("rcbench.test.mounts");
        StoreOptions options = mounts == null ? StoreOptions.DEFAULTS : StoreOptions.DEFAULTS.withMountTable(Path.of(mounts));
        try (HistoryStore store = HistoryStore.open(db, options)) {
            if (args[0].equals("save")) {
                new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8)).readLine();
                for (int i = 0; i < n; i++) {
                    store.saveRun(Fixtures.run(args[2], t0.plusSeconds(i), 1e-7 - i * 1e-10));
                }
                System.out.println("saved " + n);
            } else {
                for (int i = 0; i < n; i++) {
                    store.saveRun(Fixtures.run("HELD", t0.plusSeconds(i), 1e-7));
                }
                store.write(c -> {
                    RunWriter.insert(c, Fixtures.run("PARTIAL", t0.plusSeconds(n), 1e-7));
                    System.out.println("inside");
                    System.out.flush();
                    try {
                        Thread.sleep(600_000);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    return null;
                });
            }
        }
        System.out.flush();
    }
}
