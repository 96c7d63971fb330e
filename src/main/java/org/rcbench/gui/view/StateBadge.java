package org.rcbench.gui.view;

import java.util.Locale;
import javafx.beans.value.ObservableValue;
import javafx.geometry.Pos;
import javafx.scene.control.Label;
import javafx.scene.layout.HBox;
import javafx.scene.layout.StackPane;
import org.rcbench.gui.ReadingState;

/** A reading's state as a shape, a word and a colour, following an observable state. */
final class StateBadge extends HBox {
    private final StackPane mark = new StackPane();
    private final Label word = new Label();

    StateBadge(ObservableValue<ReadingState> state, double size) {
        super(6);
        setAlignment(Pos.CENTER_LEFT);
        getStyleClass().add("state-badge");
        mark.setMinSize(size, size);
        mark.setPrefSize(size, size);
        getChildren().addAll(mark, word);
        show(state.getValue(), size);
        state.addListener((o, was, now) -> show(now, size));
    }

    private void show(ReadingState s, double size) {
        mark.getChildren().setAll(Marks.of(s, size));
        word.setText(s.words().toUpperCase(Locale.ROOT));
        word.setTextFill(Palette.of(s).darker());
        setAccessibleText(s.words());
    }
}
