package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.TextField;
import javafx.scene.image.ImageView;
import javafx.scene.input.Clipboard;
import javafx.scene.input.ClipboardContent;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.armature.analysis.LineUpMetrics;
import org.armature.analysis.LineUpMetrics.Column;
import org.armature.analysis.LineUpMetrics.Metric;
import org.armature.model.LineUpContext;
import org.armature.render.Annotations;
import org.armature.render.Notation;
import org.armature.render.Palette;
import org.armature.units.EngineeringNotation;
import org.armature.units.Unit;

/**
 * Tools ▸ Line-up…: the stages of the document's line-up side by side on their shared relay, supply
 * and pin. Each schematic is drawn by the one renderer ({@link ImageExport#render}); below, the
 * figures of {@link LineUpMetrics}, one column per stage, the best value of each row in bold with a
 * star; "Copy table" puts the table on the clipboard as tab-separated text. The figures are computed
 * in phases off the FX thread ({@link EditorViewModel#evaluateLineUp}) and shown as they arrive: the
 * overlaid turn-off waveforms once every stage's turn-off run is in, each cell once its phase is in;
 * a cell whose phase has not arrived shows {@link #PENDING}, never a figure from before the change.
 */
public final class LineUpView {

    /** Widest a schematic is shown, pixels. */
    private static final double SCHEMATIC_WIDTH = 360;

    /** What a cell shows while its phase is still running. */
    static final String PENDING = "\u2026";

    private LineUpView() {
    }

