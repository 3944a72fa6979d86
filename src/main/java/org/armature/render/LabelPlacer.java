package org.armature.render;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Greedy label placement with guarantees, in grid units.
 *
 * <p>Each label is tried at candidate positions in order of preference. A candidate is refused
 * outright (hard constraints) when its box
 * <ul>
 *   <li>overlaps a part body or a label placed before it,</li>
 *   <li>is crossed by a wire, a pin lead or a leader placed before it,</li>
 * </ul>
 * or when its own leader (from the anchor to the nearest point of the box) runs through a label
 * placed before it or through a part body other than the one the anchor sits on. Among the allowed
 * candidates the cheapest wins: distance from the anchor first, then a penalty for every wire its
 * leader crosses. This is the fixed-candidate greedy scheme of cartographic label placement
 * (Christensen, Marks and Shieber, "An empirical study of algorithms for point-feature label
 * placement", ACM TOG 14(3), 1995, from memory), with every overlap made a hard constraint so that
 * what the renderer promises ({@link PlacedLabel}) holds by construction.
 *
 * <p>A search near an anchor always succeeds: its rings grow until a free place is found (the
 * drawing is finite, so some place beyond it is free), and a label that had to move away keeps a
 * leader to its anchor.
 */
final class LabelPlacer {

    /** Penalty per wire a leader crosses, in grid units of extra distance. */
    static final double LEADER_CROSSING_PENALTY = 1.5;
    /** Penalty per leader another leader crosses, in grid units of extra distance. */
    static final double LEADER_LEADER_PENALTY = 1.0;
    /** Gap between an anchor and the nearest edge of a label in the first ring, grid units. */
    static final double FIRST_RING = 0.3;
    /** Distance between rings, grid units. */
    static final double RING_STEP = 0.35;
    /**
     * Rings after which a search with strict leaders gives up: 100 rings reach 35 grid units, past
     * the far side of any stage drawing, where a leader that is blocked now stays blocked.
     */
    static final int MAX_RINGS = 100;
    /** Slack for the body the anchor sits on: a leader may leave that body. */
    static final double ANCHOR_BODY_SLACK = 0.06;

    private final List<Box> bodies;
    private final List<double[]> segments;
    private final List<Box> placed = new ArrayList<>();
    private final List<double[]> leaders = new ArrayList<>();

    private int relaxed;

    LabelPlacer(List<Box> bodies, List<double[]> segments) {
        this.bodies = List.copyOf(bodies);
        this.segments = List.copyOf(segments);
    }

    /** An independent placer in the same state (to try another order from here). */
    LabelPlacer copy() {
        LabelPlacer c = new LabelPlacer(bodies, segments);
        c.placed.addAll(placed);
        c.leaders.addAll(leaders);
        c.relaxed = relaxed;
        return c;
    }

    /** How many placements had to let their leader pass through another label or a body. */
    int relaxedPlacements() {
        return relaxed;
    }

    /**
     * The first allowed candidate, marked as occupied; empty if none is allowed. Candidates carry no
     * leader (they sit against what they describe).
     */
    Optional<Box> choose(List<Box> candidates) {
        for (Box c : candidates) {
            if (!blocked(c)) {
                placed.add(c);
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }

    /**
     * Takes the given box with a leader to (ax, ay) if every constraint allows it (used to keep a
     * label where it was while only numbers change).
     */
    boolean tryAt(Box c, double ax, double ay) {
        if (blocked(c) || leaderBlocked(ax, ay, c)) {
            return false;
        }
        take(c, ax, ay);
        return true;
    }

    /**
     * A box of the given size near an anchor point: searched on rings of growing distance, sixteen
     * positions per ring (four sides with three alignments each, and four corners); always succeeds
     * and marks the box and its leader occupied.
     */
    Box near(double ax, double ay, double w, double h) {
        return near(List.of(new double[] {ax, ay}), w, h).box();
    }

    /**
     * A box and the anchor its leader runs to, with what it costs.
     *
     * @param box where the label goes
     * @param anchorX x of the point its leader runs to
     * @param anchorY y of the point its leader runs to
     * @param cost distance plus penalties, grid units
     * @param relaxed true when the leader had to pass through another label or a body
     */
    record Spot(Box box, double anchorX, double anchorY, double cost, boolean relaxed) {
    }

    /**
     * Like {@link #near(double, double, double, double)} with a choice of anchors (the sides of a
     * part body, the wires of a net): the cheapest box over all of them, with the anchor it belongs
     * to. An anchor is {x, y} or {x, y, extra cost} (a less preferred anchor costs that much more,
     * in grid units of distance).
     *
     * <p>When no place anywhere keeps every rule (an anchor walled in by labels placed before), the
     * search is repeated letting the leader pass through other labels, so a drawing is always made;
     * the geometric tests over the templates and examples show it does not happen there.
     */
    Spot near(List<double[]> anchors, double w, double h) {
        Spot s = find(anchors, w, h);
        take(s);
        return s;
    }

    /** The place {@link #near(List, double, double)} would choose, without taking it. */
    Spot find(List<double[]> anchors, double w, double h) {
        Spot strict = search(anchors, w, h, true);
        return strict != null ? strict : search(anchors, w, h, false);
    }

    /** Marks a found place and its leader occupied. */
    void take(Spot s) {
        if (s.relaxed()) {
            relaxed++;
        }
        take(s.box(), s.anchorX(), s.anchorY());
    }

    /**
     * Branch and bound over the rings: every box of ring k lies {@code d_k} from its anchor, so once
     * {@code d_k} plus an anchor's extra cost reaches the best cost found, no further ring of that
     * anchor can win.
     */
    private Spot search(List<double[]> anchors, double w, double h, boolean strictLeaders) {
        Box best = null;
        double[] bestAnchor = null;
        double bestCost = Double.POSITIVE_INFINITY;
        for (int k = 0; k <= (strictLeaders ? MAX_RINGS : 4 * MAX_RINGS); k++) {
            double d = FIRST_RING + RING_STEP * k;
            if (d >= bestCost) {
                break;
            }
            for (int n = 0; n < anchors.size(); n++) {
                double[] anchor = anchors.get(n);
                double extra = anchor.length > 2 ? anchor[2] : 0;
                if (d + extra >= bestCost) {
                    continue;
                }
                double ax = anchor[0];
                double ay = anchor[1];
                List<Box> ring = ring(ax, ay, w, h, d);
                for (int j = 0; j < ring.size(); j++) {
                    Box c = ring.get(j);
                    double cost = c.distanceTo(ax, ay) + extra + j * 0.002 + n * 1e-4;
                    if (cost >= bestCost || blocked(c) || strictLeaders && leaderBlocked(ax, ay, c)) {
                        continue;
                    }
                    cost += leaderCost(ax, ay, c);
                    if (cost < bestCost) {
                        best = c;
                        bestAnchor = anchor;
                        bestCost = cost;
                    }
                }
            }
        }
        if (best == null) {
            if (!strictLeaders) {
                throw new IllegalStateException("no free place for a label near " + anchors.get(0)[0] + ", "
                        + anchors.get(0)[1]);
            }
            return null;
        }
        return new Spot(best, bestAnchor[0], bestAnchor[1], bestCost, !strictLeaders);
    }

    /** Marks a box as occupied without placing a label there. */
    void occupy(Box b) {
        placed.add(b);
    }

    private void take(Box c, double ax, double ay) {
        placed.add(c);
        double[] q = nearestOnBox(c, ax, ay);
        leaders.add(new double[] {ax, ay, q[0], q[1]});
    }

    /** The sixteen boxes whose nearest edge lies about {@code d} from the anchor. */
    static List<Box> ring(double ax, double ay, double w, double h, double d) {
        double nudge = Math.min(0.3, w / 4);
        double vNudge = Math.min(0.2, h / 4);
        double diag = d * Math.sqrt(0.5);
        return List.of(
                // beside, vertically centred
                new Box(ax + d, ay - h / 2, ax + d + w, ay + h / 2),
                new Box(ax - d - w, ay - h / 2, ax - d, ay + h / 2),
                // above and below, centred
                new Box(ax - w / 2, ay - d - h, ax + w / 2, ay - d),
                new Box(ax - w / 2, ay + d, ax + w / 2, ay + d + h),
                // above and below, reaching right or left
                new Box(ax - nudge, ay - d - h, ax - nudge + w, ay - d),
                new Box(ax - nudge, ay + d, ax - nudge + w, ay + d + h),
                new Box(ax + nudge - w, ay - d - h, ax + nudge, ay - d),
                new Box(ax + nudge - w, ay + d, ax + nudge, ay + d + h),
                // beside, reaching up or down
                new Box(ax + d, ay - h + vNudge, ax + d + w, ay + vNudge),
                new Box(ax + d, ay - vNudge, ax + d + w, ay + h - vNudge),
                new Box(ax - d - w, ay - h + vNudge, ax - d, ay + vNudge),
                new Box(ax - d - w, ay - vNudge, ax - d, ay + h - vNudge),
                // corners
                new Box(ax + diag, ay - diag - h, ax + diag + w, ay - diag),
                new Box(ax + diag, ay + diag, ax + diag + w, ay + diag + h),
                new Box(ax - diag - w, ay - diag - h, ax - diag, ay - diag),
                new Box(ax - diag - w, ay + diag, ax - diag, ay + diag + h));
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
        for (double[] s : segments) {
            if (c.crossedBy(s[0], s[1], s[2], s[3])) {
                return true;
            }
        }
        for (double[] s : leaders) {
            if (c.crossedBy(s[0], s[1], s[2], s[3])) {
                return true;
            }
        }
        return false;
    }

    /** True when the leader to a candidate would run through a placed label or a foreign body. */
    private boolean leaderBlocked(double ax, double ay, Box c) {
        double[] q = nearestOnBox(c, ax, ay);
        for (Box b : placed) {
            if (b.crossedBy(ax, ay, q[0], q[1])) {
                return true;
            }
        }
        for (Box b : bodies) {
            if (!b.inflate(ANCHOR_BODY_SLACK).contains(ax, ay)) {
                if (b.crossedBy(ax, ay, q[0], q[1])) {
                    return true;
                }
            } else if (!b.inflate(-ANCHOR_BODY_SLACK).contains(ax, ay) && b.inflate(-ANCHOR_BODY_SLACK).crossedBy(ax, ay, q[0], q[1])) {
                // an anchor on the body's edge: the leader leaves the body, it does not cross it
                return true;
            }
        }
        return false;
    }

    private double leaderCost(double ax, double ay, Box c) {
        double[] q = nearestOnBox(c, ax, ay);
        double cost = 0;
        for (double[] s : segments) {
            if (segmentsCross(ax, ay, q[0], q[1], s)) {
                cost += LEADER_CROSSING_PENALTY;
            }
        }
        for (double[] s : leaders) {
            if (segmentsCross(ax, ay, q[0], q[1], s)) {
                cost += LEADER_LEADER_PENALTY;
            }
        }
        return cost;
    }

    /** True when two segments cross at a point inside both (shared end points do not count). */
    static boolean segmentsCross(double x1, double y1, double x2, double y2, double[] s) {
        double d1 = orient(s[0], s[1], s[2], s[3], x1, y1);
        double d2 = orient(s[0], s[1], s[2], s[3], x2, y2);
        double d3 = orient(x1, y1, x2, y2, s[0], s[1]);
        double d4 = orient(x1, y1, x2, y2, s[2], s[3]);
        return d1 * d2 < 0 && d3 * d4 < 0;
    }

    private static double orient(double ax, double ay, double bx, double by, double cx, double cy) {
        return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
    }

    /** The point of a box's outline nearest to (x, y) (the point itself when inside). */
    static double[] nearestOnBox(Box b, double x, double y) {
        return new double[] {Math.max(b.minX(), Math.min(b.maxX(), x)), Math.max(b.minY(), Math.min(b.maxY(), y))};
    }
}
