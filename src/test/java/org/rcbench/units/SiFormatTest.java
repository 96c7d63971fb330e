package org.rcbench.units;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class SiFormatTest {
    // Prefix choice follows the SI brochure (BIPM, 9th edition, 2019, table 7): powers of 1000.
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "6869.976    | Hz | 4 | 6.870 kHz",
        "76.24619e-6 | s  | 4 | 76.25 µs",
        "0.1098612   | s  | 4 | 109.9 ms",
        "999.96      | Hz | 4 | 1.000 kHz",
        "0           | s  | 3 | 0.00 s",
        "-2.5e-9     | s  | 2 | -2.5 ns",
        "4700        | Ω  | 2 | 4.7 kΩ",
        "1.5         | V  | 3 | 1.50 V",
    })
    void choosesPrefixForMagnitude(double value, String unit, int digits, String expected) {
        assertThat(SiFormat.format(value, unit, digits)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource({"NaN", "Infinity"})
    void nonFiniteIsADash(double value) {
        assertThat(SiFormat.format(value, "Hz")).isEqualTo("— Hz");
    }
}
