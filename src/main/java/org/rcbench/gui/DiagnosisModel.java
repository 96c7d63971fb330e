package org.rcbench.gui;

import java.util.List;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.rcbench.design.Design;

/**
 * The suspects panel: the verdict, the ranked suspects with estimates and intervals, what the data
 * cannot separate and what would separate it. Re-solved a few times a second while data arrives.
 * Window thread only; the solving runs on the worker.
 */
public final class DiagnosisModel {
    /** Time between diagnoses of a live signal. */
    static final long INTERVAL_NANOS = 250_000_000L;
    /** Cycles needed before a diagnosis is attempted. */
    static final long MIN_CYCLES = 32;

    private final DiagnosisSource source;
    private final BackgroundSlot<Findings> slot;
    private final ReadOnlyBooleanWrapper available = new ReadOnlyBooleanWrapper(this, "available");
    private final ReadOnlyStringWrapper verdict = new ReadOnlyStringWrapper(this, "verdict", "");
    private final ReadOnlyStringWrapper ambiguity = new ReadOnlyStringWrapper(this, "ambiguity", "");
    private final ReadOnlyStringWrapper resolvers = new ReadOnlyStringWrapper(this, "resolvers", "");
    private final ReadOnlyStringWrapper note = new ReadOnlyStringWrapper(this, "note", "");
    private final ObservableList<Suspect> suspects = FXCollections.observableArrayList();
    private final ObservableList<Suspect> suspectsView = FXCollections.unmodifiableObservableList(suspects);
    private long lastRun = Long.MIN_VALUE / 2;
    private long lastSerial = -1;

    /** @param source the diagnosis, or null when this build has none */
    DiagnosisModel(DiagnosisSource source, java.util.concurrent.Executor worker) {
        this.source = source;
        this.slot = new BackgroundSlot<>(worker);
        available.set(source != null);
        note.set(source == null ? "naming suspects needs the diagnosis stage, which this window was not given" : "");
    }

    public ReadOnlyBooleanProperty availableProperty() {
        return available.getReadOnlyProperty();
    }

    /** Overall verdict in words; "" before the first diagnosis. */
    public ReadOnlyStringProperty verdictProperty() {
        return verdict.getReadOnlyProperty();
    }

    /** What the measurements cannot tell apart, in plain words; "" when nothing is ambiguous. */
    public ReadOnlyStringProperty ambiguityProperty() {
        return ambiguity.getReadOnlyProperty();
    }

    /** The extra measurement that would resolve the ambiguity; "" when none is needed. */
    public ReadOnlyStringProperty resolversProperty() {
        return resolvers.getReadOnlyProperty();
    }

    /** Why there is nothing to show (no design, too few cycles, ...), or "". */
    public ReadOnlyStringProperty noteProperty() {
        return note.getReadOnlyProperty();
    }

    /** Ranked suspects, most probable first. */
    public ObservableList<Suspect> suspects() {
        return suspectsView;
    }

    /** Starts a diagnosis of {@code frame} against {@code design} when one is due. */
    void maybeRun(long now, Design design, LiveFrame frame, int averaging) {
        if (source == null) {
            return;
        }
        if (design == null) {
            note.set("load a design to name suspects");
            return;
        }
        if (!design.circuit().topology().isFreeRunning()
                && design.circuit().topology() != org.rcbench.circuit.Topology.MONOSTABLE) {
            note.set("a " + design.circuit().topology().fileName() + " has no timing to back-solve");
            return;
        }
        if (frame == null || frame.measurement().cycles() < MIN_CYCLES) {
            note.set("waiting for " + MIN_CYCLES + " cycles");
            return;
        }
        if (frame.serial() == lastSerial || now - lastRun < INTERVAL_NANOS) {
            return;
        }
        Observed o = Observed.of(frame, averaging);
        if (slot.offer(() -> source.diagnose(design, o))) {
            lastRun = now;
            lastSerial = frame.serial();
        }
    }

    /** Applies a finished diagnosis. */
    void poll() {
        BackgroundSlot.Outcome<Findings> o = slot.take();
        if (o == null) {
            return;
        }
        if (o.value() == null) {
            note.set("cannot diagnose: " + o.problem());
            return;
        }
        Findings f = o.value();
        note.set("");
        verdict.set(f.verdict());
        if (!suspects.equals(f.suspects())) {
            suspects.setAll(f.suspects());
        }
        ambiguity.set(String.join(" ", f.ambiguities()));
        resolvers.set(String.join(" ", f.resolvers()));
    }

    /** Clears the panel (a new design or a new source). */
    void clear() {
        verdict.set("");
        suspects.setAll(List.of());
        ambiguity.set("");
        resolvers.set("");
        lastSerial = -1;
    }
}
