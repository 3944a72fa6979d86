package org.armature.render;

import java.util.Optional;
import org.armature.model.GridPoint;
import org.armature.model.Part;
import org.armature.model.PinSpec;
import org.armature.model.Stage;
import org.armature.model.Wire;

/** Snapping of pointer positions (grid units, fractional) to grid points, pins and wire ends. */
public final class Snap {

    private Snap() {
    }

    /** The nearest grid point (halves round up). */
    public static GridPoint toGrid(double gridX, double gridY) {
        return new GridPoint((int) Math.floor(gridX + 0.5), (int) Math.floor(gridY + 0.5));
    }

    /** The nearest pin or wire end within {@code radius} grid units, if any. */
    public static Optional<GridPoint> connectionNear(Stage stage, double gridX, double gridY, double radius) {
        GridPoint best = null;
        double bestD = Double.POSITIVE_INFINITY;
        for (Part part : stage.parts()) {
            for (PinSpec pin : part.kind().pins()) {
                GridPoint g = part.pinPoint(pin.name());
                double d = Math.hypot(g.gridX() - gridX, g.gridY() - gridY);
                if (d <= radius && d < bestD) {
                    best = g;
                    bestD = d;
                }
            }
        }
        for (Wire w : stage.wires()) {
            for (GridPoint g : new GridPoint[] {w.from(), w.to()}) {
                double d = Math.hypot(g.gridX() - gridX, g.gridY() - gridY);
                // pins win ties: they are what users aim at
                if (d <= radius && d < bestD - 1e-9) {
                    best = g;
                    bestD = d;
                }
            }
        }
        return Optional.ofNullable(best);
    }

    /** A pin or wire end within {@code radius}, else the nearest grid point. */
    public static GridPoint toConnectionOrGrid(Stage stage, double gridX, double gridY, double radius) {
        return connectionNear(stage, gridX, gridY, radius).orElseGet(() -> toGrid(gridX, gridY));
    }
}
