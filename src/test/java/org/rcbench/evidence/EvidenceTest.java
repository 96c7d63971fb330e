package org.rcbench.evidence;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.rcbench.circuit.Topology;

import java.util.ArrayList;
import java.util.List;

/**
 * The goals of the diagnosis on seeded populations of simulated boards (issue 4): on the astable
 * family at least 95 % correct top suspects when the fault exceeds three times the part's
 * tolerance; nowhere a confidently wrong answer; on monostables R against C always ambiguous. Each
 * population: 200 boards, faults of 3 to 6 tolerances, seed 1 ({@link StandardPopulations}).
 */
class EvidenceTest {
    @TestFactory
    List<DynamicTest> everyStandardPopulationMeetsItsGoal() {
        List<DynamicTest> tests = new ArrayList<>();
        for (StandardPopulations.Entry e : StandardPopulations.all()) {
            tests.add(DynamicTest.dynamicTest(e.population().name(), () -> {
                StudyResult r = PopulationStudy.run(e.population());
                StudyResult.Row total = r.total();
                assertThat(total.boards()).isEqualTo(200);
                assertThat(total.confidentlyWrong()).as(EvidenceTable.rows(r, e.goal())).isZero();
                if (e.goal() == StandardPopulations.Goal.CORRECT_95) {
                    assertThat(total.correctRate()).as(EvidenceTable.rows(r, e.goal())).isGreaterThanOrEqualTo(0.95);
                }
                if (e.population().design().circuit().topology() == Topology.MONOSTABLE) {
                    assertThat(total.ambiguousRate()).as(EvidenceTable.rows(r, e.goal())).isEqualTo(1.0);
                }
                assertThat(EvidenceTable.met(e.goal(), total)).isTrue();
            }));
        }
        return tests;
    }
}
