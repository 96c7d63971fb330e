package org.rcbench.capture;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.common.BadInputException;
import org.rcbench.edge.EdgeSink;
import org.rcbench.testing.ChunkedInputStream;

class EdgeCaptureReaderTest {
    static final String EXAMPLE = """
            # rcbench edges v1
            # clock_hz=16000000
            # probe=bench-probe 7
            # started=2025-03-14T09:26:53Z
            # channel.0=output
            # channel.1=trigger
            # calibration_ppm=-12.5
            # calibration_u_ppm=0.8
            # a comment without a key
            tick,channel,level
            16000,0,1
            648172,0,0
            648172,1,1
            700000,0,x
            710000,0,1
            """;

    @Test
    void readsHeaderTimebaseAndEdges() {
        Read r = Read.of(EXAMPLE);
        assertThat(r.timebase().clockHz()).isEqualTo(16e6);
        assertThat(r.timebase().offsetPpm()).isEqualTo(-12.5);
        assertThat(r.timebase().tolerancePpm()).isEqualTo(0.8);
        assertThat(r.header()).containsEntry("probe", "bench-probe 7").containsKeys("started", "clock_hz");
        assertThat(r.header().keySet()).startsWith("clock_hz", "probe", "started", "channel.0");
        assertThat(r.channels()).containsExactly(java.util.Map.entry(0, "output"), java.util.Map.entry(1, "trigger"));
        assertThat(r.lines()).containsExactly("16000,0,1", "648172,0,0", "648172,1,1", "700000,0,x", "710000,0,1");
        assertThat(r.edges().get(3).level()).isEqualTo(EdgeSink.UNKNOWN);
        assertThat(r.endTick()).isEqualTo(710000);
        assertThat(r.warnings()).isEmpty();
    }

    @Test
    void missingCalibrationKeysGiveZeroOffsetAndTolerance() {
        Read r = Read.of("# rcbench edges v1\n# clock_hz=1e6\ntick,channel,level\n");
        assertThat(r.timebase()).isEqualTo(new org.rcbench.edge.Timebase(1e6, 0, 0));
        assertThat(r.edges()).isEmpty();
        assertThat(r.endTick()).isZero();
    }

    @Test
    void wholeByteByByteAndRandomChunksGiveIdenticalEdges() {
        StringBuilder sb = new StringBuilder("# rcbench edges v1\r\n# clock_hz=16000000\r\ntick,channel,level\r\n");
        java.util.Random rnd = new java.util.Random(11);
        long t = 0;
        for (int i = 0; i < 20000; i++) {
            t += rnd.nextInt(100000);
            sb.append(t).append(',').append(rnd.nextInt(3)).append(',').append("01x".charAt(rnd.nextInt(3)));
            sb.append(i % 7 == 0 ? "\r\n" : "\n");
            if (i % 1000 == 0) {
                sb.append("# a note\n\n");
            }
        }
        byte[] bytes = sb.toString().getBytes(StandardCharsets.US_ASCII);
        Read whole = Read.of(new ByteArrayInputStream(bytes), "c.rce");
        Read single = Read.of(ChunkedInputStream.byteByByte(bytes), "c.rce");
        Read chunks = Read.of(ChunkedInputStream.randomChunks(bytes, 42, 97), "c.rce");
        assertThat(whole.edges()).hasSize(20000);
        assertThat(single.edges()).isEqualTo(whole.edges());
        assertThat(chunks.edges()).isEqualTo(whole.edges());
        assertThat(single.endTick()).isEqualTo(whole.endTick()).isEqualTo(t);
    }

    @Test
    void crlfLinesReadLikeLfLines() {
        Read lf = Read.of(EXAMPLE);
        Read crlf = Read.of(EXAMPLE.replace("\n", "\r\n"));
        assertThat(crlf.edges()).isEqualTo(lf.edges());
        assertThat(crlf.header()).isEqualTo(lf.header());
    }

    @Test
    void gzipIsRecognisedByItsMagicBytesNotTheName(@TempDir Path dir) throws IOException {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (GZIPOutputStream gz = new GZIPOutputStream(bos)) {
            gz.write(EXAMPLE.getBytes(StandardCharsets.UTF_8));
        }
        Path file = dir.resolve("no-suffix.txt");
        Files.write(file, bos.toByteArray());
        try (Capture c = CaptureFiles.open(file)) {
            org.rcbench.testing.RecordingSink sink = new org.rcbench.testing.RecordingSink();
            c.streamTo(sink);
            assertThat(sink.edges).hasSize(5);
            assertThat(c.name()).isEqualTo(file.toString());
        }
        assertThat(Read.of(ChunkedInputStream.byteByByte(bos.toByteArray()), "x").edges())
                .isEqualTo(Read.of(EXAMPLE).edges());
    }

