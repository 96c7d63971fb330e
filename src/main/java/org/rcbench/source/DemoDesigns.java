package org.rcbench.source;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;

/**
 * Design files by name: a path, or {@code demo:NAME} for the demo boards built into rcbench (the
 * {@code captures/*.toml} files of the source tree, packaged as resources under
 * {@code org/rcbench/demo}). Stateless.
 */
public final class DemoDesigns {
    /** The prefix of built-in designs. */
    public static final String PREFIX = "demo:";
    /** The board {@code rcbench} simulates when no source is given. */
    public static final String DEFAULT = "demo:piper-mk2";
    /** The built-in designs (invented demo boards). */
    public static final List<String> NAMES = List.of("piper-mk2", "piper-mk1-y5v", "wren", "lumen-dm1", "latchkey",
            "kestrel", "tally", "tally-rev-a");

    private DemoDesigns() {
    }

    /** The design named {@code spec}: {@code demo:NAME}, or a design file's path. */
    public static Design resolve(String spec) {
        return spec.startsWith(PREFIX) ? DesignReader.parse(text(spec), spec) : DesignReader.read(Path.of(spec));
    }

    /** The text of the design named {@code spec} (as {@link #resolve}), for storing it with a run. */
    public static String text(String spec) {
        if (!spec.startsWith(PREFIX)) {
            Path file = Path.of(spec);
            try {
                return Files.readString(file, StandardCharsets.UTF_8);
            } catch (NoSuchFileException e) {
                throw new BadInputException(spec, "no such file", e);
            } catch (IOException e) {
                throw new BadInputException(spec, "cannot read: " + e.getMessage(), e);
            }
        }
        String name = spec.substring(PREFIX.length());
        try (InputStream in = name.contains("/") ? null
                : DemoDesigns.class.getResourceAsStream("/org/rcbench/demo/" + name + ".toml")) {
            if (in == null) {
                throw new BadInputException(spec, "no such built-in design (" + PREFIX + String.join(", " + PREFIX, NAMES)
                        + ")");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new BadInputException(spec, "cannot read the built-in design: " + e.getMessage(), e);
        }
    }
}
