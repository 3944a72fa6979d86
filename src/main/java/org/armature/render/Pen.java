package org.armature.render;

/**
 * What the schematic renderer draws with: an abstract pen over a canvas, an SVG writer or a recorder.
 *
 * <p>Coordinates are user units mapped through the current transform ({@link #push(Affine)}); the
 * renderer works in grid units. Stroke widths, dash lengths and text sizes are user units too and
 * scale with the transform. Text is always set upright. Angles are in degrees measured from +x
 * towards +y (clockwise on screen, since y grows downwards).
 *
 * <p>A pen has no state other than its transform stack; every call names its colour and stroke.
 */
public interface Pen {

    /** A straight line. */
    void line(double x1, double y1, double x2, double y2, Colour colour, Stroke stroke);

    /** An open polyline through the points; {@code xs} and {@code ys} have the same length, at least 2. */
    void polyline(double[] xs, double[] ys, Colour colour, Stroke stroke);

    /** The outline of a closed polygon. */
    void strokePolygon(double[] xs, double[] ys, Colour colour, Stroke stroke);

    /** A filled closed polygon without outline. */
    void fillPolygon(double[] xs, double[] ys, Colour colour);

    /** The outline of a circle of radius {@code r}. */
    void circle(double cx, double cy, double r, Colour colour, Stroke stroke);

    /** A filled circle without outline. */
    void fillCircle(double cx, double cy, double r, Colour colour);

    /** An open arc of a circle from {@code startDegrees} over {@code extentDegrees} (sign gives the sense). */
    void arc(double cx, double cy, double r, double startDegrees, double extentDegrees, Colour colour, Stroke stroke);

    /** One line of text at (x, y) placed by the style's anchors. */
    void text(String text, double x, double y, TextStyle style, Colour colour);

    /** Applies {@code t} (composed inside the current transform) until the matching {@link #pop()}. */
    void push(Affine t);

    /** Restores the transform in force before the last {@link #push(Affine)}. */
    void pop();

    /** The current user-to-device transform. */
    Affine transform();

    /** A filled rectangle (convenience over {@link #fillPolygon}). */
    default void fillRect(Box b, Colour colour) {
        fillPolygon(new double[] {b.minX(), b.maxX(), b.maxX(), b.minX()},
                new double[] {b.minY(), b.minY(), b.maxY(), b.maxY()}, colour);
    }

    /** A rectangle outline (convenience over {@link #strokePolygon}). */
    default void strokeRect(Box b, Colour colour, Stroke stroke) {
        strokePolygon(new double[] {b.minX(), b.maxX(), b.maxX(), b.minX()},
                new double[] {b.minY(), b.minY(), b.maxY(), b.maxY()}, colour, stroke);
    }
}
