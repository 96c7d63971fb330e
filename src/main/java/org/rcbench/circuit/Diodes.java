package org.rcbench.circuit;

/**
 * Operating-point drops of current-dependent diodes ({@link DiodeLaw}), so that the piecewise-linear
 * models can use a fixed drop appropriate to the current.
 *
 * <p>How the drop is chosen. In a series path (source, resistance R, diode, capacitor: the two-diode
 * astable and the pot PWM) the Shockley equation with series resistance gives the exact time to move
 * the capacitor between two voltages with no leakage: with {@code u} the voltage across resistor and
 * diode and {@code I} the current, {@code u = I (R + Rs) + n Vt ln(1 + I/Is)}, {@code dt = -C du / I},
 * so {@code t = C [(R + Rs) ln(I0/I1) + (n Vt / Is)(ln(1 + Is/I1) - ln(1 + Is/I0))]}. The effective
 * drop is the constant drop that gives the same time; it is then used with leakage and input current
 * as well (exact without them, a close approximation with them). Where the diode is shunted by a
 * resistor (the one-diode astable) the drop is taken at the diode current at the middle of the
 * capacitor's voltage swing. Thread-safe; allocation-free. ({@code Math.log(1 + x)} stands in for
 * {@code log1p} where x = I/Is is large, and a short series where Is/I is tiny: the same values to
 * rounding, several times faster.)
 */
final class Diodes {
    private Diodes() {
    }

    /** n Vt of {@code law} (V). */
    static double nvt(DiodeLaw law) {
        return law.emission() * DiodeLaw.THERMAL_VOLTS;
    }

    /**
     * Solves {@code vd = drop(a - b vd)} for the diode drop when the diode current depends linearly on
     * the drop, {@code I = a - b vd} (a: A, b: S), for a diode with {@code nvt}, saturation current
     * {@code is} and series resistance {@code rs}. Returns 0 when no forward current flows ({@code a <= 0}).
     */
    static double solve(double nvt, double is, double rs, double a, double b) {
        if (!(a > 0)) {
            return 0;
        }
        double lo = 0;
        double hi = a / b;
        // Start from one fixed-point step from the current the diode would carry at a typical 0.6 V,
        // then Newton with bisection safeguard on h(vd) = vd - drop(a - b vd), which rises monotonically
        // from h(0) < 0 to h(a/b) > 0. Two or three steps reach 1e-10 V.
        double i0 = a - b * 0.6;
        double vd = i0 > 0 ? nvt * Math.log(1 + i0 / is) + rs * i0 : 0.5 * hi;
        if (!(vd > lo && vd < hi)) {
            vd = 0.5 * hi;
        }
        for (int k = 0; k < 60; k++) {
            double current = a - b * vd;
            double h = vd - (nvt * Math.log(1 + current / is) + rs * current);
            if (h > 0) {
                hi = vd;
            } else {
                lo = vd;
            }
            double dh = 1 + b * (nvt / (is + current) + rs);
            double next = vd - h / dh;
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - vd) < 1e-10) {
                return next;
            }
            vd = next;
        }
        return vd;
    }

    /** {@link #solve} for a diode of {@code law} with {@code dropAt1mA}; the fixed drop for a fixed law. */
    static double dropForLinearCurrent(DiodeLaw law, double dropAt1mA, double a, double b) {
        if (!law.currentDependent()) {
            return dropAt1mA;
        }
        return solve(nvt(law), law.saturationAmps(dropAt1mA), law.seriesOhms(), a, b);
    }

    /**
     * The constant drop that reproduces the exact Shockley time for a series path of external
     * resistance {@code ohms} in which the voltage across resistor plus diode moves from {@code u0} to
     * {@code u1} ({@code u0 > u1 > 0}), given the drops {@code vd0}, {@code vd1} at those ends (from
     * {@link #solve} with {@code a = u/ohms}, {@code b = 1/ohms}). NaN when the diode stops conducting.
     */
    static double effective(double nvt, double is, double rs, double ohms, double u0, double vd0, double u1,
            double vd1) {
        double i0 = (u0 - vd0) / ohms;
        double i1 = (u1 - vd1) / ohms;
        if (!(i1 > 0) || !(i0 > i1)) {
            return vd1;
        }
        double rTotal = ohms + rs;
        double tOverC = rTotal * Math.log(i0 / i1) + (nvt / is) * (log1pSmall(is / i1) - log1pSmall(is / i0));
        double e = Math.exp(tOverC / rTotal);
        // Fixed drop x with resistance R + Rs: t/C = (R + Rs) ln((u0 - x)/(u1 - x)) gives x = (e u1 - u0)/(e - 1).
        return (e * u1 - u0) / (e - 1);
    }

    /** {@link #effective} for a diode of {@code law}; the fixed drop for a fixed law. */
    static double effectiveSeriesDrop(DiodeLaw law, double dropAt1mA, double ohms, double u0, double u1) {
        if (!law.currentDependent()) {
            return dropAt1mA;
        }
        double nvt = nvt(law);
        double is = law.saturationAmps(dropAt1mA);
        double rs = law.seriesOhms();
        double vd0 = solve(nvt, is, rs, Math.max(u0, 0) / ohms, 1 / ohms);
        double vd1 = solve(nvt, is, rs, Math.max(u1, 0) / ohms, 1 / ohms);
        return effective(nvt, is, rs, ohms, u0, vd0, u1, vd1);
    }

    /** ln(1 + x) for x >= 0, by its series when x is tiny (error below x^4/4). */
    private static double log1pSmall(double x) {
        return x < 1e-4 ? x * (1 - x * (0.5 - x / 3)) : Math.log1p(x);
    }
}
