package org.armature.ui;

import java.util.EnumSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Region;
import org.armature.model.GridPoint;
import org.armature.model.ParamKeys;
import org.armature.model.Stage;
import org.armature.model.Wire;
import org.armature.render.Affine;
import org.armature.render.Box;
import org.armature.render.HitTester;
import org.armature.render.Layer;
import org.armature.render.Layout;
import org.armature.render.Palette;
import org.armature.render.RenderOptions;
import org.armature.render.Router;
import org.armature.render.SchematicRenderer;
import org.armature.render.Selection;
import org.armature.render.Snap;

/**
 * The drawing surface of the editor: four stacked canvases drawn by {@link SchematicRenderer}.
 *
 * <p>Layers, bottom to top: (1) paper and {@link Layer#GRID}, redrawn only when the view (zoom, pan,
 * size, theme) changes; (2) {@link Layer#WIRES}, {@link Layer#PARTS} and {@link Layer#LABELS},
 * redrawn only when the parts, wires, values, pin state, a relay's drawn contact state, the theme or
 * the view change; (3) {@link Layer#ANNOTATIONS}, redrawn on every published solve; (4)
 * {@link Layer#SELECTION} and editing previews, redrawn on every pointer move that changes them. The
 * label layout is computed once per repaint and handed on to the next, so labels stay put while
 * only numbers change.
 *
 * <p>The view follows the drawing (fitted on open, on another drawing or file, on resize and when
 * readouts reach past it) until the user zooms or pans; {@link #fit()} makes it follow again.
 *
 * <p>Screen coordinates ({@code screenX}) and grid coordinates ({@code gridX}) never mix: the view
 * transform converts between them, and all hit testing happens in grid units.
 */
public final class SchematicCanvas extends Region {

    /** Pixels per grid unit at zoom 1. */
    public static final double BASE_PIXELS_PER_GRID = 22;
    /** Zoom limits. */
    public static final double MIN_ZOOM = 0.3;
    /** Zoom limits. */
    public static final double MAX_ZOOM = 4;
    /** Zoom factor per wheel notch or key press. */
    public static final double ZOOM_STEP = 1.15;
    /** Hit tolerance in screen pixels (converted to grid units at the present zoom). */
    public static final double HIT_PIXELS = 6;
    /** Snap radius to pins and wire ends, in grid units. */
    public static final double SNAP_GRID = 0.6;

    private final EditorViewModel vm;
    private final Canvas gridLayer = new Canvas();
    private final Canvas drawingLayer = new Canvas();
    private final Canvas annotationLayer = new Canvas();
    private final Canvas overlayLayer = new Canvas();
    /** What the drawing layer shows; it is repainted only when this changes. */
    private Object drawnKey;
    private Palette palette = Palette.LIGHT;
    private double zoom = 1;
    private double offsetX = 40;
    private double offsetY = 40;
    private boolean gridDirty = true;
    private Layout lastLayout;
    private Evaluation drawn;
    /** True while the view follows the drawing (until the user zooms or pans). */
    private boolean autoFit = true;
    private boolean fitting;
    private boolean refitOnNextStage;
    /** Margin around the drawing when fitted, grid units. */
    static final double FIT_MARGIN = 1.5;

    /** Screen pixels of vertical drag per preferred-value step when dragging a value label. */
    public static final double VALUE_DRAG_PIXELS = 8;

    private enum Gesture { NONE, MOVE, WIRE, BAND, PAN, VALUE }

    private Optional<String[]> valueDrag = Optional.empty();
    private double valueDragY;
    private long lastRepaintNanos;
    private java.util.function.LongConsumer repainted = g -> { };

    private Gesture gesture = Gesture.NONE;
    private double pressScreenX;
    private double pressScreenY;
    private GridPoint pressGrid;
    private GridPoint wireStart;
    private List<Wire> previewWires = List.of();
    private Optional<Box> band = Optional.empty();
    private Optional<GridPoint> hover = Optional.empty();
    private int dragDx;
    private int dragDy;

