package org.rcbench.diagnose;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;

/**
 * What the measurement cannot separate. A monostable's pulse width is {@code R C ln 3}
 * (check-values.md: R = 100k, C = 1u gives 109.8612 ms), so R against C is structurally
 * unidentifiable from the pulse width alone: only the product R·C is determined, whatever the priors
 * or the precision.
 */
class IdentifiabilityTest {
    private static final double WIDTH = 109.8612e-3;

    // Priors that strongly favour one part (a 1 % metal film against a 20 % electrolytic, and the
    // reverse pairing) must still not produce a confident single answer.
    @ParameterizedTest
    @CsvSource({
        "1%, metal-film, 20%, aluminium-electrolytic, 0.69, 31.0 % low",
        "1%, metal-film, 20%, aluminium-electrolytic, 1.50, 50.0 % high",
        "5%, carbon-composition, 5%, film, 0.69, 31.0 % low",
        "5%, carbon-composition, 5%, film, 1.80, 80.0 % high"})
    void monostableRAgainstCIsAlwaysAmbiguousAndNamesTheProduct(String rTol, String rKind, String cTol, String cKind,
            double factor, String phrase) {
        Design m = Boards.idealMonostable(rTol, rKind, cTol, cKind);
        Diagnosis d = Diagnoser.of(m).diagnose(Boards.given(1e-4, TimingQuantity.PULSE_WIDTH, factor * WIDTH));
        assertThat(d.ambiguous()).as(d.summary()).isTrue();
        Ambiguity a = d.ambiguities().get(0);
        assertThat(a.determined()).isEqualTo("R1·C1 (the pulse width) is " + phrase);
        if (!d.best().isNoFault()) {
            assertThat(a.structural()).isTrue();
            assertThat(a.between()).contains("R1", "C1");
            assertThat(a.separate()).contains("R1 with an ohmmeter").contains("C1 with a capacitance meter");
            assertThat(a.text()).contains("no precision would separate them");
        }
    }

    @Test
    void noFaultLeadStillNamesAPartBeyondItsStatedTolerance() {
        // Pulse width 0.69 R C ln 3 (RC law; check-values.md) with a 20 % aluminium electrolytic: the
        // electrolytic's ageing allowance lets "no fault" lead, but the summary must say that this puts a
        // part beyond its stated tolerance instead of reading as "everything in tolerance".
        Design m = Boards.idealMonostable("1%", "metal-film", "20%", "aluminium-electrolytic");
        Diagnosis d = Diagnoser.of(m).diagnose(Boards.given(1e-4, TimingQuantity.PULSE_WIDTH, 0.69 * WIDTH));
        if (d.best().isNoFault()) {
            assertThat(d.summary()).contains("beyond the stated tolerance").containsPattern("C1 at [0-9.]+ [nµ]F \\(-");
        } else {
            assertThat(d.summary()).doesNotContain("No part needs to be outside its band");
        }
    }

    @Test
    void noFaultLeadInsideTheTolerancesAddsNothing() {
        // 0.97 R C ln 3 lies inside 1 % / 20 % tolerances: no part is placed beyond its stated tolerance.
        Design m = Boards.idealMonostable("1%", "metal-film", "20%", "aluminium-electrolytic");
        Diagnosis d = Diagnoser.of(m).diagnose(Boards.given(1e-4, TimingQuantity.PULSE_WIDTH, 0.97 * WIDTH));
        assertThat(d.best().isNoFault()).isTrue();
        assertThat(d.summary()).doesNotContain("beyond the stated tolerance");
    }

    @Test
    void astableCapacitorAgainstSharedResistorIsSeparatedByTheDuty() {
        // R2 = 7k: high (1k + 7k) C ln 2, low 7k C ln 2 (RC law): the duty moves, so C1 cannot explain it.
        Design a = Boards.idealAstable("5%", "carbon-film", "10n", "5%", "film");
        double ln2 = Math.log(2);
        Diagnosis d = Diagnoser.of(a).diagnose(Boards.given(1e-4, TimingQuantity.HIGH, 8e3 * 10e-9 * ln2,
                TimingQuantity.LOW, 7e3 * 10e-9 * ln2));
        assertThat(d.topSuspect().name()).isEqualTo("R2");
        assertThat(d.ambiguous()).as(d.summary()).isFalse();
        assertThat(d.topSuspect().probability()).isGreaterThan(0.9);
    }

