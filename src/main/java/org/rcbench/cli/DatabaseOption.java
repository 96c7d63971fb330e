package org.rcbench.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.rcbench.common.BadInputException;
import org.rcbench.history.DataFolder;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.StoreOptions;
import org.rcbench.source.HistoryCalibrations;
import picocli.CommandLine.Option;

/**
 * The {@code --db PATH} and {@code --db-wait SECONDS} options shared by every command that uses the
 * history, and the opening of the store with its warnings printed on stderr.
 */
public final class DatabaseOption {
    @Option(names = "--db", paramLabel = "PATH",
            description = "History database file (default: rcbench/history.db in your data folder,"
                    + " e.g. ~/.local/share/rcbench/history.db on Linux).")
    Path db;

    @Option(names = "--db-wait", paramLabel = "SECONDS", defaultValue = "10",
            description = "How long to wait for another rcbench that is writing to the history (default: ${DEFAULT-VALUE} s).")
    double waitSeconds;

    /** The history file: {@code --db}, or the default in the user's data folder. */
    public Path path() {
        return db != null ? db : DataFolder.defaultDatabase();
    }

    /** Whether the history file exists already. */
    public boolean exists() {
        return Files.exists(path());
    }

    /** Opens (creating when missing) the history, printing any warning on {@code err}. */
    public HistoryStore open(PrintWriter err) {
        HistoryStore store = HistoryStore.open(path(), StoreOptions.DEFAULTS.withBusyTimeoutMillis(waitMillis()));
        for (String w : store.warnings()) {
            err.println("rcbench: warning: " + w);
        }
        err.flush();
        return store;
    }

    /** The probe calibrations kept in this history (opened when first needed, waiting as {@code --db-wait} says). */
    public HistoryCalibrations calibrations() {
        return HistoryCalibrations.at(path(), waitMillis());
    }

    /** {@code --db-wait} in milliseconds, checked. */
    private int waitMillis() {
        if (!(waitSeconds >= 0) || waitSeconds > 86_400) {
            throw new BadInputException("--db-wait", "must be 0 to 86400 seconds, not " + waitSeconds);
        }
        return (int) Math.round(waitSeconds * 1000);
    }

    /**
     * Opens an existing history for reading.
     *
     * @throws BadInputException when there is no history file yet
     */
    public HistoryStore openExisting(PrintWriter err) {
        if (!exists()) {
            throw new BadInputException(path().toString(), "no history here yet (rcbench check --save creates it)");
        }
        return open(err);
    }
}
