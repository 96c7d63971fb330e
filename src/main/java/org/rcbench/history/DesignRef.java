package org.rcbench.history;

import java.util.Objects;

/**
 * The design a board was checked against: its file name, its whole text and the SHA-256 of that
 * text (UTF-8), so a run can be compared with the exact design even after the file has changed.
 *
 * @param name   the design file's name as given, e.g. {@code piper.toml} (never null, may be empty)
 * @param text   the design file's content
 * @param sha256 SHA-256 of {@code text}, 64 lower-case hex digits
 */
public record DesignRef(String name, String text, String sha256) {
    public DesignRef {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(text, "text");
        if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("sha256 is not 64 lower-case hex digits: " + sha256);
        }
    }

    /** The design {@code text} named {@code name}, with its hash computed. */
    public static DesignRef of(String name, String text) {
        return new DesignRef(name, text, Digests.sha256(text));
    }
}
