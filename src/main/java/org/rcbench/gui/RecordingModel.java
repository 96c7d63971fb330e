package org.rcbench.gui;

import java.nio.file.Path;
import java.util.Locale;
import java.util.function.Consumer;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import org.rcbench.common.BadInputException;
import org.rcbench.record.RecorderOptions;

/**
 * Recording the live edges to a capture file: whether a recording runs, its indicator text, and
 * the file recorded last. The pipeline writes the edges on the source's thread; this follows it on
 * the window's thread and notices when the recording ends by itself (the source ended, the disk
 * filled). Window thread only.
 */
public final class RecordingModel {
    private final Consumer<String> tell;
    private final ReadOnlyBooleanWrapper recording = new ReadOnlyBooleanWrapper(this, "recording");
    private final ReadOnlyStringWrapper text = new ReadOnlyStringWrapper(this, "text", "");
    private Path file;
    private Path last;

    /** @param tell shows a message to the user */
    RecordingModel(Consumer<String> tell) {
        this.tell = tell;
    }

    public ReadOnlyBooleanProperty recordingProperty() {
        return recording.getReadOnlyProperty();
    }

    /** {@code REC piper.rce — 12,345 edges} while recording, else "". */
    public ReadOnlyStringProperty textProperty() {
        return text.getReadOnlyProperty();
    }

    /** The file recorded last (or being recorded), or null. */
    public Path lastFile() {
        return recording.get() ? file : last;
    }

    void start(LivePipeline p, Path target, String probeId) {
        if (recording.get()) {
            return;
        }
        if (p == null) {
            tell.accept("start a source before recording");
            return;
        }
        try {
            p.startRecording(target, RecorderOptions.defaults(), probeId);
        } catch (BadInputException e) {
            tell.accept("not recording: " + e.getMessage());
            return;
        }
        file = target;
        recording.set(true);
        text.set("REC " + target.getFileName() + " — 0 edges");
        tell.accept("recording to " + target);
    }

    void stop(LivePipeline p) {
        if (!recording.get()) {
            return;
        }
        long edges = p.stopRecording();
        finish(edges < 0 ? "recording ended" : "recorded " + edges + " edges to " + file);
    }

    /** Follows the pipeline's recorder: the edge count, or the end when it stopped by itself. */
    void refresh(LivePipeline p) {
        if (!recording.get() || p == null) {
            return;
        }
        long edges = p.recordedEdges();
        if (edges < 0) {
            String problem = p.recordingProblem();
            finish(problem.isEmpty() ? "recording ended with the source" : "recording stopped: " + problem);
            return;
        }
        text.set(String.format(Locale.ROOT, "REC %s — %,d edges", file.getFileName(), edges));
    }

    private void finish(String message) {
        recording.set(false);
        text.set("");
        last = file;
        tell.accept(message);
    }
}