    /** A canvas showing the view model's stage. */
    public SchematicCanvas(EditorViewModel vm) {
        this.vm = vm;
        getStyleClass().add("schematic-canvas");
        getChildren().addAll(gridLayer, drawingLayer, annotationLayer, overlayLayer);
        setFocusTraversable(true);
        setMinSize(200, 200);
        drawn = vm.evaluation();
        vm.evaluationProperty().addListener((o, a, b) -> evaluated(b));
        // a file opened (another path) is fitted when its stage arrives
        vm.fileProperty().addListener((o, x, y) -> refitOnNextStage = y.isPresent() && !y.equals(x));
        vm.previewProperty().addListener((o, a, b) -> redrawDrawing());
        vm.shownReadoutsProperty().addListener((o, a, b) -> redrawDrawing());
        vm.selectionProperty().addListener((o, a, b) -> redrawOverlay());
        // a fault hunt's readings are drawn at their nets
        vm.faultHuntProperty().addListener((o, a, b) -> redrawDrawing());
        addEventHandler(MouseEvent.MOUSE_PRESSED, this::pressed);
        addEventHandler(MouseEvent.MOUSE_DRAGGED, this::dragged);
        addEventHandler(MouseEvent.MOUSE_RELEASED, this::released);
        addEventHandler(MouseEvent.MOUSE_MOVED, this::moved);
        addEventHandler(ScrollEvent.SCROLL, this::scrolled);
        addEventHandler(KeyEvent.KEY_PRESSED, this::key);
        // a right click without a drag (a right drag pans) on a part opens its fault menu; on the
        // click rather than the platform's context-menu request, which comes at press on some systems
        // and not at all on others
        addEventHandler(MouseEvent.MOUSE_CLICKED, e -> {
            if (e.getButton() != MouseButton.SECONDARY || !e.isStillSincePress() || fromEditor(e)) {
                return;
            }
            HitTester.Hit hit = HitTester.at(vm.stage(), gridX(e.getX()), gridY(e.getY()), HIT_PIXELS / scale());
            if (hit instanceof HitTester.PartHit part) {
                faultMenu(part.ref()).show(this, e.getScreenX(), e.getScreenY());
                e.consume();
                return;
            }
            // on a net: the track opens that split it (NET~TOWARD:track-open)
            netAt(e.getX(), e.getY()).ifPresent(net -> {
                netFaultMenu(net).show(this, e.getScreenX(), e.getScreenY());
                e.consume();
            });
        });
        // a left click without a drag on a net (a wire, a junction, a pin or the net's tag) while the
        // fault hunt is open offers to enter a meter reading there
        addEventHandler(MouseEvent.MOUSE_CLICKED, e -> {
            if (e.getButton() != MouseButton.PRIMARY || !e.isStillSincePress() || e.getClickCount() != 1
                    || vm.armedKindProperty().get().isPresent() || fromEditor(e)) {
                return;
            }
            netAt(e.getX(), e.getY()).ifPresent(net -> {
                if (netClicked.clicked(net, e.getX(), e.getY())) {
                    e.consume();
                }
            });
        });
    }

    /** What happens when a net is clicked: shown an editor (true) or nothing (false). */
    @FunctionalInterface
    public interface NetClick {
        /**
         * @param net the net's name, as {@link org.armature.model.Connectivity} names it
         * @param canvasX where, in the canvas's coordinates
         * @param canvasY where, in the canvas's coordinates
         * @return true when the click was taken
         */
        boolean clicked(String net, double canvasX, double canvasY);
    }

    private NetClick netClicked = (net, x, y) -> false;
    private javafx.scene.Node editorNode;

    /** Sets what a click on a net does (the fault hunt offers a reading there); null: nothing. */
    public void setOnNetClicked(NetClick handler) {
        netClicked = handler == null ? (net, x, y) -> false : handler;
    }

    /**
     * The net under a point of the canvas: a net's tag (voltage, test point, reading), else a pin, a
     * wire or a junction of wires; empty over a part body or paper.
     */
    public Optional<String> netAt(double canvasX, double canvasY) {
        double gx = gridX(canvasX);
        double gy = gridY(canvasY);
        if (lastLayout != null) {
            for (org.armature.render.PlacedLabel l : lastLayout.labels()) {
                if (l.box().contains(gx, gy)) {
                    switch (l.kind()) {
                        case VOLTAGE, TEST_POINT, READING -> {
                            return Optional.of(l.owner());
                        }
                        default -> {
                            return Optional.empty();
                        }
                    }
                }
            }
        }
        Stage st = vm.stage();
        HitTester.Hit hit = HitTester.at(st, gx, gy, HIT_PIXELS / scale());
        org.armature.model.Connectivity c = org.armature.model.Connectivity.of(st);
        if (hit instanceof HitTester.WireHit w && w.index() < c.netOfWire().size()) {
            return Optional.of(c.netOfWire().get(w.index()));
        }
        if (hit instanceof HitTester.PinHit p) {
            return Optional.ofNullable(c.net(p.pin().ref(), p.pin().pin()));
        }
        return Optional.empty();
    }

