package org.armature.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javafx.geometry.Insets;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.control.Label;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.input.MouseEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.Pane;
import javafx.scene.layout.VBox;
import org.armature.render.Affine;
import org.armature.render.EdgePlot;
import org.armature.render.Notation;
import org.armature.render.Palette;
import org.armature.solver.timedomain.TransientMetrics;
import org.armature.solver.timedomain.TransientResult;

/**
 * The edges drawer: the turn-on or turn-off run of the present stage as stacked strips sharing one
 * time axis ({@link EdgePlot}), a time cursor dragged with the mouse with the values at the cursor,
 * and the run's figures beside it. The runs come from the view model, which re-runs them off the FX
 * thread after edits settle.
 */
public final class EdgesPane extends BorderPane {

    private final EditorViewModel vm;
    private final Canvas canvas = new Canvas(600, 240);
    private final Pane canvasHolder = new Pane(canvas);
    private final ToggleButton turnOff = new ToggleButton("Turn-off");
    private final ToggleButton turnOn = new ToggleButton("Turn-on");
    private final VBox figures = new VBox(3);
    private final Label status = new Label();
    private Palette palette = Palette.LIGHT;
    private double cursorSeconds = Double.NaN;
    private Optional<EdgePlot.Plot> plot = Optional.empty();
    private Evaluation edgesOf;
    private boolean running;

    /** A drawer following the view model's edges. */
    public EdgesPane(EditorViewModel vm) {
        this.vm = vm;
        getStyleClass().add("edges");
        ToggleGroup g = new ToggleGroup();
        turnOff.setToggleGroup(g);
        turnOn.setToggleGroup(g);
        turnOff.setSelected(true);
        turnOff.setId("edges-turn-off");
        turnOn.setId("edges-turn-on");
        g.selectedToggleProperty().addListener((o, a, b) -> {
            if (b == null) {
                a.setSelected(true);
            }
            cursorSeconds = Double.NaN;
            rebuild();
        });
        status.getStyleClass().add("sheet-description");
        status.setWrapText(true);
        VBox left = new VBox(6, turnOff, turnOn, status);
        left.setPadding(new Insets(6));
        left.setPrefWidth(120);
        turnOff.setMaxWidth(Double.MAX_VALUE);
        turnOn.setMaxWidth(Double.MAX_VALUE);
        figures.setPadding(new Insets(6));
        figures.setPrefWidth(250);
        figures.getStyleClass().add("edge-figures");
        setLeft(left);
        setCenter(canvasHolder);
        setRight(figures);
        canvasHolder.setMinSize(200, 120);
        canvasHolder.widthProperty().addListener((o, a, b) -> resize());
        canvasHolder.heightProperty().addListener((o, a, b) -> resize());
        canvas.addEventHandler(MouseEvent.MOUSE_PRESSED, this::moveCursor);
        canvas.addEventHandler(MouseEvent.MOUSE_DRAGGED, this::moveCursor);
        edgesOf = vm.evaluation();
        running = edgesOf.edges().isEmpty();
        vm.evaluationProperty().addListener((o, a, b) -> evaluated(b));
        rebuild();
    }

    /** The plot canvas (tests, snapshots). */
    public Canvas canvas() {
        return canvas;
    }

    /** The plot shown, if a run is there. */
    public Optional<EdgePlot.Plot> plot() {
        return plot;
    }

    /** The cursor time, seconds; NaN before the first drag. */
    public double cursorSeconds() {
        return cursorSeconds;
    }

    /** Uses another palette (theme switch). */
    public void setPalette(Palette p) {
        palette = p;
        redraw();
    }

    /** Moves the cursor to a time, seconds (tests and keyboard). */
    public void setCursorSeconds(double t) {
        cursorSeconds = t;
        redraw();
        plot.ifPresent(p -> figuresFor(selected()));
    }

    /**
     * Takes a published evaluation: its edges when they are in; while they are pending, the edges of
     * the last evaluation that had them stay (plotted over that evaluation's own stage), marked as
     * running.
     */
    private void evaluated(Evaluation e) {
        running = e.edges().isEmpty();
        if (e.edges().isPresent() && e.edges().get() != edgesOf.edgesOrNone()) {
            edgesOf = e;
            rebuild();
        } else {
            syncStatus();
        }
    }

