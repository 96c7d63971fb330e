package org.rcbench.gui.view;

import javafx.geometry.Insets;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.layout.VBox;
import javafx.stage.Modality;
import javafx.stage.Window;
import org.rcbench.gui.BenchModel;
import org.rcbench.gui.SafetyNotice;

/** The safety notice as a dialog: on first start, and from the help menu. */
final class SafetyDialog {
    private SafetyDialog() {
    }

    /** Shows the notice without blocking; closing it counts as having read it. */
    static Dialog<ButtonType> show(Window owner, BenchModel model) {
        Dialog<ButtonType> d = new Dialog<>();
        d.initOwner(owner);
        d.initModality(Modality.WINDOW_MODAL);
        d.setTitle(SafetyNotice.TITLE);
        d.setHeaderText(SafetyNotice.TITLE);
        VBox body = new VBox(10);
        body.setPadding(new Insets(4, 8, 4, 8));
        body.setPrefWidth(520);
        for (String p : SafetyNotice.PARAGRAPHS) {
            Label l = new Label("• " + p);
            l.setWrapText(true);
            body.getChildren().add(l);
        }
        d.getDialogPane().setContent(body);
        d.getDialogPane().setId("safety-notice");
        ButtonType ok = new ButtonType("I have read this", ButtonBar.ButtonData.OK_DONE);
        d.getDialogPane().getButtonTypes().add(ok);
        d.setOnHidden(e -> model.acceptSafetyNotice());
        d.show();
        return d;
    }
}
