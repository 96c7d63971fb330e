package org.rcbench.circuit;

/** What a model parameter stands for. */
public enum ParameterKind {
    /** A part's value, named by its designator ({@code R1}, {@code C1}, {@code VR1}, {@code D1}). */
    PART,
    /** A potentiometer's wiper position, {@code VR1.wiper}, in [0, 1]. */
    WIPER,
    /** A quantity no part list shows: supply, capacitor leakage, control-pin source. */
    LATENT,
    /** A timer-family parameter: {@code family.divider}, {@code family.sat} ... */
    FAMILY
}
