package org.armature.ui;

import java.util.Arrays;
import java.util.Optional;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.armature.model.OptionSpec;
import org.armature.model.ParamSpec;
import org.armature.model.Part;
import org.armature.render.Notation;
import org.armature.units.EngineeringNotation;
import org.armature.units.ParseResult;
import org.armature.units.Unit;

/**
 * The part sheet: the selected part's parameters with their units, edited in engineering notation
 * ({@code 4k7}, {@code 22 kΩ}, {@code 16.7m}) and checked as typed. A value is committed with Enter
 * or when the field loses focus, as one command; Up and Down (or the wheel) step resistances through
 * the E24 series.
 */
public final class PartSheet extends VBox {

    /** Style class of a field whose text cannot be taken. */
    public static final String INVALID = "invalid";

    private final EditorViewModel vm;
    private final Label title = new Label();
    private final Label description = new Label();
    private final GridPane grid = new GridPane();
    private Optional<String> shownRef = Optional.empty();

    /** A part sheet following the view model's selection. */
    public PartSheet(EditorViewModel vm) {
        this.vm = vm;
        getStyleClass().add("part-sheet");
        title.getStyleClass().add("sheet-title");
        description.getStyleClass().add("sheet-description");
        description.setWrapText(true);
        grid.getStyleClass().add("sheet-grid");
        grid.setHgap(6);
        grid.setVgap(4);
        ColumnConstraints c0 = new ColumnConstraints();
        c0.setHgrow(Priority.SOMETIMES);
        ColumnConstraints c1 = new ColumnConstraints(70, 96, 140);
        ColumnConstraints c2 = new ColumnConstraints(24, 34, 60);
        grid.getColumnConstraints().addAll(c0, c1, c2);
        setSpacing(6);
        getChildren().addAll(title, description, grid);
        vm.selectionProperty().addListener((o, a, b) -> rebuild());
        vm.stageProperty().addListener((o, a, b) -> rebuild());
        rebuild();
    }

    private Optional<Part> lastPart = Optional.empty();
    private int lastSelectionSize = -1;

    private void rebuild() {
        var refs = vm.selectionProperty().get().refs();
        Optional<Part> part = refs.size() == 1 ? vm.stage().part(refs.iterator().next()) : Optional.empty();
        // an edit elsewhere (a slider drag) leaves the sheet as it is: rebuilding costs a frame
        if (part.equals(lastPart) && refs.size() == lastSelectionSize) {
            return;
        }
        lastPart = part;
        lastSelectionSize = refs.size();
        grid.getChildren().clear();
        shownRef = part.map(Part::ref);
        if (part.isEmpty()) {
            title.setText(refs.size() > 1 ? refs.size() + " parts selected" : "No part selected");
            description.setText(refs.size() > 1 ? "Select one part to edit its values."
                    : "Click a part on the drawing to see and edit its values.");
            return;
        }
        Part p = part.get();
        title.setText(p.ref() + " · " + p.kind().title());
        description.setText(p.kind().description());
        int row = 0;
        for (OptionSpec o : p.kind().options()) {
            ComboBox<String> box = new ComboBox<>();
            box.getItems().setAll(o.allowed());
            box.setValue(p.option(o.key()));
            box.setId("option-" + o.key());
            box.setOnAction(e -> vm.setOption(p.ref(), o.key(), box.getValue()));
            Label l = new Label(o.label());
            l.setTooltip(new Tooltip(o.description()));
            grid.addRow(row++, l, box);
        }
        for (ParamSpec s : p.kind().params()) {
            Label l = new Label(s.label());
            l.setTooltip(new Tooltip(s.description()));
            l.getStyleClass().add("param-label");
            TextField f = new TextField(Notation.format(p.value(s.key()), s.unitSymbol()));
            f.setId("param-" + s.key());
            f.getStyleClass().add("param-field");
            f.setTooltip(new Tooltip(s.description()));
            f.textProperty().addListener((o, a, b) -> check(f, s));
            f.setOnAction(e -> commit(p.ref(), f, s));
            f.focusedProperty().addListener((o, was, now) -> {
                if (was && !now) {
                    commit(p.ref(), f, s);
                }
            });
            if (s.unitSymbol().equals("Ω")) {
                f.addEventFilter(KeyEvent.KEY_PRESSED, e -> {
                    if (e.getCode() == KeyCode.UP || e.getCode() == KeyCode.DOWN) {
                        vm.stepPreferred(p.ref(), s.key(), e.getCode() == KeyCode.UP ? 1 : -1);
                        e.consume();
                    }
                });
                f.addEventHandler(ScrollEvent.SCROLL, e -> {
                    if (e.getDeltaY() != 0) {
                        vm.stepPreferred(p.ref(), s.key(), e.getDeltaY() > 0 ? 1 : -1);
                        e.consume();
                    }
                });
            }
            Label unit = new Label(s.unitSymbol());
            unit.getStyleClass().add("param-unit");
            grid.addRow(row++, l, f, unit);
        }
    }

    /** The part shown, if one. */
    public Optional<String> shownRef() {
        return shownRef;
    }

    private static Unit unitOf(ParamSpec s) {
        return Arrays.stream(Unit.values()).filter(u -> u.symbol().equals(s.unitSymbol())).findFirst().orElse(Unit.RATIO);
    }

    /** Parses a field's text; empty when it cannot be read or is out of range (the field shows why). */
    private static Optional<Double> check(TextField f, ParamSpec s) {
        ParseResult r = EngineeringNotation.tryParse(f.getText(), unitOf(s), s.min() < 0);
        String problem = null;
        double value = Double.NaN;
        if (r instanceof ParseResult.Value v) {
            value = v.value();
            if (!s.accepts(value)) {
                problem = s.label() + " must be from " + Notation.format(s.min(), s.unitSymbol()) + " to "
                        + Notation.format(s.max(), s.unitSymbol()) + ".";
            }
        } else if (r instanceof ParseResult.Failure fail) {
            problem = fail.error().message();
        }
        if (problem != null) {
            if (!f.getStyleClass().contains(INVALID)) {
                f.getStyleClass().add(INVALID);
            }
            f.setTooltip(new Tooltip(problem));
            return Optional.empty();
        }
        f.getStyleClass().remove(INVALID);
        f.setTooltip(new Tooltip(s.description()));
        return Optional.of(value);
    }

    private void commit(String ref, TextField f, ParamSpec s) {
        if (shownRef.isEmpty() || !shownRef.get().equals(ref) || vm.stage().part(ref).isEmpty()) {
            return;
        }
        Optional<Double> v = check(f, s);
        if (v.isPresent() && v.get() != vm.stage().require(ref).value(s.key())) {
            vm.setValue(ref, s.key(), v.get());
        }
    }
}
