package org.armature.ui;

import java.util.List;

import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.layout.VBox;
import org.armature.model.Finding;
import org.kordamp.ikonli.javafx.FontIcon;

/**
 * The verdicts list: for now the stage's validation findings; check verdicts join it when the
 * analysis is wired. Each line shows its severity as an icon and the finding's sentence.
 */
public final class FindingsPane extends VBox {

    private final ListView<Finding> list = new ListView<>();
    private final Label empty = new Label("No findings: the drawing is complete and every value is in range.");

    /** A list following the view model's findings. */
    public FindingsPane(EditorViewModel vm) {
        getStyleClass().add("findings");
        empty.setWrapText(true);
        empty.getStyleClass().add("sheet-description");
        list.setPlaceholder(empty);
        list.setPrefHeight(220);
        list.setCellFactory(v -> new ListCell<>() {
            @Override
            protected void updateItem(Finding f, boolean isEmpty) {
                super.updateItem(f, isEmpty);
                if (isEmpty || f == null) {
                    setText(null);
                    setGraphic(null);
                    return;
                }
                setText(f.message());
                setWrapText(true);
                setPrefWidth(0);
                FontIcon icon = new FontIcon(switch (f.severity()) {
                    case ERROR -> "mdi2a-alert-octagon";
                    case WARNING -> "mdi2a-alert";
                    case INFO -> "mdi2i-information-outline";
                });
                icon.getStyleClass().add("severity-" + f.severity().name().toLowerCase(java.util.Locale.ROOT));
                setGraphic(icon);
            }
        });
        list.getItems().setAll(vm.evaluation().findings());
        vm.evaluationProperty().addListener((o, a, b) -> {
            // a pending evaluation lacks the solver's findings: wait for them rather than flicker
            if (!b.readoutsReady()) {
                return;
            }
            List<Finding> f = b.findings();
            if (!f.equals(list.getItems())) {
                list.getItems().setAll(f);
            }
        });
        getChildren().add(list);
    }

    /** The list (tests). */
    public ListView<Finding> list() {
        return list;
    }
}
