package org.rcbench.record;

import java.io.IOException;
import java.io.OutputStream;
import java.io.FileOutputStream;
import java.io.FilterOutputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import org.rcbench.capture.EdgeCaptureWriter;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;

/**
 * Records a live edge stream to an rcbench edge-capture file, flushed so that a recorder killed at
 * any moment (even with SIGKILL) leaves a file that reads back up to the last flush.
 *
 * <p>When bytes reach the operating system: at the latest {@link RecorderOptions#flushIntervalMillis()}
 * after an edge arrives (default 250 ms, never more than one second), at once on a gap
 * ({@link EdgeSink#UNKNOWN}), on {@link #flush()}, and on {@link #onEnd(long)} / {@link #close()},
 * which also write the {@code # end_tick} trailer (end only) and sync the file to the disk. A kill
 * between flushes loses at most the last interval; the line being written when the kill came may
 * be cut short, which the reader reports as a warning and skips.
 *
 * <p>Why a background flusher and not a {@code poll()} the reader loop must call: the guarantee
 * then holds whatever the caller does. A serial read may block for a long time on a silent line,
 * and the edges that arrived just before the silence must still reach the file within the
 * interval. The cost is one uncontended lock per edge (tens of nanoseconds, against the
 * microseconds between edges a USB probe can deliver); the flusher takes the same lock for the
 * few microseconds of a flush. It is a daemon thread and stops on close.
 *
 * <p>Errors: a failed write (disk full, device gone) stops the recording. The file keeps what was
 * already written; it is never truncated or deleted. The failure surfaces as a
 * {@link BadInputException} naming the file on the next call from the caller (or at once, if the
 * caller's own call failed). Thread-safe.
 */
public final class Recorder implements EdgeSink, AutoCloseable {
    private final String name;
    private final Object lock = new Object();
    private final ScheduledExecutorService flusher;

    // Guarded by lock.
    private final EdgeCaptureWriter writer;
    private long edgesWritten;
    private long edgesFlushed;
    private boolean dirty;
    private boolean closed;
    private IOException failure;

    private Recorder(String name, OutputStream out, Map<String, String> header, RecorderOptions options)
            throws IOException {
        this.name = name;
        this.writer = EdgeCaptureWriter.to(out, header, options.gzip());
        this.flusher = Executors.newSingleThreadScheduledExecutor(r -> {
            Thread t = new Thread(r, "rcbench-recorder-flush " + name);
            t.setDaemon(true);
            return t;
        });
        this.dirty = true; // the header
        flusher.scheduleWithFixedDelay(this::periodicFlush, options.flushIntervalMillis(),
                options.flushIntervalMillis(), TimeUnit.MILLISECONDS);
    }

    /**
     * Starts recording to {@code file}, writing the header at once.
     *
     * @param header the capture header, see {@link org.rcbench.capture.EdgeCaptureFormat#header}
     * @throws BadInputException naming the file when it exists (and overwriting is off), its folder
     *                           is missing, or it cannot be created
     */
    public static Recorder create(Path file, Map<String, String> header, RecorderOptions options) {
        String name = file.toString();
        FileOutputStream out;
        try {
            if (!options.overwrite()) {
                Files.createFile(file); // atomic: never replaces an earlier recording
            }
            // A FileOutputStream, not a channel stream: an interrupt of the writing thread must not
            // close the file under the recording.
            out = new FileOutputStream(file.toFile());
        } catch (FileAlreadyExistsException e) {
            throw new BadInputException(name, "already exists; choose another name or allow overwriting", e);
        } catch (NoSuchFileException e) {
            throw new BadInputException(name, "cannot create the file: no such folder", e);
        } catch (AccessDeniedException e) {
            throw new BadInputException(name, "cannot create the file: permission denied", e);
        } catch (IOException e) {
            throw new BadInputException(name, "cannot create the file: " + e.getMessage(), e);
        }
        try {
            return new Recorder(name, new SyncingStream(out, Files.isRegularFile(file)), header, options);
        } catch (IOException e) {
            closeQuietly(out);
            throw new BadInputException(name, "cannot write: " + e.getMessage(), e);
        } catch (RuntimeException e) {
            closeQuietly(out);
            throw e;
        }
    }

