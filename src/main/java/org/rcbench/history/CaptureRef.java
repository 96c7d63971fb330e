package org.rcbench.history;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;

/**
 * Where a run's capture file is and how to tell it is the same file: the path as stored, its size
 * and its SHA-256. The capture itself is not copied into the history.
 *
 * @param path      absolute path of the capture when it was checked
 * @param sizeBytes file size in bytes, &ge; 0
 * @param sha256    SHA-256 of the file's bytes, 64 lower-case hex digits
 */
public record CaptureRef(String path, long sizeBytes, String sha256) {
    public CaptureRef {
        Objects.requireNonNull(path, "path");
        if (sizeBytes < 0) {
            throw new IllegalArgumentException("sizeBytes < 0: " + sizeBytes);
        }
        if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("sha256 is not 64 lower-case hex digits: " + sha256);
        }
    }

    /** Reads {@code file} once for its size and hash; the path is stored absolute and normalised. */
    public static CaptureRef of(Path file) throws IOException {
        Path abs = file.toAbsolutePath().normalize();
        return new CaptureRef(abs.toString(), Files.size(abs), Digests.sha256(abs));
    }
}
