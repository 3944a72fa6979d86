package org.armature.ui;

import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.function.BiConsumer;
import javafx.geometry.Point2D;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.ToggleButton;
import javafx.scene.control.ToggleGroup;
import javafx.scene.control.Tooltip;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.layout.VBox;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.render.Affine;
import org.armature.render.Annotations;
import org.armature.render.Box;
import org.armature.render.Layer;
import org.armature.render.Palette;
import org.armature.render.PartGeometry;
import org.armature.render.RenderOptions;
import org.armature.render.SchematicRenderer;

/**
 * The narrow column of allowed parts. Each button's icon is the part's own symbol drawn by the
 * schematic renderer; clicking arms the kind, and the next click on the drawing places it. Dragging a
 * button onto the drawing places the part where it is dropped.
 */
public final class PartPalette extends ScrollPane {

    /** Icon size in pixels. */
    public static final double ICON_PIXELS = 40;

    /** Thinnest icon line in pixels, so the tall and wide symbols do not fade. */
    public static final double ICON_MIN_LINE_PIXELS = 1.1;

    /** The kinds in palette order: drive and rails, passives, switches, relay and load. */
    public static final List<PartKind> ORDER = List.of(PartKind.DRIVE_PIN, PartKind.SUPPLY, PartKind.GROUND,
            PartKind.RESISTOR, PartKind.DIODE, PartKind.ZENER, PartKind.TVS, PartKind.CAPACITOR, PartKind.LED,
            PartKind.NPN, PartKind.PNP, PartKind.NMOS, PartKind.DARLINGTON, PartKind.RELAY, PartKind.LOAD);

    private final ToggleGroup group = new ToggleGroup();
    private final VBox column = new VBox(2);
    private BiConsumer<PartKind, Point2D> onDrop = (k, p) -> { };

    /** A palette arming kinds on the view model. */
    public PartPalette(EditorViewModel vm, Palette colours) {
        getStyleClass().add("part-palette");
        column.getStyleClass().add("part-palette-column");
        for (PartKind k : ORDER) {
            ToggleButton b = new ToggleButton();
            b.setGraphic(icon(k, colours));
            b.setToggleGroup(group);
            b.setUserData(k);
            b.setId("palette-" + k.name().toLowerCase(java.util.Locale.ROOT));
            b.getStyleClass().add("palette-button");
            b.setTooltip(new Tooltip(k.title() + "\n" + k.description()));
            b.setOnAction(e -> vm.arm(b.isSelected() ? Optional.of(k) : Optional.empty()));
            // a press on the button and a release elsewhere is a drag from the palette: the release
            // point decides where the part goes (the button keeps the mouse until the release)
            b.addEventHandler(MouseEvent.MOUSE_RELEASED, e -> {
                if (e.getButton() == MouseButton.PRIMARY && !b.contains(e.getX(), e.getY())) {
                    onDrop.accept(k, new Point2D(e.getSceneX(), e.getSceneY()));
                }
            });
            column.getChildren().add(b);
        }
        vm.armedKindProperty().addListener((o, a, now) -> {
            if (now.isEmpty() && group.getSelectedToggle() != null) {
                group.getSelectedToggle().setSelected(false);
            }
        });
        setContent(column);
        setFitToWidth(true);
        setHbarPolicy(ScrollBarPolicy.NEVER);
    }

    /**
     * What a drag from a button to somewhere else does: receives the kind and the release point in
     * scene coordinates (the window places the part when the point is on the drawing).
     */
    public void setOnDrop(BiConsumer<PartKind, Point2D> handler) {
        onDrop = handler == null ? (k, p) -> { } : handler;
    }

    /** Redraws the icons in other colours (theme switch). */
    public void setColours(Palette colours) {
        for (javafx.scene.Node n : column.getChildren()) {
            if (n instanceof ToggleButton b && b.getUserData() instanceof PartKind k) {
                b.setGraphic(icon(k, colours));
            }
        }
    }

    /** The symbol of a kind drawn into a small canvas. */
    public static Canvas icon(PartKind kind, Palette colours) {
        Canvas c = new Canvas(ICON_PIXELS, ICON_PIXELS);
        Part p = Part.of("X", kind, Placement.at(0, 0));
        Stage s = new Stage("", "", List.of(p), List.of(), List.of(), null);
        Box b = PartGeometry.bounds(p).inflate(0.3);
        double k = Math.min(ICON_PIXELS / b.width(), ICON_PIXELS / b.height());
        double ox = (ICON_PIXELS - b.width() * k) / 2 - b.minX() * k;
        double oy = (ICON_PIXELS - b.height() * k) / 2 - b.minY() * k;
        SchematicRenderer.draw(s, Annotations.NONE, RenderOptions.all().withPalette(colours).withLayers(EnumSet.of(Layer.PARTS)),
                new FxPen(c.getGraphicsContext2D(), new Affine(k, 0, ox, 0, k, oy), ICON_MIN_LINE_PIXELS));
        return c;
    }
}
