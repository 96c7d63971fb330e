package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.common.BadInputException;
import org.rcbench.units.Tolerance;

/** How the window writes values and reads targets. */
class FormatsTest {
    @Test
    void readingsUseSiPrefixesAndDutyAsAPercentage() {
        assertThat(Formats.value(TimingQuantity.FREQUENCY, 690.1234)).isEqualTo("690.12 Hz");
        assertThat(Formats.value(TimingQuantity.PERIOD, 1.4493e-3)).isEqualTo("1.4493 ms");
        assertThat(Formats.value(TimingQuantity.DUTY, 0.52381)).isEqualTo("52.38 %");
        assertThat(Formats.value(TimingQuantity.HIGH, Double.NaN)).isEqualTo("—");
        assertThat(Formats.range(TimingQuantity.FREQUENCY, 662.0, 716.4)).isEqualTo("662.0 Hz – 716.4 Hz");
        assertThat(Formats.plusMinus(TimingQuantity.DUTY, 0.0012)).isEqualTo("± 0.12 %");
        assertThat(Formats.deviation(700, 690)).isEqualTo("+1.4 %");
        assertThat(Formats.deviation(700, Double.NaN)).isEmpty();
        assertThat(Formats.deviation(0.5179, 0.518)).isEqualTo("0.0 %");
    }

    // text, quantity, value in SI (duty as a fraction)
    @ParameterizedTest
    @CsvSource({"1 kHz, FREQUENCY, 1000", "35 %, DUTY, 0.35", "35%, DUTY, 0.35", "0.35, DUTY, 0.35",
        "1.2 ms, PULSE_WIDTH, 0.0012", "1m2, PERIOD, 0.0012"})
    void tuningTargetsReadInTheQuantitysUnit(String text, TimingQuantity q, double value) {
        assertThat(TuningModel.parseTarget(q, text)).isCloseTo(value, org.assertj.core.data.Offset.offset(1e-12));
    }

    @Test
    void aDutyOutsideZeroToHundredIsRefused() {
        assertThatThrownBy(() -> TuningModel.parseTarget(TimingQuantity.DUTY, "120 %"))
                .isInstanceOf(BadInputException.class).hasMessageContaining("between 0 and 100 %");
    }

    @Test
    void tolerancesAreWrittenAsTheDesignFileWouldHaveThem() {
        assertThat(PartRow.toleranceText(Tolerance.symmetric(0.05))).isEqualTo("±5%");
        assertThat(PartRow.toleranceText(new Tolerance(0.82, 0.22))).isEqualTo("+22/-82%");
        assertThat(PartRow.toleranceText(Tolerance.NONE)).isEmpty();
        assertThat(Tolerance.parse(PartRow.toleranceText(new Tolerance(0.82, 0.22)))).isEqualTo(new Tolerance(0.82, 0.22));
    }
}
