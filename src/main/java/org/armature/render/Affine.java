package org.armature.render;

/**
 * A 2-D affine map {@code x' = xx·x + xy·y + tx}, {@code y' = yx·x + yy·y + ty}, immutable.
 *
 * <p>The pens support the maps the schematic needs: uniform scale, translation, quarter-turn
 * rotations and mirroring. Circles stay circles under them; text is kept upright and scaled by
 * {@link #scale()}.
 *
 * @param xx x' per unit x
 * @param xy x' per unit y
 * @param tx x' offset
 * @param yx y' per unit x
 * @param yy y' per unit y
 * @param ty y' offset
 */
public record Affine(double xx, double xy, double tx, double yx, double yy, double ty) {

    /** The identity map. */
    public static final Affine IDENTITY = new Affine(1, 0, 0, 0, 1, 0);

    /** A translation. */
    public static Affine translation(double dx, double dy) {
        return new Affine(1, 0, dx, 0, 1, dy);
    }

    /** A uniform scale about the origin. */
    public static Affine scaling(double s) {
        return new Affine(s, 0, 0, 0, s, 0);
    }

    /** The map that first applies {@code inner}, then this one. */
    public Affine then(Affine inner) {
        return new Affine(
                xx * inner.xx + xy * inner.yx, xx * inner.xy + xy * inner.yy, xx * inner.tx + xy * inner.ty + tx,
                yx * inner.xx + yy * inner.yx, yx * inner.xy + yy * inner.yy, yx * inner.tx + yy * inner.ty + ty);
    }

    /** Maps x. */
    public double mapX(double x, double y) {
        return xx * x + xy * y + tx;
    }

    /** Maps y. */
    public double mapY(double x, double y) {
        return yx * x + yy * y + ty;
    }

    /** Length scale: square root of the absolute determinant. */
    public double scale() {
        return Math.sqrt(Math.abs(xx * yy - xy * yx));
    }

    /** The inverse map; throws for a singular map. */
    public Affine inverse() {
        double det = xx * yy - xy * yx;
        if (det == 0 || !Double.isFinite(det)) {
            throw new IllegalStateException("singular transform");
        }
        double ixx = yy / det;
        double ixy = -xy / det;
        double iyx = -yx / det;
        double iyy = xx / det;
        return new Affine(ixx, ixy, -(ixx * tx + ixy * ty), iyx, iyy, -(iyx * tx + iyy * ty));
    }
}
