package org.rcbench.design;

/**
 * The ambient temperature range a board must work over, and the reference temperature at which
 * part values and tolerances are stated.
 *
 * @param minCelsius       lowest ambient (°C)
 * @param maxCelsius       highest ambient (°C)
 * @param referenceCelsius where tempcos are zero-referenced (°C); 25 °C unless the file says otherwise
 *                         (common practice for data-sheet values, no single source)
 */
public record Ambient(double minCelsius, double maxCelsius, double referenceCelsius) {
    public static final double DEFAULT_REFERENCE_CELSIUS = 25;

    public Ambient {
        if (!(minCelsius <= maxCelsius) || !Double.isFinite(minCelsius) || !Double.isFinite(maxCelsius)
                || !Double.isFinite(referenceCelsius)) {
            throw new IllegalArgumentException("bad ambient range " + minCelsius + " .. " + maxCelsius);
        }
    }
}
