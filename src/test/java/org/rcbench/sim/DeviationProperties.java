package org.rcbench.sim;

import static org.assertj.core.api.Assertions.assertThat;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.rcbench.common.BadInputException;

class DeviationProperties {
    /** Any text parses, or fails with the one-line error that quotes it; resolving likewise. */
    @Property(tries = 3000)
    void anyTextParsesOrFailsQuotingIt(@ForAll("texts") String text) {
        try {
            Deviation d = Deviation.parse(text);
            double[] p = DeviationTest.MODEL.nominal();
            try {
                d.resolve(DeviationTest.MODEL.parameters(), p, "board");
            } catch (BadInputException e) {
                assertThat(e.getMessage()).startsWith("--fault: \"" + d + "\": ").doesNotContain("\n");
            }
        } catch (BadInputException e) {
            assertThat(e.getMessage()).startsWith("--fault: \"" + text + "\": ").doesNotContain("\n");
        }
    }

    @Provide
    Arbitrary<String> texts() {
        Arbitrary<String> names = Arbitraries.of("C1", "R1", "R2", "leak", "control", "supply", "X9", "", "C 1",
                "family.delay", "C2");
        Arbitrary<String> values = Arbitraries.strings().withChars("0123456789.+-%kKMmnuµpRVFΩ eopn").ofMaxLength(8);
        Arbitrary<String> wellFormed = net.jqwik.api.Combinators.combine(names, values).as((n, v) -> n + "=" + v);
        return Arbitraries.oneOf(wellFormed, Arbitraries.strings().ofMaxLength(12));
    }
}
