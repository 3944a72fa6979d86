package org.armature.render;

import java.util.ArrayList;
import java.util.List;
import org.armature.model.ParamKeys;
import org.armature.model.GridPoint;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinSpec;
import org.armature.model.Placement;

/**
 * Where a part's symbol lies on the grid: its body boxes (the drawn symbol without its leads), its
 * bounds (bodies and pins) and the transform from the symbol's local units to grid units.
 *
 * <p>Local symbol units are grid units of the unrotated symbol, with the pin offsets of
 * {@link PartKind#pins()}. The same boxes serve hit testing, rubber-band selection and label
 * placement, so what can be clicked is what labels avoid.
 */
public final class PartGeometry {

    private PartGeometry() {
    }

    /**
     * The map from local symbol units to grid units: mirror left-right, turn clockwise, move to the
     * origin, exactly as {@link Placement#apply(int, int)} maps pins.
     */
    public static Affine frame(Placement p) {
        double m = p.mirrored() ? -1 : 1;
        double xx;
        double xy;
        double yx;
        double yy;
        switch (p.rotationDegrees()) {
            case 90 -> { xx = 0; xy = -1; yx = m; yy = 0; }
            case 180 -> { xx = -m; xy = 0; yx = 0; yy = -1; }
            case 270 -> { xx = 0; xy = 1; yx = -m; yy = 0; }
            default -> { xx = m; xy = 0; yx = 0; yy = 1; }
        }
        return new Affine(xx, xy, p.origin().gridX(), yx, yy, p.origin().gridY());
    }

    /** The body boxes of the unrotated symbol, in local units. */
    public static List<Box> localBodies(Part part) {
        return switch (part.kind()) {
            case RESISTOR -> List.of(new Box(-0.4, -1.05, 0.4, 1.05));
            case DIODE, ZENER -> List.of(new Box(-0.6, -0.55, 0.6, 0.6));
            case TVS -> List.of(new Box(-0.6, -0.95, 0.6, 0.95));
            case CAPACITOR -> List.of(new Box(-0.7, -0.3, 0.7, 0.3));
            case LED -> List.of(new Box(-0.6, -0.55, 1.45, 0.6));
            case NPN, PNP -> List.of(new Box(-0.95, -1.2, 1.45, 1.2));
            case NMOS -> List.of(new Box(-0.75, -1.3, 2.05, 1.3));
            case DARLINGTON -> List.of(new Box(-2, -2, 3.6, 2));
            case RELAY -> List.of(new Box(-0.8, -0.55, 0.8, 0.55), new Box(3.65, -0.75, 6.35, 0.95));
            case LOAD -> switch (part.option(ParamKeys.LOAD_KIND)) {
                case "lamp" -> List.of(new Box(-0.75, -0.75, 0.75, 0.75));
                case "motor" -> List.of(new Box(-0.85, -0.85, 0.85, 0.85));
                case "solenoid" -> List.of(new Box(-0.35, -1.05, 0.35, 1.05));
                case "capacitive" -> List.of(new Box(-0.8, -0.4, 0.8, 0.4));
                case "led" -> List.of(new Box(-0.6, -0.55, 1.45, 0.6));
                default -> List.of(new Box(-0.4, -1.05, 0.4, 1.05));
            };
            case SUPPLY -> List.of(new Box(-0.8, -0.2, 0.8, 0.12));
            case GROUND -> List.of(new Box(-0.7, 0, 0.7, 0.9));
            case DRIVE_PIN -> List.of(new Box(-1.35, -0.55, 1.25, 0.55));
        };
    }

    /** The body boxes on the grid. */
    public static List<Box> bodies(Part part) {
        Affine f = frame(part.placement());
        List<Box> out = new ArrayList<>();
        for (Box b : localBodies(part)) {
            out.add(map(f, b));
        }
        return out;
    }

    /** The union of the body boxes on the grid. */
    public static Box bodyBounds(Part part) {
        List<Box> b = bodies(part);
        Box u = b.get(0);
        for (int i = 1; i < b.size(); i++) {
            u = u.union(b.get(i));
        }
        return u;
    }

    /** Everything the part covers on the grid: bodies and pin points. */
    public static Box bounds(Part part) {
        Box u = bodyBounds(part);
        for (PinSpec pin : part.kind().pins()) {
            GridPoint g = part.pinPoint(pin.name());
            u = u.union(new Box(g.gridX(), g.gridY(), g.gridX(), g.gridY()));
        }
        return u;
    }

    /** True when the part's pins lie on a vertical line or its body is taller than wide (labels go beside). */
    public static boolean isUpright(Part part) {
        Box b = bodyBounds(part);
        return b.height() >= b.width();
    }

    /** A local box mapped to the grid (axis-aligned since frames only turn by quarter turns). */
    static Box map(Affine f, Box b) {
        return Box.spanning(f.mapX(b.minX(), b.minY()), f.mapY(b.minX(), b.minY()),
                f.mapX(b.maxX(), b.maxY()), f.mapY(b.maxX(), b.maxY()));
    }
}
