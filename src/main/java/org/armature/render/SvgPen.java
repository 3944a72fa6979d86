package org.armature.render;

import java.util.Locale;

/**
 * A pen that writes SVG 1.1 markup. Device units are SVG user units (CSS pixels at 96 dpi).
 *
 * <p>Build one with the page size and the user-to-page transform, draw, then call {@link #toSvg()}.
 * Text uses a generic sans-serif family so the file renders the same with any installed fonts.
 */
public final class SvgPen extends DevicePen {

    private final double widthPx;
    private final double heightPx;
    private final StringBuilder body = new StringBuilder();

    /**
     * @param widthPx page width in SVG user units
     * @param heightPx page height in SVG user units
     * @param base user-to-page transform
     */
    public SvgPen(double widthPx, double heightPx, Affine base) {
        super(base);
        if (!(widthPx > 0) || !(heightPx > 0)) {
            throw new IllegalArgumentException("page size must be positive");
        }
        this.widthPx = widthPx;
        this.heightPx = heightPx;
    }

    /** The complete SVG document drawn so far. */
    public String toSvg() {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"" + n(widthPx) + "\" height=\""
                + n(heightPx) + "\" viewBox=\"0 0 " + n(widthPx) + " " + n(heightPx) + "\">\n"
                + body + "</svg>\n";
    }

    @Override
    protected void devicePolyline(double[] xs, double[] ys, Colour colour, Stroke stroke, boolean closed) {
        body.append(closed ? "<polygon" : "<polyline").append(" points=\"").append(points(xs, ys))
                .append("\" fill=\"none\"").append(stroke(colour, stroke)).append("/>\n");
    }

    @Override
    protected void deviceFillPolygon(double[] xs, double[] ys, Colour colour) {
        body.append("<polygon points=\"").append(points(xs, ys)).append('"').append(fill(colour)).append("/>\n");
    }

    @Override
    protected void deviceCircle(double cx, double cy, double r, Colour colour, Stroke stroke) {
        body.append("<circle cx=\"").append(n(cx)).append("\" cy=\"").append(n(cy)).append("\" r=\"").append(n(r))
                .append("\" fill=\"none\"").append(stroke(colour, stroke)).append("/>\n");
    }

    @Override
    protected void deviceFillCircle(double cx, double cy, double r, Colour colour) {
        body.append("<circle cx=\"").append(n(cx)).append("\" cy=\"").append(n(cy)).append("\" r=\"").append(n(r))
                .append('"').append(fill(colour)).append("/>\n");
    }

    @Override
    protected void deviceText(String text, double x, double y, TextStyle style, Colour colour) {
        String anchor = switch (style.hAnchor()) {
            case START -> "start";
            case MIDDLE -> "middle";
            case END -> "end";
        };
        // dominant-baseline is unevenly supported, so the baseline is computed from the em size instead
        double baseline = switch (style.vAnchor()) {
            case TOP -> y + 0.8 * style.size();
            case MIDDLE -> y + 0.35 * style.size();
            case BASELINE -> y;
            case BOTTOM -> y - 0.25 * style.size();
        };
        body.append("<text x=\"").append(n(x)).append("\" y=\"").append(n(baseline))
                .append("\" font-family=\"sans-serif\" font-size=\"").append(n(style.size())).append('"')
                .append(style.bold() ? " font-weight=\"bold\"" : "")
                .append(" text-anchor=\"").append(anchor).append('"').append(fill(colour)).append('>')
                .append(escape(text)).append("</text>\n");
    }

    private static String stroke(Colour c, Stroke s) {
        StringBuilder sb = new StringBuilder(" stroke=\"").append(c.toHex()).append('"');
        if (c.alpha() < 1) {
            sb.append(" stroke-opacity=\"").append(n(c.alpha())).append('"');
        }
        sb.append(" stroke-width=\"").append(n(s.width())).append("\" stroke-linecap=\"round\" stroke-linejoin=\"round\"");
        if (s.isDashed()) {
            sb.append(" stroke-dasharray=\"");
            for (int i = 0; i < s.dashes().size(); i++) {
                sb.append(i == 0 ? "" : " ").append(n(s.dashes().get(i)));
            }
            sb.append('"');
        }
        return sb.toString();
    }

    private static String fill(Colour c) {
        return " fill=\"" + c.toHex() + "\"" + (c.alpha() < 1 ? " fill-opacity=\"" + n(c.alpha()) + "\"" : "");
    }

    private static String points(double[] xs, double[] ys) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < xs.length; i++) {
            sb.append(i == 0 ? "" : " ").append(n(xs[i])).append(',').append(n(ys[i]));
        }
        return sb.toString();
    }

    private static String n(double v) {
        String s = String.format(Locale.ROOT, "%.2f", v);
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s.equals("-0") ? "0" : s;
    }

    static String escape(String text) {
        StringBuilder sb = new StringBuilder();
        for (char c : text.toCharArray()) {
            switch (c) {
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '&' -> sb.append("&amp;");
                case '"' -> sb.append("&quot;");
                default -> sb.append(c);
            }
        }
        return sb.toString();
    }
}
