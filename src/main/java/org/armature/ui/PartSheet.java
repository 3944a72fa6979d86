package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
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
 * the E24 series. Transistors and the drive pin have a "From datasheet…" section: figures typed from
 * the datasheet are fitted ({@link DatasheetFit}) and written as one undoable step.
 */
public final class PartSheet extends VBox {

    /** Style class of a field whose text cannot be taken. */
    public static final String INVALID = "invalid";

    private final EditorViewModel vm;
    private final Label title = new Label();
    private final Label description = new Label();
    private final GridPane grid = new GridPane();
    private Optional<String> shownRef = Optional.empty();
    private Optional<TitledPane> datasheet = Optional.empty();
    private boolean datasheetOpen;

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
        datasheet.ifPresent(d -> {
            datasheetOpen = d.isExpanded();
            getChildren().remove(d);
        });
        datasheet = Optional.empty();
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
            if (s.unit() == Unit.OHM) {
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
        if (DatasheetFit.supports(p.kind())) {
            TitledPane d = datasheetPane(p);
            datasheet = Optional.of(d);
            getChildren().add(d);
        }
    }

    // ------------------------------------------------------------------ datasheet helpers

    /** One figure of a datasheet helper: field id, label, unit and starting text. */
    private record Figure(String id, String label, Unit unit, String initial) {
    }

    private List<Figure> figures(Part p) {
        return switch (p.kind()) {
            case NPN, PNP -> List.of(
                    new Figure("fit-hfe", "hFE (typical)", Unit.RATIO, Notation.format(p.value("betaForward"), "")),
                    new Figure("fit-hfe-ic", "at IC", Unit.AMPERE, "10 mA"),
                    new Figure("fit-hfe-vce", "and VCE", Unit.VOLT, "1 V"),
                    new Figure("fit-vbesat", "VBE(sat)", Unit.VOLT, "850 mV"),
                    new Figure("fit-vbesat-ic", "at IC (IC/IB = 10)", Unit.AMPERE, "50 mA"));
            case NMOS -> List.of(
                    new Figure("fit-vth", "VGS(th)", Unit.VOLT, Notation.format(p.value("vgsThMaxVolts"), "V")),
                    new Figure("fit-vth-id", "at ID", Unit.AMPERE, "250 µA"),
                    new Figure("fit-rdson", "RDS(on)", Unit.OHM, Notation.format(p.value("rdsOnOhms"), "Ω")),
                    new Figure("fit-rdson-vgs", "at VGS", Unit.VOLT, Notation.format(p.value("rdsOnGateVolts"), "V")),
                    new Figure("fit-rdson-id", "and ID", Unit.AMPERE, "100 mA"));
            case DRIVE_PIN -> List.of(
                    new Figure("fit-voh1", "VOH", Unit.VOLT, "2.9 V"),
                    new Figure("fit-voh1-i", "at sourced current", Unit.AMPERE, "8 mA"),
                    new Figure("fit-voh2", "VOH", Unit.VOLT, "2 V"),
                    new Figure("fit-voh2-i", "at sourced current", Unit.AMPERE, "20 mA"));
            default -> List.of();
        };
    }

    private TitledPane datasheetPane(Part p) {
        List<Figure> figs = figures(p);
        GridPane g = new GridPane();
        g.setHgap(6);
        g.setVgap(4);
        List<TextField> fields = new ArrayList<>();
        int row = 0;
        for (Figure fig : figs) {
            TextField f = new TextField(fig.initial());
            f.setId(fig.id());
            f.getStyleClass().add("param-field");
            f.setPrefColumnCount(7);
            f.textProperty().addListener((o, a, b) -> parseFigure(f, fig));
            fields.add(f);
            g.addRow(row++, new Label(fig.label()), f, new Label(fig.unit().symbol()));
        }
        Label message = new Label();
        message.setId("datasheet-message");
        message.setWrapText(true);
        Button apply = new Button("Fit and apply");
        apply.setId("datasheet-apply");
        apply.setOnAction(e -> {
            double[] v = new double[figs.size()];
            boolean ok = true;
            for (int i = 0; i < figs.size(); i++) {
                Optional<Double> x = parseFigure(fields.get(i), figs.get(i));
                ok &= x.isPresent();
                v[i] = x.orElse(Double.NaN);
            }
            if (!ok) {
                message.setText("Correct the marked figures first.");
                return;
            }
            DatasheetFit.Result r = switch (p.kind()) {
                case NPN, PNP -> DatasheetFit.bjt(p, new DatasheetFit.BjtFigures(v[0], v[1], v[2], v[3], v[4]));
                case NMOS -> DatasheetFit.mosfet(p, new DatasheetFit.MosfetFigures(v[0], v[1], v[2], v[3], v[4]));
                default -> DatasheetFit.pin(p, new DatasheetFit.PinFigures(v[0], v[1], v[2], v[3]));
            };
            message.setText(r.problem().orElse(""));
            vm.applyDatasheetFit(p.ref(), r);
        });
        VBox box = new VBox(6, g, apply, message);
        TitledPane pane = new TitledPane("From datasheet…", box);
        pane.setId("datasheet-pane");
        pane.setExpanded(datasheetOpen);
        return pane;
    }

    /** Parses a datasheet figure (positive); empty when it cannot be read (the field shows why). */
    private static Optional<Double> parseFigure(TextField f, Figure fig) {
        ParseResult r = EngineeringNotation.tryParse(f.getText(), fig.unit());
        String problem = null;
        double value = Double.NaN;
        if (r instanceof ParseResult.Value v) {
            value = v.value();
            if (!(value > 0) || !Double.isFinite(value)) {
                problem = fig.label() + " must be positive.";
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
        f.setTooltip(null);
        return Optional.of(value);
    }

    /** The part shown, if one. */
    public Optional<String> shownRef() {
        return shownRef;
    }

    private static Unit unitOf(ParamSpec s) {
        return s.unit();
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
