package org.armature.render;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.font.FontRenderContext;
import java.awt.font.LineMetrics;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The Java2D pen: the renderer's device-space primitives onto any {@link Graphics2D}. The PNG export
 * hands it the graphics of an image, the SVG export the graphics of JFreeSVG's SVG writer, so both
 * formats get one drawing code.
 *
 * <p>Text is set in {@link ExportFonts} (DejaVu Sans) and placed by the font's own metrics: the
 * width from the string's advance, the vertical anchors from ascent and descent. Lines have round
 * caps and joins as on the canvas; dashed lines have butt caps so the dashes keep their length.
 * The graphics' own transform is left alone (identity expected); the base transform maps user units
 * to device units.
 */
public final class Graphics2DPen extends DevicePen {

    private final Graphics2D g;
    private final Map<Float, Font> regular = new HashMap<>();
    private final Map<Float, Font> bold = new HashMap<>();

    /**
     * @param g the graphics to draw on; its antialiasing hints are switched on, nothing else changes
     * @param base user-to-device transform
     */
    public Graphics2DPen(Graphics2D g, Affine base) {
        super(base);
        this.g = g;
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
    }

    /** The AWT colour of a render colour. */
    public static Color awt(Colour c) {
        return new Color(c.red(), c.green(), c.blue(), (int) Math.round(c.alpha() * 255));
    }

    @Override
    protected void devicePolyline(double[] xs, double[] ys, Colour colour, Stroke stroke, boolean closed) {
        Path2D.Double path = new Path2D.Double(Path2D.WIND_NON_ZERO, xs.length);
        path.moveTo(xs[0], ys[0]);
        for (int i = 1; i < xs.length; i++) {
            path.lineTo(xs[i], ys[i]);
        }
        if (closed) {
            path.closePath();
        }
        g.setColor(awt(colour));
        g.setStroke(basic(stroke));
        g.draw(path);
    }

    @Override
    protected void deviceFillPolygon(double[] xs, double[] ys, Colour colour) {
        Path2D.Double path = new Path2D.Double(Path2D.WIND_NON_ZERO, xs.length);
        path.moveTo(xs[0], ys[0]);
        for (int i = 1; i < xs.length; i++) {
            path.lineTo(xs[i], ys[i]);
        }
        path.closePath();
        g.setColor(awt(colour));
        g.fill(path);
    }

    @Override
    protected void deviceCircle(double cx, double cy, double r, Colour colour, Stroke stroke) {
        g.setColor(awt(colour));
        g.setStroke(basic(stroke));
        g.draw(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
    }

    @Override
    protected void deviceFillCircle(double cx, double cy, double r, Colour colour) {
        g.setColor(awt(colour));
        g.fill(new Ellipse2D.Double(cx - r, cy - r, 2 * r, 2 * r));
    }

    @Override
    protected void deviceText(String text, double x, double y, TextStyle style, Colour colour) {
        float size = (float) style.size();
        Font font = (style.bold() ? bold : regular).computeIfAbsent(size,
                s -> ExportFonts.awt(style.bold()).deriveFont(style.bold() ? Font.BOLD : Font.PLAIN, s));
        g.setFont(font);
        g.setColor(awt(colour));
        FontRenderContext frc = g.getFontRenderContext();
        double width = font.getStringBounds(text, frc).getWidth();
        LineMetrics lm = font.getLineMetrics(text, frc);
        double left = switch (style.hAnchor()) {
            case START -> x;
            case MIDDLE -> x - width / 2;
            case END -> x - width;
        };
        double baseline = switch (style.vAnchor()) {
            case TOP -> y + lm.getAscent();
            case MIDDLE -> y + (lm.getAscent() - lm.getDescent()) / 2;
            case BASELINE -> y;
            case BOTTOM -> y - lm.getDescent();
        };
        float whole = Math.max(1, Math.round(size));
        if (whole == size) {
            g.drawString(text, (float) left, (float) baseline);
            return;
        }
        // SVG writers take the font's whole-point size (JFreeSVG writes Font.getSize()): set the text
        // in the nearest whole size and scale it to the exact one, so text never outgrows its box
        Font set = (style.bold() ? bold : regular).computeIfAbsent(whole,
                s -> ExportFonts.awt(style.bold()).deriveFont(style.bold() ? Font.BOLD : Font.PLAIN, s));
        double k = size / whole;
        AffineTransform saved = g.getTransform();
        g.setFont(set);
        g.scale(k, k);
        g.drawString(text, (float) (left / k), (float) (baseline / k));
        g.setTransform(saved);
    }

    private static BasicStroke basic(Stroke s) {
        List<Double> d = s.dashes();
        if (d.isEmpty()) {
            return new BasicStroke((float) s.width(), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
        }
        float[] dash = new float[d.size()];
        for (int i = 0; i < dash.length; i++) {
            dash[i] = d.get(i).floatValue();
        }
        return new BasicStroke((float) s.width(), BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }
}