    /**
     * Shows a small editor on the canvas near a point (kept inside the canvas), replacing any shown;
     * it stays until {@link #closeEditor()}.
     */
    public void showEditor(javafx.scene.Node node, double canvasX, double canvasY) {
        closeEditor();
        editorNode = node;
        editorX = canvasX;
        editorY = canvasY;
        node.setManaged(false);
        getChildren().add(node);
        fitEditor();
    }

    private double editorX;
    private double editorY;

    /** Sizes the editor shown to its content again (its text changed) and keeps it inside the canvas. */
    public void fitEditor() {
        if (editorNode == null) {
            return;
        }
        javafx.scene.Node node = editorNode;
        node.applyCss();
        double w = node.prefWidth(-1);
        double h = node.prefHeight(w);
        node.resize(w, h);
        if (node instanceof javafx.scene.Parent p) {
            p.layout();
        }
        double x = Math.max(2, Math.min(editorX + 12, getWidth() - w - 2));
        double y = Math.max(2, Math.min(editorY + 12, getHeight() - h - 2));
        node.relocate(x, y);
    }

    /** Closes the editor shown on the canvas, if any. */
    public void closeEditor() {
        if (editorNode != null) {
            getChildren().remove(editorNode);
            editorNode = null;
            requestFocus();
        }
    }

    /** The editor shown on the canvas, if any (tests). */
    public Optional<javafx.scene.Node> editor() {
        return Optional.ofNullable(editorNode);
    }

    /**
     * The fault menu of a net: one entry per track open of the stage's fault set that splits this
     * net ({@code NET~TOWARD:track-open}: the track toward the parts that also reach net TOWARD), each
     * ticked when injected, and "Clear faults".
     */
    public javafx.scene.control.ContextMenu netFaultMenu(String net) {
        javafx.scene.control.ContextMenu menu = new javafx.scene.control.ContextMenu();
        menu.setId("net-fault-menu");
        for (org.armature.analysis.faults.Fault f : vm.trackFaultsOfNet(net)) {
            String toward = f.ref().substring(f.ref().indexOf('~') + 1);
            javafx.scene.control.CheckMenuItem item = new javafx.scene.control.CheckMenuItem(
                    "Track open on " + net + " toward " + toward);
            item.setId("fault-" + f.id());
            item.setSelected(vm.faultsProperty().get().contains(f));
            item.setOnAction(a -> vm.toggleFault(f));
            menu.getItems().add(item);
        }
        if (menu.getItems().isEmpty()) {
            javafx.scene.control.MenuItem none = new javafx.scene.control.MenuItem(
                    "No track on " + net + " splits it in two");
            none.setDisable(true);
            menu.getItems().add(none);
        }
        javafx.scene.control.MenuItem clear = new javafx.scene.control.MenuItem("Clear faults");
        clear.setId("net-fault-clear");
        clear.setDisable(vm.faultsProperty().get().isEmpty());
        clear.setOnAction(a -> vm.clearFaults());
        menu.getItems().addAll(new javafx.scene.control.SeparatorMenuItem(), clear);
        return menu;
    }

    /**
     * The fault-mode menu of a part: each single fault it can have (ticked when injected; choosing
     * one injects it or takes it out, several may be in at once) and "Clear faults". The drawing then
     * shows the faulted stage's readouts; the document is not changed.
     *
     * @param ref the part's designator
     * @return the menu
     */
    public javafx.scene.control.ContextMenu faultMenu(String ref) {
        javafx.scene.control.ContextMenu menu = new javafx.scene.control.ContextMenu();
        menu.setId("fault-menu");
        for (org.armature.analysis.faults.Fault f : vm.faultsOf(ref)) {
            javafx.scene.control.CheckMenuItem item = new javafx.scene.control.CheckMenuItem("Fault " + f.id());
            item.setId("fault-" + f.id());
            item.setSelected(vm.faultsProperty().get().contains(f));
            item.setOnAction(a -> vm.toggleFault(f));
            menu.getItems().add(item);
        }
        List<org.armature.analysis.faults.Fault> tracks = vm.trackFaultsOf(ref);
        if (!tracks.isEmpty()) {
            javafx.scene.control.Menu sub = new javafx.scene.control.Menu("Track open at a pin");
            for (org.armature.analysis.faults.Fault f : tracks) {
                javafx.scene.control.CheckMenuItem item = new javafx.scene.control.CheckMenuItem(f.id());
                item.setId("fault-" + f.id());
                item.setSelected(vm.faultsProperty().get().contains(f));
                item.setOnAction(a -> vm.toggleFault(f));
                sub.getItems().add(item);
            }
            menu.getItems().add(sub);
        }
        if (menu.getItems().isEmpty()) {
            javafx.scene.control.MenuItem none = new javafx.scene.control.MenuItem(ref + " has no fault to inject");
            none.setDisable(true);
            menu.getItems().add(none);
        }
        javafx.scene.control.MenuItem clear = new javafx.scene.control.MenuItem("Clear faults");
        clear.setId("fault-clear");
        clear.setDisable(vm.faultsProperty().get().isEmpty());
        clear.setOnAction(a -> vm.clearFaults());
        menu.getItems().addAll(new javafx.scene.control.SeparatorMenuItem(), clear);
        return menu;
    }

