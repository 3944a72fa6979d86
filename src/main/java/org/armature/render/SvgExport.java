package org.armature.render;

import org.armature.model.Stage;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGHints;
import org.jfree.svg.ViewBox;

/**
 * SVG of a sheet or a bare drawing, through the same renderer as the canvas. The markup is written by
 * JFreeSVG's {@link SVGGraphics2D} behind the {@link Graphics2DPen}, the pen the PNG export uses too.
 * Text stays text ({@code <text>} elements, searchable and selectable) in the family
 * {@value ExportFonts#FAMILY} with a generic sans-serif fallback. Units are CSS pixels.
 */
public final class SvgExport {

    /** Margin around a bare drawing, grid units. */
    public static final double MARGIN = Sheet.MARGIN_GRID;

    private SvgExport() {
    }

    /** The SVG document of a sheet (drawing and title block) at scale 1. */
    public static String toSvg(Sheet sheet) {
        SVGGraphics2D g = graphics(sheet.width(), sheet.height());
        sheet.draw(new Graphics2DPen(g, Affine.IDENTITY), true);
        return document(g, sheet.width(), sheet.height());
    }

    /**
     * The SVG text of a bare drawing without a title block.
     *
     * @param pixelsPerGrid SVG user units (CSS pixels) per grid unit, positive (the canvas uses
     *     {@link Sheet#PIXELS_PER_GRID})
     */
    public static String toSvg(Stage stage, Annotations annotations, RenderOptions options, double pixelsPerGrid) {
        if (!(pixelsPerGrid > 0)) {
            throw new IllegalArgumentException("pixelsPerGrid must be positive, was " + pixelsPerGrid);
        }
        Box extent = SchematicRenderer.layout(stage, annotations).extent().inflate(MARGIN);
        SVGGraphics2D g = graphics(extent.width() * pixelsPerGrid, extent.height() * pixelsPerGrid);
        Affine base = Affine.scaling(pixelsPerGrid).then(Affine.translation(-extent.minX(), -extent.minY()));
        Graphics2DPen pen = new Graphics2DPen(g, base);
        pen.fillRect(extent, options.palette().paper());
        SchematicRenderer.draw(stage, annotations, options.withGridArea(extent), pen);
        return document(g, extent.width() * pixelsPerGrid, extent.height() * pixelsPerGrid);
    }

    private static SVGGraphics2D graphics(double width, double height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setRenderingHint(SVGHints.KEY_DRAW_STRING_TYPE, SVGHints.VALUE_DRAW_STRING_TYPE_STANDARD);
        // unquoted: JFreeSVG writes the style attribute in single quotes, and CSS reads the two words as one name
        g.setFontFunction(family -> family.equals(ExportFonts.FAMILY) ? ExportFonts.FAMILY + ", sans-serif" : family);
        return g;
    }

    /**
     * The standalone document: an XML declaration and the SVG element with its size and view box. No
     * DOCTYPE: a DTD reference makes validating readers fetch it from the network, and SVG needs none.
     */
    private static String document(SVGGraphics2D g, double width, double height) {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + g.getSVGElement(null, true, new ViewBox(0, 0, width, height), null, null) + "\n";
    }
}
