package org.rcbench.capture;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.entry;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.zip.GZIPOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.common.BadInputException;
import org.rcbench.testing.ChunkedInputStream;

class VcdReaderTest {

    private static byte[] fixture() throws IOException {
        try (InputStream in = VcdReaderTest.class.getResourceAsStream("layout-18-2.vcd")) {
            return in.readAllBytes();
        }
    }

    /*
     * layout-18-2.vcd is written by hand after the layout of the example file in IEEE Std 1364-2005
     * section 18.2 (header commands, nested module and task scopes, trireg/reg/integer variables,
     * multi-character identifier codes, then $dumpvars, $dumpall, $dumpoff and $dumpon blocks);
     * names and values are our own. The expected edges follow the value-change semantics of that
     * section: x and z are unknown, $dumpoff makes every variable unknown, a repeated value is no
     * change, vector and integer changes do not touch the 1-bit wires.
     */
    @Test
    void readsTheStandardLayoutFixture() throws IOException {
        Read r = Read.of(new ByteArrayInputStream(fixture()), "layout.vcd");
        assertThat(r.timebase().clockHz()).isEqualTo(1e8); // 10 ns per unit
        assertThat(r.header()).containsEntry("date", "March 3, 2025 14:10:00")
                .containsEntry("version", "hand-written rcbench test fixture 1.0")
                .containsEntry("timescale", "10 ns");
        assertThat(r.channels()).containsExactly(entry(0, "bench.timer.out"), entry(1, "bench.timer.trig"),
                entry(2, "bench.timer.reset_n"));
        assertThat(r.skipped()).containsExactly(entry("bench.load.count[15:0]", "a 16-bit vector"),
                entry("bench.load.step", "an integer variable"));
        assertThat(r.lines()).containsExactly(
                "100,0,x", "100,1,0", "100,2,1",
                "105,0,0", "105,1,1",
                "110,0,1",
                "120,1,0", "120,0,0",
                "130,0,1",
                "140,0,0",
                "1000,0,x", "1000,1,x", "1000,2,x",
                "2000,1,1", "2000,2,0",
                "2010,0,1");
        assertThat(r.endTick()).isEqualTo(2010);
        assertThat(r.warnings()).isEmpty();
    }

    @Test
    void wholeByteByByteRandomChunksAndGzipGiveIdenticalEdges() throws IOException {
        byte[] bytes = fixture();
        Read whole = Read.of(new ByteArrayInputStream(bytes), "v");
        assertThat(Read.of(ChunkedInputStream.byteByByte(bytes), "v").edges()).isEqualTo(whole.edges());
        for (long seed = 1; seed <= 5; seed++) {
            assertThat(Read.of(ChunkedInputStream.randomChunks(bytes, seed, 13), "v").edges()).isEqualTo(whole.edges());
        }
        ByteArrayOutputStream gz = new ByteArrayOutputStream();
        try (GZIPOutputStream out = new GZIPOutputStream(gz)) {
            out.write(bytes);
        }
        assertThat(Read.of(new ByteArrayInputStream(gz.toByteArray()), "v.vcd.gz").edges()).isEqualTo(whole.edges());
    }

    // Timescale numbers and units from IEEE Std 1364-2005 section 18.2 ($timescale: 1, 10, 100 of s..fs).
    @ParameterizedTest
    @CsvSource({"1 s, 1", "100 ms, 10", "10 us, 1e5", "1ns, 1e9", "100 ps, 1e10", "1 fs, 1e15", "10 s, 0.1"})
    void timescaleGivesTheTickRate(String timescale, double clockHz) {
        Read r = Read.of(vcd("$timescale " + timescale + " $end", "", "#0 1!"));
        assertThat(r.timebase().clockHz()).isEqualTo(clockHz);
        assertThat(r.header().get("timescale")).isEqualTo(VcdTimescale.parse(timescale).text());
    }

    @Test
    void scalarValuesXAndZAreGapsAndRepeatsAreNotEdges() {
        Read r = Read.of(vcd("$timescale 1 us $end", "", "#0 0! #5 1! #6 1! #7 z! #8 x! #9 0! #9 1!"));
        assertThat(r.lines()).containsExactly("0,0,0", "5,0,1", "7,0,x", "9,0,0", "9,0,1");
    }

    @Test
    void vectorValueOnAOneBitWireGivesItsLastBitAndRealsAreSkipped() {
        Read r = Read.of(vcd("$timescale 1 ns $end", "$var real 64 % v $end", "#1 b1 ! r3.3 % #2 B0 ! R0.5 % #3 bX !"));
        assertThat(r.lines()).containsExactly("1,0,1", "2,0,0", "3,0,x");
        assertThat(r.skipped()).containsEntry("top.v", "a real variable");
    }

    @Test
    void aliasesShareOneChannelAndBitSelectsJoinTheName() {
        String decl = "$var wire 1 \" bus [3] $end $scope module sub $end $var wire 1 \" alias $end"
                + " $var logic 1 ab q $end $upscope $end";
        Read r = Read.of(vcd("$timescale 1 ns $end", decl, "#1 1\" 0ab"));
        assertThat(r.channels()).containsExactly(entry(0, "top.a"), entry(1, "top.bus[3]"), entry(2, "top.sub.q"));
        assertThat(r.lines()).containsExactly("1,1,1", "1,2,0");
    }