    /**
     * Takes a published evaluation. One whose readouts are in is drawn; a pending one is drawn only
     * when its drawing differs from the one shown (a part placed or moved), and then without
     * readouts. A change of values only (a slider step) thus keeps the last whole evaluation on the
     * screen until its successor's readouts arrive: one repaint per edit, never the new stage with the
     * old readouts.
     */
    private void evaluated(Evaluation e) {
        Evaluation before = drawn;
        if (e.readoutsReady() || before == null || !sameDrawing(before.stage(), e.stage())) {
            drawn = e;
            // another drawing (a new stage from a template, another tab, an opened file) is fitted
            // again; an edit of the same stage is not
            boolean another = before == null
                    || !sameDrawing(before.stage(), e.stage()) && !before.stage().name().equals(e.stage().name());
            if (another || refitOnNextStage) {
                refitOnNextStage = false;
                lastLayout = null;
                fit();
                return;
            }
            redrawDrawing();
        }
    }

    /** The readouts drawn with {@link #shownStage()}: none on a drag preview, which no one has solved. */
    private org.armature.render.Annotations shownAnnotations() {
        return vm.previewProperty().get().isPresent() ? org.armature.render.Annotations.NONE : vm.annotations(drawn);
    }

    /** The evaluation the drawing layer shows. */
    public Evaluation drawnEvaluation() {
        return drawn;
    }

    /** The stage the canvas shows: the drag preview if any, else the drawn evaluation's. */
    private Stage shownStage() {
        return vm.previewProperty().get().orElse(drawn.stage());
    }

    /** True when two stages draw the same but for values and conditions (same parts, places and wires). */
    static boolean sameDrawing(Stage a, Stage b) {
        if (a.parts().size() != b.parts().size() || !a.wires().equals(b.wires())
                || !a.testPoints().equals(b.testPoints())) {
            return false;
        }
        for (int i = 0; i < a.parts().size(); i++) {
            var pa = a.parts().get(i);
            var pb = b.parts().get(i);
            if (!pa.ref().equals(pb.ref()) || pa.kind() != pb.kind() || !pa.placement().equals(pb.placement())) {
                return false;
            }
        }
        return true;
    }

    // ------------------------------------------------------------------ view

    /** Pixels per grid unit at the present zoom. */
    public double scale() {
        return BASE_PIXELS_PER_GRID * zoom;
    }

    /** The grid-to-screen transform. */
    public Affine view() {
        return new Affine(scale(), 0, offsetX, 0, scale(), offsetY);
    }

    /** Grid x of a screen x. */
    public double gridX(double screenX) {
        return (screenX - offsetX) / scale();
    }

    /** Grid y of a screen y. */
    public double gridY(double screenY) {
        return (screenY - offsetY) / scale();
    }

    /** The last layout drawn (labels and extent), for tests and tooltips. */
    public Layout lastLayout() {
        return lastLayout;
    }

    /** The canvas with parts, wires, labels and readouts (for snapshots). */
    public Canvas drawingLayer() {
        return drawingLayer;
    }

    /** Uses another palette (theme switch). */
    public void setPalette(Palette p) {
        palette = p;
        gridDirty = true;
        redrawAll();
    }

    /** The palette in use. */
    public Palette palette() {
        return palette;
    }

    /** Zooms by a factor about a screen point; the view stops following the drawing's size. */
    public void zoomAt(double factor, double screenX, double screenY) {
        autoFit = false;
        double gx = gridX(screenX);
        double gy = gridY(screenY);
        zoom = Math.max(MIN_ZOOM, Math.min(MAX_ZOOM, zoom * factor));
        offsetX = screenX - gx * scale();
        offsetY = screenY - gy * scale();
        gridDirty = true;
        redrawAll();
    }

