package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.history.CheckContent;
import org.rcbench.history.Fixtures;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.RunRecord;
import org.rcbench.testing.CliRun;

/**
 * The documents the real {@code measure} and {@code predict} commands print, put together as a check
 * document (the verdict is set by hand: the diagnosis stage is not here yet), go through saving,
 * the report and the export unchanged.
 */
class RealStagesTest {
    @TempDir
    Path dir;

    @Test
    void measureAndPredictOutputsAreStoredAndReportedAsTheyCame() throws Exception {
        Path design = dir.resolve("a.toml");
        Files.writeString(design, Fixtures.DESIGN_TEXT);
        StringBuilder sb = new StringBuilder("# rcbench edges v1\n# clock_hz=16000000\n# channel.0=out\ntick,channel,level\n");
        long t = 0;
        for (int i = 0; i < 2000; i++) {
            sb.append(t).append(",0,1\n").append(t + 13540 + (i % 3)).append(",0,0\n");
            t += 13540 + 11590 + (i % 5);
        }
        Path capture = dir.resolve("a.rce");
        Files.writeString(capture, sb.toString());
        ObjectMapper json = new ObjectMapper();
        CliRun measure = CliRun.of("measure", capture.toString(), "--json");
        CliRun predict = CliRun.of("predict", design.toString(), "--json");
        assertThat(measure.exitCode()).as(measure.err()).isZero();
        assertThat(predict.exitCode()).as(predict.err()).isZero();
        ObjectNode doc = (ObjectNode) json.readTree(measure.out());
        JsonNode prediction = json.readTree(predict.out());
        doc.set("prediction", prediction);
        doc.put("verdict", "pass");
        Path result = dir.resolve("check.json");
        Files.writeString(result, doc.toString());
        Path db = dir.resolve("h.db");
        SaveOptionsTest.Run saved = SaveOptionsTest.run("check-stand-in", capture.toString(), "--design", design.toString(),
                "--result", result.toString(), "--save", "--serial", "A-1", "--db", db.toString());
        assertThat(saved.code()).as(saved.err()).isZero();

        try (HistoryStore store = HistoryStore.open(db)) {
            RunRecord r = store.last().orElseThrow();
            CheckContent.Predicted f = r.content().prediction("frequency_hz").orElseThrow();
            assertThat(f.nominal()).isEqualTo(prediction.path("nominal").path("frequency_hz").asDouble());
            assertThat(f.worstLow()).isEqualTo(prediction.path("worst_case").path("frequency_hz").get(0).asDouble());
            assertThat(f.statHigh()).isEqualTo(prediction.path("statistical").path("frequency_hz").get(1).asDouble());
            assertThat(r.content().prediction("first_high_s")).isPresent();
            assertThat(r.content().oscillates()).isTrue();
            CheckContent.Measured m = r.content().measurement("frequency_hz").orElseThrow();
            assertThat(m.value()).isEqualTo(doc.path("frequency_hz").asDouble());
            assertThat(m.uncertainty()).isEqualTo(doc.path("frequency_u_hz").asDouble());
            assertThat(r.content().measurement("low_s").orElseThrow().uncertainty())
                    .isEqualTo(2 * doc.path("low").path("u_s").asDouble());
            assertThat(r.content().histogram()).isNull(); // the document had none, and nothing is recomputed
        }
        CliRun report = CliRun.of("report", "--last", "--db", db.toString());
        assertThat(report.exitCode()).as(report.err()).isZero();
        Element row = Jsoup.parse(report.out()).getElementById("comparison").select("tr").stream()
                .filter(e -> e.text().startsWith("frequency")).findFirst().orElseThrow();
        assertThat(row.select("td").get(2).text())
                .isEqualTo(org.rcbench.units.SiFormat.format(prediction.path("nominal").path("frequency_hz").asDouble(), "Hz", 4));
        assertThat(Jsoup.parse(report.out()).getElementById("uncertainty").text()).contains("quantization");
        // the design is kept whole
        try (HistoryStore store = HistoryStore.open(db)) {
            assertThat(store.last().orElseThrow().context().design().text()).isEqualTo(Fixtures.DESIGN_TEXT);
        }
    }
}
