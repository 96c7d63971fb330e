package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;
import org.rcbench.capture.VcdTimescale;
import org.rcbench.capture.VcdWriter;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;
import org.rcbench.history.CheckContent.Measured;
import org.rcbench.history.CheckDocument;
import org.rcbench.history.Fixtures;
import org.rcbench.testing.CliRun;
import org.rcbench.testing.RecordingSink;

class ExportCommandTest {
    @TempDir
    Path dir;

    /** A 16 MHz capture: 2 channels, 50 cycles of 16000 ticks (1 ms) with 5200 high ticks, and a gap. */
    private Path capture() throws Exception {
        StringBuilder sb = new StringBuilder("# rcbench edges v1\n# clock_hz=16000000\n# channel.0=top.out\n"
                + "# channel.2=trigger\ntick,channel,level\n");
        for (int i = 0; i < 50; i++) {
            long t = 1000 + 16000L * i;
            sb.append(t).append(",0,1\n").append(t + 5200).append(",0,0\n");
            if (i == 20) {
                sb.append(t + 6000).append(",2,1\n").append(t + 7000).append(",2,0\n");
            }
            if (i == 30) {
                sb.append(t + 9000).append(",0,x\n");
            }
        }
        sb.append("# end_tick=900000\n");
        Path file = dir.resolve("two.rce");
        Files.writeString(file, sb.toString(), StandardCharsets.US_ASCII);
        return file;
    }