    /** Zooms in about the centre. */
    public void zoomIn() {
        zoomAt(ZOOM_STEP, getWidth() / 2, getHeight() / 2);
    }

    /** Zooms out about the centre. */
    public void zoomOut() {
        zoomAt(1 / ZOOM_STEP, getWidth() / 2, getHeight() / 2);
    }

    /**
     * Fits the whole drawing (with labels and readouts) into the view, and keeps it fitted on every
     * resize and readout change until the user zooms or pans ({@link #fitsAutomatically()}).
     */
    public void fit() {
        fit(true);
    }

    /**
     * Fits the view to the drawing.
     *
     * @param zoomIn whether the view may grow; false while the user draws (a part placed past the
     *     edge widens the view, but the first part placed on an empty sheet does not fill the window)
     */
    private void fit(boolean zoomIn) {
        autoFit = true;
        double w = getWidth();
        double h = getHeight();
        if (w <= 0 || h <= 0) {
            return;
        }
        if (shownStage().parts().isEmpty() && shownStage().wires().isEmpty()) {
            // nothing to fit: an empty drawing keeps the default view instead of zooming into its origin
            zoom = 1;
            offsetX = 40;
            offsetY = 40;
            gridDirty = true;
            redrawAll();
            return;
        }
        Box e = SchematicRenderer.layout(shownStage(), shownAnnotations(),
                lastLayout == null ? Layout.NONE : lastLayout).extent().inflate(FIT_MARGIN);
        double fitted = Math.max(MIN_ZOOM, Math.min(MAX_ZOOM, Math.min(w / e.width(), h / e.height()) / BASE_PIXELS_PER_GRID));
        zoom = zoomIn ? fitted : Math.min(zoom, fitted);
        offsetX = (w - e.width() * scale()) / 2 - e.minX() * scale();
        offsetY = (h - e.height() * scale()) / 2 - e.minY() * scale();
        gridDirty = true;
        redrawAll();
    }

    /** True while the view follows the drawing: fitted on open, on a new stage and on resize. */
    public boolean fitsAutomatically() {
        return autoFit;
    }

    /** The drawing's extent (parts, wires, labels, readouts) in screen pixels, as last drawn. */
    public Optional<javafx.geometry.BoundingBox> drawingBoundsOnScreen() {
        if (lastLayout == null) {
            return Optional.empty();
        }
        Box e = lastLayout.extent();
        double x = e.minX() * scale() + offsetX;
        double y = e.minY() * scale() + offsetY;
        return Optional.of(new javafx.geometry.BoundingBox(x, y, e.width() * scale(), e.height() * scale()));
    }

    private void pan(double dxScreen, double dyScreen) {
        autoFit = false;
        offsetX += dxScreen;
        offsetY += dyScreen;
        gridDirty = true;
        redrawAll();
    }

    @Override
    protected void layoutChildren() {
        double w = Math.floor(getWidth());
        double h = Math.floor(getHeight());
        for (Canvas c : new Canvas[] {gridLayer, drawingLayer, annotationLayer, overlayLayer}) {
            if (c.getWidth() != w || c.getHeight() != h) {
                c.setWidth(w);
                c.setHeight(h);
                gridDirty = true;
            }
        }
        if (gridDirty) {
            if (autoFit) {
                fit();
            } else {
                redrawAll();
            }
        }
    }

    private void redrawAll() {
        redrawGrid();
        redrawDrawing();
        redrawOverlay();
    }

    private RenderOptions options(Set<Layer> layers) {
        Box visible = Box.spanning(gridX(0), gridY(0), gridX(getWidth()), gridY(getHeight()));
        return RenderOptions.all().withPalette(palette).withLayers(layers).withGridArea(visible)
                .withSelection(vm.selectionProperty().get());
    }

    private void redrawGrid() {
        if (!gridDirty) {
            return;
        }
        GraphicsContext g = gridLayer.getGraphicsContext2D();
        g.setFill(FxPen.fx(palette.paper()));
        g.fillRect(0, 0, gridLayer.getWidth(), gridLayer.getHeight());
        SchematicRenderer.draw(shownStage(), org.armature.render.Annotations.NONE, options(EnumSet.of(Layer.GRID)),
                new FxPen(g, view()));
        gridDirty = false;
    }

    /** Time the last repaint of the drawing layer took on the FX thread, ns (issuing the draw calls). */
    public long lastRepaintNanos() {
        return lastRepaintNanos;
    }

