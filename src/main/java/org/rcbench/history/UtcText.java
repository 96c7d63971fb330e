package org.rcbench.history;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.Locale;

/**
 * Timestamps as stored: ISO-8601 in UTC with milliseconds, fixed width
 * ({@code 2025-03-14T09:26:53.120Z}), so text order is time order. Thread-safe.
 */
final class UtcText {
    private static final DateTimeFormatter FORMAT =
            DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSS'Z'", Locale.ROOT).withZone(ZoneOffset.UTC);

    private UtcText() {
    }

    static String format(Instant t) {
        return FORMAT.format(t);
    }

    static Instant parse(String text) {
        try {
            return Instant.parse(text);
        } catch (DateTimeParseException e) {
            throw new IllegalStateException("stored timestamp is not ISO-8601: " + text, e);
        }
    }
}
