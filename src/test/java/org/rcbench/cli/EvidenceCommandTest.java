package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.rcbench.testing.CliRun;

/** {@code rcbench evidence} prints the table (the goals themselves are asserted by EvidenceTest). */
class EvidenceCommandTest {
    @Test
    void printsTheTableForTheChosenPopulations() {
        CliRun run = CliRun.of("evidence", "--boards", "10", "--only", "monostable");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).contains("boards").contains("correct").contains("ambiguous").contains("conf.wrong")
                .contains("monostable 100k/1u").contains("R1 faulty").contains("C1 faulty")
                .doesNotContain("astable 4k7").contains("correct: the top suspect");
    }

    @Test
    void unknownPopulationIsBadInput() {
        CliRun run = CliRun.of("evidence", "--boards", "1", "--only", "no such board");
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
    }
}
