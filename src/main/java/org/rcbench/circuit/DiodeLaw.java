package org.rcbench.circuit;

/**
 * How a diode's forward drop depends on its current.
 *
 * <p>{@link #fixed()} is an ideal diode with a constant drop (the element's value). Otherwise the drop
 * follows the Shockley equation with series resistance, {@code V = n Vt ln(1 + I/Is) + I Rs}, with
 * {@code Is} chosen so that the drop at {@link #REFERENCE_AMPS} (1 mA) equals the element's value. This
 * keeps the diode's parameter a voltage a technician can read off a data sheet while the model
 * follows the operating current.
 *
 * @param currentDependent false for a constant drop
 * @param emission         the emission coefficient n (1 to 2)
 * @param seriesOhms       the series resistance Rs
 */
public record DiodeLaw(boolean currentDependent, double emission, double seriesOhms) {
    /** The current at which a current-dependent diode's drop parameter is given: 1 mA. */
    public static final double REFERENCE_AMPS = 1e-3;
    /** Thermal voltage kT/q at 25 °C (k = 1.380649e-23 J/K, q = 1.602176634e-19 C, T = 298.15 K; SI 2019 exact constants). */
    public static final double THERMAL_VOLTS = 1.380649e-23 * 298.15 / 1.602176634e-19;

    public DiodeLaw {
        if (currentDependent && !(emission > 0)) {
            throw new IllegalArgumentException("emission <= 0: " + emission);
        }
        if (!(seriesOhms >= 0)) {
            throw new IllegalArgumentException("seriesOhms < 0: " + seriesOhms);
        }
    }

    /** A constant drop. */
    public static DiodeLaw fixed() {
        return new DiodeLaw(false, 1, 0);
    }

    /**
     * A small-signal silicon diode of the 1N4148 class: n = 1.752, Rs = 0.568 Ω, drop about 0.58 V at
     * 1 mA (from memory: the widely circulated SPICE card IS=2.52n N=1.752 RS=0.568).
     */
    public static DiodeLaw silicon() {
        return new DiodeLaw(true, 1.752, 0.568);
    }

    /** The 1 mA drop of {@link #silicon()}: n Vt ln(1 mA / 2.52 nA) + 1 mA × 0.568 Ω. */
    public static double siliconDropVolts() {
        return 1.752 * THERMAL_VOLTS * Math.log1p(REFERENCE_AMPS / 2.52e-9) + REFERENCE_AMPS * 0.568;
    }

    /** A small-signal Schottky diode: n = 1.05, Rs = 1 Ω, about 0.3 V at 1 mA (from memory, typical of small Schottky parts). */
    public static DiodeLaw schottky() {
        return new DiodeLaw(true, 1.05, 1.0);
    }

    /** The 1 mA drop of {@link #schottky()} (from memory). */
    public static double schottkyDropVolts() {
        return 0.30;
    }

    /** The saturation current Is (A) that gives {@code dropAt1mA} at 1 mA. */
    public double saturationAmps(double dropAt1mA) {
        double nvt = emission * THERMAL_VOLTS;
        return REFERENCE_AMPS / (Math.exp((dropAt1mA - REFERENCE_AMPS * seriesOhms) / nvt) - 1);
    }

    /** The forward drop (V) at current {@code amps} for a diode whose drop at 1 mA is {@code dropAt1mA}. */
    public double dropAt(double amps, double dropAt1mA) {
        if (!currentDependent) {
            return dropAt1mA;
        }
        double nvt = emission * THERMAL_VOLTS;
        return nvt * Math.log1p(Math.max(amps, 0) / saturationAmps(dropAt1mA)) + amps * seriesOhms;
    }
}
