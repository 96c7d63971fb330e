package org.rcbench.units;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.IntRange;
import org.rcbench.common.BadInputException;

class ValueCodeProperties {
    /** Every E192 value (hence every E3..E96 value) from 1 pF-scale to TΩ-scale survives format then parse. */
    @Property
    void formatThenParseIsIdentityOnSeriesValues(@ForAll @IntRange(min = 0, max = 191) int index,
            @ForAll @IntRange(min = -12, max = 9) int decade, @ForAll("units") Unit unit) {
        double v = PreferredSeries.E192.value(index, decade);
        String code = ValueCode.format(v, unit);
        double back = ValueCode.parseValue(code, unit);
        assertThat(Math.abs(back / v - 1)).as(code).isLessThan(1e-14);
        String si = ValueCode.formatSi(v, unit, 3);
        assertThat(Math.abs(ValueCode.parseValue(si, unit) / v - 1)).as(si).isLessThan(1e-14);
    }

    @Provide
    Arbitrary<Unit> units() {
        return Arbitraries.of(Unit.OHM, Unit.FARAD, Unit.HERTZ, Unit.SECOND);
    }

    /** Any text either parses or fails with the documented exception, whose message quotes the text. */
    @Property(tries = 3000)
    void garbageOnlyThrowsBadInput(@ForAll("garbage") String text, @ForAll("units") Unit unit) {
        try {
            ValueCode.parse(text, unit);
        } catch (BadInputException e) {
            assertThat(e.getMessage()).contains("\"" + text + "\"");
        }
    }

    @Property(tries = 3000)
    void anyStringOnlyThrowsBadInput(@ForAll String text) {
        try {
            ValueCode.parse(text, Unit.OHM);
            Tolerance.parse(text);
        } catch (BadInputException e) {
            assertThat(e.getMessage()).isNotEmpty();
        }
    }

    @Provide
    Arbitrary<String> garbage() {
        return Arbitraries.strings().withChars("0123456789.eE+-kKMmunpµRrGTFJΩ Hz%/±")
                .ofMinLength(0).ofMaxLength(10);
    }
}
