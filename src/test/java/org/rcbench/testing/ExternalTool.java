package org.rcbench.testing;

import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Finds an outside program a test needs (ngspice, socat, avr-gcc). Locally a missing tool skips the
 * test with a visible reason; under CI ({@code CI=true}) it fails the test, because CI must run it.
 */
public final class ExternalTool {
    private ExternalTool() {
    }

    /** Returns the tool's path, or skips (locally) / fails (CI) when it is not on the PATH. */
    public static Path require(String name, String debianPackage) {
        Path found = find(name);
        if (found == null) {
            String reason = name + " not found on PATH (Debian package " + debianPackage
                    + "; .ci/run installs it)";
            if ("true".equalsIgnoreCase(System.getenv("CI"))) {
                throw new AssertionError("CI=true but " + reason);
            }
            assumeTrue(false, "skipped: " + reason);
        }
        return found;
    }

    /** The tool's path on the PATH, or null. */
    public static Path find(String name) {
        String path = System.getenv("PATH");
        if (path == null) {
            return null;
        }
        for (String dir : path.split(File.pathSeparator)) {
            Path p = Path.of(dir, name);
            if (Files.isExecutable(p)) {
                return p;
            }
        }
        return null;
    }
}