    @Test
    void chargeResistorLowAgainstControlLoadFitEquallyWell() {
        // Both move only the astable's high time (check-values.md signatures): R1 = 700R against a pin load.
        Design a = Boards.idealAstable("5%", "carbon-film", "10n", "5%", "film");
        double ln2 = Math.log(2);
        Diagnosis d = Diagnoser.of(a).diagnose(Boards.given(1e-4, TimingQuantity.HIGH, 10.7e3 * 10e-9 * ln2,
                TimingQuantity.LOW, 10e3 * 10e-9 * ln2));
        assertThat(d.ambiguous()).isTrue();
        assertThat(d.ambiguities().get(0).between()).contains("R1");
        Explanation r1 = explanation(d, "R1");
        Explanation load = explanation(d, "a load on the control pin");
        assertThat(load.misfit() - r1.misfit()).isLessThan(Identifiability.MARGIN);
    }

    @Test
    void chargeResistorAndControlLoadHaveProportionalEffects() {
        // The effect vectors (change of ln high, ln low) of R1 = 700R and of a 10k control load are both (x, 0).
        DiagnosisModel dm = DiagnosisModel.of(Boards.idealAstable("5%", "carbon-film", "10n", "5%", "film"));
        Fault r1 = fault(dm, "R1");
        Fault load = fault(dm, "control.ohms");
        Fit f1 = fit(dm, Hypothesis.of(java.util.List.of(r1)), "R1", 700);
        Fit f2 = fit(dm, Hypothesis.of(java.util.List.of(load)), "control.ohms", 10e3);
        double[] e1 = Identifiability.effect(dm, f1);
        double[] e2 = Identifiability.effect(dm, f2);
        assertThat(e1[1]).isCloseTo(0, org.assertj.core.api.Assertions.within(1e-12));
        assertThat(e2[1]).isCloseTo(0, org.assertj.core.api.Assertions.within(1e-12));
        // check-values.md: the load to 2.5 V makes the high time 44.60116 us instead of 76.24619 us.
        assertThat(Math.exp(e2[0])).isCloseTo(44.60116 / 76.24619, org.assertj.core.api.Assertions.within(1e-6));
        assertThat(Identifiability.cosine(e1, e2)).isGreaterThan(Identifiability.PARALLEL);
        // Leakage is not proportional to either: it lengthens high and shortens low.
        Fit f3 = fit(dm, Hypothesis.of(java.util.List.of(fault(dm, "leak"))), "leak", 300e3);
        assertThat(Identifiability.cosine(e1, Identifiability.effect(dm, f3))).isLessThan(0.9);
    }

    private static Explanation explanation(Diagnosis d, String label) {
        return d.explanations().stream().filter(e -> e.label().equals(label)).findFirst().orElseThrow();
    }

    private static Fault fault(DiagnosisModel dm, String name) {
        return dm.faults.stream().filter(f -> f.name().equals(name)).findFirst().orElseThrow();
    }

    /** A fit with every coordinate at its prior's mode except {@code name} at {@code value}. */
    private static Fit fit(DiagnosisModel dm, Hypothesis h, String name, double value) {
        var coords = MapSolver.coordinates(dm, h);
        double[] z = new double[coords.size()];
        for (int i = 0; i < z.length; i++) {
            z[i] = coords.get(i).name().equals(name) ? coords.get(i).coordinate(value) : 0;
        }
        return new Fit(h, coords, z, new double[z.length][z.length], 0, 0, 0, true, 0);
    }

    @Test
    void alternativesJoinWithOr() {
        assertThat(Identifiability.alternatives(java.util.List.of("R1", "C1 and R2"))).isEqualTo("R1, or C1 and R2");
    }
}
