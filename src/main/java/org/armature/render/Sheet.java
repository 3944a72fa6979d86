package org.armature.render;

import org.armature.model.Stage;

/**
 * One exported sheet: the annotated drawing of a stage through {@link SchematicRenderer} (the same
 * call and options the canvas makes for these layers) with a title block under it. SVG, PNG and the
 * report's schematic all draw a sheet, so they show the same thing.
 *
 * <p>Immutable. Sheet units are CSS pixels at scale 1 ({@value #PIXELS_PER_GRID} per grid unit, the canvas at
 * zoom 1); a pen's base transform scales them to its device (image pixels, PDF points).
 *
 * <p>Its parts: the stage, its readouts ({@link Annotations#NONE} for a bare drawing), what the
 * title block says, the colours (the light print theme unless another is asked for), and whether
 * the title block is drawn (without it: the bare drawing with its margin).
 */
public final class Sheet {

    /** Sheet units (CSS pixels) per grid unit: the canvas's size at zoom 1. */
    public static final double PIXELS_PER_GRID = 22;
    /** Margin around the drawing, grid units. */
    public static final double MARGIN_GRID = 1.5;
    /** Height of the title block, sheet units. */
    public static final double TITLE_HEIGHT = 62;
    /** Smallest width of the title block, sheet units. */
    public static final double TITLE_MIN_WIDTH = 480;
    /** Margin around the title block, sheet units. */
    public static final double TITLE_MARGIN = 12;

    private static final TextStyle NAME = new TextStyle(15, true, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
    private static final TextStyle DOC = new TextStyle(12, false, TextStyle.HAnchor.END, TextStyle.VAnchor.TOP);
    private static final TextStyle COND = new TextStyle(11, false, TextStyle.HAnchor.START, TextStyle.VAnchor.TOP);
    private static final TextStyle DATE = new TextStyle(10, false, TextStyle.HAnchor.END, TextStyle.VAnchor.TOP);

    private final Stage stage;
    private final Annotations annotations;
    private final TitleBlock title;
    private final Palette palette;
    private final boolean titled;
    /** The drawing's extent plus margin: the label layout is the costly part, so it is found once. */
    private final Box extent;

    /** A sheet, with or without its title block. */
    public Sheet(Stage stage, Annotations annotations, TitleBlock title, Palette palette, boolean titled) {
        if (stage == null || annotations == null || title == null || palette == null) {
            throw new IllegalArgumentException("a sheet needs a stage, annotations, a title block and a palette");
        }
        this.stage = stage;
        this.annotations = annotations;
        this.title = title;
        this.palette = palette;
        this.titled = titled;
        this.extent = SchematicRenderer.layout(stage, annotations).extent().inflate(MARGIN_GRID);
    }

    /** The stage drawn. */
    public Stage stage() {
        return stage;
    }

    /** Its readouts. */
    public Annotations annotations() {
        return annotations;
    }

    /** What the title block says. */
    public TitleBlock title() {
        return title;
    }

    /** The colours. */
    public Palette palette() {
        return palette;
    }

    /** True when the title block is drawn. */
    public boolean titled() {
        return titled;
    }

    /** A sheet with its title block. */
    public Sheet(Stage stage, Annotations annotations, TitleBlock title, Palette palette) {
        this(stage, annotations, title, palette, true);
    }

    /** The same sheet with or without its title block. */
    public Sheet withTitle(boolean show) {
        return show == titled ? this : new Sheet(stage, annotations, title, palette, show);
    }

    /** The same sheet with other readouts ({@link Annotations#NONE} for the bare drawing). */
    public Sheet withAnnotations(Annotations a) {
        return new Sheet(stage, a, title, palette, titled);
    }

    /** The drawing's area in grid units: the layout's extent plus {@link #MARGIN_GRID}. */
    public Box drawingExtent() {
        return extent;
    }

    /** Sheet width, sheet units. */
    public double width() {
        if (!titled) {
            return Math.ceil(drawingExtent().width() * PIXELS_PER_GRID);
        }
        double text = Math.max(NAME.width(title.stageName()) + DOC.width(title.documentTitle()) + 40,
                COND.width(conditionsLine()) + 20);
        double block = Math.max(TITLE_MIN_WIDTH, text) + 2 * TITLE_MARGIN;
        return Math.ceil(Math.max(drawingExtent().width() * PIXELS_PER_GRID, block));
    }

    /** Sheet height, sheet units. */
    public double height() {
        if (!titled) {
            return Math.ceil(drawingExtent().height() * PIXELS_PER_GRID);
        }
        return Math.ceil(drawingExtent().height() * PIXELS_PER_GRID + TITLE_HEIGHT + 2 * TITLE_MARGIN);
    }

    /** The drawing's area on the sheet, sheet units. */
    public Box drawingBox() {
        Box e = drawingExtent();
        double w = e.width() * PIXELS_PER_GRID;
        double left = (width() - w) / 2;
        return new Box(left, 0, left + w, e.height() * PIXELS_PER_GRID);
    }

    /** The map from grid units to sheet units for the drawing. */
    public Affine drawingTransform() {
        Box e = drawingExtent();
        Box d = drawingBox();
        return Affine.translation(d.minX(), d.minY()).then(Affine.scaling(PIXELS_PER_GRID))
                .then(Affine.translation(-e.minX(), -e.minY()));
    }

    /** The render options of an export: the drawing's layers (no grid, no selection) in this palette. */
    public RenderOptions renderOptions() {
        return RenderOptions.export(palette).withGridArea(drawingExtent());
    }

    /**
     * Draws the sheet with the pen's transform mapping sheet units to its device.
     *
     * @param pen where to draw; its transform is left as found
     * @param paper fill the sheet with the palette's paper first; false leaves it transparent
     */
    public void draw(Pen pen, boolean paper) {
        double w = width();
        double h = height();
        if (paper) {
            pen.fillRect(new Box(0, 0, w, h), palette.paper());
        }
        pen.push(drawingTransform());
        SchematicRenderer.draw(stage, annotations, renderOptions(), pen);
        pen.pop();
        if (titled) {
            drawTitle(pen, w, h);
        }
    }

    /** The conditions as the title block writes them. */
    public String conditionsLine() {
        return title.conditions().isEmpty() ? "" : "Readouts: " + title.conditions();
    }

    private void drawTitle(Pen pen, double w, double h) {
        double top = h - TITLE_MARGIN - TITLE_HEIGHT;
        Box frame = new Box(TITLE_MARGIN, top, w - TITLE_MARGIN, h - TITLE_MARGIN);
        pen.fillRect(frame, palette.tagFill());
        pen.strokeRect(frame, palette.ink(), Stroke.solid(1));
        double divider = top + 27;
        pen.line(frame.minX(), divider, frame.maxX(), divider, palette.gridMajor(), Stroke.solid(0.8));
        pen.text(title.stageName(), frame.minX() + 10, top + 6, NAME, palette.ink());
        pen.text(title.documentTitle(), frame.maxX() - 10, top + 8, DOC, palette.valueInk());
        pen.text(conditionsLine(), frame.minX() + 10, divider + 6, COND, palette.labelInk());
        pen.text(title.date(), frame.maxX() - 10, divider + 20, DATE, palette.valueInk());
    }

    /** The bare drawing of a stage: no title block, the margin around the drawing only. */
    public static Sheet bare(Stage stage, Annotations annotations, Palette palette) {
        return new Sheet(stage, annotations, new TitleBlock(stage.name(), "", "", ""), palette, false);
    }
}
