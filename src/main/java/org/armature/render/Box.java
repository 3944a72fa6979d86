package org.armature.render;

/**
 * An axis-aligned rectangle in model (grid) units; y grows downwards.
 *
 * @param minX left edge
 * @param minY top edge
 * @param maxX right edge, not less than minX
 * @param maxY bottom edge, not less than minY
 */
public record Box(double minX, double minY, double maxX, double maxY) {

    public Box {
        if (!(minX <= maxX) || !(minY <= maxY)) {
            throw new IllegalArgumentException("box edges out of order: " + minX + ", " + minY + ", " + maxX + ", " + maxY);
        }
    }

    /** The box spanned by two corners in any order. */
    public static Box spanning(double x1, double y1, double x2, double y2) {
        return new Box(Math.min(x1, x2), Math.min(y1, y2), Math.max(x1, x2), Math.max(y1, y2));
    }

    /** Width. */
    public double width() {
        return maxX - minX;
    }

    /** Height. */
    public double height() {
        return maxY - minY;
    }

    /** Centre x. */
    public double centreX() {
        return (minX + maxX) / 2;
    }

    /** Centre y. */
    public double centreY() {
        return (minY + maxY) / 2;
    }

    /** True when the interiors overlap (touching edges do not count). */
    public boolean intersects(Box o) {
        return minX < o.maxX && o.minX < maxX && minY < o.maxY && o.minY < maxY;
    }

    /** True when the point lies inside or on the edge. */
    public boolean contains(double x, double y) {
        return x >= minX && x <= maxX && y >= minY && y <= maxY;
    }

    /** True when the other box lies wholly inside this one. */
    public boolean contains(Box o) {
        return o.minX >= minX && o.maxX <= maxX && o.minY >= minY && o.maxY <= maxY;
    }

    /** The smallest box holding both. */
    public Box union(Box o) {
        return new Box(Math.min(minX, o.minX), Math.min(minY, o.minY), Math.max(maxX, o.maxX), Math.max(maxY, o.maxY));
    }

    /** This box grown by {@code d} on every side (shrunk for negative d, never below a point). */
    public Box inflate(double d) {
        double cx = centreX();
        double cy = centreY();
        double hw = Math.max(0, width() / 2 + d);
        double hh = Math.max(0, height() / 2 + d);
        return new Box(cx - hw, cy - hh, cx + hw, cy + hh);
    }

    /** This box moved by an offset. */
    public Box translate(double dx, double dy) {
        return new Box(minX + dx, minY + dy, maxX + dx, maxY + dy);
    }

    /** Distance from a point to the box, 0 inside. */
    public double distanceTo(double x, double y) {
        double dx = Math.max(Math.max(minX - x, 0), x - maxX);
        double dy = Math.max(Math.max(minY - y, 0), y - maxY);
        return Math.hypot(dx, dy);
    }

    /** True when the segment from (x1, y1) to (x2, y2) passes through the interior (Liang–Barsky clip). */
    public boolean crossedBy(double x1, double y1, double x2, double y2) {
        double t0 = 0;
        double t1 = 1;
        double dx = x2 - x1;
        double dy = y2 - y1;
        double[] p = {-dx, dx, -dy, dy};
        double[] q = {x1 - minX, maxX - x1, y1 - minY, maxY - y1};
        for (int i = 0; i < 4; i++) {
            if (p[i] == 0) {
                if (q[i] <= 0) {
                    return false;
                }
            } else {
                double t = q[i] / p[i];
                if (p[i] < 0) {
                    t0 = Math.max(t0, t);
                } else {
                    t1 = Math.min(t1, t);
                }
            }
        }
        return t0 < t1;
    }
}
