package org.armature.render;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.armature.model.GridPoint;
import org.armature.model.Part;
import org.armature.model.PinSpec;
import org.armature.model.Stage;
import org.armature.model.Wire;

/**
 * Orthogonal wire routing between two grid points for the editor.
 *
 * <p>Candidates are the straight segment (when aligned), the two L-shapes (horizontal first,
 * vertical first) and, when both of those touch something, Z-shapes with the middle leg on each
 * column or row between the ends. Each is scored by what it runs into, and the cheapest wins; ties
 * keep the earlier candidate, so the result is deterministic. Landing on a foreign pin would connect
 * it by accident (connectivity is geometric), so that costs most.
 */
public final class Router {

    /** Cost of passing over a pin that is not an end of the route: an accidental connection. */
    public static final double PIN_COST = 100;
    /** Cost of crossing a part body. */
    public static final double BODY_COST = 10;
    /** Cost of running along an existing wire of another net (overlap joins the nets). */
    public static final double OVERLAP_COST = 50;
    /** Cost of each extra bend, so simpler routes win among equals. */
    public static final double BEND_COST = 1;

    private Router() {
    }

    /**
     * The cheapest orthogonal route from {@code from} to {@code to}, as one to three segments
     * (empty when the points coincide).
     */
    public static List<Wire> route(Stage stage, GridPoint from, GridPoint to) {
        if (from.equals(to)) {
            return List.of();
        }
        Obstacles obs = new Obstacles(stage, from, to);
        List<List<GridPoint>> candidates = new ArrayList<>();
        if (from.gridX() == to.gridX() || from.gridY() == to.gridY()) {
            candidates.add(List.of(from, to));
        }
        candidates.add(List.of(from, new GridPoint(to.gridX(), from.gridY()), to));
        candidates.add(List.of(from, new GridPoint(from.gridX(), to.gridY()), to));
        List<GridPoint> best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (List<GridPoint> c : candidates) {
            double cost = obs.cost(c);
            if (cost < bestCost) {
                best = c;
                bestCost = cost;
            }
        }
        if (bestCost >= BODY_COST) {
            for (List<GridPoint> c : zShapes(from, to)) {
                double cost = obs.cost(c);
                if (cost < bestCost) {
                    best = c;
                    bestCost = cost;
                }
            }
        }
        return toWires(best);
    }

    private static List<List<GridPoint>> zShapes(GridPoint a, GridPoint b) {
        List<List<GridPoint>> out = new ArrayList<>();
        int x0 = Math.min(a.gridX(), b.gridX());
        int x1 = Math.max(a.gridX(), b.gridX());
        int y0 = Math.min(a.gridY(), b.gridY());
        int y1 = Math.max(a.gridY(), b.gridY());
        for (int x = x0 + 1; x < x1; x++) {
            out.add(List.of(a, new GridPoint(x, a.gridY()), new GridPoint(x, b.gridY()), b));
        }
        for (int y = y0 + 1; y < y1; y++) {
            out.add(List.of(a, new GridPoint(a.gridX(), y), new GridPoint(b.gridX(), y), b));
        }
        return out;
    }

    private static List<Wire> toWires(List<GridPoint> pts) {
        List<Wire> out = new ArrayList<>();
        for (int i = 0; i + 1 < pts.size(); i++) {
            if (!pts.get(i).equals(pts.get(i + 1))) {
                out.add(new Wire(pts.get(i), pts.get(i + 1)));
            }
        }
        return out;
    }

    /** What a route may run into. */
    private static final class Obstacles {
        private final Set<GridPoint> foreignPins = new HashSet<>();
        private final List<Box> bodies = new ArrayList<>();
        private final List<Wire> wires;
        private final GridPoint from;
        private final GridPoint to;

        Obstacles(Stage stage, GridPoint from, GridPoint to) {
            this.from = from;
            this.to = to;
            for (Part p : stage.parts()) {
                for (PinSpec pin : p.kind().pins()) {
                    GridPoint g = p.pinPoint(pin.name());
                    if (!g.equals(from) && !g.equals(to)) {
                        foreignPins.add(g);
                    }
                }
                bodies.addAll(PartGeometry.bodies(p));
            }
            this.wires = stage.wires();
        }

        double cost(List<GridPoint> pts) {
            double cost = BEND_COST * (pts.size() - 2);
            for (int i = 0; i + 1 < pts.size(); i++) {
                GridPoint a = pts.get(i);
                GridPoint b = pts.get(i + 1);
                if (a.equals(b)) {
                    continue;
                }
                Wire seg = new Wire(a, b);
                for (GridPoint pin : foreignPins) {
                    if (seg.contains(pin)) {
                        cost += PIN_COST;
                    }
                }
                for (Box body : bodies) {
                    if (body.crossedBy(a.gridX(), a.gridY(), b.gridX(), b.gridY())) {
                        cost += BODY_COST;
                    }
                }
                for (Wire w : wires) {
                    if (overlaps(seg, w)) {
                        cost += OVERLAP_COST;
                    }
                }
            }
            return cost;
        }

        private boolean overlaps(Wire a, Wire b) {
            boolean aH = a.from().gridY() == a.to().gridY();
            boolean bH = b.from().gridY() == b.to().gridY();
            if (aH != bH || b.isPoint() || a.isPoint()) {
                return false;
            }
            if (aH) {
                if (a.from().gridY() != b.from().gridY()) {
                    return false;
                }
                int lo = Math.max(Math.min(a.from().gridX(), a.to().gridX()), Math.min(b.from().gridX(), b.to().gridX()));
                int hi = Math.min(Math.max(a.from().gridX(), a.to().gridX()), Math.max(b.from().gridX(), b.to().gridX()));
                return hi > lo && !endsAtRouteEnd(b);
            }
            if (a.from().gridX() != b.from().gridX()) {
                return false;
            }
            int lo = Math.max(Math.min(a.from().gridY(), a.to().gridY()), Math.min(b.from().gridY(), b.to().gridY()));
            int hi = Math.min(Math.max(a.from().gridY(), a.to().gridY()), Math.max(b.from().gridY(), b.to().gridY()));
            return hi > lo && !endsAtRouteEnd(b);
        }

        private boolean endsAtRouteEnd(Wire w) {
            return w.contains(from) && w.contains(to);
        }
    }
}
