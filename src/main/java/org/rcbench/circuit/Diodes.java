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
 * capacitor's voltage swing. Thread-safe; allocation-free.
 */
final class Diodes {
    private Diodes() {
    }

    /**
     * Solves {@code vd = drop(a - b vd)} for the diode drop when the diode current depends linearly on
     * the drop, {@code I = a - b vd} (a: A, b: S). Returns the fixed drop for a fixed law and 0 when no
     * forward current flows ({@code a <= 0}).
     */
    static double dropForLinearCurrent(DiodeLaw law, double dropAt1mA, double a, double b) {
        if (!law.currentDependent()) {
            return dropAt1mA;
        }
        if (!(a > 0)) {
            return 0;
        }
        double nvt = law.emission() * DiodeLaw.THERMAL_VOLTS;
        double is = law.saturationAmps(dropAt1mA);
        double rs = law.seriesOhms();
        double lo = 0;
        double hi = a / b;
        // Start where the drop at the largest possible current would put it, then Newton with bisection
        // safeguard on h(vd) = vd - drop(a - b vd), which rises monotonically from h(0) < 0 to h(a/b) > 0.
        double vd = Math.min(dropAt1mA, 0.5 * hi);
        for (int k = 0; k < 60; k++) {
            double current = a - b * vd;
            double h = vd - (nvt * Math.log1p(current / is) + rs * current);
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
            if (Math.abs(next - vd) < 1e-12) {
                return next;
            }
            vd = next;
        }
        return vd;
    }

    /**
     * The constant drop that reproduces the exact Shockley time for a series path of external resistance
     * {@code ohms} in which the voltage across resistor plus diode moves from {@code u0} to {@code u1}
     * ({@code u0 > u1 > 0}). For a fixed law, the fixed drop. NaN when the diode would stop conducting
     * before {@code u1}.
     */
    static double effectiveSeriesDrop(DiodeLaw law, double dropAt1mA, double ohms, double u0, double u1) {
        if (!law.currentDependent()) {
            return dropAt1mA;
        }
        if (!(u1 > 0) || !(u0 > u1) || !(ohms > 0)) {
            return dropForLinearCurrent(law, dropAt1mA, Math.max(u0, u1) / ohms, 1 / ohms);
        }
        double nvt = law.emission() * DiodeLaw.THERMAL_VOLTS;
        double is = law.saturationAmps(dropAt1mA);
        double rTotal = ohms + law.seriesOhms();
        double vd0 = dropForLinearCurrent(law, dropAt1mA, u0 / ohms, 1 / ohms);
        double vd1 = dropForLinearCurrent(law, dropAt1mA, u1 / ohms, 1 / ohms);
        // Currents through the external resistance (the diode's Rs is inside its drop).
        double i0 = (u0 - vd0) / ohms;
        double i1 = (u1 - vd1) / ohms;
        if (!(i1 > 0)) {
            return Double.NaN;
        }
        double tOverC = rTotal * Math.log(i0 / i1) + (nvt / is) * (Math.log1p(is / i1) - Math.log1p(is / i0));
        double e = Math.exp(tOverC / rTotal);
        // Fixed drop x with resistance R + Rs: t/C = (R + Rs) ln((u0 - x)/(u1 - x)) gives x = (e u1 - u0)/(e - 1).
        return (e * u1 - u0) / (e - 1);
    }
}
