package org.armature.model;

/**
 * Where a part sits on the grid and how it is turned.
 *
 * @param origin the part's reference point on the grid
 * @param rotationDegrees clockwise rotation on screen: 0, 90, 180 or 270
 * @param mirrored mirrored left-right before rotating
 */
public record Placement(GridPoint origin, int rotationDegrees, boolean mirrored) {

    public Placement {
        if (origin == null) {
            throw new IllegalArgumentException("origin must not be null");
        }
        if (rotationDegrees % 90 != 0) {
            throw new IllegalArgumentException("rotationDegrees must be a multiple of 90, was " + rotationDegrees);
        }
        rotationDegrees = Math.floorMod(rotationDegrees, 360);
    }

    /** An unrotated, unmirrored placement at a grid point. */
    public static Placement at(int gridX, int gridY) {
        return new Placement(new GridPoint(gridX, gridY), 0, false);
    }

    /** The same placement rotated to an absolute angle. */
    public Placement rotated(int degrees) {
        return new Placement(origin, degrees, mirrored);
    }

    /** The same placement mirrored left-right (toggled). */
    public Placement mirror() {
        return new Placement(origin, rotationDegrees, !mirrored);
    }

    /** The same orientation at another grid point. */
    public Placement movedTo(GridPoint p) {
        return new Placement(p, rotationDegrees, mirrored);
    }

    /**
     * Maps a part-local offset (grid units, unrotated symbol) to a point on the grid:
     * mirror first (x to -x), then rotate clockwise on screen, then translate.
     */
    public GridPoint apply(int localX, int localY) {
        int x = mirrored ? -localX : localX;
        int y = localY;
        int rx;
        int ry;
        switch (rotationDegrees) {
            case 90 -> { rx = -y; ry = x; }
            case 180 -> { rx = -x; ry = -y; }
            case 270 -> { rx = y; ry = -x; }
            default -> { rx = x; ry = y; }
        }
        return origin.plus(rx, ry);
    }
}
