package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.Set;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.rcbench.testing.CliRun;

/** {@code rcbench gui}: the headless snapshot and the option checks (the window itself needs a display). */
class GuiCommandTest {
    @TempDir
    Path dir;

    @Test
    void snapshotOfTheSimulatedBoardIsARealPicture() throws Exception {
        Path png = dir.resolve("bench.png");
        CliRun r = CliRun.of("gui", "--sim", "captures/piper-mk2.toml", "--fault", "C1=-30%", "--snapshot",
                png.toString(), "--after", "2s", "--size", "1280x800");
        assertThat(r.exitCode()).as(r.err()).isEqualTo(ExitCodes.OK);
        assertThat(r.out()).contains("wrote " + png).contains("1280×800");
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(1280);
        assertThat(image.getHeight()).isEqualTo(800);
        Set<Integer> colours = new HashSet<>();
        for (int y = 0; y < image.getHeight(); y += 4) {
            for (int x = 0; x < image.getWidth(); x += 4) {
                colours.add(image.getRGB(x, y));
            }
        }
        // Text, plots, state colours: far more than a blank or single-colour frame.
        assertThat(colours.size()).isGreaterThan(50);
    }

    @Test
    void twoSourcesAtOnceAreRefused() {
        CliRun r = CliRun.of("gui", "--port", "/dev/ttyUSB9", "--sim", "captures/piper-mk2.toml", "--snapshot", "x.png");
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("give one of --port, --sim and --replay");
    }

    @Test
    void aFaultNeedsTheSimulatedBoard() {
        CliRun r = CliRun.of("gui", "--port", "/dev/ttyUSB9", "--fault", "C1=-30%", "--snapshot", "x.png");
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--fault");
    }

    @Test
    void aBadSizeIsRefusedWithTheText() {
        CliRun r = CliRun.of("gui", "--snapshot", dir.resolve("x.png").toString(), "--size", "big");
        assertThat(r.exitCode()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--size").contains("\"big\"");
    }
}
