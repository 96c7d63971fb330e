package org.rcbench.record;

/**
 * How a {@link Recorder} writes its file.
 *
 * @param gzip                compress with gzip (sync-flushed, so a cut-off file still reads)
 * @param overwrite           replace an existing file; when false an existing file is an error,
 *                            so no earlier recording is lost by accident
 * @param flushIntervalMillis longest time, 1..1000 ms, an edge may wait in memory before it is
 *                            handed to the operating system
 */
public record RecorderOptions(boolean gzip, boolean overwrite, long flushIntervalMillis) {

    public RecorderOptions {
        if (flushIntervalMillis < 1 || flushIntervalMillis > 1000) {
            throw new IllegalArgumentException("flushIntervalMillis outside 1..1000: " + flushIntervalMillis);
        }
    }

    /** Plain text, no overwriting, flushed every 250 ms. */
    public static RecorderOptions defaults() {
        return new RecorderOptions(false, false, 250);
    }

    public RecorderOptions withGzip(boolean gzip) {
        return new RecorderOptions(gzip, overwrite, flushIntervalMillis);
    }

    public RecorderOptions withOverwrite(boolean overwrite) {
        return new RecorderOptions(gzip, overwrite, flushIntervalMillis);
    }

    public RecorderOptions withFlushIntervalMillis(long millis) {
        return new RecorderOptions(gzip, overwrite, millis);
    }
}
