package org.rcbench.capture;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.rcbench.edge.EdgeSink;
import org.rcbench.edge.Timebase;

class EdgeCaptureWriterTest {

    @Test
    void writesTheDocumentedLayout() throws IOException {
        Map<String, String> header = EdgeCaptureFormat.header(new Timebase(16e6, -12.5, 0.8), Map.of(0, "output"));
        header.put(EdgeCaptureFormat.PROBE, "bench-probe 7");
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (EdgeCaptureWriter w = EdgeCaptureWriter.to(bos, header, false)) {
            w.append(16000, 0, EdgeSink.HIGH);
            w.append(648172, 0, EdgeSink.LOW);
            w.append(648172, 0, EdgeSink.UNKNOWN);
            w.append(Long.MAX_VALUE, 0, EdgeSink.HIGH);
            w.end(Long.MAX_VALUE);
            assertThat(w.edges()).isEqualTo(4);
        }
        assertThat(bos.toString(StandardCharsets.UTF_8)).isEqualTo("""
                # rcbench edges v1
                # clock_hz=16000000
                # calibration_ppm=-12.5
                # calibration_u_ppm=0.8
                # channel.0=output
                # probe=bench-probe 7
                tick,channel,level
                16000,0,1
                648172,0,0
                648172,0,x
                9223372036854775807,0,1
                # end_tick=9223372036854775807
                """);
    }

    @Test
    void gzipOutputReadsBack() throws IOException {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (EdgeCaptureWriter w = EdgeCaptureWriter.to(bos, EdgeCaptureFormat.header(Timebase.of(1e6), Map.of()), true)) {
            for (int i = 0; i < 10000; i++) {
                w.append(i * 37L, i % 3, i % 2);
            }
        }
        byte[] bytes = bos.toByteArray();
        assertThat(bytes[0] & 0xff).isEqualTo(0x1f);
        Read r = Read.of(new ByteArrayInputStream(bytes), "g");
        assertThat(r.edges()).hasSize(10000);
        assertThat(r.edges().get(9999).tick()).isEqualTo(9999 * 37L);
        assertThat(r.timebase().clockHz()).isEqualTo(1e6);
    }

    @Test
    void headersThatWouldNotReadBackAreRefusedBeforeWriting() {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        Map<String, String> noClock = new LinkedHashMap<>(Map.of("probe", "p"));
        assertThatThrownBy(() -> EdgeCaptureWriter.to(bos, noClock, true))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("no clock_hz");
        Map<String, String> badKey = EdgeCaptureFormat.header(Timebase.of(1), Map.of());
        badKey.put("my key", "v");
        assertThatThrownBy(() -> EdgeCaptureWriter.to(bos, badKey, false))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("my key");
        Map<String, String> newline = EdgeCaptureFormat.header(Timebase.of(1), Map.of());
        newline.put("note", "two\nlines");
        assertThatThrownBy(() -> EdgeCaptureWriter.to(bos, newline, false)).isInstanceOf(IllegalArgumentException.class);
        assertThat(bos.size()).isZero();
    }

    @Test
    void edgesThatBreakTheFormatAreRefused() throws IOException {
        try (EdgeCaptureWriter w = EdgeCaptureWriter.to(new ByteArrayOutputStream(),
                EdgeCaptureFormat.header(Timebase.of(1), Map.of(0, "a", 2, "b")), false)) {
            w.append(10, 0, 1);
            assertThatThrownBy(() -> w.append(9, 0, 0)).isInstanceOf(IllegalArgumentException.class);
            assertThatThrownBy(() -> w.append(11, 1, 0)).hasMessageContaining("channel 1");
            assertThatThrownBy(() -> w.append(11, 256, 0)).isInstanceOf(IllegalArgumentException.class);
            assertThatThrownBy(() -> w.append(11, 2, 2)).isInstanceOf(IllegalArgumentException.class);
            assertThatThrownBy(() -> w.end(5)).isInstanceOf(IllegalArgumentException.class);
        }
    }

    @Test
    void numbersAreWrittenSoTheyParseBackExactly() {
        for (double v : new double[] {16e6, 32768, 1e9, 0.1, 1e-3, 12345678.9, 1e300, -0.25, 9.007199254740993E15}) {
            assertThat(EdgeCaptureFormat.parseDecimal(EdgeCaptureFormat.formatNumber(v))).isEqualTo(v);
        }
        assertThat(EdgeCaptureFormat.formatNumber(16e6)).isEqualTo("16000000");
    }
}
