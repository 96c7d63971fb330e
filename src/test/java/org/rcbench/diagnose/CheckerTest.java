package org.rcbench.diagnose;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.rcbench.circuit.ParameterTable;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.design.Design;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;
import org.rcbench.tolerance.Band;
import org.rcbench.tolerance.Predictor;

/** Verdicts against the predicted bands, on boards simulated through the capture path. */
class CheckerTest {
    private static final Design ASTABLE = Boards.parse("[timer]\ntopology = \"astable\"\nfamily = \"bipolar\"\n"
            + "supply = \"9 V\"\n" + Boards.part("R1", "charge", "4k7", "5%", "carbon-film")
            + Boards.part("R2", "shared", "10k", "5%", "carbon-film") + Boards.part("C1", "timing", "10n", "5%", "film"));
    private static final Checker CHECKER = Checker.of(ASTABLE, new Predictor(20_000, 1).predict(ASTABLE));

    private static CycleMeter measure(Design d, String... deviations) {
        List<Deviation> devs = new ArrayList<>();
        for (String s : deviations) {
            devs.add(Deviation.parse(s));
        }
        VirtualBoard board = VirtualBoard.of(d, SimulationSpec.defaults().withDeviations(devs).withJitterSeconds(2e-8)
                .withSeed(3));
        CycleMeter meter = new CycleMeter(MeterConfig.of(VirtualBoard.OUTPUT, board.timebase().withTolerancePpm(30)));
        board.runFor(0.5, meter);
        return meter;
    }

    @Test
    void statusFollowsTheBands() {
        Band stat = new Band(0.9, 1.1);
        Band wc = new Band(0.8, 1.2);
        assertThat(QuantityCheck.status(1.0, stat, wc)).isEqualTo(Verdict.PASS);
        assertThat(QuantityCheck.status(1.15, stat, wc)).isEqualTo(Verdict.MARGINAL);
        assertThat(QuantityCheck.status(0.85, stat, wc)).isEqualTo(Verdict.MARGINAL);
        assertThat(QuantityCheck.status(1.25, stat, wc)).isEqualTo(Verdict.FAIL);
        assertThat(QuantityCheck.status(1.0, Band.NONE, Band.NONE)).isEqualTo(Verdict.FAIL);
        assertThat(Verdict.PASS.worse(Verdict.MARGINAL)).isEqualTo(Verdict.MARGINAL);
        assertThat(Verdict.FAIL.worse(Verdict.MARGINAL)).isEqualTo(Verdict.FAIL);
        assertThat(Verdict.MARGINAL.failed()).isFalse();
        assertThat(Verdict.STOPPED.failed()).isTrue();
    }

    @Test
    void nominalBoardPasses() {
        CheckResult r = CHECKER.check(measure(ASTABLE));
        assertThat(r.verdict()).as(r.reason()).isEqualTo(Verdict.PASS);
        assertThat(r.checks()).extracting(QuantityCheck::quantity).containsExactly(TimingQuantity.FREQUENCY,
                TimingQuantity.PERIOD, TimingQuantity.HIGH, TimingQuantity.LOW, TimingQuantity.DUTY);
        assertThat(r.histogram().total()).isPositive();
        assertThat(r.trend().size()).isPositive();
        assertThat(r.diagnosis().best().isNoFault()).isTrue();
    }

    @Test
    void everyPartNearItsUpperLimitIsMarginal() {
        // All three 5 % parts at +4.8 %: the period grows 9.8 %, beyond the 95 % band of three independent
        // rectangular tolerances but inside the worst case (+10.25 %).
        CheckResult r = CHECKER.check(measure(ASTABLE, "R1=+4.8%", "R2=+4.8%", "C1=+4.8%"));
        assertThat(r.verdict()).as(r.reason()).isEqualTo(Verdict.MARGINAL);
        assertThat(r.reason()).contains("outside the 95 % band").contains("inside the worst case");
    }

    @Test
    void agedCapacitorFailsAndIsNamed() {
        CheckResult r = CHECKER.check(measure(ASTABLE, "C1=-30%"));
        assertThat(r.verdict()).isEqualTo(Verdict.FAIL);
        assertThat(r.reason()).contains("outside the worst case");
        assertThat(r.diagnosis().topSuspect().name()).isEqualTo("C1");
        assertThat(r.diagnosis().topSuspect().deviation()).isCloseTo(-0.30, within(0.03));
        assertThat(r.check(TimingQuantity.FREQUENCY).status()).isEqualTo(Verdict.FAIL);
        assertThat(r.check(TimingQuantity.DUTY).status()).isEqualTo(Verdict.PASS);
    }

    @Test
    void boardThatDoesNotRunIsStoppedWithTheCausesTheModelKnows() {
        CheckResult r = CHECKER.check(measure(ASTABLE, "leak=1k"));
        assertThat(r.verdict()).isEqualTo(Verdict.STOPPED);
        assertThat(r.reason()).startsWith("not running").contains("leakage of about").contains("control-pin load");
        assertThat(r.diagnosis().solved()).isFalse();
    }

    @Test
    void leakageLimitIsTwiceTheTimingResistance() {
        // check-values.md: leakage stops it when R_L <= 2 (Ra + Rb) (astable) and R_L <= 2 R (monostable).
        DiagnosisModel a = DiagnosisModel.of(Boards.idealAstable("5%", "carbon-film", "10n", "5%", "film"));
        assertThat(StopCauses.limit(a, ParameterTable.LEAK, a.leakReference)).isCloseTo(22e3, within(0.01 * 22e3));
        DiagnosisModel m = DiagnosisModel.of(Boards.idealMonostable("5%", "carbon-film", "5%", "film"));
        assertThat(StopCauses.limit(m, ParameterTable.LEAK, m.leakReference)).isCloseTo(200e3, within(0.01 * 200e3));
    }

    @Test
    void periodHistogramCountsEveryPeriodInTickWideBins() {
        org.rcbench.edge.Timebase tb = org.rcbench.edge.Timebase.of(1e6);
        long[] p = {1000, 1001, 1001, 1003, 1000};
        PeriodHistogram h = PeriodHistogram.of(p, p.length, tb);
        assertThat(h.counts()).containsExactly(2, 2, 0, 1);
        assertThat(h.edgesSeconds()[0]).isCloseTo(1e-3, within(1e-15));
        assertThat(h.edgesSeconds()[4]).isCloseTo(1.004e-3, within(1e-15));
        long[] wide = new long[1000];
        for (int i = 0; i < wide.length; i++) {
            wide[i] = 10_000 + i;
        }
        PeriodHistogram w = PeriodHistogram.of(wide, wide.length, tb);
        assertThat(w.counts().length).isLessThanOrEqualTo(PeriodHistogram.MAX_BINS);
        assertThat(w.total()).isEqualTo(1000);
    }
}
