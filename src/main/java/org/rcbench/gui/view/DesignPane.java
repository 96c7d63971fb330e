package org.rcbench.gui.view;

import java.io.File;
import java.util.ArrayList;
import java.util.List;
import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import javafx.stage.FileChooser;
import org.rcbench.circuit.PartKind;
import org.rcbench.circuit.TimingQuantity;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.DesignModel;
import org.rcbench.gui.Expectation;
import org.rcbench.gui.Expected;
import org.rcbench.gui.Formats;
import org.rcbench.gui.PartRow;

/**
 * The board design: its title, the parts table (designator, role, kind, value, tolerance, wiper;
 * every typed character re-predicts), the problem line, and what the design should read.
 */
final class DesignPane extends VBox {
    private final BenchModel model;
    private final GridPane table = new GridPane();

    DesignPane(BenchModel model) {
        super(8);
        this.model = model;
        getStyleClass().add("design-pane");
        setPadding(new Insets(10));
        setPrefWidth(436);

        Label heading = new Label("Board design");
        heading.getStyleClass().add("pane-heading");
        Label title = new Label();
        title.setId("design-title");
        title.setWrapText(true);
        title.textProperty().bind(model.design().titleProperty());
        Button open = new Button("Open design…");
        open.setId("open-design");
        open.setOnAction(e -> openDesign());
        Button pick = new Button("Find parts…");
        pick.setId("find-parts");
        pick.disableProperty().bind(model.design().designProperty().isNull());
        pick.setOnAction(e -> PickerDialog.show(getScene().getWindow(), model));
        Button save = new Button("Save as…");
        save.setId("save-design");
        save.disableProperty().bind(model.design().designProperty().isNull());
        save.setOnAction(e -> {
            FileChooser chooser = new FileChooser();
            chooser.setTitle("Save the design");
            chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("rcbench designs", "*.toml"));
            File f = chooser.showSaveDialog(getScene().getWindow());
            if (f != null) {
                model.saveDesign(f.toPath());
            }
        });
        HBox buttons = new HBox(8, open, pick, save);

        table.setId("parts-table");
        table.setHgap(4);
        table.setVgap(4);
        table.getStyleClass().add("parts-table");
        double[] widths = {34, 88, 112, 66, 50, 44};
        for (double w : widths) {
            javafx.scene.layout.ColumnConstraints c = new javafx.scene.layout.ColumnConstraints();
            c.setMinWidth(w);
            c.setPrefWidth(w);
            table.getColumnConstraints().add(c);
        }
        model.design().parts().addListener((ListChangeListener<PartRow>) c -> rebuild());
        rebuild();

        Label problem = new Label();
        problem.setId("design-problem");
        problem.getStyleClass().add("problem");
        problem.setWrapText(true);
        problem.textProperty().bind(model.design().problemProperty());
        problem.visibleProperty().bind(problem.textProperty().isNotEmpty());
        problem.managedProperty().bind(problem.visibleProperty());

        Label expected = new Label();
        expected.setId("design-expected");
        expected.setWrapText(true);
        expected.getStyleClass().add("design-expected");
        model.design().expectationProperty().addListener((o, was, now) -> expected.setText(summary(now)));

        getChildren().addAll(heading, title, buttons, table, problem, expected);
    }

    private void openDesign() {
        FileChooser chooser = new FileChooser();
        chooser.setTitle("Open a board design");
        chooser.getExtensionFilters().add(new FileChooser.ExtensionFilter("rcbench designs", "*.toml"));
        File f = chooser.showOpenDialog(getScene() == null ? null : getScene().getWindow());
        if (f != null) {
            model.loadDesign(f.toPath());
        }
    }

    private void rebuild() {
        table.getChildren().clear();
        String[] heads = {"Part", "Role", "Kind", "Value", "Tol.", "Wiper"};
        for (int c = 0; c < heads.length; c++) {
            Label h = new Label(heads[c]);
            h.getStyleClass().add("table-head");
            table.add(h, c, 0);
        }
        int r = 1;
        for (PartRow row : model.design().parts()) {
            table.add(new Label(row.designator()), 0, r);
            table.add(new Label(row.role()), 1, r);
            table.add(kindBox(row), 2, r);
            table.add(field(row, DesignModel.Field.VALUE, row.valueProperty().get(), 7), 3, r);
            table.add(field(row, DesignModel.Field.TOLERANCE, row.toleranceProperty().get(), 6), 4, r);
            if (row.hasWiper()) {
                table.add(field(row, DesignModel.Field.WIPER, row.wiperProperty().get(), 4), 5, r);
            }
            r++;
        }
    }

    private TextField field(PartRow row, DesignModel.Field f, String text, int columns) {
        TextField t = new TextField(text);
        t.setId(f.name().toLowerCase(java.util.Locale.ROOT) + "-" + row.designator());
        t.setPrefColumnCount(columns);
        t.setMaxWidth(Double.MAX_VALUE);
        t.textProperty().addListener((o, was, now) -> model.design().edit(row.designator(), f, now));
        Tooltip tip = new Tooltip();
        tip.textProperty().bind(row.problemProperty());
        row.problemProperty().addListener((o, was, now) -> {
            t.pseudoClassStateChanged(javafx.css.PseudoClass.getPseudoClass("bad"), !now.isEmpty());
            t.setTooltip(now.isEmpty() ? null : tip);
        });
        return t;
    }

    private ComboBox<String> kindBox(PartRow row) {
        List<String> kinds = new ArrayList<>();
        for (PartKind k : PartKind.values()) {
            if (k == PartKind.UNSPECIFIED || k.fits(row.type())) {
                kinds.add(k.fileName());
            }
        }
        ComboBox<String> box = new ComboBox<>(javafx.collections.FXCollections.observableArrayList(kinds));
        box.setId("kind-" + row.designator());
        box.setValue(row.kindProperty().get());
        box.setMaxWidth(Double.MAX_VALUE);
        box.valueProperty().addListener((o, was, now) -> {
            if (now != null) {
                model.design().edit(row.designator(), DesignModel.Field.KIND, now);
            }
        });
        return box;
    }

    /** {@code Should read 688.9 Hz, duty 52.4 % (nominal values only, no bands)}. */
    static String summary(Expectation e) {
        if (e == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder();
        if (!e.runs()) {
            sb.append("Does not run: ").append(e.reason()).append(". ");
        }
        List<String> parts = new ArrayList<>();
        for (TimingQuantity q : List.of(TimingQuantity.FREQUENCY, TimingQuantity.DUTY, TimingQuantity.PULSE_WIDTH)) {
            Expected x = e.of(q);
            if (x != null && Double.isFinite(x.nominal())) {
                parts.add(q.name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ') + " "
                        + Formats.shortValue(q, x.nominal()));
            }
        }
        if (!parts.isEmpty()) {
            sb.append("Should read ").append(String.join(", ", parts)).append(" (").append(e.basis()).append(").");
        }
        for (String w : e.warnings()) {
            sb.append("\n• ").append(w);
        }
        return sb.toString();
    }
}