    /** Records to {@code out} (owned and closed by the recorder); {@code name} is used in messages. */
    public static Recorder to(OutputStream out, String name, Map<String, String> header, RecorderOptions options) {
        try {
            return new Recorder(name, out, header, options);
        } catch (IOException e) {
            throw new BadInputException(name, "cannot write: " + e.getMessage(), e);
        }
    }

    /** Appends one edge; flushes at once when it starts a gap. */
    @Override
    public void onEdge(long tick, int channel, int level) {
        synchronized (lock) {
            checkOpen();
            try {
                writer.append(tick, channel, level);
                edgesWritten++;
                dirty = true;
                if (level == UNKNOWN) {
                    flushLocked();
                }
            } catch (IOException e) {
                throw fail(e);
            }
        }
    }

    /** Writes the end trailer, flushes, syncs and closes the file. */
    @Override
    public void onEnd(long lastTick) {
        synchronized (lock) {
            checkOpen();
            try {
                writer.end(Math.max(lastTick, writer.lastTick()));
            } catch (IOException e) {
                throw fail(e);
            }
        }
        close();
    }

    /** Hands everything recorded so far to the operating system now. */
    public void flush() {
        synchronized (lock) {
            checkOpen();
            try {
                flushLocked();
            } catch (IOException e) {
                throw fail(e);
            }
        }
    }

    /** Flushes, syncs and closes the file (without an end trailer unless {@link #onEnd} was called); idempotent. */
    @Override
    public void close() {
        // shutdown, not shutdownNow: interrupting a flush in progress could abort the write.
        flusher.shutdown();
        synchronized (lock) {
            if (closed) {
                return;
            }
            closed = true;
            if (failure != null) {
                closeAfterFailure();
                return;
            }
            try {
                flushLocked();
                writer.close(); // for a file: gzip trailer, then sync to the disk, then close
            } catch (IOException e) {
                failure = e;
                closeAfterFailure();
                throw failed();
            }
        }
    }

    /** Name of the file or stream, as used in messages. */
    public String name() {
        return name;
    }

    /** Edges accepted so far. */
    public long edgesWritten() {
        synchronized (lock) {
            return edgesWritten;
        }
    }

    /** Edges known to have reached the operating system (at the last flush). */
    public long edgesFlushed() {
        synchronized (lock) {
            return edgesFlushed;
        }
    }

    private void periodicFlush() {
        synchronized (lock) {
            if (closed || failure != null || !dirty) {
                return;
            }
            try {
                flushLocked();
            } catch (IOException e) {
                failure = e; // reported on the caller's next call
            }
        }
    }

    private void flushLocked() throws IOException {
        writer.flush();
        edgesFlushed = edgesWritten;
        dirty = false;
    }

    private void checkOpen() {
        if (failure != null) {
            throw failed();
        }
        if (closed) {
            throw new IllegalStateException("recorder already closed: " + name);
        }
    }

    private BadInputException fail(IOException e) {
        failure = e;
        return failed();
    }

    private BadInputException failed() {
        String why = failure.getMessage() == null ? failure.getClass().getSimpleName() : failure.getMessage();
        return new BadInputException(name, "cannot write the capture (" + why + "); the file keeps the "
                + edgesFlushed + " edges flushed before the failure", failure);
    }

    private void closeAfterFailure() {
        try {
            writer.close();
        } catch (IOException | RuntimeException e) {
            // the first failure is the one reported; nothing more can be saved
        }
    }

    private static void closeQuietly(OutputStream out) {
        try {
            out.close();
        } catch (IOException e) {
            // already failing; the original error is reported
        }
    }

    /** A file stream that syncs the file to the disk before closing it. */
    private static final class SyncingStream extends FilterOutputStream {
        private final FileOutputStream file;
        private final boolean regular;

        SyncingStream(FileOutputStream file, boolean regular) {
            super(file);
            this.file = file;
            this.regular = regular;
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            file.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            try {
                if (regular) {
                    file.getFD().sync(); // devices and pipes cannot be synced
                }
            } finally {
                file.close();
            }
        }
    }
}
