package org.rcbench.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code rcbench gui} from the fat jar, in a fresh JVM without a display (as on CI): the headless
 * snapshot works (plain launcher, Monocle shipped in the jar), and the window itself says why it
 * cannot open instead of failing with a stack trace.
 */
class GuiJarIT {
    @TempDir
    Path dir;

    private record Run(int exit, String out, String err) {
    }

    private static Run run(String... args) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-jar", System.getProperty("rcbench.jar")));
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd);
        pb.environment().remove("DISPLAY");
        pb.environment().remove("WAYLAND_DISPLAY");
        Process p = pb.start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("rcbench gui did not finish: " + String.join(" ", args));
        }
        return new Run(p.exitValue(), new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8),
                new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8));
    }

    @Test
    void theJarRendersAPictureWithoutADisplay() throws Exception {
        Path png = dir.resolve("window.png");
        Run r = run("gui", "--snapshot", png.toString(), "--after", "2s", "--size", "1024x700",
                "--db", dir.resolve("h.db").toString());
        assertThat(r.exit()).as(r.err()).isZero();
        assertThat(r.out()).contains("1024×700");
        assertThat(r.err()).doesNotContain("Exception").doesNotContain("Unsupported JavaFX configuration");
        BufferedImage image = ImageIO.read(png.toFile());
        assertThat(image.getWidth()).isEqualTo(1024);
        assertThat(image.getHeight()).isEqualTo(700);
    }

    @Test
    void theWindowWithoutADisplaySaysWhatToDo() throws Exception {
        Run r = run("gui", "--db", dir.resolve("h.db").toString());
        assertThat(r.exit()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("rcbench: gui: cannot open a window here").contains("--snapshot")
                .doesNotContain("\tat ");
    }
}
