package org.rcbench.gui;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** How a reading stands against its expectation; the band definitions follow issue 4's verdicts. */
class ReadingStateTest {
    private static final Expected BANDS = new Expected(690, 670, 710, 650, 730);

    // value, state: statistical band 670..710 inside worst case 650..730 (both ends count as inside).
    @ParameterizedTest
    @CsvSource({
        "690, IN_BAND", "670, IN_BAND", "710, IN_BAND",
        "669.9, MARGINAL", "650, MARGINAL", "730, MARGINAL", "720, MARGINAL",
        "649.9, OUTSIDE", "730.1, OUTSIDE", "450, OUTSIDE"})
    void bandsDecideTheState(double value, ReadingState state) {
        assertThat(ReadingState.of(value, BANDS, false)).isEqualTo(state);
    }

    @Test
    void settlingOverridesTheBandsButNotAMissingValue() {
        assertThat(ReadingState.of(690, BANDS, true)).isEqualTo(ReadingState.SETTLING);
        assertThat(ReadingState.of(Double.NaN, BANDS, true)).isEqualTo(ReadingState.WAITING);
    }

    @Test
    void withoutBandsOnlyTheNominalIsCompared() {
        assertThat(ReadingState.of(690, Expected.nominalOnly(500), false)).isEqualTo(ReadingState.NOMINAL_ONLY);
        assertThat(ReadingState.of(690, null, false)).isEqualTo(ReadingState.UNPREDICTED);
        assertThat(ReadingState.of(690, new Expected(690, 680, 700, Double.NaN, Double.NaN), false))
                .isEqualTo(ReadingState.IN_BAND);
        assertThat(ReadingState.of(720, new Expected(690, 680, 700, Double.NaN, Double.NaN), false))
                .isEqualTo(ReadingState.OUTSIDE);
    }

    @Test
    void everyStateHasItsOwnWord() {
        java.util.Set<String> words = new java.util.HashSet<>();
        for (ReadingState s : ReadingState.values()) {
            words.add(s.words());
        }
        assertThat(words).hasSize(ReadingState.values().length);
    }
}
