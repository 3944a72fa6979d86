package org.armature.render;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * A pen that remembers what was drawn, in device units, for tests and for view models that need to
 * know what the renderer put where (texts, shapes) without a toolkit.
 */
public final class RecordingPen extends DevicePen {

    /** One recorded primitive. */
    public sealed interface Op permits PolylineOp, FillOp, CircleOp, TextOp {
    }

    /** A stroked polyline or polygon outline. */
    public record PolylineOp(double[] xs, double[] ys, Colour colour, Stroke stroke, boolean closed) implements Op {
    }

    /** A filled polygon. */
    public record FillOp(double[] xs, double[] ys, Colour colour) implements Op {
    }

    /** A circle, filled or outlined. */
    public record CircleOp(double cx, double cy, double r, Colour colour, boolean filled) implements Op {
    }

    /** A text. */
    public record TextOp(String text, double x, double y, TextStyle style, Colour colour) implements Op {
    }

    private final List<Op> ops = new ArrayList<>();

    /** A recorder in user units (identity base transform). */
    public RecordingPen() {
        super(Affine.IDENTITY);
    }

    /** Everything drawn so far, in order. */
    public List<Op> ops() {
        return Collections.unmodifiableList(ops);
    }

    /** The texts drawn so far, in order. */
    public List<String> texts() {
        return ops.stream().filter(o -> o instanceof TextOp).map(o -> ((TextOp) o).text()).toList();
    }

    @Override
    protected void devicePolyline(double[] xs, double[] ys, Colour colour, Stroke stroke, boolean closed) {
        ops.add(new PolylineOp(xs, ys, colour, stroke, closed));
    }

    @Override
    protected void deviceFillPolygon(double[] xs, double[] ys, Colour colour) {
        ops.add(new FillOp(xs, ys, colour));
    }

    @Override
    protected void deviceCircle(double cx, double cy, double r, Colour colour, Stroke stroke) {
        ops.add(new CircleOp(cx, cy, r, colour, false));
    }

    @Override
    protected void deviceFillCircle(double cx, double cy, double r, Colour colour) {
        ops.add(new CircleOp(cx, cy, r, colour, true));
    }

    @Override
    protected void deviceText(String text, double x, double y, TextStyle style, Colour colour) {
        ops.add(new TextOp(text, x, y, style, colour));
    }
}
