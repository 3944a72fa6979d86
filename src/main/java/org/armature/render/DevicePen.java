package org.armature.render;

import java.util.ArrayDeque;
import java.util.Deque;

/**
 * Base of the concrete pens: keeps the transform stack and hands device-space primitives to the
 * subclass, so that every output (canvas, SVG, recorder) gets exactly the same geometry.
 *
 * <p>Arcs become polylines of at most {@value #ARC_STEP_DEGREES}° steps before mapping, so mirrored
 * transforms need no special case. Circles map to circles with radius times {@link Affine#scale()};
 * only similarity transforms (uniform scale, quarter turns, mirroring, translation) are supported.
 */
public abstract class DevicePen implements Pen {

    /** Largest angle step when an arc is flattened; 10° keeps the chord error below 0.4 % of r. */
    public static final double ARC_STEP_DEGREES = 10;

    private final Deque<Affine> stack = new ArrayDeque<>();
    private Affine current;

    /** A pen whose user units map to device units through {@code base}. */
    protected DevicePen(Affine base) {
        this.current = base;
    }

    @Override
    public final void line(double x1, double y1, double x2, double y2, Colour colour, Stroke stroke) {
        polyline(new double[] {x1, x2}, new double[] {y1, y2}, colour, stroke);
    }

    @Override
    public final void polyline(double[] xs, double[] ys, Colour colour, Stroke stroke) {
        checkPoints(xs, ys, 2);
        devicePolyline(mapX(xs, ys), mapY(xs, ys), colour, stroke.scaled(current.scale()), false);
    }

    @Override
    public final void strokePolygon(double[] xs, double[] ys, Colour colour, Stroke stroke) {
        checkPoints(xs, ys, 3);
        devicePolyline(mapX(xs, ys), mapY(xs, ys), colour, stroke.scaled(current.scale()), true);
    }

    @Override
    public final void fillPolygon(double[] xs, double[] ys, Colour colour) {
        checkPoints(xs, ys, 3);
        deviceFillPolygon(mapX(xs, ys), mapY(xs, ys), colour);
    }

    @Override
    public final void circle(double cx, double cy, double r, Colour colour, Stroke stroke) {
        deviceCircle(current.mapX(cx, cy), current.mapY(cx, cy), r * current.scale(), colour,
                stroke.scaled(current.scale()));
    }

    @Override
    public final void fillCircle(double cx, double cy, double r, Colour colour) {
        deviceFillCircle(current.mapX(cx, cy), current.mapY(cx, cy), r * current.scale(), colour);
    }

    @Override
    public final void arc(double cx, double cy, double r, double startDegrees, double extentDegrees,
                          Colour colour, Stroke stroke) {
        int steps = Math.max(2, (int) Math.ceil(Math.abs(extentDegrees) / ARC_STEP_DEGREES));
        double[] xs = new double[steps + 1];
        double[] ys = new double[steps + 1];
        for (int i = 0; i <= steps; i++) {
            double a = Math.toRadians(startDegrees + extentDegrees * i / steps);
            xs[i] = cx + r * Math.cos(a);
            ys[i] = cy + r * Math.sin(a);
        }
        polyline(xs, ys, colour, stroke);
    }

    @Override
    public final void text(String text, double x, double y, TextStyle style, Colour colour) {
        if (text.isEmpty()) {
            return;
        }
        double s = current.scale();
        deviceText(text, current.mapX(x, y), current.mapY(x, y),
                new TextStyle(style.size() * s, style.bold(), style.hAnchor(), style.vAnchor()), colour);
    }

    @Override
    public final void push(Affine t) {
        stack.push(current);
        current = current.then(t);
    }

    @Override
    public final void pop() {
        if (stack.isEmpty()) {
            throw new IllegalStateException("pop without push");
        }
        current = stack.pop();
    }

    @Override
    public final Affine transform() {
        return current;
    }

    /** A polyline in device units; {@code closed} joins the last point to the first. */
    protected abstract void devicePolyline(double[] xs, double[] ys, Colour colour, Stroke stroke, boolean closed);

    /** A filled polygon in device units. */
    protected abstract void deviceFillPolygon(double[] xs, double[] ys, Colour colour);

    /** A circle outline in device units. */
    protected abstract void deviceCircle(double cx, double cy, double r, Colour colour, Stroke stroke);

    /** A filled circle in device units. */
    protected abstract void deviceFillCircle(double cx, double cy, double r, Colour colour);

    /** Upright text in device units; the style's size is already in device units. */
    protected abstract void deviceText(String text, double x, double y, TextStyle style, Colour colour);

    private double[] mapX(double[] xs, double[] ys) {
        double[] out = new double[xs.length];
        for (int i = 0; i < xs.length; i++) {
            out[i] = current.mapX(xs[i], ys[i]);
        }
        return out;
    }

    private double[] mapY(double[] xs, double[] ys) {
        double[] out = new double[xs.length];
        for (int i = 0; i < xs.length; i++) {
            out[i] = current.mapY(xs[i], ys[i]);
        }
        return out;
    }

    private static void checkPoints(double[] xs, double[] ys, int min) {
        if (xs.length != ys.length || xs.length < min) {
            throw new IllegalArgumentException("need at least " + min + " points with matching x and y arrays");
        }
    }
}
