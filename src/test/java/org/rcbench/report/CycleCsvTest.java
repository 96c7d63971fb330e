package org.rcbench.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.rcbench.capture.Capture;
import org.rcbench.capture.CaptureFiles;

class CycleCsvTest {
    /**
     * 1 MHz clock; rising every 1000 ticks, high for 300; a gap at 2500 in the third cycle, and after
     * it a rising edge whose low phase was not seen.
     */
    static final String CAPTURE = """
            # rcbench edges v1
            # clock_hz=1000000
            # channel.0=out
            # channel.1=other
            tick,channel,level
            100,0,1
            400,0,0
            1100,0,1
            1250,1,1
            1400,0,0
            2100,0,1
            2500,0,x
            3000,0,1
            3300,0,0
            4000,0,1
            4300,0,0
            5000,0,1
            # end_tick=5200
            """;

    static Capture open(String text) throws Exception {
        return CaptureFiles.open(new ByteArrayInputStream(text.getBytes(StandardCharsets.UTF_8)), "t.rce");
    }

    @Test
    void cyclesRunRisingToRisingAndNeverSpanAGap() throws Exception {
        StringWriter sw = new StringWriter();
        CycleCsv.Summary s;
        try (Capture c = open(CAPTURE)) {
            s = CycleCsv.write(c, 0, sw);
        }
        // The first edge only sets the level (it may be the initial state of a dump), so the first
        // whole cycle is 1100 -> 2100; 2100 -> 3000 is cut by the gap; 3000 follows the gap, so its low
        // phase was not seen; 4000 -> 5000 is whole.
        assertThat(s).isEqualTo(new CycleCsv.Summary(2, 1, 0));
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(sw.toString())).getRecords();
        assertThat(rows.get(0).getParser().getHeaderNames()).containsExactly(CycleCsv.HEADER);
        assertThat(rows).extracting(r -> r.get("start_tick")).containsExactly("1100", "4000");
        for (CSVRecord r : rows) {
            // 1000 ticks of a 1 MHz clock = 1 ms; high 300 ticks = 0.3 ms; duty 0.3 (arithmetic).
            assertThat(Double.parseDouble(r.get("period_s"))).isEqualTo(0.001);
            assertThat(Double.parseDouble(r.get("high_s"))).isEqualTo(0.0003);
            assertThat(Double.parseDouble(r.get("low_s"))).isEqualTo(0.0007);
            assertThat(Double.parseDouble(r.get("duty"))).isEqualTo(0.3);
        }
        assertThat(rows).extracting(r -> r.get("cycle")).containsExactly("1", "2");
        assertThat(sw.toString()).contains("\r\n").doesNotContain(",\n");
    }

    @Test
    void secondsHonourTheCalibrationOffset() throws Exception {
        // Timebase: seconds = ticks / (clock_hz * (1 + ppm * 1e-6)); 1000 ticks at 1 MHz, +250 ppm.
        StringWriter sw = new StringWriter();
        try (Capture c = open(CAPTURE.replace("# channel.0=out", "# calibration_ppm=250\n# channel.0=out"))) {
            CycleCsv.write(c, 0, sw);
        }
        CSVRecord first = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(sw.toString())).getRecords().get(0);
        assertThat(Double.parseDouble(first.get("period_s"))).isCloseTo(1000 / (1e6 * 1.00025), within(1e-18));
    }

    @Test
    void aLostEdgeBreaksTheCycle() {
        List<long[]> got = new java.util.ArrayList<>();
        CycleExtractor x = new CycleExtractor(0, (start, high, period) -> got.add(new long[] {start, high, period}));
        int[][] edges = {{0, 0}, {10, 1}, {13, 0}, {20, 1}, {30, 1}, {33, 0}, {40, 1}, {43, 0}, {50, 1}};
        for (int[] e : edges) {
            x.onEdge(e[0], 0, e[1]);
        }
        // 10->20 is whole; 20->30 has no falling edge (a repeated high), so 30 only sets the level;
        // 40 follows a seen low but 30 was not a known rising edge, so the next whole cycle is 40->50.
        assertThat(got).containsExactly(new long[] {10, 3, 10}, new long[] {40, 3, 10});
        assertThat(x.repeatedLevels()).isEqualTo(1);
    }
}
