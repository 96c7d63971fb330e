package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.history.HistoryStore;
import org.rcbench.history.ProbeCalibration;
import org.rcbench.sim.ProbeOptions;
import org.rcbench.sim.SimulationSpec;
import org.rcbench.sim.VirtualBoard;
import org.rcbench.source.DemoDesigns;
import org.rcbench.testing.CliRun;

/**
 * {@code rcbench calibrate} on a simulated probe whose clock runs a known amount fast, then a later
 * session with the same probe id: the stored offset is applied and the measurement reads true time.
 */
class CalibrateCommandTest {

    static CliRun calibrate(Path store, String... extra) {
        List<String> args = new java.util.ArrayList<>(List.of("calibrate", "--sim", "reference:1Hz", "--sim-clock-ppm",
                "37", "--jitter", "50ns", "--sim-speed", "fast", "--reference", "1Hz", "--reference-ppm", "0.05",
                "--duration", "120s", "--db", store.toString()));
        args.addAll(List.of(extra));
        return CliRun.of(args.toArray(new String[0]));
    }

    @Test
    void findsTheSimulatedClockOffsetAndStoresItUnderTheProbeId(@TempDir Path dir) {
        Path store = dir.resolve("history.db");
        CliRun r = calibrate(store);
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        ProbeCalibration c;
        try (HistoryStore h = HistoryStore.open(store)) {
            c = h.latestCalibration(String.format("%016x", ProbeOptions.DEFAULT_PROBE_ID)).orElseThrow();
        }
        // JCGM 100:2008 4.3.7: a stated limit of ±0.05 ppm, rectangular, is a standard uncertainty of 0.05/sqrt(3).
        assertThat(c.uncertaintyPpm()).isGreaterThanOrEqualTo(0.05 / Math.sqrt(3));
        assertThat(c.offsetPpm()).isCloseTo(37, within(2 * c.uncertaintyPpm()));
        assertThat(r.out()).contains("clock offset +37.00").contains("stored in the history " + store);
    }

    @Test
    void aLaterSessionWithThatProbeAppliesTheCalibration(@TempDir Path dir) throws Exception {
        Path store = dir.resolve("history.db");
        assertThat(calibrate(store).exitCode()).isZero();
        Path file = dir.resolve("piper.rce");
        CliRun rec = CliRun.of("record", "--sim", "demo:piper-mk2", "--sim-clock-ppm", "37", "--sim-speed", "fast",
                "--duration", "10s", "-o", file.toString(), "--db", store.toString());
        assertThat(rec.exitCode()).as(rec.err()).isZero();
        String text = Files.readString(file);
        assertThat(text).contains("# calibration_ppm=37.0").contains("# clock_note=clock calibrated ");
        CliRun m = CliRun.of("measure", "--json", file.toString());
        var json = new ObjectMapper().readTree(m.out());
        double trueHz = VirtualBoard.of(DemoDesigns.resolve("demo:piper-mk2"), SimulationSpec.defaults()).predicted()
                .frequencyHz();
        // Calibrated, the 37 ppm of the probe's clock is gone: the reading is the board's true frequency.
        assertThat(json.get("frequency_hz").asDouble()).isCloseTo(trueHz, within(trueHz * 0.2e-6));
        assertThat(json.get("clock_offset_ppm").asDouble()).isCloseTo(37, within(0.01));
        // Without it the same probe reads 37 ppm low.
        Path raw = dir.resolve("raw.rce");
        CliRun.of("record", "--sim", "demo:piper-mk2", "--sim-clock-ppm", "37", "--sim-speed", "fast", "--duration",
                "10s", "-o", raw.toString(), "--db", dir.resolve("empty.db").toString());
        double rawHz = new ObjectMapper().readTree(CliRun.of("measure", "--json", raw.toString()).out())
                .get("frequency_hz").asDouble();
        assertThat((rawHz / trueHz - 1) * 1e6).isCloseTo(-37, within(0.01));
    }

    @Test
    void theNewestCalibrationWinsAndDryRunStoresNothing(@TempDir Path dir) {
        Path store = dir.resolve("history.db");
        calibrate(store);
        CliRun again = CliRun.of("calibrate", "--sim", "reference:1Hz", "--sim-clock-ppm", "-12", "--sim-speed", "fast",
                "--reference", "1Hz", "--reference-ppm", "0.05", "--duration", "60s", "--db", store.toString());
        assertThat(again.exitCode()).as(again.err()).isZero();
        try (HistoryStore h = HistoryStore.open(store)) {
            assertThat(h.calibrations("72636273696d0001")).hasSize(2);
            assertThat(h.latestCalibration("72636273696d0001").orElseThrow().offsetPpm()).isCloseTo(-12, within(0.2));
        }
        CliRun dry = calibrate(store, "--dry-run");
        assertThat(dry.out()).contains("not stored (--dry-run)");
        try (HistoryStore h = HistoryStore.open(store)) {
            assertThat(h.calibrations("72636273696d0001")).hasSize(2);
        }
    }

    @Test
    void aSignalThatIsNotTheReferenceIsRefused(@TempDir Path dir) {
        Path store = dir.resolve("history.db");
        CliRun r = CliRun.of("calibrate", "--sim", "reference:1Hz", "--sim-speed", "fast", "--reference", "10Hz",
                "--reference-ppm", "1", "--duration", "30s", "--db", store.toString());
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).isEqualTo("rcbench: --reference: the signal reads 1.00000 Hz, not the stated 10.0000 Hz"
                + " reference: check the wiring and the frequency; nothing was stored\n");
        assertThat(store).doesNotExist();
        CliRun neg = CliRun.of("calibrate", "--sim", "reference:1Hz", "--reference", "1Hz", "--reference-ppm", "-1");
        assertThat(neg.err()).isEqualTo("rcbench: --reference-ppm: must be zero or more, not -1.0\n");
    }

    @Test
    void aDamagedStoreIsOneLine(@TempDir Path dir) throws Exception {
        Path store = dir.resolve("history.db");
        Files.writeString(store, "{not a database");
        CliRun r = calibrate(store);
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).startsWith("rcbench: " + store.toAbsolutePath()).doesNotContain("\n\tat ");
        assertThat(r.err().lines()).hasSize(1);
        assertThat(Files.readString(store)).isEqualTo("{not a database");
    }
}
