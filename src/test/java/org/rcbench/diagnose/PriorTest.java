package org.rcbench.diagnose;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.apache.commons.math3.analysis.integration.IterativeLegendreGaussIntegrator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The priors' normalizers against numerical integration (Commons Math Gauss–Legendre) and their shape. */
class PriorTest {
    private static double integral(Prior p, double from, double to) {
        return new IterativeLegendreGaussIntegrator(16, 1e-12, 1e-14).integrate(1_000_000,
                z -> Math.exp(p.logDensity(z)), from, to);
    }

    @ParameterizedTest
    @CsvSource({"-0.05, 0.05", "-0.357, 0.182", "-0.001, 0.001"})
    void bandDensityIntegratesToOne(double low, double high) {
        Prior p = Prior.band(low, high);
        double w = high - low;
        // Split at the band's edges, where the density's slope changes.
        double total = integral(p, low - 5 * w, low) + integral(p, low, high) + integral(p, high, high + 5 * w);
        assertThat(total).isCloseTo(1, within(1e-9));
    }

    @ParameterizedTest
    @CsvSource({"0, 0.6, 0.15", "0.3, 0.5, 0.5", "-1, 0.2, 1.2"})
    void splitNormalIntegratesToOne(double mode, double below, double above) {
        Prior p = Prior.split(mode, below, above);
        double total = integral(p, mode - 12 * below, mode) + integral(p, mode, mode + 12 * above);
        assertThat(total).isCloseTo(1, within(1e-9));
    }

    @Test
    void bandIsNormalInsideWithTheRectangularStandardDeviationAndSteepOutside() {
        Prior p = Prior.band(-0.05, 0.05);
        double sd = 0.1 / Math.sqrt(12); // GUM (JCGM 100:2008, 4.3.7): a/sqrt(3) for a half-width a
        assertThat(p.residual(0.02)).isCloseTo(0.02 / sd, within(1e-12));
        assertThat(p.residual(0.05)).isCloseTo(Math.sqrt(3), within(1e-12));
        assertThat(p.residual(0.06) - p.residual(0.05)).isCloseTo(Prior.TAIL_STEEPNESS * 0.01 / sd, within(1e-9));
        assertThat(p.residual(-0.06)).isCloseTo(-p.residual(0.06), within(1e-12));
        assertThat(p.slope(0.0)).isCloseTo(1 / sd, within(1e-9));
        assertThat(p.slope(0.07)).isCloseTo(Prior.TAIL_STEEPNESS / sd, within(1e-9));
    }

    @Test
    void splitNormalUsesTheSideOfTheMode() {
        Prior p = Prior.split(0, 0.6, 0.15);
        assertThat(p.residual(-0.6)).isCloseTo(-1, within(1e-12));
        assertThat(p.residual(0.15)).isCloseTo(1, within(1e-12));
    }

    @Test
    void electrolyticHealthyBandReachesFurtherDown() {
        // 20 % tolerance plus a 10 % in-life loss allowance; 2 % up.
        double[] b = KindModel.of(org.rcbench.circuit.PartKind.ALUMINIUM_ELECTROLYTIC,
                org.rcbench.circuit.ElementType.CAPACITOR).healthyBand(org.rcbench.units.Tolerance.symmetric(0.2));
        assertThat(b[0]).isCloseTo(Math.log(0.7), within(1e-12));
        assertThat(b[1]).isCloseTo(Math.log(1.22), within(1e-12));
        KindModel cc = KindModel.of(org.rcbench.circuit.PartKind.CARBON_COMPOSITION, org.rcbench.circuit.ElementType.RESISTOR);
        assertThat(cc.faultSdAbove()).isGreaterThan(cc.faultSdBelow());
    }
}
