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
 * on the view model's solve executor ({@link EditorViewModel#evaluateLineUp}), never on the FX thread.
 */
public final class LineUpView {

    /** Widest a schematic is shown, pixels. */
    private static final double SCHEMATIC_WIDTH = 360;

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
        for (int i = 0; i < stages.size(); i++) {
            LineUpContext.Applied a = stages.get(i);
            String name = "[" + (i + 1) + "] " + a.stage().name();
            names.add(a.stage().name());
            ImageView image = new ImageView(ImageExport.render(a.stage(), Annotations.NONE, palette, 1));
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
        Label pending = new Label("Solving, simulating and checking every stage…");
        pending.setId("line-up-pending");
        Button copy = new Button("Copy table");
        copy.setId("line-up-copy");
        copy.setDisable(true);
        org.armature.model.Stage first = stages.get(0).stage();
        TextField supply = new TextField(org.armature.model.StageRecognition.of(first).roles()
                .flatMap(r -> r.coilSupplyRef()).flatMap(first::part)
                .map(p -> Notation.format(p.value("volts"), "V")).orElse(""));
        supply.setId("line-up-supply");
        supply.setPrefColumnCount(8);
        Button applySupply = new Button("Apply to every stage");
        applySupply.setId("line-up-apply-supply");
        Button undo = new Button("Undo");
        undo.setId("line-up-undo");
        Label note = new Label();
        note.setId("line-up-note");
        HBox shared = new HBox(8, new Label("Shared coil supply"), supply, applySupply, undo, note);
        javafx.scene.canvas.Canvas waves = new javafx.scene.canvas.Canvas(Math.max(720, stages.size() * 360), 300);
        waves.setId("line-up-waves");
        LineUpRows rows = new LineUpRows();
        java.util.concurrent.atomic.AtomicReference<List<Column>> last = new java.util.concurrent.atomic.AtomicReference<>(List.of());
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
        content.getChildren().addAll(schematics, shared, pending, table, copy, rowChoice, waves);
        copy.setOnAction(e -> {
            ClipboardContent c = new ClipboardContent();
            c.putString(rows.tabSeparated(names, last.get()));
            Clipboard.getSystemClipboard().setContent(c);
        });
        Runnable refresh = () -> {
            List<LineUpContext.Applied> now = vm.lineUpStages();
            vm.evaluateLineUp(now, columns -> {
                last.set(columns);
                rows.merge(columns);
                redraw.run();
                List<org.armature.render.EdgePlot.Plot> plots = new ArrayList<>();
                List<String> legend = new ArrayList<>();
                for (int i = 0; i < columns.size(); i++) {
                    Column c = columns.get(i);
                    if (c.turnOff().isPresent()) {
                        plots.add(org.armature.render.EdgePlot.of(c.stage(), c.turnOff().get()));
                        legend.add("[" + (i + 1) + "] " + names.get(i));
                    }
                }
                org.armature.render.OverlayPlot.draw(new FxPen(waves.getGraphicsContext2D(),
                        org.armature.render.Affine.IDENTITY), plots, legend, waves.getWidth(), waves.getHeight(), palette);
                content.getChildren().remove(pending);
                copy.setDisable(false);
            });
        };
        applySupply.setOnAction(e -> {
            try {
                double volts = EngineeringNotation.parse(supply.getText(), Unit.VOLT);
                if (vm.setSharedValue("coilSupply", "volts", volts)) {
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
                refresh.run();
            }
        });
        refresh.run();
        ScrollPane scroll = new ScrollPane(content);
        scroll.setPrefViewportWidth(Math.min(1500, stages.size() * (SCHEMATIC_WIDTH + 12) + 40));
        scroll.setPrefViewportHeight(760);
        d.getDialogPane().setContent(scroll);
        d.setResizable(true);
        return d;
    }

    /**
     * Fills the table with the shown rows in their order: a figure or a check per row, best values
     * bold with a star.
     */
    static void fill(GridPane table, List<Column> columns, LineUpRows rows) {
        table.getChildren().clear();
        if (columns.isEmpty()) {
            return;
        }
        int row = 0;
        for (LineUpRows.Row r : rows.shown()) {
            table.add(new Label(r.label()), 0, row);
            if (r.id().startsWith(LineUpRows.CHECK)) {
                String id = r.id().substring(LineUpRows.CHECK.length());
                List<Integer> best = LineUpMetrics.bestCheck(id, columns);
                for (int i = 0; i < columns.size(); i++) {
                    String word = columns.get(i).report().check(id).map(c -> c.status().word()).orElse("\u2014");
                    table.add(cell(word, best.contains(i)), i + 1, row);
                }
            } else {
                Metric m = LineUpMetrics.METRICS.stream().filter(x -> x.key().equals(r.id())).findFirst().orElseThrow();
                List<Integer> best = LineUpMetrics.best(m, columns);
                for (int i = 0; i < columns.size(); i++) {
                    table.add(cell(LineUpMetrics.format(m, columns.get(i).value(m.key())), best.contains(i)), i + 1, row);
                }
            }
            row++;
        }
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
