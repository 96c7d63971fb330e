package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.history.CheckContent;
import org.rcbench.history.CheckDocument;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.RunRecord;
import org.rcbench.source.DemoDesigns;
import org.rcbench.testing.CliRun;

/** {@code rcbench check --save}: file and live checks stored, listed by {@code history}, rendered by {@code report}. */
class CheckSaveTest {
    /** The simulated probe's id and firmware, as its hello states them. */
    static final String SIM_PROBE = "72636273696d0001";

    @TempDir
    Path dir;

    private Path db() {
        return dir.resolve("history.db");
    }

    private CliRun run(String... args) {
        List<String> all = new ArrayList<>(List.of(args));
        all.addAll(List.of("--db", db().toString()));
        return CliRun.of(all.toArray(String[]::new));
    }

    private RunRecord last() {
        try (HistoryStore store = HistoryStore.open(db())) {
            return store.last().orElseThrow();
        }
    }

    @Test
    void aFileCheckIsStoredWithTheChecksOwnPlotsListedAndReported() throws Exception {
        Path file = dir.resolve("aged.rce");
        CliRun rec = run("record", "--sim", "demo:piper-mk2", "--fault", "C1=-25%", "--sim-speed", "fast", "--duration",
                "3s", "-o", file.toString());
        assertThat(rec.exitCode()).as(rec.err()).isZero();
        String[] check = {"check", file.toString(), "--design", "demo:piper-mk2", "--draws", "20000"};
        JsonNode doc = new ObjectMapper().readTree(run(concat(check, "--json")).out());
        CliRun saved = run(concat(check, "--save", "--serial", "SN-1", "--note", "pitch too high"));
        assertThat(saved.exitCode()).as(saved.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(saved.err()).contains("rcbench: saved as run 1 in ");
        assertThat(saved.out()).startsWith("FAIL  Piper Mk2: ");

        RunRecord r = last();
        assertThat(r.context().board()).isEqualTo("Piper Mk2");
        assertThat(r.context().serial()).isEqualTo("SN-1");
        assertThat(r.context().note()).isEqualTo("pitch too high");
        assertThat(r.context().capture().path()).isEqualTo(file.toAbsolutePath().toString());
        assertThat(r.context().design().name()).isEqualTo("demo:piper-mk2");
        assertThat(r.context().design().text()).isEqualTo(DemoDesigns.text("demo:piper-mk2"));
        assertThat(r.context().probe().probeId()).isEqualTo(SIM_PROBE);
        assertThat(r.content().verdict()).isEqualTo("fail");
        assertThat(r.content().suspects().get(0).part()).isEqualTo("C1");
        // the stored plots are the check's own: the histogram as printed, the trend as printed but
        // thinned to CheckDocument.MAX_TREND_POINTS by averaging equal runs of points
        CheckContent.PeriodHistogram h = r.content().histogram();
        assertThat(h.counts()).containsExactly(longs(doc.get("histogram").get("counts")));
        assertThat(h.edgesSeconds()).containsExactly(doubles(doc.get("histogram").get("edges_s")));
        JsonNode trend = doc.get("trend");
        int per = (trend.size() + CheckDocument.MAX_TREND_POINTS - 1) / CheckDocument.MAX_TREND_POINTS;
        assertThat(r.content().trend()).hasSize((trend.size() + per - 1) / per);
        double first = 0;
        for (int i = 0; i < per; i++) {
            first += trend.get(i).get("frequency_hz").asDouble() / per;
        }
        assertThat(r.content().trend().get(0).frequencyHz()).isCloseTo(first, org.assertj.core.api.Assertions.within(1e-9));

        CliRun history = run("history");
        assertThat(history.exitCode()).as(history.err()).isZero();
        assertThat(history.out()).containsPattern("\\n +1 +\\S+ \\S+ +Piper Mk2 +SN-1 +fail +905\\.\\d+ Hz +C1 +pitch too high");
        CliRun report = run("report", "--last");
        assertThat(report.exitCode()).as(report.err()).isZero();
        Document html = Jsoup.parse(report.out());
        assertThat(html.getElementById("verdict").text()).containsIgnoringCase("fail");
        assertThat(html.getElementById("suspects").text()).contains("C1");
        assertThat(html.getElementById("plots").select("svg")).hasSizeGreaterThanOrEqualTo(2);
        assertThat(html.getElementById("probe").text()).contains(SIM_PROBE);
    }

    @Test
    void aLiveCheckIsStoredWithTheProbesHello() {
        CliRun saved = run("check", "--sim", "demo:piper-mk2", "--fault", "C1=-25%", "--draws", "20000", "--save",
                "--serial", "SN-2");
        assertThat(saved.exitCode()).as(saved.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        RunRecord r = last();
        assertThat(r.context().capture()).isNull();
        assertThat(r.context().serial()).isEqualTo("SN-2");
        assertThat(r.context().probe().probeId()).isEqualTo(SIM_PROBE);
        assertThat(r.context().probe().firmware()).isEqualTo("1.0.0");
        // uncalibrated crystal: no offset, the typical bound of 50 ppm as a rectangular limit
        assertThat(r.context().probe().clockOffsetPpm()).isZero();
        assertThat(r.context().probe().clockUncertaintyPpm())
                .isCloseTo(50 / Math.sqrt(3), org.assertj.core.api.Assertions.within(1e-9));
        assertThat(r.context().probe().calibrationSource()).startsWith("clock not calibrated");
        assertThat(r.content().histogram()).isNotNull();
        CliRun report = run("report", "--last");
        assertThat(report.exitCode()).as(report.err()).isZero();
        assertThat(Jsoup.parse(report.out()).getElementById("board").text()).contains("Piper Mk2").contains("SN-2");
        assertThat(run("history", "SN-2").out()).contains("Piper Mk2").contains("fail");
    }

    @Test
    void aStoppedBoardIsStoredWithoutPlots() {
        CliRun saved = run("check", "--sim", "demo:piper-mk2", "--fault", "leak=1k", "--draws", "2000", "--save");
        assertThat(saved.exitCode()).as(saved.err()).isEqualTo(ExitCodes.CHECK_FAILED);
        assertThat(saved.out()).startsWith("STOPPED  Piper Mk2: not running");
        RunRecord r = last();
        assertThat(r.content().verdict()).isEqualTo("stopped");
        assertThat(r.content().histogram()).isNull();
        assertThat(run("report", "--last").out()).contains("No period histogram is stored with this run.");
    }

    @Test
    void saveOptionsWithoutSaveAreRefused() {
        CliRun r = run("check", "--sim", "demo:piper-mk2", "--serial", "SN-3");
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).isEqualTo("rcbench: --serial: is stored only with --save\n");
    }

    private static String[] concat(String[] a, String... b) {
        String[] all = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return all;
    }

    private static long[] longs(JsonNode a) {
        long[] v = new long[a.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = a.get(i).asLong();
        }
        return v;
    }

    private static double[] doubles(JsonNode a) {
        double[] v = new double[a.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = a.get(i).asDouble();
        }
        return v;
    }
}
