package org.rcbench.history;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.rcbench.common.BadInputException;
import org.sqlite.SQLiteConfig;

/**
 * The history file: runs of {@code rcbench check} and probe clock calibrations, in one SQLite
 * database that several processes may use at once (the bench window open while a script checks
 * boards).
 *
 * <p>Opening creates the file and its folder when missing and migrates an older schema forward
 * ({@link Schema}). The connection is configured through {@link SQLiteConfig}: write-ahead log with
 * {@code synchronous=NORMAL} on local disks; on a network or FUSE file system (from the mount
 * table, see {@link MountTable}) the rollback journal with {@code synchronous=FULL} and a warning,
 * because WAL needs shared memory those lack; a busy timeout; foreign keys enforced. Every write is
 * one {@code BEGIN IMMEDIATE} transaction, so a run is stored whole or not at all: a process killed
 * mid-write leaves the file as it was before that run (SQLite's atomic commit), and a second writer
 * waits up to the busy timeout instead of failing at once. Reads see only committed runs.
 *
 * <p>User-fixable failures (locked beyond the timeout, not a database, damaged, read-only, newer
 * schema) throw {@link BadInputException} naming the file. Thread-safe: one connection, every
 * method synchronised (one writer per process; SQLite serialises the processes). A write can wait up
 * to the busy timeout for another process, so a window should call it off its UI thread.
 */
public final class HistoryStore implements AutoCloseable {
    private final String name;
    private final StoreOptions options;
    private final Connection connection;
    private final List<String> warnings;
    private final String journalMode;
    private boolean closed;

    private HistoryStore(String name, StoreOptions options, Connection connection, List<String> warnings,
            String journalMode) {
        this.name = name;
        this.options = options;
        this.connection = connection;
        this.warnings = List.copyOf(warnings);
        this.journalMode = journalMode;
    }

    /** Opens (creating when missing) the history at {@code file} with {@link StoreOptions#DEFAULTS}. */
    public static HistoryStore open(Path file) {
        return open(file, StoreOptions.DEFAULTS);
    }

    /**
     * Opens (creating when missing) the history at {@code file}.
     *
     * @throws BadInputException naming the file when it cannot be used
     */
    public static HistoryStore open(Path file, StoreOptions options) {
        Path abs = file.toAbsolutePath().normalize();
        String name = abs.toString();
        if (Files.isDirectory(abs)) {
            throw new BadInputException(name, "is a folder, not a history database");
        }
        try {
            Files.createDirectories(abs.getParent());
        } catch (IOException e) {
            throw new BadInputException(abs.getParent().toString(),
                    "cannot create the folder for the history database (" + e.getMessage() + ")", e);
        }
        List<String> warnings = new ArrayList<>();
        Optional<String> network = MountTable.read(options.mountTable()).networkTypeOf(abs.getParent());
        SQLiteConfig config = new SQLiteConfig();
        if (network.isPresent()) {
            config.setJournalMode(SQLiteConfig.JournalMode.DELETE);
            config.setSynchronous(SQLiteConfig.SynchronousMode.FULL);
            warnings.add(name + ": on a " + network.get() + " network file system: using the rollback journal"
                    + " instead of the write-ahead log; keep the history on a local disk if you can, and never"
                    + " open it from two machines at once");
        } else {
            config.setJournalMode(SQLiteConfig.JournalMode.WAL);
            config.setSynchronous(SQLiteConfig.SynchronousMode.NORMAL);
        }
        config.setBusyTimeout(options.busyTimeoutMillis());
        config.enforceForeignKeys(true);
        config.setTransactionMode(SQLiteConfig.TransactionMode.IMMEDIATE);
        Connection c = null;
        try {
            c = config.createConnection("jdbc:sqlite:" + name);
            String mode = Schema.pragmaText(c, "journal_mode");
            if (network.isEmpty() && !mode.equalsIgnoreCase("wal")) {
                warnings.add(name + ": SQLite refused the write-ahead log here (journal mode " + mode
                        + "); concurrent use will wait more");
            }
            HistoryStore store = new HistoryStore(name, options, c, warnings, mode.toLowerCase(Locale.ROOT));
            if (Schema.version(c) != Schema.CURRENT || Schema.pragmaInt(c, "application_id") != Schema.APPLICATION_ID) {
                store.write(conn -> {
                    Schema.migrate(conn, Schema.CURRENT, name);
                    return null;
                });
            }
            return store;
        } catch (SQLException e) {
            closeQuietly(c, e);
            throw SqlErrors.translate(name, e, options.busyTimeoutMillis());
        } catch (RuntimeException e) {
            closeQuietly(c, e);
            throw e;
        }
    }

    /** The file's absolute path as text. */
    public String name() {
        return name;
    }

    /** Problems found on opening that did not stop it (network file system...), one line each. */
    public List<String> warnings() {
        return warnings;
    }

    /** SQLite's journal mode in use: {@code wal}, or {@code delete} on a network file system. */
    public String journalMode() {
        return journalMode;
    }

    /** The schema version of the file (after migration, {@code 2}). */
    public synchronized int schemaVersion() {
        return read(Schema::version);
    }

    /** Saves {@code run} as a new run (its id is ignored) in one transaction; returns the new id (&ge; 1). */
    public synchronized long saveRun(RunRecord run) {
        return write(c -> RunWriter.insert(c, run));
    }

    /** The runs {@code filter} selects, oldest first (the newest {@code limit} of them). */
    public synchronized List<RunSummary> runs(RunFilter filter) {
        return read(c -> RunReader.summaries(c, filter));
    }

