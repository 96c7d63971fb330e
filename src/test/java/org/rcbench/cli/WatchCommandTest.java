package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.design.Design;
import org.rcbench.diagnose.Words;
import org.rcbench.measure.CycleMeter;
import org.rcbench.measure.MeterConfig;
import org.rcbench.sim.Deviation;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;
import org.rcbench.source.DemoDesigns;
import org.rcbench.source.LiveReading;
import org.rcbench.testing.CliRun;
import org.rcbench.tolerance.Predictor;

/** {@code rcbench watch}, in-process, on simulated boards at fast pace (plain output: no terminal here). */
class WatchCommandTest {

    static CliRun watch(Path dir, String... args) {
        String[] all = new String[args.length + 4];
        all[0] = "watch";
        System.arraycopy(args, 0, all, 1, args.length);
        all[args.length + 1] = "--sim-speed=fast";
        all[args.length + 2] = "--db";
        all[args.length + 3] = dir.resolve("history.db").toString();
        return CliRun.of(all);
    }

    static String line(String out, String label) {
        return out.lines().filter(l -> l.startsWith("  " + label + " ")).reduce((a, b) -> b).orElseThrow();
    }

    // check-values.md, "Signatures": a pure capacitance change scales high and low time by the same
    // factor; C1 -25 % gives 0.75 of each, a frequency 1/0.75 - 1 = +33.3 % from nominal, and the
    // back-solved C1 is 0.75 of 100 nF.
    @Test
    void anAgedCapacitorReadsOutOfBandWithTheRightSignature(@TempDir Path dir) {
        CliRun r = watch(dir, "--sim", "demo:piper-mk2", "--fault", "C1=-25%", "--once");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(line(r.out(), "frequency")).endsWith("fail (+33.3 %)");
        assertThat(line(r.out(), "high")).endsWith("fail (-25.0 %)");
        assertThat(line(r.out(), "low")).endsWith("fail (-25.0 %)");
        assertThat(line(r.out(), "duty")).endsWith("pass");
        assertThat(line(r.out(), "top suspect:")).startsWith("  top suspect: C1 at 75.").contains("(-24.");
        assertThat(r.out()).contains("  verdict: FAIL, outside the worst case");
    }

    @Test
    void aHealthyBoardReadsTheDesignsNominalInBand(@TempDir Path dir) throws Exception {
        CliRun r = watch(dir, "--sim", "demo:piper-mk2", "--once");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        CliRun p = CliRun.of("predict", "--json", "captures/piper-mk2.toml");
        double nominal = new ObjectMapper().readTree(p.out()).at("/nominal/frequency_hz").asDouble();
        String f = line(r.out(), "frequency");
        assertThat(f).contains(Words.value(org.rcbench.circuit.TimingQuantity.FREQUENCY, nominal))
                .endsWith("pass");
        assertThat(r.out()).contains("  verdict: PASS, every quantity inside its 95 % band")
                .contains("  diagnosis: No part needs to be outside its band");
        assertThat(r.err()).doesNotContain("Exception");
    }

    // check-values.md: pot PWM period (R1 + P) C k at any wiper, duty 0.0099 / 0.2574 / 0.5050 / 1.0000
    // at wiper 0 / 0.25 / 0.5 / 1: duty is linear in the wiper, so a wiper at 0.6 goes back to the
    // design's 0.5, a tenth of the travel: 27° of the demo VR1's 270° (its design file's travel).
    @Test
    void aPotentiometerOffItsSettingGetsATuningStep(@TempDir Path dir) {
        CliRun r = watch(dir, "--sim", "demo:lumen-dm1", "--fault", "VR1.wiper=0.6", "--once");
        assertThat(r.out()).contains("  tuning: VR1 0.60 → 0.50 of its travel (about 27° of 270°) for duty 49.59 %:"
                + " more of the track on the discharge side\n");
        CliRun ok = watch(dir, "--sim", "demo:lumen-dm1", "--once");
        assertThat(ok.out()).contains("  tuning: VR1 is on target for duty 49.59 %: leave it\n");
    }

    @Test
    void aMonostableShowsItsPulseWidth(@TempDir Path dir) {
        CliRun r = watch(dir, "--sim", "demo:wren", "--once");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(line(r.out(), "triggers")).contains("2 pulses timed");
        assertThat(line(r.out(), "pulse width")).endsWith("pass");
    }

