package org.rcbench.json;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.common.BadInputException;
import org.rcbench.probe.StoredCalibration;

class CalibrationFileTest {

    @Test
    void savesEveryCalibrationAndGivesTheNewestOfAProbe(@TempDir Path dir) {
        CalibrationFile f = CalibrationFile.at(dir.resolve("sub/cal.json"));
        assertThat(f.latest("0000000000000001")).isEmpty();
        Instant t = Instant.parse("2025-03-14T09:26:53.123Z");
        f.save(new StoredCalibration("0000000000000001", 37.5, 0.4, "1 Hz PPS", t));
        f.save(new StoredCalibration("0000000000000002", -2000, 12, "10 MHz OCXO", t));
        f.save(new StoredCalibration("0000000000000001", 36.9, 0.3, "1 Hz PPS", t.plusSeconds(60)));
        assertThat(f.readAll()).hasSize(3);
        StoredCalibration c = CalibrationFile.at(dir.resolve("sub/cal.json")).latest("0000000000000001").orElseThrow();
        assertThat(c).isEqualTo(new StoredCalibration("0000000000000001", 36.9, 0.3, "1 Hz PPS", t.plusSeconds(60)));
        assertThat(f.latest("0000000000000002").orElseThrow().offsetPpm()).isEqualTo(-2000);
    }

    @Test
    void aFileOfAnotherKindIsRefusedAndLeftAlone(@TempDir Path dir) throws Exception {
        Path p = dir.resolve("cal.json");
        Files.writeString(p, "{\"something\": 1}");
        assertThatThrownBy(() -> CalibrationFile.at(p).latest("01")).isInstanceOf(BadInputException.class)
                .hasMessage(p + ": not an rcbench calibration file (version 1)");
        Files.writeString(p, "{\"rcbench_calibrations\": 1, \"calibrations\": [{\"probe_id\": \"01\"}]}");
        assertThatThrownBy(() -> CalibrationFile.at(p).latest("01")).isInstanceOf(BadInputException.class)
                .hasMessage(p + ": calibration 1 is damaged: offset_ppm is not a number");
    }

    // XDG Base Directory Specification 0.8 ($XDG_DATA_HOME, default ~/.local/share); macOS
    // ~/Library/Application Support; Windows %LOCALAPPDATA%.
    @Test
    void theDefaultFileFollowsEachPlatformsDataFolder() {
        Path home = Path.of("/home/ada");
        assertThat(CalibrationFile.defaultPath("Linux", Map.of(), home))
                .isEqualTo(Path.of("/home/ada/.local/share/rcbench/calibrations.json"));
        assertThat(CalibrationFile.defaultPath("Linux", Map.of("XDG_DATA_HOME", "/data"), home))
                .isEqualTo(Path.of("/data/rcbench/calibrations.json"));
        assertThat(CalibrationFile.defaultPath("Linux", Map.of("XDG_DATA_HOME", "relative"), home))
                .isEqualTo(Path.of("/home/ada/.local/share/rcbench/calibrations.json"));
        assertThat(CalibrationFile.defaultPath("Mac OS X", Map.of(), home))
                .isEqualTo(Path.of("/home/ada/Library/Application Support/rcbench/calibrations.json"));
    }
}