    @Test
    void channelsAreSelectedByNumberNameOrLastPartAndVectorsAreRefused() throws IOException {
        try (Capture c = CaptureFiles.open(new ByteArrayInputStream(fixture()), "layout.vcd")) {
            assertThat(CaptureFiles.selectChannel(c, "1")).isEqualTo(1);
            assertThat(CaptureFiles.selectChannel(c, "bench.timer.reset_n")).isEqualTo(2);
            assertThat(CaptureFiles.selectChannel(c, "out")).isZero();
            assertThatThrownBy(() -> CaptureFiles.selectChannel(c, "count[15:0]"))
                    .isInstanceOf(BadInputException.class)
                    .hasMessage("layout.vcd: bench.load.count[15:0] is a 16-bit vector; only 1-bit wires can be measured");
            assertThatThrownBy(() -> CaptureFiles.selectChannel(c, "clk"))
                    .hasMessageStartingWith("layout.vcd: no channel named \"clk\" (channels: 0=bench.timer.out, ");
            assertThatThrownBy(() -> CaptureFiles.selectChannel(c, "7"))
                    .hasMessageStartingWith("layout.vcd: no channel 7");
        }
    }

    @Test
    void unknownCommandsAreSkippedWithAWarning() {
        Read r = Read.of(vcd("$timescale 1 ns $end $attrbegin misc 07 x $end", "", "#1 1! $vcdclose #2 $end"));
        assertThat(r.lines()).containsExactly("1,0,1");
        assertThat(r.warnings()).hasSize(2).allSatisfy(w -> assertThat(w).startsWith("t.vcd:"));
        assertThat(r.endTick()).isEqualTo(1);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', value = {
        "no timescale        | ''                                  | '#1 1!'     | t.vcd:3: no $timescale in the header",
        "bad timescale       | '$timescale 3 ns $end'              | '#1 1!'     | t.vcd:1: timescale \"3 ns\" must be 1, 10 or 100 followed by s, ms, us, ns, ps or fs",
        "two timescales      | '$timescale 1 ns $end\n$timescale 1 us $end' | '' | t.vcd:2: second $timescale",
        "missing $end        | '$timescale 1 ns $end\n$var wire 1 ! a' | ''      | t.vcd:2: $var has no closing $end (found \"$scope\" on line 3)",
        "short var           | '$timescale 1 ns $end\n$var wire 1 ! $end' | ''   | t.vcd:2: $var needs a type, a size, an identifier code and a name",
        "bad size            | '$timescale 1 ns $end\n$var wire one # b $end' | '' | t.vcd:2: $var size must be a whole number of bits",
        "upscope underflow   | '$timescale 1 ns $end\n$upscope $end $upscope $end' | '' | t.vcd:2: $upscope without a matching $scope",
        "text in header      | '$timescale 1 ns $end\nclk'         | ''          | t.vcd:2: expected a $ keyword in the header, found \"clk\"",
        "dump in header      | '$timescale 1 ns $end\n$dumpvars'   | ''          | t.vcd:2: $dumpvars before $enddefinitions",
        "undeclared code     | '$timescale 1 ns $end'              | '#1\n1?'    | t.vcd:5: value change for identifier code \"?\", which no $var declares",
        "no code             | '$timescale 1 ns $end'              | '#1\n1'     | t.vcd:5: value change \"1\" has no identifier code",
        "backwards time      | '$timescale 1 ns $end'              | '#5\n#4'    | t.vcd:5: time #4 is before the previous time #5",
        "bad time            | '$timescale 1 ns $end'              | '#1.5'      | t.vcd:4: time must be # and a whole number, found \"#1.5\"",
        "huge time           | '$timescale 1 ns $end'              | '#99999999999999999999' | t.vcd:4: time \"#99999999999999999999\" is larger than 2^63-1",
        "bad vector          | '$timescale 1 ns $end'              | 'b12 !'     | t.vcd:4: vector value must be b followed by 0, 1, x or z digits, found \"b12\"",
        "vector without code | '$timescale 1 ns $end'              | 'b1'        | t.vcd:4: vector value without an identifier code",
        "stray $end          | '$timescale 1 ns $end'              | '#1 $end'   | t.vcd:4: $end without an opening command",
        "garbage             | '$timescale 1 ns $end'              | '#1\nhello' | t.vcd:5: expected #time, a value change or a $ command, found \"hello\"",
        "extended vcd        | '$timescale 1 ns $end'              | '$dumpports' | t.vcd:4: extended VCD ($dumpports) is not supported",
        "no enddefinitions   | '$timescale 1 ns $end'              | null        | t.vcd:3: file ends inside the header (no $enddefinitions)",
    })
    void badDumpGivesOneLineNamingFileAndLine(String label, String declarations, String changes, String expected) {
        String text = changes.equals("null")
                ? declarations + "\n$scope module top $end $var wire 1 ! a $end\n"
                : declarations + "\n$scope module top $end $var wire 1 ! a $end $upscope $end\n$enddefinitions $end\n" + changes + "\n";
        assertThatThrownBy(() -> Read.of(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)), "t.vcd"))
                .isInstanceOf(BadInputException.class)
                .hasMessageStartingWith(expected)
                .hasMessageNotContaining("\n");
    }

    /**
     * A dump with one wire {@code top.a} as code {@code !}: the timescale command, then more
     * declarations inside scope {@code top}, then the changes (spaces become line breaks).
     */
    private static InputStream vcd(String timescale, String declarations, String changes) {
        String text = "$date today $end\n" + timescale + "\n$scope module top $end\n$var wire 1 ! a $end\n"
                + declarations + "\n$upscope $end\n$enddefinitions $end\n" + changes.replace(' ', '\n') + "\n";
        return new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8));
    }
}
