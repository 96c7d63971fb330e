package org.rcbench.testing;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * A pair of connected pseudo-terminals made by socat ({@code pty,raw,echo=0} both ends, linked as
 * {@code dir/a} and {@code dir/b}), for tests that need a real serial device: what is written on
 * one end is read on the other. Skips the test (fails under CI) without socat. {@link #unplug()}
 * kills socat, which a reader on either end sees as the cable pulled; {@link #close()} does the same.
 */
public final class PtyPair implements AutoCloseable {
    private final Process socat;
    private final Path a;
    private final Path b;

    private PtyPair(Process socat, Path a, Path b) {
        this.socat = socat;
        this.a = a;
        this.b = b;
    }

    /** Starts socat (its log in {@code dir/socat.log}) and waits until both links exist, at most 10 s. */
    public static PtyPair start(Path dir) throws IOException, InterruptedException {
        Path tool = ExternalTool.require("socat", "socat");
        Path a = dir.resolve("a");
        Path b = dir.resolve("b");
        Process p = new ProcessBuilder(tool.toString(), "-d", "-d", "pty,raw,echo=0,link=" + a,
                "pty,raw,echo=0,link=" + b).redirectErrorStream(true).redirectOutput(dir.resolve("socat.log").toFile())
                .start();
        long deadline = System.nanoTime() + 10_000_000_000L;
        while (!(Files.exists(a) && Files.exists(b))) {
            if (System.nanoTime() > deadline) {
                p.destroyForcibly();
                throw new IllegalStateException("socat made no ptys within 10 s (see " + dir.resolve("socat.log") + ")");
            }
            Thread.sleep(20);
        }
        return new PtyPair(p, a, b);
    }

    /** One end's link. */
    public Path a() {
        return a;
    }

    /** The other end's link. */
    public Path b() {
        return b;
    }

    /** Kills socat and waits for it: both ends go away, as when a probe's cable is pulled. */
    public void unplug() throws InterruptedException {
        socat.destroyForcibly().waitFor();
    }

    @Override
    public void close() {
        socat.destroyForcibly();
    }
}
