package org.armature.ui;

import java.util.Locale;
import javafx.geometry.Insets;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import org.armature.analysis.BaseNetworkSizing;
import org.armature.analysis.SizingResult;
import org.armature.analysis.SizingStep;
import org.armature.analysis.Suggestion;
import org.armature.model.Finding;
import org.armature.model.Stage;
import org.armature.render.Notation;

/**
 * Tools ▸ Size base network…: the sizing assistant's calculation chain, step by step as an engineer
 * writes it, and the preferred values it proposes. "Apply" writes every proposal back as one
 * undoable edit ({@link EditorViewModel#applySuggestions}).
 */
public final class SizingDialog {

    /** The Apply button. */
    public static final ButtonType APPLY = new ButtonType("Apply", ButtonBar.ButtonData.OK_DONE);

    private SizingDialog() {
    }

    /** The calculation of a stage (pure; the dialog shows it). */
    public static SizingResult size(Stage stage) {
        return BaseNetworkSizing.size(stage);
    }

    /** A dialog for the present stage; Apply applies the proposals. */
    public static Dialog<ButtonType> dialog(EditorViewModel vm) {
        SizingResult r = size(vm.stage());
        Dialog<ButtonType> d = new Dialog<>();
        d.setTitle("Size base network");
        d.setHeaderText(r.topology().map(t -> "Drive network of the " + t.toString().toLowerCase(Locale.ROOT)
                .replace('_', ' ') + " stage").orElse("The stage was not recognised"));
        GridPane steps = new GridPane();
        steps.setHgap(12);
        steps.setVgap(4);
        steps.setId("sizing-steps");
        int row = 0;
        for (SizingStep s : r.steps()) {
            Label label = new Label(s.label());
            label.getStyleClass().add("param-label");
            Label formula = new Label(s.formula());
            formula.getStyleClass().add("sheet-description");
            formula.setWrapText(true);
            formula.setMaxWidth(430);
            Label value = new Label(s.formattedValue());
            value.getStyleClass().add("reading");
            steps.addRow(row++, label, formula, value);
        }
        VBox proposals = new VBox(4);
        proposals.setId("sizing-proposals");
        Label ph = new Label("Proposed preferred values");
        ph.getStyleClass().add("sheet-title");
        proposals.getChildren().add(ph);
        for (Suggestion s : r.suggestions()) {
            String unit = s.paramKey().endsWith("Ohms") ? "Ω" : "";
            Label l = new Label(s.ref() + " (" + s.role() + "): " + Notation.format(s.value(), unit) + " ±"
                    + String.format(Locale.ROOT, "%.3g", s.tolerancePercent()) + " %  — " + s.rule());
            l.setWrapText(true);
            proposals.getChildren().add(l);
        }
        for (Finding f : r.findings()) {
            Label l = new Label(f.message());
            l.setWrapText(true);
            l.getStyleClass().add("severity-" + f.severity().name().toLowerCase(Locale.ROOT));
            proposals.getChildren().add(l);
        }
        ScrollPane scroll = new ScrollPane(steps);
        scroll.setFitToWidth(true);
        scroll.setPrefViewportHeight(380);
        VBox content = new VBox(10, scroll, proposals);
        content.setPadding(new Insets(8));
        content.setPrefWidth(820);
        d.getDialogPane().setContent(content);
        d.getDialogPane().getButtonTypes().addAll(ButtonType.CANCEL, APPLY);
        d.getDialogPane().lookupButton(APPLY).setDisable(r.suggestions().isEmpty());
        d.setResultConverter(b -> {
            if (b == APPLY) {
                vm.applySuggestions(r.suggestions());
            }
            return b;
        });
        return d;
    }
}
