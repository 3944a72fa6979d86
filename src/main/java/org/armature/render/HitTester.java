package org.armature.render;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.armature.model.GridPoint;
import org.armature.model.Part;
import org.armature.model.PinRef;
import org.armature.model.PinSpec;
import org.armature.model.Stage;
import org.armature.model.Wire;

/**
 * What lies under a point of the drawing, in grid units: a pin first, then a part body, then a wire.
 * Later parts win over earlier ones (they are drawn on top).
 */
public final class HitTester {

    private HitTester() {
    }

    /** Something under the pointer. */
    public sealed interface Hit permits PinHit, PartHit, WireHit, NoHit {
    }

    /** A part's pin. */
    public record PinHit(PinRef pin, GridPoint at) implements Hit {
    }

    /** A part's body. */
    public record PartHit(String ref) implements Hit {
    }

    /** A wire, by index in {@link Stage#wires()}. */
    public record WireHit(int index) implements Hit {
    }

    /** Empty paper. */
    public record NoHit() implements Hit {
    }

    /**
     * The topmost thing within {@code tolerance} grid units of (gridX, gridY).
     *
     * @param tolerance largest distance that still counts, in grid units; pins use it as a radius,
     *     bodies are grown by it, wires are hit within it
     */
    public static Hit at(Stage stage, double gridX, double gridY, double tolerance) {
        List<Part> parts = stage.parts();
        PinHit bestPin = null;
        double bestPinDistance = Double.POSITIVE_INFINITY;
        for (int i = parts.size() - 1; i >= 0; i--) {
            Part part = parts.get(i);
            for (PinSpec pin : part.kind().pins()) {
                GridPoint g = part.pinPoint(pin.name());
                double d = Math.hypot(g.gridX() - gridX, g.gridY() - gridY);
                if (d <= tolerance && d < bestPinDistance) {
                    bestPin = new PinHit(new PinRef(part.ref(), pin.name()), g);
                    bestPinDistance = d;
                }
            }
        }
        if (bestPin != null) {
            return bestPin;
        }
        for (int i = parts.size() - 1; i >= 0; i--) {
            for (Box b : PartGeometry.bodies(parts.get(i))) {
                if (b.inflate(tolerance).contains(gridX, gridY)) {
                    return new PartHit(parts.get(i).ref());
                }
            }
        }
        List<Wire> wires = stage.wires();
        for (int i = wires.size() - 1; i >= 0; i--) {
            if (distanceToSegment(wires.get(i), gridX, gridY) <= tolerance) {
                return new WireHit(i);
            }
        }
        return new NoHit();
    }

    /** Parts whose bounds lie wholly inside the box (rubber-band selection). */
    public static Set<String> partsWithin(Stage stage, Box box) {
        Set<String> out = new LinkedHashSet<>();
        for (Part p : stage.parts()) {
            if (box.contains(PartGeometry.bodyBounds(p))) {
                out.add(p.ref());
            }
        }
        return out;
    }

    /** Wires with both ends inside the box. */
    public static Set<Integer> wiresWithin(Stage stage, Box box) {
        Set<Integer> out = new LinkedHashSet<>();
        for (int i = 0; i < stage.wires().size(); i++) {
            Wire w = stage.wires().get(i);
            if (box.contains(w.from().gridX(), w.from().gridY()) && box.contains(w.to().gridX(), w.to().gridY())) {
                out.add(i);
            }
        }
        return out;
    }

    /** Distance from a point to a wire segment, in grid units. */
    public static double distanceToSegment(Wire w, double x, double y) {
        double x1 = w.from().gridX();
        double y1 = w.from().gridY();
        double dx = w.to().gridX() - x1;
        double dy = w.to().gridY() - y1;
        double len2 = dx * dx + dy * dy;
        double t = len2 == 0 ? 0 : Math.max(0, Math.min(1, ((x - x1) * dx + (y - y1) * dy) / len2));
        return Math.hypot(x - (x1 + t * dx), y - (y1 + t * dy));
    }
}
