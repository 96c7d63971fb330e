package org.rcbench.diagnose;

import org.rcbench.circuit.ElementType;
import org.rcbench.circuit.PartKind;
import org.rcbench.units.Tolerance;

/**
 * What the back-solver assumes about a part of one construction: how far a healthy part may sit
 * outside its stated tolerance (ageing, bias, temperature), how a faulty part's value is spread,
 * and how likely a fault is.
 *
 * <p>None of these figures comes from a standard: they are rules of thumb (common practice, no
 * source) or recalled figures (from memory), marked per kind in {@link #of}. They decide the
 * ranking only where the measurement cannot, and {@link Identifiability} says so whenever that
 * happens, so a technician is never handed a prior as if it were a finding.
 *
 * @param ageingDown        fraction a healthy part may lie below its tolerance band (ageing, bias)
 * @param ageingUp          fraction a healthy part may lie above it
 * @param faultSdBelow      spread of a faulty part's log value below nominal
 * @param faultSdAbove      spread above nominal
 * @param faultProbability  prior chance that this part is out of its band on a board brought in for checking
 * @param note              where the figures come from, in words
 */
public record KindModel(double ageingDown, double ageingUp, double faultSdBelow, double faultSdAbove,
        double faultProbability, String note) {

    /** Smallest half-width of a healthy band, for parts whose file gives no tolerance (0.1 %). */
    public static final double MIN_HALF_WIDTH = 0.001;
    /** Healthy spread of a diode drop when the design gives none: ±8 % (common practice, no source). */
    public static final double DEFAULT_DIODE_TOLERANCE = 0.08;

    public KindModel {
        if (!(ageingDown >= 0 && ageingDown < 1) || !(ageingUp >= 0) || !(faultSdBelow > 0) || !(faultSdAbove > 0)
                || !(faultProbability > 0 && faultProbability < 1)) {
            throw new IllegalArgumentException("bad kind model " + ageingDown + " " + ageingUp + " " + faultSdBelow
                    + " " + faultSdAbove + " " + faultProbability);
        }
    }

    /** The model for a part of {@code kind} used as an element of {@code type}. */
    public static KindModel of(PartKind kind, ElementType type) {
        switch (kind) {
            case ALUMINIUM_ELECTROLYTIC:
                // End-of-life criteria for the IEC 60384-4 family are usually quoted as a capacitance
                // change beyond -20 to -30 % (secondary sources, check-values.md); a working part may
                // have lost some 10 % (common practice, no source). Faults are losses far more often than gains.
                return new KindModel(0.10, 0.02, 0.60, 0.15, 0.10,
                        "aluminium electrolytic: loses capacitance with age (end of life about -20 to -30 %, IEC 60384-4"
                                + " as usually quoted); fault spread skewed low; common practice, no source");
            case TANTALUM:
                return new KindModel(0.03, 0.02, 0.40, 0.20, 0.03, "tantalum: fairly stable; common practice, no source");
            case Y5V:
            case Z5U:
                // EIA-198 allows +22/-82 % (Y5V) and +22/-56 % (Z5U) over temperature; DC bias and ageing
                // take more. From memory: such parts often read 30-60 % low in circuit.
                return new KindModel(0.40, 0.10, 0.60, 0.20, 0.08,
                        "class-2 ceramic (Y5V/Z5U): shifts strongly with temperature (EIA-198), DC bias and age;"
                                + " from memory");
            case X7R:
            case X5R:
                // EIA-198: ±15 % over temperature; ageing a few % per decade-hour (from memory) and DC bias.
                return new KindModel(0.15, 0.05, 0.40, 0.15, 0.04,
                        "class-2 ceramic (X7R/X5R): ±15 % over temperature (EIA-198), bias and ageing losses"
                                + " (from memory)");
            case C0G:
                return new KindModel(0.002, 0.002, 0.50, 0.50, 0.01, "C0G: stable (0 ±30 ppm/K, EIA-198)");
            case FILM:
            case POLYESTER:
            case POLYPROPYLENE:
                return new KindModel(0.01, 0.01, 0.50, 0.50, 0.02, "film capacitor: stable; common practice, no source");
            case METAL_FILM:
            case THIN_FILM:
            case WIREWOUND:
                return new KindModel(0.005, 0.005, 0.50, 0.50, 0.01,
                        "metal film / thin film / wirewound resistor: tight and stable; common practice, no source");
            case THICK_FILM:
                return new KindModel(0.01, 0.01, 0.50, 0.50, 0.015, "thick film resistor; common practice, no source");
            case CARBON_FILM:
                return new KindModel(0.02, 0.02, 0.50, 0.50, 0.02, "carbon film resistor; common practice, no source");
            case CARBON_COMPOSITION:
                // From memory: old carbon composition resistors commonly read 10-20 % high.
                return new KindModel(0.02, 0.10, 0.15, 0.50, 0.08,
                        "carbon composition resistor: drifts up with age and moisture (from memory)");
            case CARBON_TRACK:
                return new KindModel(0.05, 0.05, 0.50, 0.50, 0.04, "carbon track potentiometer; common practice, no source");
            case CERMET:
                return new KindModel(0.02, 0.02, 0.50, 0.50, 0.02, "cermet potentiometer; common practice, no source");
            case SILICON:
            case SCHOTTKY:
                return diode();
            default:
                return unspecified(type);
        }
    }

    private static KindModel unspecified(ElementType type) {
        switch (type) {
            case CAPACITOR:
                return new KindModel(0.05, 0.02, 0.50, 0.30, 0.04,
                        "capacitor of unstated kind; common practice, no source");
            case DIODE:
                return diode();
            default:
                return new KindModel(0.01, 0.01, 0.50, 0.50, 0.02,
                        "resistor of unstated kind; common practice, no source");
        }
    }

    /** A diode whose drop differs from the design's (wrong type fitted, damaged): common practice, no source. */
    private static KindModel diode() {
        return new KindModel(0, 0, 0.35, 0.35, 0.01, "diode drop: a wrong or damaged diode; common practice, no source");
    }

    /**
     * The healthy band in log coordinates, {@code [ln(1 - minus - ageingDown), ln(1 + plus + ageingUp)]},
     * at least {@link #MIN_HALF_WIDTH} each side and never reaching zero.
     */
    public double[] healthyBand(Tolerance tolerance) {
        double low = Math.max(0.02, 1 - Math.max(MIN_HALF_WIDTH, tolerance.minusFraction() + ageingDown));
        double high = 1 + Math.max(MIN_HALF_WIDTH, tolerance.plusFraction() + ageingUp);
        return new double[] {Math.log(low), Math.log(high)};
    }

    /** The prior of a faulty part: a split normal about nominal. */
    public Prior faultPrior() {
        return Prior.split(0, faultSdBelow, faultSdAbove);
    }
}
