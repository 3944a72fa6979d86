package org.armature.ui;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
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
import org.armature.model.ParamKeys;
import org.armature.model.ParamSpec;
import org.armature.model.Part;
import org.armature.model.PinSpec;
import org.armature.model.TestPoint;
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

    /** Key of a value field's last parsed value in its properties. */
    private static final String PARSED = "armature.parsed";

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
        this.stageSheet = new StageSheet(vm);
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
    private boolean stageSheetShown;
    private final Map<String, TextField> valueFields = new HashMap<>();
    private final Map<String, ComboBox<String>> optionBoxes = new HashMap<>();
    private final Map<String, TextField> testPointFields = new HashMap<>();
    private final StageSheet stageSheet;

    /**
     * Follows the selection and the stage. The same part with other values (its own edit, an undo,
     * a slider) keeps its fields and only changes the texts that changed, so focus, typed datasheet
     * figures and Tab order survive; another part, kind or selection builds the sheet anew.
     */
    private void rebuild() {
        var refs = vm.selectionProperty().get().refs();
        Optional<Part> part = refs.size() == 1 ? vm.stage().part(refs.iterator().next()) : Optional.empty();
        if (part.isEmpty() && lastPart.isEmpty() && refs.size() == lastSelectionSize && !refs.isEmpty()) {
            return;
        }
        // the same part: values, options and its test points brought up to date in place
        if (part.isPresent() && lastPart.isPresent() && refs.size() == lastSelectionSize
                && part.get().ref().equals(lastPart.get().ref()) && part.get().kind() == lastPart.get().kind()) {
            Part before = lastPart.get();
            lastPart = part;
            update(before, part.get());
            return;
        }
        if (refs.isEmpty() && stageSheetShown) {
            lastPart = part;
            stageSheet.update();
            return;
        }
        lastPart = part;
        lastSelectionSize = refs.size();
        valueFields.clear();
        optionBoxes.clear();
        testPointFields.clear();
        grid.getChildren().clear();
        getChildren().remove(stageSheet);
        stageSheetShown = false;
        datasheet.ifPresent(d -> {
            datasheetOpen = d.isExpanded();
            getChildren().remove(d);
        });
        datasheet = Optional.empty();
        shownRef = part.map(Part::ref);
        if (part.isEmpty()) {
            title.setText(refs.size() > 1 ? refs.size() + " parts selected" : "Stage");
            description.setText(refs.size() > 1 ? "Select one part to edit its values."
                    : "Click a part on the drawing to see and edit its values. The stage's own name and check settings:");
            if (refs.isEmpty()) {
                stageSheet.update();
                getChildren().add(stageSheet);
                stageSheetShown = true;
            }
            return;
        }
        Part p = part.get();
        title.setText(p.ref() + " · " + p.kind().title());
        description.setText(p.kind().description());
        int row = 0;
        TextField designator = new TextField(p.ref());
        designator.setId("part-ref");
        designator.getStyleClass().add("param-field");
        Runnable rename = () -> {
            if (!designator.getText().strip().equals(p.ref()) && vm.stage().part(p.ref()).isPresent()
                    && !vm.renamePart(p.ref(), designator.getText())) {
                designator.setText(p.ref());
            }
        };
        designator.setOnAction(e -> rename.run());
        designator.focusedProperty().addListener((o, was, now) -> {
            if (was && !now) {
                rename.run();
            }
        });
        grid.addRow(row++, new Label("Designator"), designator);
        for (OptionSpec o : p.kind().options()) {
            ComboBox<String> box = new ComboBox<>();
            box.getItems().setAll(o.allowed());
            box.setValue(p.option(o.key()));
            box.setId("option-" + o.key());
            box.setOnAction(e -> {
                if (box.getValue() != null && !box.getValue().equals(vm.stage().part(p.ref()).map(q -> q.option(o.key())).orElse(null))) {
                    vm.setOption(p.ref(), o.key(), box.getValue());
                }
            });
            optionBoxes.put(o.key(), box);
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
            // the text is parsed and range-checked once, as it is typed; a commit takes that value
            f.textProperty().addListener((o, a, b) -> f.getProperties().put(PARSED, check(f, s)));
            f.getProperties().put(PARSED, Optional.of(p.value(s.key())));
            f.setOnAction(e -> commit(p.ref(), f, s));
            valueFields.put(s.key(), f);
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
        row = testPointRows(p, row);
        if (DatasheetFit.supports(p.kind())) {
            TitledPane d = datasheetPane(p);
            datasheet = Optional.of(d);
            getChildren().add(d);
        }
    }

    /** Brings the fields of the part shown up to its values; fields whose value did not change keep their text. */
    private void update(Part before, Part p) {
        for (ParamSpec s : p.kind().params()) {
            TextField f = valueFields.get(s.key());
            // only a value that changed: a field being typed in while something else changes keeps its text
            if (f != null && before.value(s.key()) != p.value(s.key())) {
                f.setText(Notation.format(p.value(s.key()), s.unitSymbol()));
            }
        }
        for (OptionSpec o : p.kind().options()) {
            ComboBox<String> box = optionBoxes.get(o.key());
            if (box != null && !p.option(o.key()).equals(box.getValue())) {
                box.setValue(p.option(o.key()));
            }
        }
        for (PinSpec pin : p.kind().pins()) {
            TextField f = testPointFields.get(pin.name());
            if (f != null) {
                String net = testPointAt(p.ref(), pin.name());
                if (!net.equals(f.getText())) {
                    f.setText(net);
                }
            }
        }
    }

    // ------------------------------------------------------------------ test points

    private String testPointAt(String ref, String pin) {
        return vm.stage().testPoints().stream().filter(t -> t.ref().equals(ref) && t.pin().equals(pin))
                .map(TestPoint::net).findFirst().orElse("");
    }

    /** One row per pin: the name of the test point there (empty: none), committed with Enter or on leaving. */
    private int testPointRows(Part p, int row) {
        Label head = new Label("Test points");
        head.getStyleClass().add("sheet-title");
        head.setTooltip(new Tooltip("Name the net at a pin to measure it; clear the name to remove the test point."));
        grid.add(head, 0, row++, 3, 1);
        for (PinSpec pin : p.kind().pins()) {
            TextField f = new TextField(testPointAt(p.ref(), pin.name()));
            f.setId("testpoint-" + pin.name());
            f.setPromptText("none");
            f.getStyleClass().add("param-field");
            Runnable commit = () -> {
                if (!f.getText().strip().equals(testPointAt(p.ref(), pin.name()))
                        && !vm.nameTestPoint(p.ref(), pin.name(), f.getText())) {
                    f.setText(testPointAt(p.ref(), pin.name()));
                }
            };
            f.setOnAction(e -> commit.run());
            f.focusedProperty().addListener((o, was, now) -> {
                if (was && !now && vm.stage().part(p.ref()).isPresent()) {
                    commit.run();
                }
            });
            testPointFields.put(pin.name(), f);
            grid.addRow(row++, new Label("pin " + pin.name()), f);
        }
        return row;
    }

    // ------------------------------------------------------------------ datasheet helpers

    /** One figure of a datasheet helper: field id, label, unit and starting text. */
    private record Figure(String id, String label, Unit unit, String initial) {
    }

    private List<Figure> figures(Part p) {
        return switch (p.kind()) {
            case NPN, PNP -> List.of(
                    new Figure("fit-hfe", "hFE (typical)", Unit.RATIO, Notation.format(p.value(ParamKeys.BETA_FORWARD), "")),
                    new Figure("fit-hfe-ic", "at IC", Unit.AMPERE, "10 mA"),
                    new Figure("fit-hfe-vce", "and VCE", Unit.VOLT, "1 V"),
                    new Figure("fit-vbesat", "VBE(sat)", Unit.VOLT, "850 mV"),
                    new Figure("fit-vbesat-ic", "at IC (IC/IB = 10)", Unit.AMPERE, "50 mA"));
            case NMOS -> List.of(
                    new Figure("fit-vth", "VGS(th)", Unit.VOLT, Notation.format(p.value(ParamKeys.VGS_TH_MAX_VOLTS), "V")),
                    new Figure("fit-vth-id", "at ID", Unit.AMPERE, "250 µA"),
                    new Figure("fit-rdson", "RDS(on)", Unit.OHM, Notation.format(p.value(ParamKeys.RDS_ON_OHMS), "Ω")),
                    new Figure("fit-rdson-vgs", "at VGS", Unit.VOLT, Notation.format(p.value(ParamKeys.RDS_ON_GATE_VOLTS), "V")),
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
        Object parsed = f.getProperties().get(PARSED);
        Optional<Double> v = parsed instanceof Optional<?> o && o.isPresent() && o.get() instanceof Double d
                ? Optional.of(d) : Optional.empty();
        if (v.isPresent() && v.get() != vm.stage().require(ref).value(s.key())) {
            vm.setValue(ref, s.key(), v.get());
        }
    }
}