    /**
     * Repaints what changed since the last repaint: the label layout is computed once, keeping every
     * label where it was while only numbers change ({@link SchematicRenderer#layout(Stage,
     * org.armature.render.Annotations, Layout)}); the drawing layer (wires, symbols, designators and
     * values) is repainted only when those change, the annotation layer (test point tags and
     * readouts) every time. A slider drag therefore repaints the readouts alone.
     */
    private void redrawDrawing() {
        long start = System.nanoTime();
        Stage st = shownStage();
        org.armature.render.Annotations a = shownAnnotations();
        lastLayout = SchematicRenderer.layout(st, a, lastLayout == null ? Layout.NONE : lastLayout);
        if (autoFit && !fitting && getWidth() > 0 && getHeight() > 0) {
            Box visible = Box.spanning(gridX(0), gridY(0), gridX(getWidth()), gridY(getHeight()));
            if (!visible.contains(lastLayout.extent())) {
                // readouts arrived and reach past the view: fit again (once; fit redraws)
                fitting = true;
                try {
                    fit(false);
                } finally {
                    fitting = false;
                }
                return;
            }
        }
        Object key = List.of(st.parts(), st.wires(), st.conditions().pinHigh(), operated(a), palette, view(),
                drawingLayer.getWidth(), drawingLayer.getHeight(), partLabels(lastLayout));
        if (!key.equals(drawnKey)) {
            GraphicsContext g = drawingLayer.getGraphicsContext2D();
            g.clearRect(0, 0, drawingLayer.getWidth(), drawingLayer.getHeight());
            SchematicRenderer.draw(st, a, options(EnumSet.of(Layer.WIRES, Layer.PARTS, Layer.LABELS)),
                    new FxPen(g, view()), lastLayout);
            drawnKey = key;
        }
        redrawAnnotations(st, a);
        lastRepaintNanos = System.nanoTime() - start;
        repainted.accept(drawn.generation());
    }

    /** Repaints the annotation layer alone, with the layout of the last repaint. */
    private void redrawAnnotations(Stage st, org.armature.render.Annotations a) {
        GraphicsContext g = annotationLayer.getGraphicsContext2D();
        g.clearRect(0, 0, annotationLayer.getWidth(), annotationLayer.getHeight());
        SchematicRenderer.draw(st, a, options(EnumSet.of(Layer.ANNOTATIONS)), new FxPen(g, view()), lastLayout);
    }

    /** The relays drawn operated: their contact sets belong to the drawing layer. */
    private static Set<String> operated(org.armature.render.Annotations a) {
        Set<String> out = new java.util.TreeSet<>();
        for (org.armature.render.Annotations.RelayGauge g : a.gauges()) {
            if (g.operated()) {
                out.add(g.ref());
            }
        }
        return out;
    }

    private static List<org.armature.render.PlacedLabel> partLabels(Layout l) {
        return l.labels(org.armature.render.PlacedLabel.Kind.PART);
    }

    /** True when the drawing layer was last painted for exactly what it would show now (tests). */
    boolean drawingLayerCurrent() {
        Stage st = shownStage();
        org.armature.render.Annotations a = shownAnnotations();
        return drawnKey != null && drawnKey.equals(List.of(st.parts(), st.wires(), st.conditions().pinHigh(),
                operated(a), palette, view(), drawingLayer.getWidth(), drawingLayer.getHeight(), partLabels(lastLayout)));
    }

    /**
     * Called at the end of every repaint of the drawing layer with the generation of the readouts
     * painted ({@link Evaluation#generation()}): the hook of latency probes.
     */
    public void setOnRepainted(java.util.function.LongConsumer listener) {
        repainted = listener == null ? g -> { } : listener;
    }

    /**
     * The part value label under a screen point that can be stepped through preferred values:
     * {designator, parameter key}. Resistors and capacitors have one.
     */
    public Optional<String[]> steppableValueAt(double screenX, double screenY) {
        if (lastLayout == null) {
            return Optional.empty();
        }
        double gx = gridX(screenX);
        double gy = gridY(screenY);
        for (org.armature.render.PlacedLabel l : lastLayout.labels(org.armature.render.PlacedLabel.Kind.PART)) {
            if (l.box().contains(gx, gy)) {
                Optional<org.armature.model.Part> p = vm.stage().part(l.owner());
                if (p.isPresent()) {
                    String key = switch (p.get().kind()) {
                        case RESISTOR -> ParamKeys.RESISTANCE_OHMS;
                        case CAPACITOR -> ParamKeys.CAPACITANCE_FARADS;
                        default -> "";
                    };
                    if (!key.isEmpty()) {
                        return Optional.of(new String[] {l.owner(), key});
                    }
                }
            }
        }
        return Optional.empty();
    }

