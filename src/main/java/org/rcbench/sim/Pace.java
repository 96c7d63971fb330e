package org.rcbench.sim;

import java.util.Locale;
import org.rcbench.common.BadInputException;

/** How fast a simulated probe lets its board's time run. */
public enum Pace {
    /** One simulated second per wall-clock second, as a real bench. */
    REALTIME,
    /** As fast as the link takes the bytes (the host's reading sets the speed). */
    FAST;

    /** {@code realtime} or {@code fast}, as users type it. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Reads {@code realtime} or {@code fast} (case-insensitive); anything else is a one-line error quoting it. */
    public static Pace parse(String text) {
        for (Pace p : values()) {
            if (p.word().equals(text.strip().toLowerCase(Locale.ROOT))) {
                return p;
            }
        }
        throw new BadInputException("--sim-speed", "\"" + text + "\" is not realtime or fast");
    }
}