    private static List<CSVRecord> csv(String text) throws Exception {
        try (Reader r = new StringReader(text)) {
            return CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
    }

    @Test
    void cyclesToCsvFile() throws Exception {
        Path out = dir.resolve("cycles.csv");
        CliRun run = CliRun.of("export", "cycles", capture().toString(), "-o", out.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        // 50 rises (0 .. 49): cycle 30 -> 31 is cut by the gap after rise 30, so the cycles are
        // 0->1 ... 29->30 (30 of them) and 31->32 ... 48->49 (18): 48; 31 starts a new run.
        assertThat(run.err()).isEqualTo("rcbench: 48 cycles of channel 0 written to " + out
                + " (1 gap: no cycle spans it)\n");
        List<CSVRecord> rows = csv(Files.readString(out));
        assertThat(rows).hasSize(48);
        assertThat(rows).filteredOn(r -> r.get("flags").equals("new-run")).extracting(r -> r.get("start_tick"))
                .containsExactly("1000", String.valueOf(1000 + 16000 * 31));
        for (CSVRecord r : rows) {
            assertThat(Double.parseDouble(r.get("period_s"))).isEqualTo(0.001); // 16000 / 16 MHz
            assertThat(Double.parseDouble(r.get("high_s"))).isEqualTo(5200 / 16e6);
            assertThat(Double.parseDouble(r.get("duty"))).isEqualTo(0.325);
        }
        assertThat(rows.get(0).get("start_tick")).isEqualTo("1000");
    }

    @Test
    void cyclesOfANamedChannelToStdout() throws Exception {
        CliRun run = CliRun.of("export", "cycles", capture().toString(), "--channel", "trigger");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).isEqualTo("cycle,start_tick,start_s,period_s,high_s,low_s,duty,flags\r\n"); // one pulse, no cycle
    }

    @Test
    void measurementsOfAStoredRunAndOfAJsonFileAreTheSame() throws Exception {
        Path db = HistoryCommandTest.drifting(dir);
        CliRun fromRun = CliRun.of("export", "measurements", "2", "--db", db.toString());
        assertThat(fromRun.exitCode()).as(fromRun.err()).isZero();
        Path json = dir.resolve("check.json");
        Files.writeString(json, Fixtures.check().toString());
        CliRun fromJson = CliRun.of("export", "measurements", "--from-json", json.toString());
        assertThat(fromJson.out()).isEqualTo(fromRun.out());
        List<CSVRecord> rows = csv(fromRun.out());
        assertThat(rows.get(0).getParser().getHeaderNames()).containsExactly(ExportMeasurementsCommand.HEADER);
        List<Measured> expected = CheckDocument.measurementsOf(Fixtures.check());
        assertThat(rows).hasSize(expected.size());
        CSVRecord f = rows.stream().filter(r -> r.get("quantity").equals("frequency_hz")).findFirst().orElseThrow();
        assertThat(f.values()).containsExactly("frequency_hz", "1000", "0.04", "Hz", "2");
        CSVRecord tie = rows.stream().filter(r -> r.get("quantity").equals("tie_rms_s")).findFirst().orElseThrow();
        assertThat(tie.values()).containsExactly("tie_rms_s", "0.000003", "", "s", "");
    }

    @Test
    void measurementsOfACaptureThroughMeasureJsonOnStdin() throws Exception {
        CliRun measure = CliRun.of("measure", capture().toString(), "--json");
        assertThat(measure.exitCode()).as(measure.err()).isZero();
        JsonNode m = new ObjectMapper().readTree(measure.out());
        java.io.InputStream stdin = System.in;
        CliRun export;
        try {
            System.setIn(new java.io.ByteArrayInputStream(measure.out().getBytes(StandardCharsets.UTF_8)));
            export = CliRun.of("export", "measurements", "--from-json", "-");
        } finally {
            System.setIn(stdin);
        }
        assertThat(export.exitCode()).as(export.err()).isZero();
        List<CSVRecord> rows = csv(export.out());
        CSVRecord f = rows.stream().filter(r -> r.get("quantity").equals("frequency_hz")).findFirst().orElseThrow();
        assertThat(Double.parseDouble(f.get("value"))).isEqualTo(m.path("frequency_hz").asDouble());
        assertThat(Double.parseDouble(f.get("uncertainty"))).isEqualTo(m.path("frequency_u_hz").asDouble());
        CSVRecord high = rows.stream().filter(r -> r.get("quantity").equals("high_s")).findFirst().orElseThrow();
        // the measure document's standard uncertainty high.u_s, expanded with k = 2
        assertThat(Double.parseDouble(high.get("uncertainty"))).isEqualTo(2 * m.path("high").path("u_s").asDouble());
        assertThat(high.get("unit")).isEqualTo("s");
        assertThat(rows).noneMatch(r -> r.get("quantity").equals("frequency_u_hz") || r.get("quantity").equals("channel"));
    }

    @Test
    void badJsonIsOneLine() throws Exception {
        Path json = dir.resolve("bad.json");
        Files.writeString(json, "{\n \"verdict\": pass\n}");
        CliRun run = CliRun.of("export", "measurements", "--from-json", json.toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).startsWith("rcbench: " + json + ":2: not JSON: ").doesNotContain("\n\tat");
        assertThat(run.err().lines()).hasSize(1);
    }

    @Test
    void vcdRoundTripPreservesEveryEdge() throws Exception {
        // A VCD as another tool might write it: 1 ns units, two wires, a gap (x).
        Path original = dir.resolve("in.vcd");
        Map<Integer, String> names = new LinkedHashMap<>(Map.of(0, "bench.osc"));
        names.put(1, "bench.trig");
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (VcdWriter w = new VcdWriter(bytes, VcdTimescale.NANOSECOND.timebase(), VcdTimescale.NANOSECOND, names, null)) {
            long t = 0;
            for (int i = 0; i < 200; i++) {
                w.append(t += 690_000 + (i % 7), 0, EdgeSink.HIGH);
                if (i == 50) {
                    w.append(t + 10, 1, EdgeSink.HIGH);
                    w.append(t + 20_000, 1, EdgeSink.LOW);
                }
                w.append(t += 760_000 - (i % 5), 0, i == 120 ? EdgeSink.UNKNOWN : EdgeSink.LOW);
            }
            w.end(t + 1000);
        }
        Files.write(original, bytes.toByteArray());
        Path copy = dir.resolve("out.vcd");
        CliRun run = CliRun.of("export", "vcd", original.toString(), "-o", copy.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.err()).isEqualTo("rcbench: 2 channels written to " + copy + " in units of 1 ns\n");
        Read a = read(original);
        Read b = read(copy);
        assertThat(b.edges).isEqualTo(a.edges);
        assertThat(b.edges).hasSize(402);
        assertThat(b.end).isEqualTo(a.end);
        assertThat(b.channels).isEqualTo(a.channels);
        assertThat(b.timebase).isEqualTo(a.timebase);
    }

    @Test
    void edgeCaptureToVcdKeepsEveryEdgeTime() throws Exception {
        Path vcd = dir.resolve("two.vcd");
        CliRun run = CliRun.of("export", "vcd", capture().toString(), "-o", vcd.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        // one tick of 16 MHz is 62.5 ns = 625 units of 100 ps, the coarsest exact unit
        assertThat(run.err()).contains("in units of 100 ps");
        Read a = read(capture());
        Read b = read(vcd);
        assertThat(b.edges).hasSize(a.edges.size());
        for (int i = 0; i < a.edges.size(); i++) {
            RecordingSink.Edge x = a.edges.get(i);
            RecordingSink.Edge y = b.edges.get(i);
            assertThat(y.tick()).isEqualTo(x.tick() * 625);
            assertThat(y.level()).isEqualTo(x.level());
            // VCD numbers its wires in declaration order: channel 0 -> 0, channel 2 -> 1
            assertThat(y.channel()).isEqualTo(x.channel() == 0 ? 0 : 1);
        }
        assertThat(b.channels).containsExactly(Map.entry(0, "top.out"), Map.entry(1, "capture.trigger"));
    }

    @Test
    void vcdNeedsAnOutputFile() throws Exception {
        CliRun run = CliRun.of("export", "vcd", capture().toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).startsWith("rcbench: Missing required option: '--output=FILE'");
    }

    @Test
    void missingCaptureIsOneLine() {
        CliRun run = CliRun.of("export", "cycles", dir.resolve("nope.rce").toString());
        assertThat(run.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(run.err()).isEqualTo("rcbench: " + dir.resolve("nope.rce") + ": no such file\n");
    }

    private record Read(List<RecordingSink.Edge> edges, long end, Map<Integer, String> channels, Timebase timebase) {
    }

    private static Read read(Path file) throws Exception {
        try (Capture c = CaptureFiles.open(file)) {
            RecordingSink sink = new RecordingSink();
            c.streamTo(sink);
            return new Read(new ArrayList<>(sink.edges), sink.endTick, c.channels(), c.timebase());
        }
    }
}