    /** The dialog for the document's line-up (or its first stages); null-free, may show a note only. */
    public static Dialog<ButtonType> dialog(EditorViewModel vm, Palette palette) {
        List<LineUpContext.Applied> stages = vm.lineUpStages();
        Dialog<ButtonType> d = new Dialog<>();
        d.setTitle("Line-up");
        d.getDialogPane().getButtonTypes().add(ButtonType.CLOSE);
        VBox content = new VBox(10);
        content.setId("line-up");
        if (stages.isEmpty()) {
            d.setHeaderText("A line-up needs two to four stages; add a stage first.");
            d.getDialogPane().setContent(content);
            return d;
        }
        d.setHeaderText("Stages side by side on one relay, supply and pin");
        HBox schematics = new HBox(12);
        List<String> names = new ArrayList<>();
        List<ImageView> images = new ArrayList<>();
        // one warm DC engine per stage (compile once, re-solve on every shared change), solve executor only
        List<ReadoutSource> engines = stages.stream().map(a -> (ReadoutSource) new EngineReadouts()).toList();
        for (int i = 0; i < stages.size(); i++) {
            LineUpContext.Applied a = stages.get(i);
            String name = "[" + (i + 1) + "] " + a.stage().name();
            names.add(a.stage().name());
            ImageView image = new ImageView(ImageExport.render(a.stage(), Annotations.NONE, palette, 1));
            image.setId("line-up-schematic-" + i);
            images.add(image);
            image.setPreserveRatio(true);
            image.setFitWidth(Math.min(SCHEMATIC_WIDTH, image.getImage().getWidth()));
            VBox box = new VBox(4, new Label(name), image);
            if (a.relayDiffers()) {
                Label l = new Label("Drawn for another relay; judged with the shared one.");
                l.getStyleClass().add("severity-warning");
                box.getChildren().add(l);
            }
            schematics.getChildren().add(box);
        }
        GridPane table = new GridPane();
        table.setId("line-up-table");
        table.setHgap(16);
        table.setVgap(2);
        Label pending = new Label(state(null));
        pending.setId("line-up-pending");
        Button copy = new Button("Copy table");
        copy.setId("line-up-copy");
        copy.setDisable(true);
        LineUpContext start = vm.sharedContext().orElseGet(() -> LineUpContext.of(stages.get(0).stage()));
        List<SharedField> fields = sharedFields(start);
        GridPane sharedGrid = new GridPane();
        sharedGrid.setId("line-up-shared");
        sharedGrid.setHgap(8);
        sharedGrid.setVgap(4);
        for (int i = 0; i < fields.size(); i++) {
            SharedField f = fields.get(i);
            sharedGrid.add(new Label(f.label()), (i % 3) * 2, i / 3);
            sharedGrid.add(f.field(), (i % 3) * 2 + 1, i / 3);
        }
        Button applySupply = new Button("Apply to every stage");
        applySupply.setId("line-up-apply-supply");
        Button undo = new Button("Undo");
        undo.setId("line-up-undo");
        Label note = new Label();
        note.setId("line-up-note");
        VBox shared = new VBox(6, new Label("Shared by every stage"), sharedGrid, new HBox(8, applySupply, undo, note));
        javafx.scene.canvas.Canvas waves = new javafx.scene.canvas.Canvas(Math.max(720, stages.size() * 360), 300);
        waves.setId("line-up-waves");
        Label wavesState = new Label("Turn-off waveforms: running\u2026");
        wavesState.setId("line-up-waves-state");
        LineUpRows rows = new LineUpRows();
        java.util.concurrent.atomic.AtomicReference<LineUpProgress> last = new java.util.concurrent.atomic.AtomicReference<>(
                LineUpProgress.pending(0, stages));
        ListView<LineUpRows.Row> rowList = new ListView<>();
        rowList.setId("line-up-rows");
        rowList.setPrefHeight(160);
        rowList.setCellFactory(v -> new javafx.scene.control.ListCell<>() {
            @Override
            protected void updateItem(LineUpRows.Row r, boolean empty) {
                super.updateItem(r, empty);
                setText(empty || r == null ? null : (r.shown() ? "\u2611 " : "\u2610 ") + r.label());
            }
        });
        rowList.getItems().setAll(rows.rows());
        Runnable redraw = () -> {
            int at = rowList.getSelectionModel().getSelectedIndex();
            rowList.getItems().setAll(rows.rows());
            rowList.getSelectionModel().select(at);
            fill(table, last.get(), rows);
        };
        Button toggle = new Button("Show / hide row");
        toggle.setId("line-up-row-toggle");
        toggle.setOnAction(e -> {
            int i = rowList.getSelectionModel().getSelectedIndex();
            if (i >= 0) {
                rows.toggle(i);
                redraw.run();
            }
        });
        Button up = new Button("Up");
        up.setId("line-up-row-up");
        Button down = new Button("Down");
        down.setId("line-up-row-down");
        for (Button b : List.of(up, down)) {
            int delta = b == up ? -1 : 1;
            b.setOnAction(e -> {
                int i = rowList.getSelectionModel().getSelectedIndex();
                if (i >= 0) {
                    int j = rows.move(i, delta);
                    redraw.run();
                    rowList.getSelectionModel().select(j);
                }
            });
        }
        HBox rowChoice = new HBox(8, rowList, new VBox(6, new Label("Rows of the table"), toggle, up, down));
        content.getChildren().addAll(schematics, shared, pending, table, copy, rowChoice, wavesState, waves);
        copy.setOnAction(e -> {
            ClipboardContent c = new ClipboardContent();
            c.putString(rows.tabSeparated(names, last.get().columns()));
            Clipboard.getSystemClipboard().setContent(c);
        });
        Runnable refresh = () -> {
            List<LineUpContext.Applied> now = vm.lineUpStages();
            if (now.size() == engines.size()) {
                // first the DC readouts on every schematic (milliseconds), then the figures and waveforms
                vm.lineUpReadouts(now, engines, readouts -> {
                    for (int i = 0; i < readouts.size(); i++) {
                        ImageView image = images.get(i);
                        image.setImage(ImageExport.render(now.get(i).stage(), readouts.get(i).annotations(), palette, 1));
                        image.setUserData(readouts.get(i));
                    }
                });
            }
            vm.evaluateLineUp(now, progress -> {
                last.set(progress);
                List<Column> columns = progress.columns();
                rows.merge(columns);
                redraw.run();
                pending.setText(state(progress));
                pending.setVisible(!progress.complete());
                pending.setManaged(!progress.complete());
                copy.setDisable(!progress.complete());
                if (!progress.hasAll(LineUpMetrics.Phase.TURN_OFF)) {
                    wavesState.setText("Turn-off waveforms: running\u2026");
                } else if (!Long.valueOf(progress.generation()).equals(waves.getUserData())) {
                    // every stage's turn-off run is in: repaint the overlay once for this change
                    List<org.armature.render.EdgePlot.Plot> plots = new ArrayList<>();
                    List<String> legend = new ArrayList<>();
                    for (int i = 0; i < columns.size(); i++) {
                        Column c = columns.get(i);
                        if (c.turnOff().isPresent()) {
                            plots.add(org.armature.render.EdgePlot.of(c.stage(), c.turnOff().get()));
                            legend.add("[" + (i + 1) + "] " + names.get(i));
                        }
                    }
                    waves.getGraphicsContext2D().clearRect(0, 0, waves.getWidth(), waves.getHeight());
                    org.armature.render.OverlayPlot.draw(new FxPen(waves.getGraphicsContext2D(),
                            org.armature.render.Affine.IDENTITY), plots, legend, waves.getWidth(), waves.getHeight(), palette);
                    waves.setUserData(progress.generation());
                    wavesState.setText("Turn-off waveforms, " + plots.size() + " of " + columns.size() + " stages");
                }
            });
        };
        applySupply.setOnAction(e -> {
            try {
                LineUpContext next = withFields(vm.sharedContext().orElse(start), fields);
                if (vm.setSharedContext(next)) {
                    show(next, fields);
                    note.setText("");
                    refresh.run();
                } else {
                    note.setText(vm.messageProperty().get());
                }
            } catch (IllegalArgumentException ex) {
                note.setText(ex.getMessage());
            }
        });
        undo.setOnAction(e -> {
            if (vm.undoSharedValue()) {
                vm.sharedContext().ifPresent(c -> show(c, fields));
                note.setText("");
                refresh.run();
            }
        });
        refresh.run();
        d.setOnHidden(e -> vm.stopLineUpEvaluation());
        ScrollPane scroll = new ScrollPane(content);
        scroll.setPrefViewportWidth(Math.min(1500, stages.size() * (SCHEMATIC_WIDTH + 12) + 40));
        scroll.setPrefViewportHeight(760);
        d.getDialogPane().setContent(scroll);
        d.setResizable(true);
        return d;
    }

