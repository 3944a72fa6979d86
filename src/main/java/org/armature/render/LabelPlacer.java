package org.armature.render;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Greedy label placement with collision avoidance, in grid units.
 *
 * <p>Each label is tried at candidate positions in order of preference; a candidate is refused if
 * it overlaps a part body or an already placed label (hard constraints), and otherwise scored by its
 * rank plus a penalty for every wire or lead it covers (soft). The cheapest wins. This is the
 * fixed-candidate greedy scheme of cartographic label placement (Christensen, Marks and Shieber,
 * "An empirical study of algorithms for point-feature label placement", ACM TOG 14(3), 1995, from
 * memory), which is plenty for drawings of a few dozen labels.
 */
final class LabelPlacer {

    /** Penalty per wire or lead segment a label covers. */
    static final double SEGMENT_PENALTY = 4;
    /** Penalty per ring of distance in the ring search. */
    static final double RING_PENALTY = 2;
    /** Gap between a ring search anchor and the first ring, grid units. */
    static final double FIRST_RING = 0.45;
    /** Distance between rings, grid units. */
    static final double RING_STEP = 0.6;
    /** Rings tried before the search widens without limit. */
    static final int RINGS = 10;

    private final List<Box> bodies;
    private final List<double[]> segments;
    private final List<Box> placed = new ArrayList<>();

    LabelPlacer(List<Box> bodies, List<double[]> segments) {
        this.bodies = List.copyOf(bodies);
        this.segments = List.copyOf(segments);
    }

    /** The cheapest allowed candidate (earlier ones preferred), marked as occupied; empty if none is allowed. */
    Optional<Box> choose(List<Box> candidates) {
        Box best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int i = 0; i < candidates.size(); i++) {
            Box c = candidates.get(i);
            if (blocked(c)) {
                continue;
            }
            double cost = i + SEGMENT_PENALTY * crossings(c);
            if (cost < bestCost) {
                best = c;
                bestCost = cost;
            }
        }
        if (best != null) {
            placed.add(best);
        }
        return Optional.ofNullable(best);
    }

    /**
     * A box of the given size near an anchor point, searched on rings of growing distance in sixteen
     * directions; always succeeds (the search widens until a free place is found) and marks it occupied. Covering a wire costs twice what it costs a part label, since readouts
     * may sit a little further out.
     */
    Box near(double ax, double ay, double w, double h) {
        Box best = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int k = 0; best == null || k < RINGS; k++) {
            double d = FIRST_RING + RING_STEP * k;
            for (int j = 0; j < 16; j++) {
                double a = Math.toRadians(j * 22.5);
                double ux = Math.cos(a);
                double uy = Math.sin(a);
                double cx = ax + ux * (d + w / 2);
                double cy = ay + uy * (d + h / 2);
                Box c = new Box(cx - w / 2, cy - h / 2, cx + w / 2, cy + h / 2);
                if (blocked(c)) {
                    continue;
                }
                double cost = RING_PENALTY * k + 2 * SEGMENT_PENALTY * crossings(c) + j * 0.01
                        + (leaderCrossesBody(ax, ay, c) ? SEGMENT_PENALTY * 2 : 0);
                if (cost < bestCost) {
                    best = c;
                    bestCost = cost;
                }
            }
            if (k > 200) {
                throw new IllegalStateException("no free place for a label near " + ax + ", " + ay);
            }
        }
        placed.add(best);
        return best;
    }

    /** Marks a box as occupied without placing a label there. */
    void occupy(Box b) {
        placed.add(b);
    }

    private boolean blocked(Box c) {
        for (Box b : bodies) {
            if (b.intersects(c)) {
                return true;
            }
        }
        for (Box b : placed) {
            if (b.intersects(c)) {
                return true;
            }
        }
        return false;
    }

    private int crossings(Box c) {
        int n = 0;
        for (double[] s : segments) {
            if (c.crossedBy(s[0], s[1], s[2], s[3])) {
                n++;
            }
        }
        return n;
    }

    private boolean leaderCrossesBody(double ax, double ay, Box c) {
        double[] p = nearestOnBox(c, ax, ay);
        for (Box b : bodies) {
            if (!b.contains(ax, ay) && b.crossedBy(ax, ay, p[0], p[1])) {
                return true;
            }
        }
        return false;
    }

    /** The point of a box's outline nearest to (x, y) (the point itself when inside). */
    static double[] nearestOnBox(Box b, double x, double y) {
        return new double[] {Math.max(b.minX(), Math.min(b.maxX(), x)), Math.max(b.minY(), Math.min(b.maxY(), y))};
    }
}
