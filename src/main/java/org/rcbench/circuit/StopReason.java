package org.rcbench.circuit;

import java.util.Locale;

/**
 * Why a circuit does not run (or, for the last two, why it does not oscillate by itself). Each has a
 * message template filled with up to two numbers from the evaluation.
 */
public enum StopReason {
    /** The charge path settles below the upper threshold because of leakage across the capacitor. */
    LEAKAGE("leakage across the timing capacitor holds it at %s, below the upper threshold %s"),
    /** The charge path settles below the upper threshold because of the input current times the resistance. */
    INPUT_CURRENT("the threshold input current through the timing resistance leaves the capacitor at %s,"
            + " below the upper threshold %s: total resistance too high"),
    /** The output-fed astable's output high level does not exceed the upper threshold. */
    OUTPUT_HIGH_TOO_LOW("the output high level %s is not above the upper threshold %s"),
    /** The charge path's asymptote is below the upper threshold for another reason (control pin driven high, diode drop). */
    CHARGE_STALLS("the capacitor charges toward %s and never reaches the upper threshold %s"),
    /** The discharge path's floor is above the lower threshold (diode drop plus saturation, output low level). */
    DISCHARGE_STALLS("the capacitor discharges toward %s and never reaches the lower threshold %s"),
    /** The control pin is pulled so low that there are no usable thresholds. */
    NO_THRESHOLDS("the control pin sits at %s: no usable thresholds"),
    /** A part value makes the circuit meaningless (no timing capacitance, no charge resistance). */
    DEGENERATE("%s"),
    /** A monostable: one pulse per trigger. */
    MONOSTABLE("a monostable gives one pulse per trigger and does not run by itself"),
    /** A bistable: no timing. */
    BISTABLE("a bistable latches: set below the trigger level %s, cleared above the threshold level %s; no timing");

    private final String template;

    StopReason(String template) {
        this.template = template;
    }

    /** Whether this reason means the circuit does not do its job (as opposed to not oscillating by design). */
    public boolean isFailure() {
        return this != MONOSTABLE && this != BISTABLE;
    }

    /** The message with the two numbers (volts) filled in. */
    public String text(double a, double b, String detail) {
        if (this == DEGENERATE) {
            return detail;
        }
        return String.format(Locale.ROOT, template, volts(a), volts(b));
    }

    private static String volts(double v) {
        return String.format(Locale.ROOT, "%.3f V", v);
    }
}
