package org.rcbench.gui.view;

import java.nio.file.Path;
import java.time.Duration;
import java.util.Objects;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import javafx.application.Platform;
import javafx.geometry.Rectangle2D;
import javafx.stage.Screen;
import javafx.stage.Stage;
import org.rcbench.common.BadInputException;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.BenchServices;
import org.rcbench.gui.BenchSettings;
import org.rcbench.gui.SourceChoice;

/**
 * Starts the bench window from a plain class (the fat jar's main class is not a JavaFX
 * {@code Application}, which would fail there with "JavaFX runtime components are missing"): the
 * toolkit is started with {@link Platform#startup}, or reused when it already runs (tests), and
 * never exited, so several windows can be opened in one process. For pictures without a display
 * the toolkit is started on Monocle's headless platform with software rendering; the Monocle jar
 * ships in rcbench for that.
 */
public final class GuiLauncher {
    /**
     * What the window starts with.
     *
     * @param choice   the source shown in the source strip
     * @param startNow start that source at once
     * @param design   a design file to load first, or null
     * @param folder   where shortcut recordings and pictures go
     * @param services the stages the model calls
     * @param settings what the window remembers
     */
    public record Launch(SourceChoice choice, boolean startNow, Path design, Path folder, BenchServices services,
            BenchSettings settings) {
        public Launch {
            Objects.requireNonNull(choice, "choice");
            Objects.requireNonNull(folder, "folder");
            Objects.requireNonNull(services, "services");
            Objects.requireNonNull(settings, "settings");
        }
    }

    /**
     * JavaFX logs "Unsupported JavaFX configuration: classes were loaded from 'unnamed module'" when
     * it runs from the class path, as rcbench's single jar does; harmless (rcbench has no module-info),
     * so it is kept off the console. Held here so the logger keeps its level.
     */
    private static final java.util.logging.Logger PLATFORM_LOG =
            java.util.logging.Logger.getLogger("javafx");

    private GuiLauncher() {
    }

    /** Opens the window and returns when the user has closed it. */
    public static void runWindow(Launch launch) throws InterruptedException {
        startToolkit(false);
        CountDownLatch closed = new CountDownLatch(1);
        CompletableFuture<Void> shown = onFxThread(() -> {
            Stage stage = new Stage();
            open(launch, stage, 1440, 900);
            stage.setOnHiding(e -> closed.countDown());
            return null;
        });
        await(shown, Duration.ofSeconds(30));
        closed.await();
    }

    /**
     * Opens the window headless at {@code width × height}, lets {@code warmUp} of data arrive,
     * writes a PNG of it to {@code file}, closes the window and returns the picture's size (smaller
     * than asked when the toolkit already ran on a smaller screen).
     */
    public static int[] snapshot(Launch launch, Path file, Duration warmUp, double width, double height)
            throws InterruptedException {
        // Monocle's headless screen is 1280x800 unless told otherwise before it starts; a window
        // larger than its screen overflows the screen's buffer, so ask for a screen that fits.
        System.setProperty("headless.geometry", (int) Math.max(1280, Math.ceil(width)) + "x"
                + (int) Math.max(800, Math.ceil(height)) + "-32");
        startToolkit(true);
        CompletableFuture<Stage> opened = onFxThread(() -> {
            Rectangle2D screen = Screen.getPrimary().getBounds();
            Stage stage = new Stage();
            open(launch, stage, Math.min(width, screen.getWidth()), Math.min(height, screen.getHeight()));
            return stage;
        });
        Stage stage = await(opened, Duration.ofSeconds(30));
        Thread.sleep(warmUp.toMillis());
        CompletableFuture<int[]> picture = onFxThread(() -> {
            try {
                return WindowPicture.write(stage.getScene(), file);
            } finally {
                stage.hide();
            }
        });
        return await(picture, Duration.ofSeconds(30));
    }

    private static BenchWindow open(Launch launch, Stage stage, double width, double height) {
        BenchModel model = new BenchModel(launch.services(), launch.settings());
        if (launch.design() != null) {
            model.loadDesign(launch.design());
        }
        model.choose(launch.choice());
        BenchWindow w = new BenchWindow(model, launch.folder(), width, height);
        w.show(stage);
        stage.requestFocus();
        if (launch.startNow()) {
            model.start();
        }
        return w;
    }

    /**
     * Starts the JavaFX toolkit unless it runs already; {@code headless} selects Monocle's headless
     * platform and software rendering (only effective before the first start).
     *
     * @throws BadInputException when there is no display to open a window on
     */
    public static void startToolkit(boolean headless) throws InterruptedException {
        if (headless) {
            System.setProperty("glass.platform", "Monocle");
            System.setProperty("monocle.platform", "Headless");
            System.setProperty("prism.order", "sw");
            System.setProperty("prism.text", "t2k");
            System.setProperty("java.awt.headless", "true");
        }
        PLATFORM_LOG.setLevel(java.util.logging.Level.SEVERE);
        CountDownLatch started = new CountDownLatch(1);
        try {
            Platform.startup(started::countDown);
        } catch (IllegalStateException alreadyRunning) {
            started.countDown();
        } catch (UnsupportedOperationException | UnsatisfiedLinkError e) {
            throw new BadInputException("gui", "cannot open a window here (" + e.getMessage() + "); use "
                    + "'rcbench gui --snapshot FILE' for a picture without a display");
        }
        started.await();
        Platform.setImplicitExit(false);
    }

    /** Work done on the JavaFX thread. */
    @FunctionalInterface
    public interface FxWork<T> {
        T run() throws Exception;
    }

    /** Runs {@code work} on the JavaFX thread; the future completes with its result or failure. */
    public static <T> CompletableFuture<T> onFxThread(FxWork<T> work) {
        CompletableFuture<T> f = new CompletableFuture<>();
        Platform.runLater(() -> {
            try {
                f.complete(work.run());
            } catch (Throwable t) {
                f.completeExceptionally(t);
            }
        });
        return f;
    }

    private static <T> T await(CompletableFuture<T> f, Duration timeout) throws InterruptedException {
        try {
            return f.get(timeout.toMillis(), TimeUnit.MILLISECONDS);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(cause);
        } catch (TimeoutException e) {
            throw new IllegalStateException("the window did not answer within " + timeout.toSeconds() + " s");
        }
    }
}
