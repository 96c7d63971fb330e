package org.rcbench.protocol;

import java.nio.charset.StandardCharsets;

/**
 * Lines of the plain-text mode, as a text-mode probe prints them (for simulators, tests and the
 * protocol document). Each method returns the line with its LF. Static, thread-safe.
 */
public final class TextLines {
    private TextLines() {
    }

    /** {@code H clock_hz=... probe_id=... ...} */
    public static String hello(Hello hello) {
        return TextHello.format(hello) + "\n";
    }

    /** {@code E tick channel level}: an edge at probe tick {@code tick} (0..10^18-1). */
    public static String edge(long tick, int channel, int level) {
        return "E " + tick + " " + channel + " " + level + "\n";
    }

    /** {@code T tick}: no edge occurred up to {@code tick}. */
    public static String heartbeat(long tick) {
        return "T " + tick + "\n";
    }

    /** {@code D total}: the probe has lost {@code total} edges since it reset. */
    public static String dropped(long total) {
        return "D " + total + "\n";
    }

    /** The line a host sends to ask a text-mode probe for its hello. */
    public static final String HELLO_REQUEST = "?\n";

    /** ASCII bytes of a line. */
    public static byte[] bytes(String line) {
        return line.getBytes(StandardCharsets.US_ASCII);
    }
}