    /** The run numbered {@code id}, or empty when there is none. */
    public synchronized Optional<RunRecord> run(long id) {
        return read(c -> RunReader.run(c, id));
    }

    /** The run saved last, or empty when the history has none. */
    public synchronized Optional<RunRecord> last() {
        return read(c -> {
            long id = RunReader.lastId(c);
            return id == 0 ? Optional.<RunRecord>empty() : RunReader.run(c, id);
        });
    }

    /**
     * One trend per unit (board and serial) and part among the runs whose board name (any case) or
     * serial is {@code boardOrSerial} (null: every run), ordered by board, serial and part.
     */
    public synchronized List<PartTrend> partTrends(String boardOrSerial) {
        return read(c -> RunReader.trends(c, boardOrSerial));
    }

    /** The trend of {@code part} of the unit {@code board} / {@code serial} (null serial: runs without one). */
    public synchronized Optional<PartTrend> partTrend(String board, String serial, String part) {
        return read(c -> RunReader.trends(c, serial == null ? board : serial)).stream()
                .filter(t -> t.board().equalsIgnoreCase(board) && Objects.equals(t.serial(), serial)
                        && t.part().equals(part))
                .findFirst();
    }

    /** Saves a probe clock calibration; returns its id. */
    public synchronized long saveCalibration(ProbeCalibration cal) {
        return write(c -> {
            try (PreparedStatement s = c.prepareStatement("INSERT INTO probe_calibration (probe_id, offset_ppm,"
                    + " uncertainty_ppm, reference, measured_utc) VALUES (?, ?, ?, ?, ?) RETURNING id")) {
                s.setString(1, cal.probeId());
                s.setDouble(2, cal.offsetPpm());
                s.setDouble(3, cal.uncertaintyPpm());
                s.setString(4, cal.reference());
                s.setString(5, UtcText.format(cal.measuredAt()));
                try (ResultSet rs = s.executeQuery()) {
                    rs.next();
                    return rs.getLong(1);
                }
            }
        });
    }

    /** The most recent calibration of {@code probeId} (by its time, then by saving order), or empty. */
    public synchronized Optional<ProbeCalibration> latestCalibration(String probeId) {
        List<ProbeCalibration> all = calibrations(probeId);
        return all.isEmpty() ? Optional.empty() : Optional.of(all.get(all.size() - 1));
    }

    /** Every calibration of {@code probeId}, oldest first. */
    public synchronized List<ProbeCalibration> calibrations(String probeId) {
        return read(c -> {
            List<ProbeCalibration> out = new ArrayList<>();
            try (PreparedStatement s = c.prepareStatement("SELECT * FROM probe_calibration WHERE probe_id = ?"
                    + " ORDER BY measured_utc, id")) {
                s.setString(1, probeId);
                try (ResultSet rs = s.executeQuery()) {
                    while (rs.next()) {
                        out.add(new ProbeCalibration(rs.getLong("id"), rs.getString("probe_id"),
                                rs.getDouble("offset_ppm"), rs.getDouble("uncertainty_ppm"), rs.getString("reference"),
                                UtcText.parse(rs.getString("measured_utc"))));
                    }
                }
            }
            return out;
        });
    }

    /** SQLite's {@code PRAGMA integrity_check}: {@code ok}, or its first problems one per line. */
    public synchronized String integrityCheck() {
        return read(c -> {
            StringBuilder sb = new StringBuilder();
            try (Statement s = c.createStatement(); ResultSet rs = s.executeQuery("PRAGMA integrity_check")) {
                while (rs.next()) {
                    sb.append(sb.length() == 0 ? "" : "\n").append(rs.getString(1));
                }
            }
            return sb.toString();
        });
    }

    @Override
    public synchronized void close() {
        if (!closed) {
            closed = true;
            try {
                connection.close();
            } catch (SQLException e) {
                throw SqlErrors.translate(name, e, options.busyTimeoutMillis());
            }
        }
    }

    /** Work on the connection. */
    interface Work<T> {
        T run(Connection c) throws SQLException;
    }

    /**
     * Runs {@code work} inside {@code BEGIN IMMEDIATE ... COMMIT}; rolls back on any failure.
     * Explicit statements on an auto-commit connection, because the driver's non-auto-commit mode
     * opens the next transaction as soon as one commits and would hold the write lock.
     */
    synchronized <T> T write(Work<T> work) {
        ensureOpen();
        try {
            execute("BEGIN IMMEDIATE");
            boolean done = false;
            try {
                T result = work.run(connection);
                execute("COMMIT");
                done = true;
                return result;
            } finally {
                if (!done) {
                    rollbackQuietly();
                }
            }
        } catch (SQLException e) {
            throw SqlErrors.translate(name, e, options.busyTimeoutMillis());
        }
    }

    private <T> T read(Work<T> work) {
        ensureOpen();
        try {
            return work.run(connection);
        } catch (SQLException e) {
            throw SqlErrors.translate(name, e, options.busyTimeoutMillis());
        }
    }

    private void execute(String sql) throws SQLException {
        try (Statement s = connection.createStatement()) {
            s.execute(sql);
        }
    }

    private void rollbackQuietly() {
        try {
            execute("ROLLBACK");
        } catch (SQLException ignored) {
            // Not in a transaction any more (BEGIN failed, or SQLite rolled back itself): nothing to undo.
        }
    }

    private void ensureOpen() {
        if (closed) {
            throw new IllegalStateException("history " + name + " is closed");
        }
    }

    private static void closeQuietly(Connection c, Exception cause) {
        if (c != null) {
            try {
                c.close();
            } catch (SQLException e) {
                cause.addSuppressed(e);
            }
        }
    }
}
