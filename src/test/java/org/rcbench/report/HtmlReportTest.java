package org.rcbench.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.parser.Parser;
import org.junit.jupiter.api.Test;
import org.rcbench.history.Fixtures;
import org.rcbench.history.PartTrend;
import org.rcbench.history.ProbeCalibration;
import org.rcbench.history.RunRecord;
import org.rcbench.history.TrendAnalysis;
import org.rcbench.units.Tolerance;

/** The report's content (shape fixture: values are only checked to appear as stored) and its validity. */
class HtmlReportTest {
    private static final Instant T0 = Instant.parse("2024-05-01T08:00:00Z");

    static ReportInput input(String note) {
        RunRecord stored = RunRecord.of(Fixtures.check(), Fixtures.context("SN-1", T0).withNote(note));
        RunRecord run = new RunRecord(7, stored.context(), stored.content(), stored.document());
        List<PartTrend.Point> pts = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            pts.add(new PartTrend.Point(i + 1, TrendAnalysis.at(T0, i - 3.0), 1e-7 * (1 - 0.02 * i), 0.98e-7 * (1 - 0.02 * i),
                    1.02e-7 * (1 - 0.02 * i)));
        }
        TrendAnalysis a = new PartTrend("TestBoard-A", "SN-1", "C1", "F", 1e-7, Tolerance.symmetric(0.1), pts).analyse(10);
        ProbeCalibration cal = ProbeCalibration.of("probe-7", 12.0, 1.5, "1 Hz reference", T0.minusSeconds(86400));
        return new ReportInput(run, List.of(a), cal, T0.plusSeconds(60), "rcbench test");
    }

    @Test
    void everySectionIsPresentWithTheRunsContent() {
        String html = HtmlReport.render(input("replaced R3 <before> & after"));
        Document doc = Jsoup.parse(html);
        for (String id : List.of("verdict", "board", "comparison", "suspects", "uncertainty", "probe", "plots", "capture",
                "safety")) {
            assertThat(doc.getElementById(id)).as(id).isNotNull();
            assertThat(doc.getElementById(id).selectFirst("h2")).as(id + " heading").isNotNull();
        }
        assertThat(doc.title()).isEqualTo("Test record: TestBoard-A SN-1, run 7");
        Element verdict = doc.getElementById("verdict");
        assertThat(verdict.selectFirst(".word").text()).isEqualTo("marginal");
        assertThat(verdict.text()).contains("outside its statistical band but inside the worst-case band")
                .contains("duty cycle (marginal)");
        Element cmp = doc.getElementById("comparison");
        Element freq = cmp.select("tr").stream().filter(r -> r.text().startsWith("frequency")).findFirst().orElseThrow();
        assertThat(freq.select("td").eachText()).containsExactly("frequency", "1.000 kHz ± 40.00 mHz", "1.010 kHz",
                "950.0 Hz to 1.070 kHz", "900.0 Hz to 1.130 kHz", "pass");
        assertThat(cmp.select("svg")).hasSize(1);
        Element sus = doc.getElementById("suspects");
        assertThat(sus.select("tbody").get(0).select("tr").get(0).select("td").eachText())
                .containsExactly("1", "C1", "95.00 nF", "100.0 nF", "-5.0 %", "81 %");
        assertThat(sus.text()).contains("R1 and a mild leakage of C1 cannot be told apart").contains("93.00 nF to 97.00 nF")
                .contains("±10 %");
        assertThat(doc.getElementById("uncertainty").text()).contains("statistical").contains("10.00 mHz")
                .contains("1.5 ppm (one standard uncertainty)");
        assertThat(doc.getElementById("probe").text()).contains("probe-7").contains("fw 1.2.0").contains("+12.5 ppm")
                .contains("+12 ppm ± 1.5 ppm against 1 Hz reference");
        Element plots = doc.getElementById("plots");
        assertThat(plots.select("figure")).hasSize(3); // period histogram, frequency trend, C1 over the runs
        assertThat(plots.text()).contains("Periods of 3999 cycles").contains("C1 (nominal 100.0 nF ±10 %): 4 runs");
        assertThat(doc.getElementById("capture").text()).contains("replaced R3 <before> & after");
        assertThat(doc.getElementById("safety").select("li").eachText()).hasSize(5)
                .anySatisfy(t -> assertThat(t).contains("probe's ground is the computer's ground"))
                .anySatisfy(t -> assertThat(t).contains("mains-referenced or transformerless"))
                .anySatisfy(t -> assertThat(t).contains("keep their charge"))
                .anySatisfy(t -> assertThat(t).contains("input-voltage limits"))
                .anySatisfy(t -> assertThat(t).contains("licensed"));
    }

    @Test
    void htmlParsesWithoutErrorsAndNeedsNothingFromOutside() {
        String html = HtmlReport.render(input("<script>alert(1)</script>"));
        Parser parser = Parser.htmlParser().setTrackErrors(50);
        Document doc = Jsoup.parse(html, "", parser);
        assertThat(parser.getErrors()).isEmpty();
        assertThat(doc.select("script, link, img, iframe, object, embed")).isEmpty();
        assertThat(doc.select("[src], [href]")).isEmpty();
        assertThat(html).doesNotContain("url(").doesNotContain("@import");
        assertThat(html.replace("http://www.w3.org/2000/svg", "")).doesNotContain("http");
        assertThat(doc.getElementById("capture").text()).contains("<script>alert(1)</script>");
    }

    @Test
    void everyEmbeddedPictureIsWellFormedSvg() throws Exception {
        String html = HtmlReport.render(input(null));
        Matcher m = Pattern.compile("<svg .*?</svg>", Pattern.DOTALL).matcher(html);
        int count = 0;
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        while (m.find()) {
            org.w3c.dom.Document svg = f.newDocumentBuilder()
                    .parse(new ByteArrayInputStream(m.group().getBytes(StandardCharsets.UTF_8)));
            assertThat(svg.getDocumentElement().getNamespaceURI()).isEqualTo("http://www.w3.org/2000/svg");
            assertThat(svg.getDocumentElement().getAttribute("width")).isEqualTo("100%");
            assertThat(svg.getDocumentElement().getAttribute("viewBox")).isNotEmpty();
            count++;
        }
        assertThat(count).isEqualTo(5); // verdict mark, bands, histogram, frequency trend, part history
    }

    @Test
    void textColumnFitsThePrintableWidthOfA4AndLetter() {
        String css = ReportStyle.CSS;
        Matcher page = Pattern.compile("@page \\{ margin: (\\d+)mm (\\d+)mm (\\d+)mm (\\d+)mm; }").matcher(css);
        assertThat(page.find()).isTrue();
        double sides = Double.parseDouble(page.group(2)) + Double.parseDouble(page.group(4));
        // ISO 216 A4 is 210 mm wide; ANSI Letter is 8.5 in = 215.9 mm.
        double a4 = 210 - sides;
        double letter = 215.9 - sides;
        Matcher body = Pattern.compile("body \\{ max-width: (\\d+)mm").matcher(css);
        assertThat(body.find()).isTrue();
        assertThat(Double.parseDouble(body.group(1))).isLessThanOrEqualTo(Math.min(a4, letter));
        assertThat(css).doesNotContainPattern("[0-9]px").contains("break-inside: avoid").contains("break-after: avoid");
    }

    @Test
    void eachVerdictHasItsOwnShape() throws Exception {
        HashSet<String> marks = new HashSet<>();
        for (String v : List.of("pass", "marginal", "fail", "stopped")) {
            String svg = SvgCharts.verdictMark(v);
            DocumentBuilderFactory.newInstance().newDocumentBuilder()
                    .parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
            marks.add(svg.replace(v, ""));
        }
        assertThat(marks).hasSize(4);
    }

    @Test
    void aRunWithoutPlotsOrPredictionSaysSo() {
        var doc = Fixtures.check();
        doc.remove(List.of("histogram", "trend", "prediction", "checks", "suspects"));
        doc.put("verdict", "stopped");
        RunRecord r = RunRecord.of(doc, Fixtures.context(null, T0));
        Document html = Jsoup.parse(HtmlReport.render(new ReportInput(r, List.of(), null, T0, "x")));
        assertThat(html.getElementById("verdict").selectFirst(".word").text()).isEqualTo("stopped");
        assertThat(html.getElementById("comparison").text()).contains("no prediction to compare with");
        assertThat(html.getElementById("suspects").text()).contains("No suspect");
        assertThat(html.getElementById("plots").text()).contains("No period histogram").contains("No frequency trend")
                .contains("no part history yet");
        assertThat(html.getElementById("board").text()).contains("Serial number not given");
    }
}
