package org.rcbench.units;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.common.BadInputException;

class ValueCodeTest {
    // IEC 60062 letter-and-digit code vectors (check-values.md, "Preferred values and value codes"):
    // the letter stands where the decimal point goes.
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "R47  | OHM   | 0.47",
        "4R7  | OHM   | 4.7",
        "470R | OHM   | 470",
        "4K7  | OHM   | 4700",
        "4k7  | OHM   | 4700",
        "47K3 | OHM   | 47300",
        "1K0  | OHM   | 1000",
        "2M2  | OHM   | 2200000",
        "4M7  | OHM   | 4700000",
        "10p  | FARAD | 10e-12",
        "4n7  | FARAD | 4.7e-9",
        "2n2  | FARAD | 2.2e-9",
        "1u0  | FARAD | 1e-6",
        "1µ0  | FARAD | 1e-6",
        "10n  | FARAD | 10e-9",
        "2u2  | FARAD | 2.2e-6",
    })
    void readsLetterAndDigitCodes(String text, Unit unit, double expected) {
        assertThat(ValueCode.parseValue(text, unit)).isCloseTo(expected, within(expected * 1e-15));
    }

    // SI text: number, optional space, SI prefix (BIPM SI brochure, 9th ed., table 7), unit symbol.
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "4.7 kΩ   | OHM    | 4700",
        "4.7 kΩ   | OHM    | 4700",
        "4.7kohm  | OHM    | 4700",
        "10 µF    | FARAD  | 10e-6",
        "10 μF    | FARAD  | 10e-6",
        "10uF     | FARAD  | 10e-6",
        "10nF     | FARAD  | 10e-9",
        "100 nF   | FARAD  | 100e-9",
        "1.2 kHz  | HERTZ  | 1200",
        "1.2k     | HERTZ  | 1200",
        "690 Hz   | HERTZ  | 690",
        "1 MHz    | HERTZ  | 1e6",
        "1 mHz    | HERTZ  | 1e-3",
        "10 ms    | SECOND | 0.01",
        "9 V      | VOLT   | 9",
        "0.25 µA  | AMPERE | 0.25e-6",
        "1e-6     | FARAD  | 1e-6",
        "4.7E3    | OHM    | 4700",
        ".5       | NONE   | 0.5",
        "4700     | OHM    | 4700",
    })
    void readsSiText(String text, Unit unit, double expected) {
        assertThat(ValueCode.parseValue(text, unit)).isCloseTo(expected, within(expected * 1e-15));
    }

    // IEC 60062: position decides. "4K7K" is 4.7 kΩ with tolerance letter K (±10 %).
    @Test
    void trailingUpperCaseLetterAfterTheCodeIsATolerance() {
        CodedValue v = ValueCode.parse("4K7K", Unit.OHM);
        assertThat(v.value()).isEqualTo(4700);
        assertThat(v.tolerance()).isEqualTo(Tolerance.symmetric(0.10));
        assertThat(ValueCode.parse("47KJ", Unit.OHM).tolerance()).isEqualTo(Tolerance.symmetric(0.05));
        assertThat(ValueCode.parse("2M2M", Unit.OHM).value()).isEqualTo(2.2e6);
        assertThat(ValueCode.parse("2M2M", Unit.OHM).tolerance()).isEqualTo(Tolerance.symmetric(0.20));
        assertThat(ValueCode.parse("2M", Unit.OHM).tolerance()).isNull();
    }

    @Test
    void unitSymbolWinsOverAToleranceLetter() {
        // "10nF" is 10 nF; F is the farad here, not the ±1 % letter.
        CodedValue v = ValueCode.parse("10nF", Unit.FARAD);
        assertThat(v.value()).isCloseTo(10e-9, within(1e-24));
        assertThat(v.tolerance()).isNull();
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "4k7k  | \"4k7k\" is not a resistance",
        "4,7k  | \"4,7k\" is not a resistance",
        "k     | \"k\" is not a resistance",
        "R     | \"R\" is not a resistance",
        "4k7Ω  | \"4k7Ω\" is not a resistance",
        "1.2.3 | \"1.2.3\" is not a resistance",
        "1e    | \"1e\" is not a resistance",
        "abc   | \"abc\" is not a resistance",
        "4 kF  | \"4 kF\" is not a resistance",
    })
    void rejectsTextThatIsNotAValue(String text, String message) {
        assertThatThrownBy(() -> ValueCode.parse(text, Unit.OHM))
                .isInstanceOf(BadInputException.class)
                .hasMessageStartingWith(message);
    }

    @Test
    void rejectsNegativeWhenAPositiveValueIsNeeded() {
        assertThat(ValueCode.parseValue("-4k7", Unit.OHM)).isEqualTo(-4700);
        assertThatThrownBy(() -> ValueCode.parsePositive("-4k7", Unit.OHM))
                .isInstanceOf(BadInputException.class)
                .hasMessage("\"-4k7\" is negative: a resistance must be above zero");
    }

    // Formatting writes the code back (IEC 60062 vectors from check-values.md).
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "0.47    | OHM   | R47",
        "4.7     | OHM   | 4R7",
        "470     | OHM   | 470R",
        "1000    | OHM   | 1k0",
        "4700    | OHM   | 4k7",
        "47300   | OHM   | 47k3",
        "10000   | OHM   | 10k",
        "2.2e6   | OHM   | 2M2",
        "10e-12  | FARAD | 10p",
        "4.7e-9  | FARAD | 4n7",
        "2.2e-9  | FARAD | 2n2",
        "1e-6    | FARAD | 1u0",
        "100e-9  | FARAD | 100n",
        "4.99e3  | OHM   | 4k99",
        "1200    | HERTZ | 1k2",
    })
    void writesLetterAndDigitCodes(double value, Unit unit, String expected) {
        assertThat(ValueCode.format(value, unit)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "4700    | OHM   | 4.7 kΩ",
        "10e-6   | FARAD | 10 µF",
        "1200    | HERTZ | 1.2 kHz",
        "690     | HERTZ | 690 Hz",
    })
    void writesSiText(double value, Unit unit, String expected) {
        assertThat(ValueCode.formatSi(value, unit, 4)).isEqualTo(expected);
    }
}
