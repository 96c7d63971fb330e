package org.rcbench.capture;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.rcbench.testing.RecordingSink.Edge;

class RoundTripTest {
    private static final String CAPTURE = """
            # rcbench edges v1
            # clock_hz=16000000
            # channel.0=output
            # channel.3=trigger in
            tick,channel,level
            16000,0,1
            16000,3,1
            648172,0,0
            650000,3,0
            700000,0,x
            710000,0,1
            9000000000,0,0
            # end_tick=9000000123
            """;

    @Test
    void rcbenchToVcdToRcbenchKeepsEveryEdgeExactly() throws IOException {
        Read original = Read.of(CAPTURE);
        VcdTimescale ts = VcdTimescale.coarsestExactFor(16e6);
        assertThat(ts.text()).isEqualTo("100 ps"); // 62.5 ns per tick = 625 units
        byte[] vcd = toVcd(CAPTURE.getBytes(StandardCharsets.UTF_8), ts);
        Read viaVcd = Read.of(new ByteArrayInputStream(vcd), "x.vcd");
        assertThat(viaVcd.channels()).containsValues("capture.output", "capture.trigger_in");

        Read back = Read.of(new ByteArrayInputStream(toEdges(vcd)), "back.rce");
        assertThat(back.timebase().clockHz()).isEqualTo(1e10);
        // Same instants: tick' / 1e10 s == tick / 16e6 s, i.e. tick' == 625 tick, exactly in integers.
        List<Edge> expected = new ArrayList<>();
        for (Edge e : original.edges()) {
            expected.add(new Edge(e.tick() * 625, e.channel() == 3 ? 1 : 0, e.level()));
        }
        assertThat(back.edges()).isEqualTo(expected);
        assertThat(back.endTick()).isEqualTo(9000000123L * 625);
        assertThat(back.channels()).containsValues("capture.output", "capture.trigger_in");
    }

    @Test
    void vcdToRcbenchToVcdKeepsEdgesNamesAndTimescale() throws IOException {
        byte[] fixture;
        try (InputStream in = RoundTripTest.class.getResourceAsStream("layout-18-2.vcd")) {
            fixture = in.readAllBytes();
        }
        Read original = Read.of(new ByteArrayInputStream(fixture), "a.vcd");
        byte[] rce = toEdges(fixture);
        Read asEdges = Read.of(new ByteArrayInputStream(rce), "a.rce");
        assertThat(asEdges.edges()).isEqualTo(original.edges());
        assertThat(asEdges.header()).containsEntry("clock_hz", "100000000").containsEntry("timescale", "10 ns");

        byte[] vcd = toVcd(rce, VcdTimescale.parse("10 ns"));
        Read back = Read.of(new ByteArrayInputStream(vcd), "b.vcd");
        assertThat(back.edges()).isEqualTo(original.edges());
        assertThat(back.channels()).isEqualTo(original.channels());
        assertThat(back.timebase()).isEqualTo(original.timebase());
        assertThat(back.endTick()).isEqualTo(original.endTick());
        assertThat(back.header()).containsEntry("date", "March 3, 2025 14:10:00");
    }

    // Expected ratios worked by hand: units per tick = (1 / clockHz) / unit.
    @ParameterizedTest
    @CsvSource({
        "16e6,   100 ps, 1000,        625000",  // 62.5 ns per tick = 625 x 100 ps
        "1e9,    1 ns,   123456789,   123456789",
        "1e9,    1 us,   1499,        1",       // 1.499 us rounds to 1 us
        "1e9,    1 us,   1500,        2",       // half rounds up
        "32768,  1 ns,   1,           30518",   // 30517.578125 ns
        "32768,  1 ns,   32768,       1000000000",
        "0.1,    1 s,    3,           30",      // a 10 s clock
        "3e6,    1 ps,   3,           1000000", // 333333.33 ps per tick, 3 ticks = 1 us exactly
    })
    void ticksBecomeVcdTimesExactly(double clockHz, String timescale, long tick, long expectedUnits) {
        assertThat(new TickScaler(clockHz, VcdTimescale.parse(timescale)).units(tick)).isEqualTo(expectedUnits);
    }

    @Test
    void coarsestExactTimescales() {
        assertThat(VcdTimescale.coarsestExactFor(1e9).text()).isEqualTo("1 ns");
        assertThat(VcdTimescale.coarsestExactFor(8e6).text()).isEqualTo("1 ns"); // 125 ns; 10 ns would give 12.5
        assertThat(VcdTimescale.coarsestExactFor(1).text()).isEqualTo("1 s");
        assertThat(VcdTimescale.coarsestExactFor(3e6).text()).isEqualTo("1 ps"); // no exact unit
    }

    private static byte[] toVcd(byte[] capture, VcdTimescale ts) throws IOException {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (Capture c = CaptureFiles.open(new ByteArrayInputStream(capture), "in")) {
            VcdWriter.write(c, bos, ts);
        }
        return bos.toByteArray();
    }

    private static byte[] toEdges(byte[] capture) throws IOException {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (Capture c = CaptureFiles.open(new ByteArrayInputStream(capture), "in")) {
            EdgeCaptureWriter.write(c, bos, false);
        }
        return bos.toByteArray();
    }
}
