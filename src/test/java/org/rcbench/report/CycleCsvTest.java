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
        // Rising edges at 100, 1100, 2100, 3000, 4000, 5000 (channel 1 is not this channel's):
        // 100 -> 1100 and 1100 -> 2100 are whole; 2100 -> 3000 is cut by the gap at 2500, so 3000
        // starts a new run: 3000 -> 4000 and 4000 -> 5000. Four cycles, none settling.
        assertThat(s).isEqualTo(new CycleCsv.Summary(4, 0, 0, 1, 0));
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(sw.toString())).getRecords();
        assertThat(rows.get(0).getParser().getHeaderNames()).containsExactly(CycleCsv.HEADER);
        assertThat(rows).extracting(r -> r.get("start_tick")).containsExactly("100", "1100", "3000", "4000");
        assertThat(rows).extracting(r -> r.get("flags")).containsExactly("new-run", "", "new-run", "");
        for (CSVRecord r : rows) {
            // 1000 ticks of a 1 MHz clock = 1 ms; high 300 ticks = 0.3 ms; duty 0.3 (arithmetic).
            assertThat(Double.parseDouble(r.get("period_s"))).isEqualTo(0.001);
            assertThat(Double.parseDouble(r.get("high_s"))).isEqualTo(0.0003);
            assertThat(Double.parseDouble(r.get("low_s"))).isEqualTo(0.0007);
            assertThat(Double.parseDouble(r.get("duty"))).isEqualTo(0.3);
        }
        assertThat(rows).extracting(r -> r.get("cycle")).containsExactly("1", "2", "3", "4");
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
    void aLostEdgeBreaksTheCycleAndSettlingIsFlagged() throws Exception {
        // Rising every 10 ticks, high 3, low 7; the first high lasts 6 (settling); a falling edge is
        // lost between 20 and 30 (high, then high again), so 20 -> 30 is no cycle and 30 starts a new run.
        String text = "# rcbench edges v1\n# clock_hz=1000\ntick,channel,level\n0,0,1\n6,0,0\n10,0,1\n13,0,0\n20,0,1\n"
                + "30,0,1\n33,0,0\n40,0,1\n43,0,0\n50,0,1\n53,0,0\n60,0,1\n";
        StringWriter sw = new StringWriter();
        CycleCsv.Summary s;
        try (Capture c = open(text)) {
            s = CycleCsv.write(c, 0, sw);
        }
        List<CSVRecord> rows = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(sw.toString())).getRecords();
        assertThat(rows).extracting(r -> r.get("start_tick") + " " + r.get("high_s") + " " + r.get("flags"))
                .containsExactly("0 0.006 settling new-run", "10 0.003 ", "30 0.003 new-run", "40 0.003 ", "50 0.003 ");
        assertThat(s).isEqualTo(new CycleCsv.Summary(5, 1, 0, 0, 1));
    }
}
