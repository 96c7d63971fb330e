package org.rcbench.probe;

import java.time.Duration;
import java.util.Locale;
import org.rcbench.common.BadInputException;

/**
 * How a type of probe behaves when its port is opened, and how long the host waits for it.
 *
 * @param name         the name users type ({@code reset-on-open}, {@code native-usb}, {@code no-reset}, {@code stream})
 * @param dtr          what to do with DTR on open
 * @param bootQuiet    how long the board is expected to sit in its bootloader before the firmware's
 *                     boot hello; the host asks for a hello only after this
 * @param helloTimeout how long to wait for a hello in all before giving up
 * @param description  one line for help texts
 */
public record ProbeProfile(String name, DtrPolicy dtr, Duration bootQuiet, Duration helloTimeout, String description) {

    /** ATmega328P boards with a USB-to-serial bridge: opening the port resets them (bootloader 1–3 s). */
    public static final ProbeProfile RESET_ON_OPEN = new ProbeProfile("reset-on-open", DtrPolicy.RAISE,
            Duration.ofMillis(2500), Duration.ofSeconds(6),
            "board with a USB-serial bridge that resets when the port opens (ATmega328P class)");
    /** Boards with native USB (RP2040, SAMD, STM32 class): send nothing until DTR is raised and asked. */
    public static final ProbeProfile NATIVE_USB = new ProbeProfile("native-usb", DtrPolicy.RAISE,
            Duration.ZERO, Duration.ofSeconds(3), "board with native USB that starts when DTR is raised");
    /** A bridge board modified not to reset (cut reset trace): keep DTR low and ask for the hello. */
    public static final ProbeProfile NO_RESET = new ProbeProfile("no-reset", DtrPolicy.HOLD_LOW,
            Duration.ZERO, Duration.ofSeconds(3), "board that must not be reset; DTR is kept low");
    /** In-memory links, pipes and simulated boards. */
    public static final ProbeProfile STREAM = new ProbeProfile("stream", DtrPolicy.NONE, Duration.ZERO,
            Duration.ofSeconds(3), "pipe or simulated board");

    private static final ProbeProfile[] ALL = {RESET_ON_OPEN, NATIVE_USB, NO_RESET, STREAM};

    public ProbeProfile {
        if (bootQuiet.isNegative() || helloTimeout.compareTo(bootQuiet) <= 0) {
            throw new IllegalArgumentException("need 0 <= bootQuiet < helloTimeout: " + bootQuiet + " " + helloTimeout);
        }
    }

    /** The profile called {@code name} (case-insensitive); a bad name is a one-line error listing the good ones. */
    public static ProbeProfile named(String name) {
        for (ProbeProfile p : ALL) {
            if (p.name.equals(name.toLowerCase(Locale.ROOT))) {
                return p;
            }
        }
        throw new BadInputException("probe type", "\"" + name + "\" is not one of reset-on-open, native-usb, "
                + "no-reset, stream");
    }

    public ProbeProfile withHelloTimeout(Duration timeout) {
        return new ProbeProfile(name, dtr, bootQuiet, timeout, description);
    }

    public ProbeProfile withBootQuiet(Duration quiet) {
        return new ProbeProfile(name, dtr, quiet, helloTimeout, description);
    }
}
