package org.rcbench.diagnose;

/**
 * Where a potentiometer's wiper is and where it should go. Positions are fractions of the travel,
 * 0..1, as the design defines them (for the pot PWM's split pot, the fraction of the track on the
 * charge side; for a pot used as a variable resistor, the fraction in circuit). Immutable.
 *
 * @param pot             the potentiometer's designator
 * @param target          what was asked for
 * @param present         the present position estimated from the measurement (posterior median)
 * @param presentLow      its 95 % interval, lower end
 * @param presentHigh     upper end
 * @param wanted          the position that gives the target (the nearest end when out of reach)
 * @param reachable       whether some position gives the target
 * @param reached         the value the circuit gives at {@code wanted}
 * @param rangeLow        the least value over the whole travel
 * @param rangeHigh       the greatest value over the whole travel
 * @param change          {@code wanted - present}, as a fraction of the travel (positive: toward 1)
 * @param advice          which way and how far to turn, in words
 * @param step            the same in one short line for a live view, e.g. {@code VR1 0.60 → 0.50 of its
 *                        travel (about 27° of 270°): more of the track on the discharge side}
 */
public record TuneResult(String pot, TuneTarget target, double present, double presentLow, double presentHigh,
        double wanted, boolean reachable, double reached, double rangeLow, double rangeHigh, double change,
        String advice, String step) {
}
