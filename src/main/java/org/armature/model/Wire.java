package org.armature.model;

/**
 * A straight, horizontal or vertical wire segment between two grid points. Orthogonal routes are
 * made of several segments.
 *
 * @param from one end
 * @param to the other end
 */
public record Wire(GridPoint from, GridPoint to) {

    public Wire {
        if (from == null || to == null) {
            throw new IllegalArgumentException("wire ends must not be null");
        }
        if (from.gridX() != to.gridX() && from.gridY() != to.gridY()) {
            throw new IllegalArgumentException("wire must be horizontal or vertical: " + from + " to " + to);
        }
    }

    /** Convenience constructor from coordinates. */
    public static Wire of(int x1, int y1, int x2, int y2) {
        return new Wire(new GridPoint(x1, y1), new GridPoint(x2, y2));
    }

    /** True when the point lies on this segment, ends included. */
    public boolean contains(GridPoint p) {
        int minX = Math.min(from.gridX(), to.gridX());
        int maxX = Math.max(from.gridX(), to.gridX());
        int minY = Math.min(from.gridY(), to.gridY());
        int maxY = Math.max(from.gridY(), to.gridY());
        return p.gridX() >= minX && p.gridX() <= maxX && p.gridY() >= minY && p.gridY() <= maxY;
    }

    /** True for a zero-length segment. */
    public boolean isPoint() {
        return from.equals(to);
    }
}
