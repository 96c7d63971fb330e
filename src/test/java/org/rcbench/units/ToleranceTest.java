package org.rcbench.units;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.common.BadInputException;

class ToleranceTest {
    // IEC 60062 tolerance letters F ±1 %, G ±2 %, J ±5 %, K ±10 %, M ±20 % (check-values.md).
    @ParameterizedTest
    @CsvSource({"F, 0.01", "G, 0.02", "J, 0.05", "K, 0.10", "M, 0.20"})
    void lettersGiveSymmetricBands(String letter, double fraction) {
        assertThat(Tolerance.parse(letter)).isEqualTo(Tolerance.symmetric(fraction));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "5%        | 0.05  | 0.05",
        "±0.5 %    | 0.005 | 0.005",
        "+-1%      | 0.01  | 0.01",
        "+22/-82%  | 0.82  | 0.22",
        "+22%/-56% | 0.56  | 0.22",
        "-82/+22 % | 0.82  | 0.22",
        "100%      | 1.0   | 1.0",
    })
    void readsPercentages(String text, double minus, double plus) {
        Tolerance t = Tolerance.parse(text);
        assertThat(t.minusFraction()).isCloseTo(minus, within(1e-15));
        assertThat(t.plusFraction()).isCloseTo(plus, within(1e-15));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "150%   | \"150%\": tolerance over 100 %",
        "-5%    | \"-5%\": a tolerance cannot be negative; write ±5% or +0/-10%",
        "5      | \"5\": write a tolerance as a percentage (5%) or a letter (F G J K M)",
        "X      | \"X\": write a tolerance as a percentage (5%) or a letter (F G J K M)",
        "+5/+5% | \"+5/+5%\": write an asymmetric band as +22/-82%",
    })
    void rejectsBadTolerances(String text, String message) {
        assertThatThrownBy(() -> Tolerance.parse(text)).isInstanceOf(BadInputException.class).hasMessage(message);
    }

    @Test
    void printsBands() {
        assertThat(Tolerance.symmetric(0.05)).hasToString("±5 %");
        assertThat(new Tolerance(0.82, 0.22)).hasToString("+22/-82 %");
        assertThat(new Tolerance(0.82, 0.22).low(100e-9)).isCloseTo(18e-9, within(1e-20));
    }
}
