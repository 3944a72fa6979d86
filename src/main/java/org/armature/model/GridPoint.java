package org.armature.model;

/**
 * A point on the drawing grid, in grid units (not screen pixels).
 *
 * @param gridX column, grows to the right
 * @param gridY row, grows downwards
 */
public record GridPoint(int gridX, int gridY) {

    /** Returns this point moved by the given grid offsets. */
    public GridPoint plus(int dx, int dy) {
        return new GridPoint(gridX + dx, gridY + dy);
    }

    /** Returns the Manhattan distance to another point, in grid units. */
    public int manhattan(GridPoint other) {
        return Math.abs(gridX - other.gridX) + Math.abs(gridY - other.gridY);
    }
}
