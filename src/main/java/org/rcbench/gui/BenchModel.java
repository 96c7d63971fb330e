package org.rcbench.gui;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyIntegerProperty;
import javafx.beans.property.ReadOnlyIntegerWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;

/**
 * The bench window's model: which source runs, what it measures, the design beside it, the
 * suspects, the trimmer guide and the recording. Read-only properties for the view to bind, and
 * command methods for the view to call; nothing here touches the scene graph.
 *
 * <p>Threads: every method runs on the window's thread (in tests, the test's thread). Sources write
 * on their own threads into a {@link LivePipeline}; {@link #poll(long)}, called once per frame,
 * takes the newest frame and status from it, refreshes the numeric readouts at most
 * {@link #READOUT_NANOS} apart, and starts predictions, diagnoses and tuning on the worker.
 */
public final class BenchModel implements AutoCloseable {
    /** Time between numeric readout refreshes: 8 per second. */
    public static final long READOUT_NANOS = 125_000_000L;
    /** The averaging windows offered, in cycles; {@link ReadingsModel#WHOLE_RUN} is every cycle since the start. */
    public static final List<Integer> AVERAGING_CHOICES = List.of(16, 64, 256, 1024, 4096, ReadingsModel.WHOLE_RUN);

    private final BenchServices services;
    private final BenchSettings settings;
    private final long publishNanos;
    private final ReadingsModel readings = new ReadingsModel();
    private final DesignModel design;
    private final DiagnosisModel diagnosis;
    private final TuningModel tuning;
    private final PickerModel picker;

    private final ReadOnlyObjectWrapper<SourceChoice> choice = new ReadOnlyObjectWrapper<>(this, "choice",
            SourceChoice.simulated("", ""));
    private final ReadOnlyObjectWrapper<SourceStatus> status = new ReadOnlyObjectWrapper<>(this, "status",
            SourceStatus.idle());
    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running");
    private final ReadOnlyObjectWrapper<LiveFrame> frame = new ReadOnlyObjectWrapper<>(this, "frame");
    private final ReadOnlyIntegerWrapper averaging = new ReadOnlyIntegerWrapper(this, "averaging", 256);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final ReadOnlyStringWrapper signalNote = new ReadOnlyStringWrapper(this, "signalNote", "");
    private final ReadOnlyBooleanWrapper safetyNoticeDue = new ReadOnlyBooleanWrapper(this, "safetyNoticeDue");

    private BenchSource source;
    private LivePipeline pipeline;
    private final RecordingModel recording = new RecordingModel(message::set);
    private Design sourceDesign;
    private final BackgroundSlot<String> saving;
    private Expectation shownExpectation;
    private boolean readoutDirty = true;
    private long lastReadout = Long.MIN_VALUE / 2;

    public BenchModel(BenchServices services, BenchSettings settings) {
        this(services, settings, LivePipeline.DEFAULT_PUBLISH_NANOS);
    }

    /** @param publishNanos time between live frames (tests may shorten it) */
    public BenchModel(BenchServices services, BenchSettings settings, long publishNanos) {
        this.services = services;
        this.settings = settings;
        this.publishNanos = publishNanos;
        this.design = new DesignModel(services.expectations(), services.worker());
        this.diagnosis = new DiagnosisModel(services.diagnosis(), services.worker());
        this.tuning = new TuningModel(services.tuning(), services.worker());
        this.picker = new PickerModel(design, services.worker());
        this.saving = new BackgroundSlot<>(services.worker());
        safetyNoticeDue.set(!settings.safetyNoticeAccepted());
        design.designProperty().addListener((o, was, now) -> designChanged(now));
    }

    // ---- parts ---------------------------------------------------------------------------------

    public ReadingsModel readings() {
        return readings;
    }

    public DesignModel design() {
        return design;
    }

    public DiagnosisModel diagnosis() {
        return diagnosis;
    }

    public TuningModel tuning() {
        return tuning;
    }

    public PickerModel picker() {
        return picker;
    }

    // ---- properties ----------------------------------------------------------------------------

    /** The chosen source (running or not). */
    public ReadOnlyObjectProperty<SourceChoice> choiceProperty() {
        return choice.getReadOnlyProperty();
    }

