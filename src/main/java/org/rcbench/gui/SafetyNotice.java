package org.rcbench.gui;

import java.util.List;

/** The safety notice shown on first start and from the help menu. */
public final class SafetyNotice {
    public static final String TITLE = "Before you connect the probe";

    /** One paragraph per caution. */
    public static final List<String> PARAGRAPHS = List.of(
            "The probe's ground is your computer's ground. Through the USB cable, whatever you clip the probe's "
                    + "ground to is joined to the computer's chassis and, on a mains-powered computer, to earth. "
                    + "Clip it only to the circuit's own 0 V.",
            "Never connect the probe to a mains-referenced or transformerless circuit (capacitive dropper, "
                    + "off-line supply, anything wired straight to the mains) without isolation between them: an "
                    + "isolation transformer for the circuit or an isolated probe. Without it the probe, the computer "
                    + "and you can carry mains current.",
            "Capacitors can hold a charge after the power is off. Discharge them safely before you touch, "
                    + "desolder or swap parts.",
            "Keep the probe's input inside its limits. For 5–15 V timer circuits use the protective front end in "
                    + "the firmware notes (series resistor, divider, clamp diodes, ideally a Schmitt buffer), and "
                    + "probe the timer's output pin, never the timing capacitor.",
            "rcbench does not replace local electrical codes or licensed practice. Where they apply, follow them, "
                    + "and ask a qualified person when in doubt.");

    private SafetyNotice() {
    }
}
