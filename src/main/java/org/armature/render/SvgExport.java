package org.armature.render;

import org.armature.model.Stage;

/** A stage with its readouts as one SVG document, through the same renderer as the canvas. */
public final class SvgExport {

    /** Margin around the drawing, grid units. */
    public static final double MARGIN = 1.5;

    private SvgExport() {
    }

    /**
     * The SVG text of a drawing.
     *
     * @param pixelsPerGrid SVG user units (CSS pixels) per grid unit, positive (the canvas uses 20)
     */
    public static String toSvg(Stage stage, Annotations annotations, RenderOptions options, double pixelsPerGrid) {
        Box extent = SchematicRenderer.layout(stage, annotations).extent().inflate(MARGIN);
        double w = extent.width() * pixelsPerGrid;
        double h = extent.height() * pixelsPerGrid;
        Affine base = Affine.scaling(pixelsPerGrid).then(Affine.translation(-extent.minX(), -extent.minY()));
        SvgPen pen = new SvgPen(w, h, base);
        pen.fillRect(extent, options.palette().paper());
        SchematicRenderer.draw(stage, annotations, options.withGridArea(extent), pen);
        return pen.toSvg();
    }
}