    /** The source's newest status: state, line, probe, clock, gaps and errors. */
    public ReadOnlyObjectProperty<SourceStatus> statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** True from {@link #start()} until {@link #stop()} or until the source ends or fails. */
    public ReadOnlyBooleanProperty runningProperty() {
        return running.getReadOnlyProperty();
    }

    /** The newest live frame (for the plots); null before the first. */
    public ReadOnlyObjectProperty<LiveFrame> frameProperty() {
        return frame.getReadOnlyProperty();
    }

    /** The averaging window in cycles, or {@link ReadingsModel#WHOLE_RUN}. */
    public ReadOnlyIntegerProperty averagingProperty() {
        return averaging.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty recordingProperty() {
        return recording.recordingProperty();
    }

    /** {@code REC piper.rce — 12,345 edges} while recording, else "". */
    public ReadOnlyStringProperty recordingTextProperty() {
        return recording.textProperty();
    }

    /** The latest message for the user (a problem or a confirmation), or "". */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** {@code no edge for 3.2 s} while a live source has gone quiet, else "". */
    public ReadOnlyStringProperty signalNoteProperty() {
        return signalNote.getReadOnlyProperty();
    }

    /** True until the user has closed the safety notice once. */
    public ReadOnlyBooleanProperty safetyNoticeDueProperty() {
        return safetyNoticeDue.getReadOnlyProperty();
    }

    /** Whether checks can be saved in this build. */
    public boolean canSaveChecks() {
        return services.checks() != null;
    }

    // ---- commands ------------------------------------------------------------------------------

    /** Chooses the source; a running source is stopped and the new one started. */
    public void choose(SourceChoice c) {
        boolean wasRunning = running.get();
        if (wasRunning) {
            stop();
        }
        choice.set(c);
        if (wasRunning) {
            start();
        }
    }

    /** Starts the chosen source (no-op while running). Failures show in the status and the message. */
    public void start() {
        if (running.get()) {
            return;
        }
        SourceChoice c = choice.get();
        BenchSource s;
        try {
            s = services.sources().open(c);
        } catch (BadInputException e) {
            status.set(SourceStatus.idle().withState(ConnectionState.FAILED, e.getMessage()));
            message.set("cannot start the " + c.kind().words() + ": " + e.getMessage());
            return;
        }
        if (s.design() != null && (design.design() == null || design.design() == sourceDesign)) {
            // Compare with the simulated board's design, unless the user has loaded or edited one.
            sourceDesign = s.design();
            design.use(sourceDesign);
        }
        LivePipeline p = new LivePipeline(0, publishNanos);
        p.setRollingCycles(rollingFor(averaging.get()));
        pipeline = p;
        source = s;
        frame.set(null);
        diagnosis.clear();
        readoutDirty = true;
        running.set(true);
        message.set("");
        s.start(p);
    }

    /** Stops the source (and a recording); the last readings stay on screen. */
    public void stop() {
        stopRecording();
        BenchSource s = source;
        source = null;
        if (s != null) {
            s.stop();
        }
        running.set(false);
        if (pipeline != null) {
            status.set(pipeline.latestStatus());
        }
    }

    public void toggleRunning() {
        if (running.get()) {
            stop();
        } else {
            start();
        }
    }

    /** Sets the averaging window: cycles from {@link #AVERAGING_CHOICES}, or {@link ReadingsModel#WHOLE_RUN}. */
    public void setAveraging(int cycles) {
        if (!AVERAGING_CHOICES.contains(cycles)) {
            throw new IllegalArgumentException("averaging not one of " + AVERAGING_CHOICES + ": " + cycles);
        }
        averaging.set(cycles);
        if (pipeline != null) {
            pipeline.setRollingCycles(rollingFor(cycles));
        }
        readoutDirty = true;
    }

    /** Loads a design file; a bad one shows its problem and changes nothing else. */
    public void loadDesign(Path file) {
        design.load(file);
        if (!design.problemProperty().get().isEmpty()) {
            message.set(design.problemProperty().get());
        }
    }

    /** Saves the design in use (with its edits) to {@code file}. */
    public void saveDesign(Path file) {
        try {
            design.save(file);
            message.set("design saved to " + file);
        } catch (BadInputException e) {
            message.set("design not saved: " + e.getMessage());
        }
    }

    /** Starts recording every edge to {@code file} (which must not exist). */
    public void startRecording(Path file) {
        recording.start(running.get() ? pipeline : null, file, status.get().probeId());
    }

    /** Stops the recording; the file is complete and closed when this returns. */
    public void stopRecording() {
        recording.stop(pipeline);
    }

    /** Starts recording to {@code file} or stops the running recording. */
    public void toggleRecording(Path file) {
        if (recording.recordingProperty().get()) {
            stopRecording();
        } else {
            startRecording(file);
        }
    }

    /** The file recorded last (or being recorded), or null. */
    public Path lastRecording() {
        return recording.lastFile();
    }

    /** Saves the current check to the history (on the worker), when this build has one. */
    public void saveCheck() {
        if (services.checks() == null) {
            message.set("saving checks needs a history, which this window was not given");
            return;
        }
        LiveFrame f = frame.get();
        if (design.design() == null || f == null || f.measurement().cycles() == 0) {
            message.set("a check needs a design and a measurement");
            return;
        }
        CheckSaver.Request r = new CheckSaver.Request(design.design(), f, lastRecording(), status.get().probeId());
        if (saving.offer(() -> services.checks().save(r))) {
            message.set("saving the check…");
        }
    }

    /** The user has read the safety notice. */
    public void acceptSafetyNotice() {
        settings.acceptSafetyNotice();
        safetyNoticeDue.set(false);
    }

    /** Shows a message from the view (e.g. where a picture was saved). */
    public void tell(String text) {
        message.set(text);
    }

    /**
     * Takes the newest status and frame, refreshes the readouts when due, and starts background
     * work; call once per frame with {@link System#nanoTime()}.
     */
    public void poll(long nowNanos) {
        LivePipeline p = pipeline;
        if (p != null) {
            SourceStatus s = p.latestStatus();
            if (s != status.get() && (source != null || !s.state().isLive())) {
                status.set(s);
                if (!s.state().isLive() && s.state() != ConnectionState.IDLE) {
                    recording.refresh(p);
                    running.set(false);
                }
            }
            LiveFrame f = p.latestFrame();
            if (f != null && f != frame.get()) {
                frame.set(f);
                readoutDirty = true;
            }
        }
        design.poll();
        if (design.expectation() != shownExpectation) {
            shownExpectation = design.expectation();
            readoutDirty = true;
        }
        diagnosis.poll();
        tuning.poll();
        picker.poll();
        BackgroundSlot.Outcome<String> saved = saving.take();
        if (saved != null) {
            message.set(saved.value() != null ? saved.value() : "check not saved: " + saved.problem());
        }
        if (readoutDirty && nowNanos - lastReadout >= READOUT_NANOS) {
            readings.update(frame.get(), shownExpectation, averaging.get());
            readoutDirty = false;
            lastReadout = nowNanos;
            recording.refresh(p);
        }
        signalNote.set(quietNote(nowNanos));
        diagnosis.maybeRun(nowNanos, design.design(), frame.get(), averaging.get());
        tuning.maybeRun(nowNanos, design.design(), frame.get());
    }

    /** The running pipeline, or null before the first start (for benchmarks and tests). */
    public LivePipeline pipeline() {
        return pipeline;
    }

    /** Stops the source and any recording. */
    @Override
    public void close() {
        stop();
    }

    // ---- internals -----------------------------------------------------------------------------

    private void designChanged(Design d) {
        readings.build(d == null ? null : d.circuit().topology());
        tuning.designChanged(d);
        diagnosis.clear();
        readoutDirty = true;
    }

    private String quietNote(long now) {
        LiveFrame f = frame.get();
        if (!running.get() || f == null || f.ended() || status.get().state() != ConnectionState.STREAMING) {
            return "";
        }
        double period = f.measurement().period().meanSeconds();
        double limit = Math.max(1.0, Double.isFinite(period) ? 4 * period : 0);
        double quiet = (now - f.builtNanos()) * 1e-9;
        return quiet > limit ? String.format(Locale.ROOT, "no edge for %.1f s", quiet) : "";
    }

    private static int rollingFor(int averagingCycles) {
        return averagingCycles == ReadingsModel.WHOLE_RUN ? 256 : averagingCycles;
    }
}
