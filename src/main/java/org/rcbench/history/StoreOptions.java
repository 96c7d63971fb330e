package org.rcbench.history;

import java.nio.file.Path;
import java.util.Objects;

/**
 * How a {@link HistoryStore} opens its file. Immutable; change with {@code with...}.
 *
 * @param busyTimeoutMillis how long a write waits for another process's write to finish before
 *                          giving up with "locked", ms, &ge; 0
 * @param mountTable        the mount table consulted for network file systems ({@code /proc/mounts})
 */
public record StoreOptions(int busyTimeoutMillis, Path mountTable) {
    /** 10 s wait, {@code /proc/mounts}. */
    public static final StoreOptions DEFAULTS = new StoreOptions(10_000, Path.of("/proc/mounts"));

    public StoreOptions {
        if (busyTimeoutMillis < 0) {
            throw new IllegalArgumentException("busyTimeoutMillis < 0: " + busyTimeoutMillis);
        }
        Objects.requireNonNull(mountTable, "mountTable");
    }

    public StoreOptions withBusyTimeoutMillis(int ms) {
        return new StoreOptions(ms, mountTable);
    }

    public StoreOptions withMountTable(Path file) {
        return new StoreOptions(busyTimeoutMillis, file);
    }
}
