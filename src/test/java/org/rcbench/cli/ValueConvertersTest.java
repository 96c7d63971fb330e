package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.rcbench.units.PreferredSeries;
import org.rcbench.units.Tolerance;
import picocli.CommandLine.TypeConversionException;

class ValueConvertersTest {
    // IEC 60062 codes and SI text (check-values.md vectors).
    @Test
    void convertsCodesAndSiText() {
        assertThat(new ValueConverters.Resistance().convert("4k7")).isEqualTo(4700);
        assertThat(new ValueConverters.Capacitance().convert("10n")).isEqualTo(10e-9);
        assertThat(new ValueConverters.Frequency().convert("1.2 kHz")).isEqualTo(1200);
        assertThat(new ValueConverters.Time().convert("150m")).isEqualTo(0.15);
        assertThat(new ValueConverters.TimeOrZero().convert("2us")).isEqualTo(2e-6);
        assertThat(new ValueConverters.TimeOrZero().convert("20 ms")).isEqualTo(0.02);
        assertThat(new ValueConverters.TimeOrZero().convert("0")).isEqualTo(0);
        assertThat(new ValueConverters.Voltage().convert("9V")).isEqualTo(9);
        assertThat(new ValueConverters.Fraction().convert("60%")).isEqualTo(0.6);
        assertThat(new ValueConverters.ToleranceBand().convert("J")).isEqualTo(Tolerance.symmetric(0.05));
        assertThat(new ValueConverters.Series().convert("e96")).isEqualTo(PreferredSeries.E96);
    }

    @Test
    void rejectsBadTextQuotingIt() {
        assertThatThrownBy(() -> new ValueConverters.Resistance().convert("4k7k"))
                .isInstanceOf(TypeConversionException.class).hasMessageStartingWith("\"4k7k\" is not a resistance");
        assertThatThrownBy(() -> new ValueConverters.Capacitance().convert("-10n"))
                .isInstanceOf(TypeConversionException.class).hasMessage("\"-10n\" is negative: a capacitance must be above zero");
        assertThatThrownBy(() -> new ValueConverters.Frequency().convert("1.2 kV"))
                .isInstanceOf(TypeConversionException.class).hasMessageStartingWith("\"1.2 kV\" is not a frequency");
        assertThatThrownBy(() -> new ValueConverters.TimeOrZero().convert("-1ms"))
                .isInstanceOf(TypeConversionException.class).hasMessage("\"-1ms\" is not a time of zero or more");
        assertThatThrownBy(() -> new ValueConverters.TimeOrZero().convert("2 Hz"))
                .isInstanceOf(TypeConversionException.class).hasMessageStartingWith("\"2 Hz\" is not a time");
        assertThatThrownBy(() -> new ValueConverters.Series().convert("E25"))
                .isInstanceOf(TypeConversionException.class).hasMessageStartingWith("\"E25\" is not a preferred series");
    }
}