    private Optional<TransientResult> selected() {
        Analyses.Edges e = edgesOf.edgesOrNone();
        return turnOn.isSelected() ? e.turnOn() : e.turnOff();
    }

    private void rebuild() {
        Optional<TransientResult> r = selected();
        plot = r.map(t -> EdgePlot.of(edgesOf.stage(), t.waveform()));
        figuresFor(r);
        syncStatus();
        redraw();
    }

    private void syncStatus() {
        String s = edgesOf.edgesOrNone().status();
        status.setText(running ? "Running…" : s);
    }

    private void figuresFor(Optional<TransientResult> r) {
        figures.getChildren().clear();
        Label head = new Label(turnOn.isSelected() ? "Turn-on figures" : "Turn-off figures");
        head.getStyleClass().add("sheet-title");
        figures.getChildren().add(head);
        if (r.isEmpty()) {
            return;
        }
        TransientMetrics m = r.get().metrics();
        List<String[]> rows = new ArrayList<>();
        if (turnOn.isSelected()) {
            rows.add(new String[] {"operate time", seconds(m.operateTimeSeconds())});
        } else {
            rows.add(new String[] {"peak switch voltage", Notation.format(m.peakSwitchVolts(), "V")});
            rows.add(new String[] {"peak coil reverse", Notation.format(m.peakCoilReverseVolts(), "V")});
            rows.add(new String[] {"decay to drop-out", seconds(m.decayToReleaseCurrentSeconds())});
            rows.add(new String[] {"decay to zero", seconds(m.decayToZeroSeconds())});
            rows.add(new String[] {"release time", seconds(m.releaseTimeSeconds())});
            rows.add(new String[] {"suppressor energy", Notation.format(m.suppressorEnergyJoules(), "J")});
            rows.add(new String[] {"switch energy", Notation.format(m.switchEnergyJoules(), "J")});
            rows.add(new String[] {"peak suppressor current", Notation.format(m.peakSuppressorAmps(), "A")});
            rows.add(new String[] {"switch breakdown", m.switchBreakdown() ? "yes: avalanche" : "no"});
        }
        // names wrap rather than being cut ("peak suppressor current"); values keep their width
        GridPane grid = new GridPane();
        grid.setHgap(6);
        grid.setVgap(2);
        ColumnConstraints names = new ColumnConstraints();
        names.setHgrow(Priority.ALWAYS);
        names.setMinWidth(60);
        ColumnConstraints values = new ColumnConstraints();
        values.setMinWidth(Region.USE_PREF_SIZE);
        grid.getColumnConstraints().addAll(names, values);
        for (int i = 0; i < rows.size(); i++) {
            Label k = new Label(rows.get(i)[0]);
            k.getStyleClass().add("param-label");
            k.setWrapText(true);
            k.setMinHeight(Region.USE_PREF_SIZE);
            Label v = new Label(rows.get(i)[1]);
            v.getStyleClass().add("reading");
            v.setMinWidth(Region.USE_PREF_SIZE);
            grid.addRow(i, k, v);
        }
        figures.getChildren().add(grid);
        for (String note : r.get().notes()) {
            Label n = new Label(note);
            n.setWrapText(true);
            n.getStyleClass().add("sheet-description");
            figures.getChildren().add(n);
        }
    }

    private static String seconds(double s) {
        return Double.isNaN(s) ? "not within the run" : Notation.format(s, "s");
    }

    private void moveCursor(MouseEvent e) {
        plot.ifPresent(p -> {
            cursorSeconds = EdgePlot.timeAt(p, e.getX(), canvas.getWidth());
            redraw();
        });
    }

    private void resize() {
        canvas.setWidth(Math.max(100, Math.floor(canvasHolder.getWidth())));
        canvas.setHeight(Math.max(80, Math.floor(canvasHolder.getHeight())));
        redraw();
    }

    private void redraw() {
        GraphicsContext g = canvas.getGraphicsContext2D();
        g.clearRect(0, 0, canvas.getWidth(), canvas.getHeight());
        EdgePlot.Plot p = plot.orElse(new EdgePlot.Plot(new double[0], List.of(), List.of()));
        EdgePlot.draw(new FxPen(g, new Affine(1, 0, 0, 0, 1, 0)), p, canvas.getWidth(), canvas.getHeight(),
                cursorSeconds, palette);
    }
}