    @Test
    void truncatedGzipReadsWhatWasWrittenAndWarns() throws IOException {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        GZIPOutputStream gz = new GZIPOutputStream(bos, true);
        gz.write(EXAMPLE.getBytes(StandardCharsets.UTF_8));
        gz.flush(); // a sync flush, as the recorder does, then the process dies
        byte[] cut = bos.toByteArray();
        Read r = Read.of(new ByteArrayInputStream(cut), "k.rce.gz");
        assertThat(r.edges()).hasSize(5);
        assertThat(r.warnings()).singleElement().asString().startsWith("k.rce.gz:16: the compressed data ends early");
    }

    @Test
    void blankLinesCommentsAndEndTickAfterTheColumnLine() {
        Read r = Read.of("# rcbench edges v1\n# clock_hz=10\n\ntick,channel,level\n\n5,0,1\n#  note\n"
                + "\n7,0,0\n# end_tick=100\n");
        assertThat(r.lines()).containsExactly("5,0,1", "7,0,0");
        assertThat(r.endTick()).isEqualTo(100);
    }

    @Test
    void completeLastLineWithoutNewlineIsAccepted() {
        Read r = Read.of("# rcbench edges v1\n# clock_hz=10\ntick,channel,level\n5,0,1\n9,0,0");
        assertThat(r.lines()).containsExactly("5,0,1", "9,0,0");
        assertThat(r.warnings()).isEmpty();
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {"9", "9,", "9,0", "9,12", "9,0,", "123456789012"})
    void cutShortLastLineIsAWarningAndTheRestIsRead(String tail) {
        Read r = Read.of("# rcbench edges v1\n# clock_hz=10\ntick,channel,level\n5,0,1\n" + tail);
        assertThat(r.lines()).containsExactly("5,0,1");
        assertThat(r.warnings()).singleElement().asString()
                .startsWith("t.rce:5: last line \"" + tail + "\" is cut short");
        assertThat(r.endTick()).isEqualTo(5);
    }

    @Test
    void unknownKeysAreKeptAndAStrangeStartedDateOnlyWarns() {
        Read r = Read.of("# rcbench edges v1\n# clock_hz=10\n# fixture-id=A7\n# started=yesterday\ntick,channel,level\n");
        assertThat(r.header()).containsEntry("fixture-id", "A7").containsEntry("started", "yesterday");
        assertThat(r.warnings()).singleElement().asString().startsWith("t.rce:4: started \"yesterday\"");
    }

    @Test
    void warningsStopGrowingAfterAHundred() {
        StringBuilder sb = new StringBuilder("# rcbench edges v1\n# clock_hz=10\ntick,channel,level\n");
        for (int i = 0; i < 150; i++) {
            sb.append("# end_tick=soon\n");
        }
        java.util.List<String> w = Read.of(sb.toString()).warnings();
        assertThat(w).hasSize(101);
        assertThat(w.get(0)).isEqualTo("t.rce:4: end_tick \"soon\" is not a whole number of ticks; ignored");
        assertThat(w.get(100)).isEqualTo("t.rce:153: 50 more warnings not shown (the last is on this line)");
    }

    @Test
    void byteOrderMarkIsSkipped() {
        Read r = Read.of("\uFEFF# rcbench edges v1\n# clock_hz=10\ntick,channel,level\n1,0,1\n");
        assertThat(r.lines()).containsExactly("1,0,1");
    }

    @Test
    void largestTickIsRead() {
        Read r = Read.of("# rcbench edges v1\n# clock_hz=10\ntick,channel,level\n9223372036854775807,0,1\n");
        assertThat(r.edges().get(0).tick()).isEqualTo(Long.MAX_VALUE);
    }

