package org.armature.ui;

import java.util.List;
import javafx.event.ActionEvent;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.stage.Window;
import org.armature.model.ParamKeys;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.render.Notation;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * Tools ▸ What if: another resistor value…: one of the active stage's resistors and a new value; OK
 * adds the copy with that value to the line-up ({@link EditorViewModel#whatIfValue}) and the caller
 * opens the line-up view. A value that does not parse or is out of the resistor's range is said in
 * the dialog and nothing is added.
 */
final class WhatIfValueDialog {

    private WhatIfValueDialog() {
    }

    /** Shows the dialog and, when a copy was added, runs {@code then} (opening the line-up view). */
    static void show(EditorViewModel vm, Window owner, Runnable then) {
        Dialog<ButtonType> d = dialog(vm);
        if (owner != null) {
            d.initOwner(owner);
        }
        if (d.showAndWait().filter(b -> b == ButtonType.OK).isPresent()) {
            then.run();
        }
    }

    /** The dialog for the active stage; a note and Close only when the stage has no resistor. */
    static Dialog<ButtonType> dialog(EditorViewModel vm) {
        List<Part> resistors = vm.stage().parts().stream().filter(p -> p.kind() == PartKind.RESISTOR).toList();
        Dialog<ButtonType> d = new Dialog<>();
        d.setTitle("What if: another resistor value");
        if (resistors.isEmpty()) {
            d.setHeaderText("The stage has no resistor to try another value of.");
            d.getDialogPane().getButtonTypes().add(ButtonType.CLOSE);
            return d;
        }
        d.setHeaderText("A copy of \u201c" + vm.stage().name() + "\u201d with one resistor changed, lined up beside it");
        d.getDialogPane().getButtonTypes().addAll(ButtonType.OK, ButtonType.CANCEL);
        ChoiceBox<String> ref = new ChoiceBox<>();
        ref.setId("what-if-value-ref");
        resistors.forEach(p -> ref.getItems().add(p.ref()));
        TextField value = new TextField();
        value.setId("what-if-value-ohms");
        ref.valueProperty().addListener((o, was, now) -> vm.stage().part(now).ifPresent(
                p -> value.setText(Notation.format(p.value(ParamKeys.RESISTANCE_OHMS), "Ω"))));
        ref.setValue(resistors.get(0).ref());
        Label note = new Label();
        note.setId("what-if-value-note");
        GridPane g = new GridPane();
        g.setHgap(8);
        g.setVgap(6);
        g.addRow(0, new Label("Resistor"), ref);
        g.addRow(1, new Label("New value"), value);
        g.add(note, 0, 2, 2, 1);
        d.getDialogPane().setContent(g);
        Button ok = (Button) d.getDialogPane().lookupButton(ButtonType.OK);
        ok.addEventFilter(ActionEvent.ACTION, e -> {
            var spec = PartKind.RESISTOR.param(ParamKeys.RESISTANCE_OHMS).orElseThrow();
            double ohms;
            try {
                ohms = EngineeringNotation.parse(value.getText(), Unit.OHM);
            } catch (IllegalArgumentException ex) {
                note.setText(ex.getMessage());
                e.consume();
                return;
            }
            if (!spec.accepts(ohms)) {
                note.setText("The resistance must be between " + Notation.format(spec.min(), "Ω") + " and "
                        + Notation.format(spec.max(), "Ω") + ".");
                e.consume();
                return;
            }
            vm.whatIfValue(ref.getValue(), ParamKeys.RESISTANCE_OHMS, ohms);
        });
        return d;
    }
}
