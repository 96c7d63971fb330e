package org.rcbench.diagnose;

import org.apache.commons.math3.special.Erf;

/**
 * A prior density for one solver coordinate (a log ratio such as {@code ln(C/C_nominal)}), written
 * as a least-squares residual {@code r(z)} so that {@code -ln p(z) = r(z)^2 / 2 + ln N} with the
 * normalizer {@code N}. Immutable and thread-safe.
 *
 * <p>Two shapes:
 * <ul>
 * <li><b>Band</b> ({@link #band}): a healthy part lies inside its tolerance band (with an ageing
 * allowance). Inside the band the density is a normal centred on the band's middle with the
 * standard deviation of a rectangular distribution over the band, {@code width / sqrt(12)} (the GUM's
 * standard uncertainty of a rectangular band, JCGM 100:2008, 4.3.7); outside it falls
 * {@link #TAIL_STEEPNESS} times faster, so a value well outside the band is all but excluded while the
 * solver still sees a smooth slope. The steepness is a choice (common practice, no source).</li>
 * <li><b>Split normal</b> ({@link #split}): a normal with different standard deviations below and
 * above its mode, for faults that go one way more than the other (an aluminium electrolytic loses
 * capacitance, a carbon composition resistor drifts up). With equal sides it is a plain normal.</li>
 * </ul>
 * Both normalizers are closed forms (below), so evidences of different hypotheses compare fairly.
 */
public final class Prior {
    /** How much faster than inside the band the density falls outside it (common practice, no source). */
    public static final double TAIL_STEEPNESS = 4;
    private static final double SQRT3 = Math.sqrt(3);
    private static final double LN_SQRT_2PI = 0.5 * Math.log(2 * Math.PI);

    private final boolean band;
    private final double centre;
    private final double sdBelow;
    private final double sdAbove;
    private final double lowEdge;
    private final double highEdge;
    private final double logNormalizer;

    private Prior(boolean band, double centre, double sdBelow, double sdAbove, double lowEdge, double highEdge) {
        this.band = band;
        this.centre = centre;
        this.sdBelow = sdBelow;
        this.sdAbove = sdAbove;
        this.lowEdge = lowEdge;
        this.highEdge = highEdge;
        this.logNormalizer = band ? bandLogNormalizer(sdBelow) : LN_SQRT_2PI + Math.log(0.5 * (sdBelow + sdAbove));
    }

    /**
     * A band prior over {@code [low, high]} (solver coordinates, {@code low < high}).
     *
     * @throws IllegalArgumentException when the band is empty or not finite
     */
    public static Prior band(double low, double high) {
        if (!(low < high) || !Double.isFinite(low) || !Double.isFinite(high)) {
            throw new IllegalArgumentException("band not low < high: " + low + ", " + high);
        }
        double sd = (high - low) / Math.sqrt(12);
        return new Prior(true, 0.5 * (low + high), sd, sd, low, high);
    }

    /** A split normal with mode {@code mode} and standard deviations below and above it (both > 0). */
    public static Prior split(double mode, double sdBelow, double sdAbove) {
        if (!(sdBelow > 0) || !(sdAbove > 0) || !Double.isFinite(mode)) {
            throw new IllegalArgumentException("split normal needs sd > 0: " + sdBelow + ", " + sdAbove);
        }
        return new Prior(false, mode, sdBelow, sdAbove, Double.NaN, Double.NaN);
    }

    /** A normal with mean {@code mean} and standard deviation {@code sd}. */
    public static Prior normal(double mean, double sd) {
        return split(mean, sd, sd);
    }

    /**
     * Band normalizer: inside, {@code s sqrt(2 pi) (2 Phi(sqrt 3) - 1)}; each tail
     * {@code (s/K) sqrt(2 pi) (1 - Phi(sqrt 3))}, since the tail residual is {@code sqrt 3 + K u / s}.
     */
    private static double bandLogNormalizer(double sd) {
        double outside = 0.5 * Erf.erfc(SQRT3 / Math.sqrt(2));
        double mass = (1 - 2 * outside) + 2 * outside / TAIL_STEEPNESS;
        return Math.log(sd * mass) + LN_SQRT_2PI;
    }

    /** The residual {@code r(z)}: {@code r^2 / 2} is minus the log density up to the normalizer. */
    public double residual(double z) {
        if (band) {
            if (z > highEdge) {
                return SQRT3 + (z - highEdge) * TAIL_STEEPNESS / sdAbove;
            }
            if (z < lowEdge) {
                return -SQRT3 + (z - lowEdge) * TAIL_STEEPNESS / sdBelow;
            }
            return (z - centre) / sdAbove;
        }
        return (z - centre) / (z < centre ? sdBelow : sdAbove);
    }

    /** {@code dr/dz}. */
    public double slope(double z) {
        if (band) {
            return z > highEdge || z < lowEdge ? TAIL_STEEPNESS / sdAbove : 1 / sdAbove;
        }
        return 1 / (z < centre ? sdBelow : sdAbove);
    }

    /** {@code ln p(z)}, normalized. */
    public double logDensity(double z) {
        double r = residual(z);
        return -0.5 * r * r - logNormalizer;
    }

    /** {@code ln} of the normalizer {@code N}. */
    public double logNormalizer() {
        return logNormalizer;
    }

    /** The most probable coordinate: the band's middle or the split normal's mode. */
    public double mode() {
        return centre;
    }

    /** Whether this is a band prior. */
    public boolean isBand() {
        return band;
    }

    /** The band's lower edge (NaN for a split normal). */
    public double lowEdge() {
        return lowEdge;
    }

    /** The band's upper edge (NaN for a split normal). */
    public double highEdge() {
        return highEdge;
    }

    /** Standard deviation below the mode (inside the band for a band prior). */
    public double sdBelow() {
        return sdBelow;
    }

    /** Standard deviation above the mode. */
    public double sdAbove() {
        return sdAbove;
    }

    @Override
    public String toString() {
        return band ? String.format(java.util.Locale.ROOT, "band[%.4g, %.4g]", lowEdge, highEdge)
                : String.format(java.util.Locale.ROOT, "split(%.4g; -%.3g/+%.3g)", centre, sdBelow, sdAbove);
    }
}