    /**
     * Fills the table with the shown rows in their order: a figure or a check per row, best values
     * bold with a star. A cell whose phase has not arrived shows {@link #PENDING}; a row is marked
     * best only once every column's value is in.
     */
    static void fill(GridPane table, LineUpProgress progress, LineUpRows rows) {
        table.getChildren().clear();
        List<Column> columns = progress.columns();
        if (columns.isEmpty()) {
            return;
        }
        int row = 0;
        for (LineUpRows.Row r : rows.shown()) {
            table.add(new Label(r.label()), 0, row);
            if (r.id().startsWith(LineUpRows.CHECK)) {
                String id = r.id().substring(LineUpRows.CHECK.length());
                List<Integer> best = progress.hasAll(LineUpMetrics.Phase.CHECKS) ? LineUpMetrics.bestCheck(id, columns)
                        : List.of();
                for (int i = 0; i < columns.size(); i++) {
                    String word = !progress.has(i, LineUpMetrics.Phase.CHECKS) ? PENDING
                            : columns.get(i).report().check(id).map(c -> c.status().word()).orElse("\u2014");
                    table.add(cell(word, best.contains(i)), i + 1, row);
                }
            } else {
                Metric m = LineUpMetrics.METRICS.stream().filter(x -> x.key().equals(r.id())).findFirst().orElseThrow();
                List<Integer> best = progress.hasAll(LineUpMetrics.phaseOf(m)) ? LineUpMetrics.best(m, columns)
                        : List.of();
                for (int i = 0; i < columns.size(); i++) {
                    Column c = columns.get(i);
                    String text = c.pending(m) ? PENDING : LineUpMetrics.format(m, c.value(m.key()));
                    table.add(cell(text, best.contains(i)), i + 1, row);
                }
            }
            row++;
        }
    }

    /** The status line above the table: which phase the figures are at. */
    static String state(LineUpProgress p) {
        if (p == null || !p.hasAll(LineUpMetrics.Phase.DC)) {
            return "Solving every stage\u2026";
        }
        if (!p.hasAll(LineUpMetrics.Phase.TURN_OFF)) {
            return "Simulating the turn-off of every stage\u2026";
        }
        if (!p.hasAll(LineUpMetrics.Phase.TURN_ON)) {
            return "Simulating the turn-on of every stage\u2026";
        }
        if (!p.complete()) {
            return "Checking the corners and the yield of every stage\u2026";
        }
        return "";
    }

    /**
     * One shared value the view edits.
     *
     * @param role {@code relay}, {@code coilSupply}, {@code drivePin} or {@code ambient}
     * @param key the parameter key ({@code min}/{@code max} for the ambient range)
     */
    record SharedField(String role, String key, String label, Unit unit, TextField field) {
    }