    private void redrawOverlay() {
        GraphicsContext g = overlayLayer.getGraphicsContext2D();
        g.clearRect(0, 0, overlayLayer.getWidth(), overlayLayer.getHeight());
        Selection sel = gesture == Gesture.MOVE && dragDx != 0 || gesture == Gesture.MOVE && dragDy != 0
                ? new Selection(vm.selectionProperty().get().refs(), Set.of()) : vm.selectionProperty().get();
        RenderOptions o = options(EnumSet.of(Layer.SELECTION)).withSelection(sel).withPreview(previewWires, band, hover);
        SchematicRenderer.draw(shownStage(), org.armature.render.Annotations.NONE, o, new FxPen(g, view()));
    }

    // ------------------------------------------------------------------ input

    private void pressed(MouseEvent e) {
        if (fromEditor(e)) {
            return;
        }
        closeEditor();
        requestFocus();
        pressScreenX = e.getX();
        pressScreenY = e.getY();
        double gx = gridX(e.getX());
        double gy = gridY(e.getY());
        pressGrid = Snap.toGrid(gx, gy);
        if (e.getButton() == MouseButton.MIDDLE || e.getButton() == MouseButton.SECONDARY) {
            gesture = Gesture.PAN;
            return;
        }
        if (vm.armedKindProperty().get().isPresent()) {
            vm.place(vm.armedKindProperty().get().get(), pressGrid);
            gesture = Gesture.NONE;
            return;
        }
        valueDrag = steppableValueAt(e.getX(), e.getY());
        if (valueDrag.isPresent()) {
            vm.select(Selection.ofPart(valueDrag.get()[0]));
            gesture = Gesture.VALUE;
            valueDragY = e.getY();
            return;
        }
        Stage st = vm.stage();
        HitTester.Hit hit = HitTester.at(st, gx, gy, HIT_PIXELS / scale());
        if (hit instanceof HitTester.PinHit pin) {
            gesture = Gesture.WIRE;
            wireStart = pin.at();
            previewWires = List.of();
        } else if (hit instanceof HitTester.PartHit part) {
            Selection cur = vm.selectionProperty().get();
            if (e.isShiftDown() || e.isShortcutDown()) {
                Set<String> refs = new LinkedHashSet<>(cur.refs());
                if (!refs.remove(part.ref())) {
                    refs.add(part.ref());
                }
                vm.select(new Selection(refs, cur.wires()));
            } else if (!cur.refs().contains(part.ref())) {
                vm.select(Selection.ofPart(part.ref()));
            }
            gesture = Gesture.MOVE;
            dragDx = 0;
            dragDy = 0;
        } else if (hit instanceof HitTester.WireHit wire) {
            vm.select(new Selection(Set.of(), Set.of(wire.index())));
            gesture = Gesture.NONE;
        } else {
            if (!e.isShiftDown()) {
                vm.select(Selection.EMPTY);
            }
            gesture = Gesture.BAND;
            band = Optional.empty();
        }
    }

    /** True when an event comes from the editor shown on the canvas (its keys and clicks are its own). */
    private boolean fromEditor(javafx.event.Event e) {
        return editorNode != null && e.getTarget() instanceof javafx.scene.Node n && isInside(n, editorNode);
    }

    private static boolean isInside(javafx.scene.Node n, javafx.scene.Node root) {
        for (javafx.scene.Node x = n; x != null; x = x.getParent()) {
            if (x == root) {
                return true;
            }
        }
        return false;
    }

