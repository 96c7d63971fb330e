package org.rcbench.gui.view;

import javafx.scene.control.Label;
import javafx.scene.layout.VBox;
import org.rcbench.gui.Reading;

/** One large reading: name, value, uncertainty or window, expected value, band, deviation, state. */
final class ReadingTile extends VBox {
    ReadingTile(Reading r) {
        super(2);
        getStyleClass().add("reading-tile");
        setId("reading-" + r.quantity().jsonKey());
        Label name = new Label(r.label());
        name.getStyleClass().add("reading-name");
        Label value = new Label();
        value.getStyleClass().add("reading-value");
        value.textProperty().bind(r.valueProperty());
        value.setId("value-" + r.quantity().jsonKey());
        Label detail = small(r, "reading-detail");
        detail.textProperty().bind(r.detailProperty());
        Label expected = small(r, "reading-expected");
        expected.textProperty().bind(javafx.beans.binding.Bindings.createStringBinding(
                () -> r.expectedProperty().get() + (r.deviationProperty().get().isEmpty() ? ""
                        : " (" + r.deviationProperty().get() + ")"),
                r.expectedProperty(), r.deviationProperty()));
        Label band = small(r, "reading-band");
        band.textProperty().bind(r.bandProperty());
        StateBadge badge = new StateBadge(r.stateProperty(), 16);
        badge.setId("state-" + r.quantity().jsonKey());
        getChildren().addAll(name, value, detail, expected, band, badge);
    }

    private static Label small(Reading r, String style) {
        Label l = new Label();
        l.getStyleClass().add(style);
        l.setWrapText(true);
        return l;
    }
}