    /** The relay's coil figures, the coil supply and its tolerance, the pin, the ambient range. */
    static List<SharedField> sharedFields(LineUpContext c) {
        String[][] spec = {
            {"relay", org.armature.model.ParamKeys.RATED_VOLTS, "Rated coil voltage"},
            {"relay", org.armature.model.ParamKeys.COIL_RESISTANCE_OHMS, "Coil resistance"},
            {"relay", org.armature.model.ParamKeys.MUST_OPERATE_VOLTS, "Must-operate voltage"},
            {"relay", org.armature.model.ParamKeys.MUST_RELEASE_VOLTS, "Must-release voltage"},
            {"coilSupply", org.armature.model.ParamKeys.VOLTS, "Coil supply"},
            {"coilSupply", org.armature.model.ParamKeys.TOLERANCE_PERCENT, "Supply tolerance"},
            {"drivePin", org.armature.model.ParamKeys.HIGH_VOLTS, "Pin high level"},
            {"drivePin", org.armature.model.ParamKeys.OUTPUT_RESISTANCE_OHMS, "Pin output resistance"},
            {"ambient", "min", "Coldest ambient"},
            {"ambient", "max", "Hottest ambient"},
        };
        List<SharedField> out = new ArrayList<>();
        for (String[] s : spec) {
            Unit unit = s[0].equals("ambient") ? Unit.CELSIUS
                    : part(c, s[0]).flatMap(p -> p.kind().param(s[1])).map(org.armature.model.ParamSpec::unit).orElse(Unit.RATIO);
            TextField f = new TextField();
            f.setId(s[0].equals("coilSupply") && s[1].equals(org.armature.model.ParamKeys.VOLTS) ? "line-up-supply"
                    : "line-up-shared-" + s[0] + "-" + s[1]);
            f.setPrefColumnCount(8);
            out.add(new SharedField(s[0], s[1], s[2], unit, f));
        }
        show(c, out);
        return out;
    }

    /** Puts the context's values into the fields; a role the line-up does not share leaves its field disabled. */
    static void show(LineUpContext c, List<SharedField> fields) {
        for (SharedField f : fields) {
            if (f.role().equals("ambient")) {
                f.field().setText(Notation.format(f.key().equals("min") ? c.ambientMinCelsius() : c.ambientMaxCelsius(), "°C"));
                f.field().setUserData(f.field().getText());
                continue;
            }
            java.util.Optional<org.armature.model.SharedPart> p = part(c, f.role());
            f.field().setDisable(p.isEmpty() || p.get().kind().param(f.key()).isEmpty());
            f.field().setText(p.flatMap(sp -> sp.kind().param(f.key()).map(spec -> Notation.format(
                    sp.values().getOrDefault(f.key(), spec.defaultValue()), spec.unitSymbol()))).orElse(""));
            f.field().setUserData(f.field().getText());
        }
    }

    /**
     * The context with every field's value in it; one sentence saying what was expected when a field
     * does not parse or is out of its parameter's range.
     */
    static LineUpContext withFields(LineUpContext c, List<SharedField> fields) {
        LineUpContext next = c;
        double min = c.ambientMinCelsius();
        double max = c.ambientMaxCelsius();
        for (SharedField f : fields) {
            if (f.field().isDisabled() || f.field().getText().equals(f.field().getUserData())) {
                continue; // unchanged: the shown text is rounded, so it is not read back
            }
            double v;
            try {
                v = EngineeringNotation.parse(f.field().getText(), f.unit());
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException(f.label() + ": " + e.getMessage(), e);
            }
            if (f.role().equals("ambient")) {
                if (f.key().equals("min")) {
                    min = v;
                } else {
                    max = v;
                }
                continue;
            }
            org.armature.model.ParamSpec spec = part(next, f.role()).orElseThrow().kind().param(f.key()).orElseThrow();
            if (!spec.accepts(v)) {
                throw new IllegalArgumentException(f.label() + " must be between " + Notation.format(spec.min(), spec.unitSymbol())
                        + " and " + Notation.format(spec.max(), spec.unitSymbol()) + ".");
            }
            org.armature.model.SharedPart changed = part(next, f.role()).orElseThrow().with(f.key(), v);
            next = switch (f.role()) {
                case "relay" -> next.withRelay(changed);
                case "coilSupply" -> next.withCoilSupply(changed);
                default -> new LineUpContext(next.relay(), next.coilSupply(), java.util.Optional.of(changed),
                        next.contactSupply(), next.load(), next.ambientCelsius(), next.ambientMinCelsius(),
                        next.ambientMaxCelsius());
            };
        }
        if (!(min <= max)) {
            throw new IllegalArgumentException("The coldest ambient must not be above the hottest.");
        }
        if (min < -273.15) {
            throw new IllegalArgumentException("The coldest ambient must be above absolute zero (-273.15 °C).");
        }
        if (min != c.ambientMinCelsius() || max != c.ambientMaxCelsius()) {
            next = next.withAmbient(Math.max(min, Math.min(max, c.ambientCelsius())), min, max);
        }
        return next;
    }

    private static java.util.Optional<org.armature.model.SharedPart> part(LineUpContext c, String role) {
        return switch (role) {
            case "relay" -> c.relay();
            case "coilSupply" -> c.coilSupply();
            case "drivePin" -> c.drivePin();
            default -> java.util.Optional.empty();
        };
    }

    private static Label cell(String text, boolean best) {
        Label l = new Label(best ? text + " ★" : text);
        l.getStyleClass().add("reading");
        if (best) {
            l.setStyle("-fx-font-weight: bold;");
        }
        return l;
    }
}