    private void dragged(MouseEvent e) {
        if (fromEditor(e)) {
            return;
        }
        double gx = gridX(e.getX());
        double gy = gridY(e.getY());
        switch (gesture) {
            case PAN -> {
                pan(e.getX() - pressScreenX, e.getY() - pressScreenY);
                pressScreenX = e.getX();
                pressScreenY = e.getY();
            }
            case MOVE -> {
                GridPoint now = Snap.toGrid(gx, gy);
                int dx = now.gridX() - pressGrid.gridX();
                int dy = now.gridY() - pressGrid.gridY();
                if (dx != dragDx || dy != dragDy) {
                    dragDx = dx;
                    dragDy = dy;
                    vm.previewMove(dx, dy);
                    redrawOverlay();
                }
            }
            case WIRE -> {
                GridPoint end = Snap.toConnectionOrGrid(vm.stage(), gx, gy, SNAP_GRID);
                previewWires = Router.route(vm.stage(), wireStart, end);
                hover = Snap.connectionNear(vm.stage(), gx, gy, SNAP_GRID);
                redrawOverlay();
            }
            case BAND -> {
                band = Optional.of(Box.spanning(gridX(pressScreenX), gridY(pressScreenY), gx, gy));
                redrawOverlay();
            }
            case VALUE -> valueDrag.ifPresent(v -> {
                int steps = (int) ((valueDragY - e.getY()) / VALUE_DRAG_PIXELS);
                if (steps != 0) {
                    valueDragY -= steps * VALUE_DRAG_PIXELS;
                    vm.stepPreferred(v[0], v[1], steps);
                }
            });
            default -> {
            }
        }
    }

    private void released(MouseEvent e) {
        if (fromEditor(e)) {
            return;
        }
        double gx = gridX(e.getX());
        double gy = gridY(e.getY());
        switch (gesture) {
            case MOVE -> {
                if (dragDx != 0 || dragDy != 0) {
                    vm.moveSelection(dragDx, dragDy);
                } else {
                    vm.clearPreview();
                }
            }
            case WIRE -> {
                GridPoint end = Snap.toConnectionOrGrid(vm.stage(), gx, gy, SNAP_GRID);
                if (!end.equals(wireStart)) {
                    vm.drawWire(wireStart, end);
                }
            }
            case BAND -> band.ifPresent(b -> {
                Selection cur = vm.selectionProperty().get();
                Set<String> refs = new LinkedHashSet<>(e.isShiftDown() ? cur.refs() : Set.of());
                refs.addAll(HitTester.partsWithin(vm.stage(), b));
                Set<Integer> wires = new LinkedHashSet<>(e.isShiftDown() ? cur.wires() : Set.of());
                wires.addAll(HitTester.wiresWithin(vm.stage(), b));
                vm.select(new Selection(refs, wires));
            });
            default -> {
            }
        }
        gesture = Gesture.NONE;
        previewWires = List.of();
        band = Optional.empty();
        dragDx = 0;
        dragDy = 0;
        redrawOverlay();
    }

    private void moved(MouseEvent e) {
        setCursor(steppableValueAt(e.getX(), e.getY()).isPresent() ? javafx.scene.Cursor.V_RESIZE : null);
        Optional<GridPoint> h = Snap.connectionNear(vm.stage(), gridX(e.getX()), gridY(e.getY()), HIT_PIXELS / scale());
        if (!h.equals(hover)) {
            hover = h;
            redrawOverlay();
        }
    }

    private void scrolled(ScrollEvent e) {
        if (fromEditor(e) || e.getDeltaY() == 0) {
            return;
        }
        Optional<String[]> v = steppableValueAt(e.getX(), e.getY());
        if (v.isPresent()) {
            vm.stepPreferred(v.get()[0], v.get()[1], e.getDeltaY() > 0 ? 1 : -1);
            e.consume();
            return;
        }
        zoomAt(e.getDeltaY() > 0 ? ZOOM_STEP : 1 / ZOOM_STEP, e.getX(), e.getY());
        e.consume();
    }

    private void key(KeyEvent e) {
        if (fromEditor(e)) {
            return;
        }
        KeyCode k = e.getCode();
        boolean nudge = !vm.selectionProperty().get().refs().isEmpty() && !e.isShortcutDown();
        switch (k) {
            case LEFT -> { if (nudge) { vm.moveSelection(-1, 0); } else { pan(scale(), 0); } }
            case RIGHT -> { if (nudge) { vm.moveSelection(1, 0); } else { pan(-scale(), 0); } }
            case UP -> { if (nudge) { vm.moveSelection(0, -1); } else { pan(0, scale()); } }
            case DOWN -> { if (nudge) { vm.moveSelection(0, 1); } else { pan(0, -scale()); } }
            case R -> vm.rotate();
            case M -> vm.mirror();
            case DELETE, BACK_SPACE -> vm.delete();
            case ESCAPE -> {
                vm.arm(Optional.empty());
                vm.select(Selection.EMPTY);
            }
            case PLUS, EQUALS, ADD -> zoomIn();
            case MINUS, SUBTRACT -> zoomOut();
            case F -> fit();
            default -> {
                return;
            }
        }
        e.consume();
    }
}
