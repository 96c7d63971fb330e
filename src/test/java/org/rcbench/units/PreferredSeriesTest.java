package org.rcbench.units;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import org.junit.jupiter.api.Test;

class PreferredSeriesTest {
    // IEC 60063 tables (check-values.md): E6, E12 and E24 as published.
    @Test
    void tablesMatchIec60063() {
        assertThat(PreferredSeries.E6.mantissas()).containsExactly(1.0, 1.5, 2.2, 3.3, 4.7, 6.8);
        assertThat(PreferredSeries.E12.mantissas())
                .containsExactly(1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2);
        assertThat(PreferredSeries.E24.mantissas()).containsExactly(1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8,
                2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1);
        assertThat(PreferredSeries.E3.mantissas()).containsExactly(1.0, 2.2, 4.7);
    }

    // IEC 60063: eight E24 values differ from round(10^(i/24), 1), which is why E3..E24 are tables.
    @Test
    void e24DiffersFromTheFormulaAtEightPlaces() {
        double[] e24 = PreferredSeries.E24.mantissas();
        int differ = 0;
        for (int i = 0; i < 24; i++) {
            if (Math.abs(Math.round(Math.pow(10, i / 24.0) * 10) / 10.0 - e24[i]) > 1e-9) {
                differ++;
            }
        }
        assertThat(differ).isEqualTo(8);
    }

    // IEC 60063: E192 has 9.20 where round(10^(185/192), 2) = 9.19.
    @Test
    void e192HoldsTheNineTwentyException() {
        double[] e192 = PreferredSeries.E192.mantissas();
        assertThat(Math.round(Math.pow(10, 185 / 192.0) * 100) / 100.0).isEqualTo(9.19);
        assertThat(e192[185]).isEqualTo(9.20);
        assertThat(e192).doesNotContain(9.19);
        assertThat(e192[184]).isEqualTo(9.09);
        assertThat(e192[186]).isEqualTo(9.31);
    }

    // IEC 60063: E96 is every second E192 value and E48 every second E96 value.
    @Test
    void coarserFormulaSeriesAreEverySecondValue() {
        double[] e192 = PreferredSeries.E192.mantissas();
        double[] e96 = PreferredSeries.E96.mantissas();
        double[] e48 = PreferredSeries.E48.mantissas();
        for (int i = 0; i < 96; i++) {
            assertThat(e96[i]).isEqualTo(e192[2 * i]);
        }
        for (int i = 0; i < 48; i++) {
            assertThat(e48[i]).isEqualTo(e96[2 * i]);
        }
    }

    // Spot values of E96 as printed in IEC 60063 (well-known members).
    @Test
    void e96SpotValues() {
        assertThat(PreferredSeries.E96.mantissas()).contains(1.02, 1.47, 2.49, 3.01, 4.99, 6.04, 8.06, 9.76);
        assertThat(PreferredSeries.E96.mantissas()).hasSize(96);
        assertThat(Arrays.stream(PreferredSeries.E96.mantissas()).anyMatch(v -> v == 4.7)).isFalse();
    }

    @Test
    void findsNeighboursAcrossDecades() {
        assertThat(PreferredSeries.E12.nearest(4600)).isEqualTo(4700);
        assertThat(PreferredSeries.E12.atOrBelow(9999)).isEqualTo(8200);
        assertThat(PreferredSeries.E12.atOrAbove(9000)).isEqualTo(10000);
        assertThat(PreferredSeries.E12.next(8200)).isEqualTo(10000);
        assertThat(PreferredSeries.E12.previous(1e-8)).isCloseTo(8.2e-9, within(1e-22));
        assertThat(PreferredSeries.E6.between(1e3, 1e4)).containsExactly(1000, 1500, 2200, 3300, 4700, 6800, 10000);
        assertThat(PreferredSeries.E24.contains(5100)).isTrue();
        assertThat(PreferredSeries.E24.contains(5000)).isFalse();
    }

    // Usual pairing of series and tolerance (check-values.md).
    @Test
    void usualTolerances() {
        assertThat(PreferredSeries.E6.usualTolerance()).isEqualTo(0.20);
        assertThat(PreferredSeries.E24.usualTolerance()).isEqualTo(0.05);
        assertThat(PreferredSeries.E192.usualTolerance()).isEqualTo(0.005);
    }
}
