package org.rcbench.diagnose;

import java.util.Objects;

/**
 * One thing that may be wrong with a board: a part out of its band, a latent fault, or the other
 * timer family. Immutable.
 *
 * @param kind        what kind of fault
 * @param name        the model parameter it frees ({@code C1}, {@code leak}, {@code control.ohms}), or the
 *                    other family's name ({@code cmos}) for {@link FaultKind#FAMILY}
 * @param label       how the output names it ({@code C1}, {@code leakage across C1}, {@code a cmos timer})
 * @param prior       the prior of the freed coordinate (null for a family swap)
 * @param probability prior chance of this fault on a board brought in for checking, in (0, 1)
 */
public record Fault(FaultKind kind, String name, String label, Prior prior, double probability) {
    public Fault {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(label, "label");
        if (!(probability > 0 && probability < 1)) {
            throw new IllegalArgumentException("probability outside (0, 1): " + probability);
        }
        if (kind != FaultKind.FAMILY) {
            Objects.requireNonNull(prior, "prior");
        }
    }

    /** Whether this fault is a part's value (a part or a diode) rather than a latent fault. */
    public boolean isPart() {
        return kind == FaultKind.PART || kind == FaultKind.DIODE;
    }
}
