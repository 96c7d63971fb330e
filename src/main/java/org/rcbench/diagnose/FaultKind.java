package org.rcbench.diagnose;

/** What kind of fault a hypothesis blames. The JSON and readable output spell each in lower case with hyphens. */
public enum FaultKind {
    /** A resistor, capacitor or potentiometer track outside its band. */
    PART("part"),
    /** A diode whose drop differs from the design's (wrong type fitted, damaged). */
    DIODE("diode"),
    /** A leakage resistance across the timing capacitor. */
    LEAKAGE("leakage"),
    /** A resistance from the control pin to ground that the design does not show (a leaky bypass capacitor, a solder bridge). */
    CONTROL_LOAD("control-load"),
    /** A timer of the other family fitted (bipolar for CMOS or the reverse). */
    FAMILY("family");

    private final String fileName;

    FaultKind(String fileName) {
        this.fileName = fileName;
    }

    /** The spelling in JSON, e.g. {@code "control-load"}. */
    public String fileName() {
        return fileName;
    }
}
