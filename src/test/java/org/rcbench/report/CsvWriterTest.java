package org.rcbench.report;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CsvWriterTest {
    @Test
    void recordsEndWithCrlfAndAwkwardFieldsAreQuoted() throws Exception {
        StringWriter sw = new StringWriter();
        CsvWriter csv = new CsvWriter(sw);
        csv.row("name", "note");
        csv.row("plain", "a, b");
        csv.row("quote", "say \"hi\"");
        csv.row("lines", "one\r\ntwo\nthree");
        csv.flush();
        // RFC 4180 section 2: CRLF after each record; fields with comma, quote or line break in quotes,
        // quotes inside doubled.
        assertThat(sw.toString()).isEqualTo("name,note\r\nplain,\"a, b\"\r\nquote,\"say \"\"hi\"\"\"\r\n"
                + "lines,\"one\r\ntwo\nthree\"\r\n");
        List<CSVRecord> back = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(sw.toString())).getRecords();
        assertThat(back).extracting(r -> r.get("note")).containsExactly("a, b", "say \"hi\"", "one\r\ntwo\nthree");
    }

    @ParameterizedTest
    @CsvSource({"0.001, 0.001", "1.0E-9, 0.000000001", "1000.0, 1000", "-2.5, -2.5", "6.02214076E23, 602214076000000000000000",
        "0.1, 0.1", "1.23E-4, 0.000123", "7.62462E-5, 0.0000762462"})
    void numbersArePlainDecimalsThatReadBackExactly(double v, String text) {
        assertThat(CsvWriter.number(v)).isEqualTo(text);
        assertThat(Double.parseDouble(CsvWriter.number(v))).isEqualTo(v);
    }

    @Test
    void plainTextMatchesBigDecimalForManyDoubles() {
        // java.math.BigDecimal's toPlainString of the same digits is the reference.
        java.util.Random rnd = new java.util.Random(42);
        for (int i = 0; i < 20_000; i++) {
            double v = (rnd.nextDouble() - 0.5) * Math.pow(10, rnd.nextInt(40) - 20);
            String expected = new java.math.BigDecimal(Double.toString(v)).stripTrailingZeros().toPlainString();
            if (v == Math.rint(v) && Math.abs(v) < 1e15) {
                expected = Long.toString((long) v);
            }
            assertThat(CsvWriter.number(v)).as(Double.toString(v)).isEqualTo(expected);
        }
    }

    @Test
    void notANumberIsAnEmptyField() {
        assertThat(CsvWriter.number(Double.NaN)).isEmpty();
        assertThat(CsvWriter.number(Double.POSITIVE_INFINITY)).isEmpty();
    }
}
