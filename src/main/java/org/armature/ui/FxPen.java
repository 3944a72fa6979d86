package org.armature.ui;

import java.util.List;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.shape.StrokeLineJoin;
import javafx.scene.text.Font;
import javafx.scene.text.FontWeight;
import javafx.scene.text.TextAlignment;
import org.armature.render.Affine;
import org.armature.render.Colour;
import org.armature.render.DevicePen;
import org.armature.render.Stroke;
import org.armature.render.TextStyle;

/**
 * The JavaFX pen: draws the renderer's device-space primitives on a canvas's graphics context. The
 * context's own transform is left alone (identity expected); the base transform maps grid units to
 * canvas pixels.
 */
public final class FxPen extends DevicePen {

    /** Font family of all drawing text: the platform's logical sans-serif. */
    public static final String FONT_FAMILY = "SansSerif";

    private final GraphicsContext gc;
    private final double minLinePixels;

    /** A pen over a graphics context with a grid-to-pixel base transform. */
    public FxPen(GraphicsContext gc, Affine base) {
        this(gc, base, 0);
    }

    /**
     * A pen that never draws lines thinner than {@code minLinePixels} (small icons stay legible).
     */
    public FxPen(GraphicsContext gc, Affine base, double minLinePixels) {
        super(base);
        this.gc = gc;
        this.minLinePixels = minLinePixels;
    }

    /** The JavaFX colour of a render colour. */
    public static Color fx(Colour c) {
        return Color.rgb(c.red(), c.green(), c.blue(), c.alpha());
    }

    @Override
    protected void devicePolyline(double[] xs, double[] ys, Colour colour, Stroke stroke, boolean closed) {
        setStroke(colour, stroke);
        if (closed) {
            gc.strokePolygon(xs, ys, xs.length);
        } else {
            gc.strokePolyline(xs, ys, xs.length);
        }
    }

    @Override
    protected void deviceFillPolygon(double[] xs, double[] ys, Colour colour) {
        gc.setFill(fx(colour));
        gc.fillPolygon(xs, ys, xs.length);
    }

    @Override
    protected void deviceCircle(double cx, double cy, double r, Colour colour, Stroke stroke) {
        setStroke(colour, stroke);
        gc.strokeOval(cx - r, cy - r, 2 * r, 2 * r);
    }

    @Override
    protected void deviceFillCircle(double cx, double cy, double r, Colour colour) {
        gc.setFill(fx(colour));
        gc.fillOval(cx - r, cy - r, 2 * r, 2 * r);
    }

    @Override
    protected void deviceText(String text, double x, double y, TextStyle style, Colour colour) {
        // a font lookup per label costs more than drawing it; a repaint uses a handful of sizes
        Font font = fonts.computeIfAbsent(style.bold() ? -style.size() : style.size(),
                k -> Font.font(FONT_FAMILY, style.bold() ? FontWeight.BOLD : FontWeight.NORMAL, style.size()));
        if (font != lastFont) {
            gc.setFont(font);
            lastFont = font;
        }
        gc.setFill(fx(colour));
        gc.setTextAlign(switch (style.hAnchor()) {
            case START -> TextAlignment.LEFT;
            case MIDDLE -> TextAlignment.CENTER;
            case END -> TextAlignment.RIGHT;
        });
        gc.setTextBaseline(switch (style.vAnchor()) {
            case TOP -> VPos.TOP;
            case MIDDLE -> VPos.CENTER;
            case BASELINE -> VPos.BASELINE;
            case BOTTOM -> VPos.BOTTOM;
        });
        gc.fillText(text, x, y);
    }

    private final java.util.Map<Double, Font> fonts = new java.util.HashMap<>();
    private Font lastFont;

    private void setStroke(Colour colour, Stroke stroke) {
        gc.setStroke(fx(colour));
        gc.setLineWidth(Math.max(minLinePixels, stroke.width()));
        gc.setLineCap(StrokeLineCap.ROUND);
        gc.setLineJoin(StrokeLineJoin.ROUND);
        List<Double> d = stroke.dashes();
        if (d.isEmpty()) {
            gc.setLineDashes((double[]) null);
        } else {
            gc.setLineCap(StrokeLineCap.BUTT);
            gc.setLineDashes(d.stream().mapToDouble(Double::doubleValue).toArray());
        }
    }
}
