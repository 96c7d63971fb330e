package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.testing.CliRun;

/**
 * {@code rcbench check} on a live source: the simulated board through the simulated probe, the wire
 * protocol and the decoder (the whole chain), in-process.
 */
class CheckLiveTest {
    @TempDir
    Path dir;

    private CliRun check(String... args) {
        List<String> all = new ArrayList<>(List.of("check"));
        all.addAll(List.of(args));
        all.addAll(List.of("--draws", "20000", "--db", dir.resolve("history.db").toString()));
        return CliRun.of(all.toArray(String[]::new));
    }

    private static JsonNode json(CliRun r) throws Exception {
        return new ObjectMapper().readTree(r.out());
    }

    // check-values.md, "Signatures": a pure capacitance change scales high and low time alike, so
    // C1 -25 % leaves the duty and multiplies the frequency by 1/0.75 (+33.3 %); the Piper Mk2's
    // nominal 678.9 Hz becomes 905.2 Hz, and C1 is the part to blame, at 75 nF.
    @Test
    void agedCapacitorOnTheSimulatedBoardFailsAndNamesC1() throws Exception {
        CliRun r = check("--sim", "demo:piper-mk2", "--fault", "C1=-25%");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(r.out()).startsWith("FAIL  Piper Mk2: frequency 905.")
                .contains("(simulated Piper Mk2 (demo:piper-mk2) with C1=-25%: ")
                .contains("Diagnosis: C1 at 75.").contains("is the likely fault");
        assertThat(r.err()).startsWith("rcbench: measuring simulated Piper Mk2 (demo:piper-mk2) for 5.00 s of probe time");
        JsonNode j = json(check("--sim", "demo:piper-mk2", "--fault", "C1=-25%", "--json"));
        assertThat(j.get("frequency_hz").asDouble()).isCloseTo(678.9 / 0.75, within(0.5));
        assertThat(j.get("verdict").asText()).isEqualTo("fail");
        JsonNode top = j.get("suspects").get(0);
        assertThat(top.get("part").asText()).isEqualTo("C1");
        assertThat(top.get("deviation").asDouble()).isCloseTo(-0.25, within(0.01));
        assertThat(top.get("probability").asDouble()).isGreaterThan(0.9);
    }

    @Test
    void healthySimulatedBoardPasses() {
        CliRun r = check("--sim", "demo:piper-mk2");
        assertThat(r.exitCode()).as(r.err()).isZero();
        assertThat(r.out()).startsWith("PASS  Piper Mk2: every quantity is inside its 95 % band\n"
                + "(simulated Piper Mk2 (demo:piper-mk2): ");
    }

    // Probe time, not wall time: 2 s of a board at 678.9 Hz nominal hold 1357 or 1358 periods; the
    // first one is settling (the longer first charge from 0 V) and one more is cut by the end.
    @Test
    void durationIsProbeTime() throws Exception {
        JsonNode j = json(check("--sim", "demo:piper-mk2", "--duration", "2s", "--json"));
        assertThat(j.get("span_s").asDouble()).isCloseTo(2.0, within(0.01));
        assertThat(j.get("cycles").asLong()).isBetween(1354L, 1358L);
    }

    // The Wren's pulse: 1.1 R1 C1 (the 555's ln 3 = 1.0986, handbook monostable) = 5.163 s at
    // R1 = 470k, C1 = 10u; the trigger channel is the simulated board's "trigger".
    @Test
    void aSimulatedMonostableIsTimedFromItsTrigger() throws Exception {
        JsonNode j = json(check("--sim", "demo:wren", "--json"));
        assertThat(j.get("verdict").asText()).isEqualTo("pass");
        assertThat(j.get("pulse_width_s").asDouble()).isCloseTo(Math.log(3) * 470e3 * 10e-6, within(0.03));
        assertThat(j.get("checks").has("pulse_width_s")).isTrue();
    }

    @Test
    void jsonHasTheSameKeysLiveAndFromAFile() throws Exception {
        Path file = dir.resolve("piper.rce");
        CliRun rec = CliRun.of("record", "--sim", "demo:piper-mk2", "--sim-speed", "fast", "--duration", "2s", "-o",
                file.toString(), "--db", dir.resolve("history.db").toString());
        assertThat(rec.exitCode()).as(rec.err()).isZero();
        JsonNode fromFile = json(check(file.toString(), "--design", "demo:piper-mk2", "--json"));
        JsonNode live = json(check("--sim", "demo:piper-mk2", "--duration", "2s", "--json"));
        TreeSet<String> a = new TreeSet<>();
        fromFile.fieldNames().forEachRemaining(a::add);
        TreeSet<String> b = new TreeSet<>();
        live.fieldNames().forEachRemaining(b::add);
        assertThat(b).isEqualTo(a);
        assertThat(fromFile.get("capture").asText()).isEqualTo(file.toString());
        assertThat(live.get("capture").isNull()).isTrue();
        assertThat(live.get("source").asText()).isEqualTo("simulated Piper Mk2 (demo:piper-mk2)");
        // the same board, recorded or live, measures the same
        assertThat(live.get("frequency_hz").asDouble()).isCloseTo(fromFile.get("frequency_hz").asDouble(), within(1e-6));
    }

    @Test
    void aSimulatedBoardIsCheckedAgainstAnotherDesignWhenAsked() {
        CliRun r = check("--sim", "demo:piper-mk1-y5v", "--fault", "C1=-25%", "--design", "demo:piper-mk2");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(r.out()).startsWith("FAIL  Piper Mk2: ").contains("; design demo:piper-mk2)");
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "board.rce --sim demo:piper-mk2                 | CAPTURE: give a capture file or a live source, not both (also given: --sim)",
        "board.rce --design demo:piper-mk2 --fault C1=-5% | CAPTURE: give a capture file or a live source, not both (also given: --fault)",
        "board.rce --design demo:piper-mk2 --duration 2s | --duration: only for a live source (--port, --sim); a capture file is read whole",
        "board.rce                                      | --design: needed with a capture file: the board's design file or demo:NAME",
        "--design demo:piper-mk2                        | CAPTURE: missing: give a capture file, or a live source (--port PORT or --sim DESIGN)",
        "--replay board.rce --design demo:piper-mk2     | --replay: give the capture file as CAPTURE instead (e.g. rcbench check FILE --design DESIGN)",
        "--port /dev/null                               | --design: needed with --port: the board's design file or demo:NAME",
        "--sim reference:1kHz                           | --design: needed: a simulated reference signal has no design of its own",
        "--port /dev/null --design demo:wren --fault C1=-5% | --fault: only for a simulated board (--sim), not with --port",
    })
    void badCombinationsAreOneLineAndExitTwo(String args, String message) {
        List<String> a = new ArrayList<>();
        for (String s : args.strip().split(" +")) {
            a.add(s.equals("board.rce") ? dir.resolve("board.rce").toString() : s);
        }
        CliRun r = check(a.toArray(String[]::new));
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).isEqualTo("rcbench: " + message + "\n");
        assertThat(r.out()).isEmpty();
    }
}
