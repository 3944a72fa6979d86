package org.armature.render.report;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDFont;
import org.apache.pdfbox.pdmodel.graphics.state.PDExtendedGraphicsState;
import org.armature.render.Affine;
import org.armature.render.Colour;
import org.armature.render.DevicePen;
import org.armature.render.Stroke;
import org.armature.render.TextStyle;

/**
 * The PDF pen: the renderer's device-space primitives onto one page's content stream (PDFBox).
 * Device units are PDF points measured from the page's top-left corner with y downwards, like every
 * other pen; the pen turns them round to PDF's bottom-up coordinates itself. Text is real text in the
 * embedded fonts (extractable and searchable), placed by the font's own advance widths and ascent;
 * a character the font lacks is written as '?'. Circles are four Bézier quarter arcs.
 *
 * <p>Every call is one self-contained path with its own colour and stroke; I/O failures of the
 * content stream surface as {@link UncheckedIOException}.
 */
public final class PdfPen extends DevicePen {

    /** Control-point factor of a Bézier quarter circle: 4/3·(√2 − 1) (standard construction). */
    private static final double KAPPA = 0.5522847498;

    private final PDPageContentStream cs;
    private final double pageHeight;
    private final PdfFonts fonts;
    private final Map<Double, PDExtendedGraphicsState> alphas = new HashMap<>();

    /**
     * @param cs the page's content stream, open; the caller closes it
     * @param pageHeight the page's height in points (to turn y round)
     * @param fonts the document's embedded fonts
     * @param base user-to-device transform (device: points from the top-left corner)
     */
    public PdfPen(PDPageContentStream cs, double pageHeight, PdfFonts fonts, Affine base) {
        super(base);
        this.cs = cs;
        this.pageHeight = pageHeight;
        this.fonts = fonts;
    }

    @Override
    protected void devicePolyline(double[] xs, double[] ys, Colour colour, Stroke stroke, boolean closed) {
        try {
            begin(colour, true);
            strokeStyle(stroke);
            cs.moveTo(f(xs[0]), fy(ys[0]));
            for (int i = 1; i < xs.length; i++) {
                cs.lineTo(f(xs[i]), fy(ys[i]));
            }
            if (closed) {
                cs.closePath();
            }
            cs.stroke();
            cs.restoreGraphicsState();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    protected void deviceFillPolygon(double[] xs, double[] ys, Colour colour) {
        try {
            begin(colour, false);
            cs.moveTo(f(xs[0]), fy(ys[0]));
            for (int i = 1; i < xs.length; i++) {
                cs.lineTo(f(xs[i]), fy(ys[i]));
            }
            cs.closePath();
            cs.fill();
            cs.restoreGraphicsState();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    protected void deviceCircle(double cx, double cy, double r, Colour colour, Stroke stroke) {
        try {
            begin(colour, true);
            strokeStyle(stroke);
            circlePath(cx, cy, r);
            cs.stroke();
            cs.restoreGraphicsState();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    protected void deviceFillCircle(double cx, double cy, double r, Colour colour) {
        try {
            begin(colour, false);
            circlePath(cx, cy, r);
            cs.fill();
            cs.restoreGraphicsState();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @Override
    protected void deviceText(String text, double x, double y, TextStyle style, Colour colour) {
        PDFont font = fonts.font(style.bold());
        String safe = fonts.printable(text, style.bold());
        double size = style.size();
        double width = fonts.width(safe, size, style.bold());
        double ascent = fonts.ascent(size);
        double descent = fonts.descent(size);
        double left = switch (style.hAnchor()) {
            case START -> x;
            case MIDDLE -> x - width / 2;
            case END -> x - width;
        };
        double baseline = switch (style.vAnchor()) {
            case TOP -> y + ascent;
            case MIDDLE -> y + (ascent - descent) / 2;
            case BASELINE -> y;
            case BOTTOM -> y - descent;
        };
        try {
            begin(colour, false);
            cs.beginText();
            cs.setFont(font, (float) size);
            cs.newLineAtOffset(f(left), fy(baseline));
            cs.showText(safe);
            cs.endText();
            cs.restoreGraphicsState();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private void begin(Colour c, boolean stroking) throws IOException {
        cs.saveGraphicsState();
        float r = c.red() / 255f;
        float g = c.green() / 255f;
        float b = c.blue() / 255f;
        if (stroking) {
            cs.setStrokingColor(r, g, b);
        } else {
            cs.setNonStrokingColor(r, g, b);
        }
        if (c.alpha() < 1) {
            PDExtendedGraphicsState gs = alphas.computeIfAbsent(c.alpha(), a -> {
                PDExtendedGraphicsState s = new PDExtendedGraphicsState();
                s.setStrokingAlphaConstant(a.floatValue());
                s.setNonStrokingAlphaConstant(a.floatValue());
                return s;
            });
            cs.setGraphicsStateParameters(gs);
        }
    }

    private void strokeStyle(Stroke s) throws IOException {
        cs.setLineWidth((float) s.width());
        cs.setLineJoinStyle(1);
        List<Double> d = s.dashes();
        if (d.isEmpty()) {
            cs.setLineCapStyle(1);
        } else {
            cs.setLineCapStyle(0);
            float[] dash = new float[d.size()];
            for (int i = 0; i < dash.length; i++) {
                dash[i] = d.get(i).floatValue();
            }
            cs.setLineDashPattern(dash, 0);
        }
    }

    private void circlePath(double cx, double cy, double r) throws IOException {
        double k = KAPPA * r;
        cs.moveTo(f(cx + r), fy(cy));
        cs.curveTo(f(cx + r), fy(cy + k), f(cx + k), fy(cy + r), f(cx), fy(cy + r));
        cs.curveTo(f(cx - k), fy(cy + r), f(cx - r), fy(cy + k), f(cx - r), fy(cy));
        cs.curveTo(f(cx - r), fy(cy - k), f(cx - k), fy(cy - r), f(cx), fy(cy - r));
        cs.curveTo(f(cx + k), fy(cy - r), f(cx + r), fy(cy - k), f(cx + r), fy(cy));
        cs.closePath();
    }

    private static float f(double v) {
        return (float) v;
    }

    private float fy(double y) {
        return (float) (pageHeight - y);
    }
}
