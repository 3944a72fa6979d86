package org.armature.render;

import java.util.List;

/**
 * How a line is drawn: width and optional dash pattern, both in the pen's current user units
 * (grid units when the renderer draws).
 *
 * @param width line width, positive
 * @param dashes alternating dash and gap lengths; empty for a solid line
 */
public record Stroke(double width, List<Double> dashes) {

    public Stroke {
        if (!(width > 0) || !Double.isFinite(width)) {
            throw new IllegalArgumentException("width must be positive and finite, was " + width);
        }
        dashes = List.copyOf(dashes);
        for (Double d : dashes) {
            if (!(d > 0)) {
                throw new IllegalArgumentException("dash lengths must be positive, were " + dashes);
            }
        }
    }

    /** A solid line. */
    public static Stroke solid(double width) {
        return new Stroke(width, List.of());
    }

    /** A dashed line with equal dash and gap. */
    public static Stroke dashed(double width, double dash) {
        return new Stroke(width, List.of(dash, dash));
    }

    /** True when a dash pattern is set. */
    public boolean isDashed() {
        return !dashes.isEmpty();
    }

    /** The same stroke scaled by a positive factor (width and dashes). */
    public Stroke scaled(double factor) {
        return new Stroke(width * factor, dashes.stream().map(d -> d * factor).toList());
    }
}