    // Each bad file must give exactly one line "file:line: what is wrong".
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', value = {
        "empty file            | ''                                                  | t.rce:1: empty file",
        "wrong magic           | '# rcbench edge v1\n'                               | t.rce:1: not an rcbench edge capture: the first line must be \"# rcbench edges v1\", found \"# rcbench edge v1\"",
        "other version         | '# rcbench edges v2\n'                              | t.rce:1: capture format version \"v2\" is not one this rcbench reads (v1)",
        "not a capture         | 'hello\n'                                           | t.rce:1: not a capture file",
        "missing clock         | '# rcbench edges v1\n# probe=p\ntick,channel,level\n' | t.rce:3: no clock_hz in the header",
        "bad clock             | '# rcbench edges v1\n# clock_hz=16MHz\n'            | t.rce:2: clock_hz must be a positive number of hertz, found \"16MHz\"",
        "zero clock            | '# rcbench edges v1\n# clock_hz=0\n'                | t.rce:2: clock_hz must be a positive number",
        "NaN clock             | '# rcbench edges v1\n# clock_hz=NaN\n'              | t.rce:2: clock_hz must be a positive number",
        "bad calibration       | '# rcbench edges v1\n# calibration_ppm=2e6\n'       | t.rce:2: calibration_ppm must be a number of ppm between",
        "negative uncertainty  | '# rcbench edges v1\n# calibration_u_ppm=-1\n'      | t.rce:2: calibration_u_ppm must be a number of ppm, zero or more",
        "duplicate key         | '# rcbench edges v1\n# clock_hz=1\n\n# clock_hz=2\n' | t.rce:4: header key clock_hz given twice (first on line 2)",
        "bad channel key       | '# rcbench edges v1\n# channel.256=a\n'             | t.rce:2: channel key \"channel.256\" must be channel.N",
        "no column line        | '# rcbench edges v1\n# clock_hz=1\n'                | t.rce:3: file ends before the column line",
        "data before columns   | '# rcbench edges v1\n# clock_hz=1\n5,0,1\n'         | t.rce:3: data line before the column line tick,channel,level: \"5,0,1\"",
        "wrong column line     | '# rcbench edges v1\n# clock_hz=1\ntime,ch,lvl\n'   | t.rce:3: expected a \"# key=value\" header line or the column line tick,channel,level, found \"time,ch,lvl\"",
        "two fields            | 'H\n5,0\n'                                          | t.rce:4: expected 3 fields tick,channel,level, found 2: \"5,0\"",
        "four fields           | 'H\n5,0,1,1\n'                                      | t.rce:4: expected 3 fields tick,channel,level, found 4: \"5,0,1,1\"",
        "non-numeric tick      | 'H\n5a,0,1\n'                                       | t.rce:4: tick must be a whole number of ticks, 0 or more, found \"5a\"",
        "negative tick         | 'H\n-5,0,1\n'                                       | t.rce:4: tick must be a whole number of ticks, 0 or more, found \"-5\"",
        "empty tick            | 'H\n,0,1\n'                                         | t.rce:4: tick must be a whole number of ticks, 0 or more, found \"\"",
        "spaces                | 'H\n5, 0,1\n'                                       | t.rce:4: channel must be a whole number, found \" 0\"",
        "tick overflow         | 'H\n9223372036854775808,0,1\n'                      | t.rce:4: tick \"9223372036854775808\" is larger than 2^63-1",
        "channel out of range  | 'H\n5,256,1\n'                                      | t.rce:4: channel \"256\" is out of range 0..255",
        "channel not named     | 'N\n5,1,1\n'                                        | t.rce:5: channel 1 is not named in the header (named: 0)",
        "unknown level         | 'H\n5,0,2\n'                                        | t.rce:4: level must be 0, 1 or x, found \"2\"",
        "word level            | 'H\n5,0,high\n'                                     | t.rce:4: level must be 0, 1 or x, found \"high\"",
        "backwards ticks       | 'H\n5,0,1\n\n4,0,0\n'                               | t.rce:6: tick 4 is before the previous data line's tick 5 (ticks must never decrease)",
        "bad last line         | 'H\n5,0,1\n6,0,7'                                   | t.rce:5: level must be 0, 1 or x, found \"7\"",
        "bad header utf-8      | '# rcbench edges v1\n# probe=\u00ff\n'             | t.rce:2: header line is not valid UTF-8",
    })
    void badInputGivesOneLineNamingFileAndLine(String label, String text, String expectedStart) {
        String file = text.replace("H\n", "# rcbench edges v1\n# clock_hz=1\ntick,channel,level\n")
                .replace("N\n", "# rcbench edges v1\n# clock_hz=1\n# channel.0=out\ntick,channel,level\n");
        byte[] bytes = label.equals("bad header utf-8")
                ? file.replace("\u00ff", "").replace("=\n", "=\u0000\n").getBytes(StandardCharsets.ISO_8859_1)
                : file.getBytes(StandardCharsets.UTF_8);
        if (label.equals("bad header utf-8")) {
            bytes[bytes.length - 2] = (byte) 0xff;
        }
        assertThatThrownBy(() -> Read.of(bytes))
                .isInstanceOf(BadInputException.class)
                .hasMessageStartingWith(expectedStart)
                .hasMessageNotContaining("\n");
    }

    @Test
    void longOffendingTextIsShortened() {
        String junk = "7".repeat(30) + "q".repeat(200);
        assertThatThrownBy(() -> Read.of("# rcbench edges v1\n# clock_hz=1\ntick,channel,level\n" + junk + ",0,1\n"))
                .hasMessageEndingWith("\"...")
                .satisfies(e -> assertThat(e.getMessage().length()).isLessThan(160));
    }

    @Test
    void missingFileIsABadInputNamingIt(@TempDir Path dir) {
        Path missing = dir.resolve("nope.rce");
        assertThatThrownBy(() -> CaptureFiles.open(missing))
                .isInstanceOf(BadInputException.class)
                .hasMessage(missing + ": no such file");
    }

    @Test
    void streamingTwiceIsRefused() throws IOException {
        try (Capture c = CaptureFiles.open(new ByteArrayInputStream(EXAMPLE.getBytes(StandardCharsets.UTF_8)), "e")) {
            c.streamTo(new org.rcbench.testing.RecordingSink());
            assertThatThrownBy(() -> c.streamTo(new org.rcbench.testing.RecordingSink()))
                    .isInstanceOf(IllegalStateException.class);
        }
    }
}
