package org.rcbench.gui;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.rcbench.circuit.CircuitSpec;
import org.rcbench.circuit.Element;
import org.rcbench.circuit.PartKind;
import org.rcbench.common.BadInputException;
import org.rcbench.design.Design;
import org.rcbench.design.DesignReader;
import org.rcbench.design.PartSpread;
import org.rcbench.units.CodedValue;
import org.rcbench.units.Tolerance;
import org.rcbench.units.ValueCode;

/**
 * The board design beside the readings: loaded from a file, edited in the parts table, and turned
 * into an {@link Expectation} off the window's thread after every change (the newest change wins;
 * older results are dropped). A design that does not load, or a value that does not read, shows
 * its one-line problem and leaves the current design (and the running source) as they are.
 * Window thread only, except the expectation work, which runs on the given executor.
 */
public final class DesignModel {
    /** The editable columns of the parts table. */
    public enum Field { VALUE, TOLERANCE, WIPER, KIND }

    private final ExpectationSource expectations;
    private final Executor worker;
    private final ReadOnlyObjectWrapper<Design> design = new ReadOnlyObjectWrapper<>(this, "design");
    private final ReadOnlyObjectWrapper<Expectation> expectation = new ReadOnlyObjectWrapper<>(this, "expectation");
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper(this, "problem", "");
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "no design loaded");
    private final ObservableList<PartRow> parts = FXCollections.observableArrayList();
    private final ObservableList<PartRow> partsView = FXCollections.unmodifiableObservableList(parts);
    private final AtomicLong version = new AtomicLong();
    private final AtomicReference<Result> result = new AtomicReference<>();
    private boolean edited;

    private record Result(long version, Expectation expectation, String problem) {
    }

    DesignModel(ExpectationSource expectations, Executor worker) {
        this.expectations = expectations;
        this.worker = worker;
    }

    /** The design in use (with every accepted edit), or null before one is loaded. */
    public ReadOnlyObjectProperty<Design> designProperty() {
        return design.getReadOnlyProperty();
    }

    /** What the design in use should do; null until computed, or when it cannot be. */
    public ReadOnlyObjectProperty<Expectation> expectationProperty() {
        return expectation.getReadOnlyProperty();
    }

    /** The latest problem (a design that did not load, a value that did not read), or "". */
    public ReadOnlyStringProperty problemProperty() {
        return problem.getReadOnlyProperty();
    }

    /** {@code Piper Mk2 (captures/piper-mk2.toml), astable, bipolar, 9 V}; marked when edited. */
    public ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    public ObservableList<PartRow> parts() {
        return partsView;
    }

    public Design design() {
        return design.get();
    }

    public Expectation expectation() {
        return expectation.get();
    }

    /** Loads {@code file}; on failure shows the problem and keeps the current design. */
    public void load(Path file) {
        try {
            use(DesignReader.read(file));
        } catch (BadInputException e) {
            problem.set("design not loaded: " + e.getMessage());
        }
    }

    /**
     * Writes the design in use, with every edit, to {@code file} as a design file.
     *
     * @throws BadInputException naming the file when it cannot be written
     */
    public void save(Path file) {
        Design d = design.get();
        if (d == null) {
            throw new BadInputException(file.toString(), "no design to save");
        }
        try {
            java.nio.file.Files.writeString(file, org.rcbench.design.DesignText.toToml(d),
                    java.nio.charset.StandardCharsets.UTF_8);
        } catch (java.io.IOException e) {
            throw new BadInputException(file.toString(), "cannot write: " + e.getMessage(), e);
        }
    }

    /** Uses {@code d} as loaded (not edited). */
    public void use(Design d) {
        edited = false;
        problem.set("");
        setDesign(d);
        List<PartRow> rows = new ArrayList<>();
        for (Element e : d.circuit().elements()) {
            rows.add(new PartRow(d, e));
        }
        parts.setAll(rows);
    }

    /**
     * The user typed {@code text} into {@code field} of part {@code designator}. When it reads, the
     * design changes and a new expectation is computed; otherwise the row shows why and the design
     * stays as it was.
     */
    public void edit(String designator, Field field, String text) {
        Design d = design.get();
        PartRow row = row(designator);
        if (d == null || row == null) {
            throw new IllegalArgumentException("no part " + designator);
        }
        row.setText(field, text);
        try {
            Design changed = apply(d, d.part(designator), field, text.strip());
            row.setProblem("");
            problem.set("");
            edited = true;
            setDesign(changed);
        } catch (BadInputException | IllegalArgumentException e) {
            String why = e.getMessage();
            row.setProblem(why);
            problem.set(designator + " " + field.name().toLowerCase(java.util.Locale.ROOT) + ": " + why);
        }
    }

    /** Marks the design in use as changed from its file (after taking a picked part set). */
    void markEdited() {
        edited = true;
        setDesign(design.get());
    }

    /** Applies a finished expectation run; call once per frame on the window's thread. */
    void poll() {
        Result r = result.getAndSet(null);
        if (r == null || r.version() != version.get()) {
            return;
        }
        expectation.set(r.expectation());
        if (!r.problem().isEmpty()) {
            problem.set(r.problem());
        }
    }

    private static Design apply(Design d, Element e, Field field, String text) {
        switch (field) {
            case VALUE: {
                CodedValue cv = ValueCode.parse(text, e.type().unit());
                if (!(cv.value() > 0)) {
                    throw new BadInputException("", "\"" + text + "\" must be above zero");
                }
                return d.withValue(e.designator(), cv.value());
            }
            case TOLERANCE: {
                Tolerance t = text.isEmpty() ? Tolerance.NONE : Tolerance.parse(text);
                PartSpread old = d.spread(e.designator());
                Map<String, PartSpread> spreads = new HashMap<>(d.spreads());
                spreads.put(e.designator(), new PartSpread(t, old.distribution(), old.tempco()));
                return new Design(d.source(), d.boardName(), d.revision(), d.notes(), d.circuit(), spreads,
                        d.supplyTolerance(), d.ambient());
            }
            case WIPER: {
                double w = ValueCode.parseValue(text, org.rcbench.units.Unit.NONE);
                if (!(w >= 0 && w <= 1)) {
                    throw new BadInputException("", "a wiper position lies from 0 to 1, not \"" + text + "\"");
                }
                return replace(d, e.withWiper(w));
            }
            case KIND: {
                PartKind k = PartKind.fromFileName(text);
                if (k == null) {
                    throw new BadInputException("", "unknown kind \"" + text + "\" (one of " + PartKind.spellings() + ")");
                }
                if (!k.fits(e.type())) {
                    throw new BadInputException("", "\"" + text + "\" is not a kind of "
                            + e.type().name().toLowerCase(java.util.Locale.ROOT));
                }
                return replace(d, e.withKind(k));
            }
            default:
                throw new IllegalArgumentException(field.name());
        }
    }

    private static Design replace(Design d, Element changed) {
        List<Element> out = new ArrayList<>();
        for (Element e : d.circuit().elements()) {
            out.add(e.designator().equals(changed.designator()) ? changed : e);
        }
        CircuitSpec c = d.circuit().withElements(out);
        return d.withCircuit(c);
    }

    private PartRow row(String designator) {
        for (PartRow r : parts) {
            if (r.designator().equals(designator)) {
                return r;
            }
        }
        return null;
    }

    private void setDesign(Design d) {
        design.set(d);
        CircuitSpec c = d.circuit();
        title.set(d.title() + (edited ? " (edited)" : "") + " — " + c.topology().fileName() + ", "
                + c.family().name().toLowerCase(java.util.Locale.ROOT) + ", "
                + ValueCode.formatSi(c.supplyVolts(), org.rcbench.units.Unit.VOLT, 3));
        long v = version.incrementAndGet();
        worker.execute(() -> {
            if (version.get() != v) {
                return; // a newer edit is already queued
            }
            try {
                result.set(new Result(v, expectations.expect(d), ""));
            } catch (BadInputException | IllegalArgumentException e) {
                result.set(new Result(v, null, "cannot predict " + d.title() + ": " + e.getMessage()));
            }
        });
    }
}
