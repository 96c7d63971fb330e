package org.rcbench.source;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.ProbeCalibration;
import org.rcbench.history.StoreOptions;
import org.rcbench.probe.CalibrationStore;
import org.rcbench.probe.StoredCalibration;

/**
 * Probe calibrations kept in the history database ({@link HistoryStore#saveCalibration},
 * {@link HistoryStore#latestCalibration}). The file is opened for each call and closed again
 * (calls are rare: one per session start, one per calibration); looking up in a history that does
 * not exist yet finds nothing and creates nothing. Thread-safe.
 */
public final class HistoryCalibrations implements CalibrationStore {
    private final Path file;
    private final StoreOptions options;

    private HistoryCalibrations(Path file, StoreOptions options) {
        this.file = file;
        this.options = options;
    }

    /** The calibrations in the history at {@code file}, waiting up to {@code busyTimeoutMillis} for other writers. */
    public static HistoryCalibrations at(Path file, int busyTimeoutMillis) {
        return new HistoryCalibrations(file, StoreOptions.DEFAULTS.withBusyTimeoutMillis(busyTimeoutMillis));
    }

    /** The history file. */
    public Path file() {
        return file;
    }

    @Override
    public void save(StoredCalibration c) {
        try (HistoryStore store = HistoryStore.open(file, options)) {
            store.saveCalibration(ProbeCalibration.of(c.probeId(), c.offsetPpm(), c.uncertaintyPpm(), c.reference(),
                    c.measuredAt()));
        }
    }

    @Override
    public Optional<StoredCalibration> latest(String probeIdHex) {
        if (!Files.exists(file)) {
            return Optional.empty();
        }
        try (HistoryStore store = HistoryStore.open(file, options)) {
            return store.latestCalibration(probeIdHex).map(p -> new StoredCalibration(p.probeId(), p.offsetPpm(),
                    p.uncertaintyPpm(), p.reference(), p.measuredAt()));
        }
    }
}
