package org.rcbench.cli;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import org.rcbench.common.BadInputException;

/**
 * Writes a command's output to {@code -o FILE} or to stdout. A file is written beside its target
 * under a temporary name and moved into place when complete, so an interrupted export never leaves
 * a half-written file under the real name. Stateless.
 */
final class OutputFile {
    /** Produces text. */
    interface TextBody {
        void write(Writer w) throws IOException;
    }

    /** Produces bytes. */
    interface StreamBody {
        void write(OutputStream os) throws IOException;
    }

    private OutputFile() {
    }

    /** True when {@code file} means stdout (not given, or {@code -}). */
    static boolean isStdout(Path file) {
        return file == null || file.toString().equals("-");
    }

    /** Writes {@code body} as UTF-8 to {@code file}, or to {@code out} when {@link #isStdout}. */
    static void text(Path file, PrintWriter out, TextBody body) throws IOException {
        if (isStdout(file)) {
            body.write(out);
            out.flush();
            return;
        }
        stream(file, os -> {
            Writer w = new OutputStreamWriter(os, StandardCharsets.UTF_8);
            body.write(w);
            w.flush();
        });
    }

    /** Writes {@code body}'s bytes to {@code file} (temporary name, then moved into place); the body may close the stream. */
    static void stream(Path file, StreamBody body) throws IOException {
        Path target = file.toAbsolutePath();
        if (Files.isDirectory(target)) {
            throw new BadInputException(file.toString(), "is a folder; give a file name");
        }
        Path dir = target.getParent();
        if (!Files.isDirectory(dir)) {
            throw new BadInputException(file.toString(), "folder " + dir + " does not exist");
        }
        // Not Files.createTempFile: its owner-only permissions would stay on the finished file.
        Path tmp = dir.resolve("." + target.getFileName() + "." + ProcessHandle.current().pid() + "."
                + System.nanoTime() + ".part");
        try {
            try (OutputStream os = new BufferedOutputStream(
                    Files.newOutputStream(tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE), 1 << 16)) {
                body.write(os);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
