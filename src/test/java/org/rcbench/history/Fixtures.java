package org.rcbench.history;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.time.Instant;

/**
 * Test inputs for the history. {@code check-shape.json} is a SHAPE FIXTURE ONLY: a hand-written
 * check result with the keys fixed by issues 2, 3 and 4 (plus extra keys a later check command may
 * add), whose invented numbers check no computation; tests assert that what is stored reads back.
 */
public final class Fixtures {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private Fixtures() {
    }

    /** A fresh copy of the shape fixture. */
    public static ObjectNode check() {
        try (InputStream in = Fixtures.class.getResourceAsStream("check-shape.json")) {
            return (ObjectNode) MAPPER.readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** The shape fixture with C1's estimate set to {@code farads}. */
    public static ObjectNode checkWithC1(double farads) {
        ObjectNode doc = check();
        ObjectNode c1 = (ObjectNode) doc.path("estimates").path("C1");
        c1.put("value", farads);
        c1.put("low", farads * 0.98);
        c1.put("high", farads * 1.02);
        return doc;
    }

    /** A design of our own test board (not demo data): an astable with asymmetric C1 tolerance. */
    public static final String DESIGN_TEXT = """
            rcbench_design = 1

            [board]
            name = "TestBoard-A"

            [timer]
            topology = "astable"
            family = "bipolar"
            supply = "5 V"

            [parts.R1]
            role = "charge"
            value = "2k2"
            tolerance = "1%"

            [parts.R2]
            role = "shared"
            value = "10k"
            tolerance = "2%"

            [parts.C1]
            role = "timing"
            value = "100n"
            tolerance = "+50/-20%"
            """;

    public static DesignRef design() {
        return DesignRef.of("board-a.toml", "# test design\n[parts.C1]\nvalue = \"100n\"\ntolerance = \"10%\"\n");
    }

    /** A context for unit {@code serial} of "TestBoard-A" at {@code when}. */
    public static RunContext context(String serial, Instant when) {
        return RunContext.of("TestBoard-A", design()).withSerial(serial).withRecordedAt(when)
                .withProbe(new ProbeInfo("probe-7", "fw 1.2.0", 12.5, 1.5, "capture header"));
    }

    public static RunRecord run(String serial, Instant when, double c1Farads) {
        return RunRecord.of(checkWithC1(c1Farads), context(serial, when));
    }
}
