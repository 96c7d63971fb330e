package org.rcbench.gui.view;

import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import javafx.stage.Stage;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.BenchSettings;
import org.rcbench.gui.LiveFrame;
import org.rcbench.gui.PredictedExpectations;
import org.rcbench.gui.SourceChoice;
import org.rcbench.gui.Sources;

/**
 * Measures the bench window's cost at a given edge rate (a measurement, never an assertion): opens
 * the window headless on a simulated board, lets it run, and prints frames per second, the time
 * the one animation timer spends per frame (mean and worst, each second), the edges per second
 * measured, and the source thread's cost of building one frame.
 *
 * <p>Run: {@code java -cp target/test-classes:target/classes:DEPS org.rcbench.gui.view.FrameTimeBench DESIGN SECONDS [WxH]}
 */
public final class FrameTimeBench {
    private FrameTimeBench() {
    }

    public static void main(String[] args) throws Exception {
        Path design = Path.of(args[0]);
        int seconds = Integer.parseInt(args[1]);
        String[] size = (args.length > 2 ? args[2] : "1280x800").split("x");
        double w = Double.parseDouble(size[0]);
        double h = Double.parseDouble(size[1]);
        System.setProperty("headless.geometry", (int) w + "x" + (int) h + "-32");
        GuiLauncher.startToolkit(true);
        BenchServices services = BenchServices.standard().withExpectations(new PredictedExpectations())
                .withSources(Sources.standard(org.rcbench.probe.CalibrationStore.none()));
        CompletableFuture<Object[]> opened = GuiLauncher.onFxThread(() -> {
            BenchModel model = new BenchModel(services, BenchSettings.inMemory(true));
            model.choose(SourceChoice.simulated(design.toString(), ""));
            BenchWindow window = new BenchWindow(model, Path.of(System.getProperty("java.io.tmpdir")), w, h);
            Stage stage = new Stage();
            window.show(stage);
            model.start();
            return new Object[] {model, window, stage};
        });
        Object[] o = opened.get(30, TimeUnit.SECONDS);
        BenchModel model = (BenchModel) o[0];
        BenchWindow window = (BenchWindow) o[1];
        long lastEdges = 0;
        long lastNanos = System.nanoTime();
        for (int s = 0; s < seconds; s++) {
            Thread.sleep(1000);
            FrameLoop loop = window.frameLoop();
            LiveFrame f = GuiLauncher.onFxThread(() -> model.frameProperty().get()).get(5, TimeUnit.SECONDS);
            long edges = f == null ? 0 : f.measurement().edges();
            long now = System.nanoTime();
            double rate = (edges - lastEdges) / ((now - lastNanos) * 1e-9);
            lastEdges = edges;
            lastNanos = now;
            System.out.printf(Locale.ROOT, "t=%2ds  %5.1f frames/s  frame work %.2f ms mean, %.2f ms worst  "
                    + "%,9.0f edges/s measured  frame build %.2f ms on the source thread%n", s + 1,
                    loop.framesPerSecond(), loop.meanMillis(), loop.worstMillis(), rate,
                    model.pipeline().publishCostNanos() / 1e6);
        }
        GuiLauncher.onFxThread(() -> {
            ((Stage) o[2]).hide();
            return null;
        }).get(10, TimeUnit.SECONDS);
        System.exit(0);
    }
}