    @Test
    void withADurationItPrintsReadoutsAsItGoes(@TempDir Path dir) {
        CliRun r = watch(dir, "--sim", "demo:piper-mk2", "--duration", "20s", "--every", "0.01s");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        long readouts = r.out().lines().filter(l -> l.startsWith("  frequency ")).count();
        assertThat(readouts).isGreaterThanOrEqualTo(1);
        assertThat(r.out()).contains("20.0 s of signal");
        assertThat(r.out()).doesNotContain("\u001b[");
    }

    @Test
    void aRecordingReplaysIntoTheSameReadout(@TempDir Path dir) {
        Path file = dir.resolve("aged.rce");
        CliRun rec = CliRun.of("record", "--sim", "demo:piper-mk2", "--fault", "C1=-25%", "--sim-speed", "fast",
                "--duration", "3s", "-o", file.toString(), "--db", dir.resolve("history.db").toString());
        assertThat(rec.exitCode()).as(rec.err()).isZero();
        CliRun r = watch(dir, "--replay", file.toString(), "--design", "demo:piper-mk2", "--once");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(line(r.out(), "frequency")).endsWith("(+33.3 %)");
        assertThat(r.out()).contains("replay done: ");
    }

    @Test
    void withoutADesignThereIsNoVerdict(@TempDir Path dir) {
        Path file = dir.resolve("x.rce");
        CliRun.of("record", "--sim", "demo:piper-mk2", "--sim-speed", "fast", "--duration", "1s", "-o", file.toString(),
                "--db", dir.resolve("history.db").toString());
        CliRun r = watch(dir, "--replay", file.toString(), "--once");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).doesNotContain("verdict").doesNotContain("band").doesNotContain("diagnosis");
        assertThat(line(r.out(), "frequency")).doesNotContain("pass");
    }

    @Test
    void aTerminalRedrawsInPlaceAndAPipeGetsPlainLines() {
        StringWriter tty = new StringWriter();
        Terminal t = new Terminal(new PrintWriter(tty), true, 100);
        t.block(List.of("a", "b", "c"));
        t.block(List.of("d", "e"));
        // ECMA-48: ESC [ 3 A moves up over the three lines drawn; ESC [ K erases what was left of each.
        assertThat(tty.toString()).isEqualTo("a\u001b[K\nb\u001b[K\nc\u001b[K\n"
                + "\u001b[3A\rd\u001b[K\ne\u001b[K\n\u001b[K\n\u001b[1A");
        StringWriter pipe = new StringWriter();
        Terminal p = new Terminal(new PrintWriter(pipe), false, 100);
        p.block(List.of("a", "b"));
        p.status("waiting 1", "WAITING");
        p.status("waiting 2", "WAITING");
        p.status("streaming", "STREAMING");
        assertThat(pipe.toString()).isEqualTo("a\nb\n\nwaiting 1\nstreaming\n");
        StringWriter narrow = new StringWriter();
        new Terminal(new PrintWriter(narrow), true, 20).status("a status line longer than twenty", "S");
        assertThat(narrow.toString()).isEqualTo("\ra status line long…\u001b[K");
    }

    @Test
    void helpTextsShowTheirPercentSigns() {
        CliRun w = CliRun.of("watch", "--help");
        assertThat(w.out()).contains("95 % band").contains("C1=-35%, R2=12k").contains("+2%@30s").doesNotContain("%%");
    }

    /** The judge re-solves only for a new reading: asking again for the same one costs nothing. */
    @Test
    void theDiagnosisIsSolvedOncePerReading() {
        Design d = DemoDesigns.resolve("demo:piper-mk2");
        VirtualBoard board = VirtualBoard.of(d, SimulationSpec.defaults()
                .withDeviations(List.of(Deviation.parse("C1=-25%"))));
        CycleMeter meter = new CycleMeter(
                MeterConfig.of(0, board.timebase()));
        board.runFor(1.0, meter);
        WatchJudge judge = new WatchJudge(d, new Predictor(2000, 1).predict(d));
        LiveReading r = new LiveReading(meter.snapshot(), null, null, 0, 0, 1.0, false);
        WatchJudge.Judgement first = judge.of(r);
        assertThat(judge.of(r)).isSameAs(first);
        assertThat(first.diagnosis().topSuspect().name()).isEqualTo("C1");
        LiveReading next = new LiveReading(meter.snapshot(), null, null, 0, 0, 1.0,
                false);
        assertThat(judge.of(next)).isNotSameAs(first);
    }
}
