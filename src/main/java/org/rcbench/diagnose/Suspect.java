package org.rcbench.diagnose;

import org.rcbench.units.Unit;

/**
 * A fault that may explain the measurement: a part (by designator) or a latent fault, with the
 * value it would have to take. Immutable.
 *
 * @param name              the part's designator, or {@code leak}, {@code control.ohms}, or the other
 *                          family's name ({@code cmos})
 * @param kind              part, diode, leakage, control load or family
 * @param label             in words: {@code C1}, {@code leakage across C1}, {@code a cmos timer fitted}
 * @param value             the estimated value if this is the fault (ohms, farads, volts); NaN for a family
 * @param unit              its unit
 * @param nominal           the design's value; +infinity for leakage and control load (none intended), NaN for a family
 * @param low               lower end of the 95 % interval of {@code value} (Laplace approximation, normal in
 *                          the log of the value) under the most probable explanation that blames it
 * @param high              upper end
 * @param deviation         {@code value / nominal - 1}; NaN when there is no finite nominal
 * @param toleranceMultiple the deviation in multiples of the part's tolerance on that side (NaN without one)
 * @param probability       posterior probability that this fault is present (summed over every
 *                          explanation that includes it)
 */
public record Suspect(String name, FaultKind kind, String label, double value, Unit unit, double nominal, double low,
        double high, double deviation, double toleranceMultiple, double probability) {
}
