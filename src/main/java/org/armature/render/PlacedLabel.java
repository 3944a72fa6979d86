package org.armature.render;

import java.util.List;

/**
 * A label the renderer has placed: what it says, where its box is (grid units) and what its leader
 * points at. Boxes of one layout never overlap each other nor any part body.
 *
 * @param kind what the label is
 * @param owner the part designator, net name or pin it belongs to
 * @param lines its text lines, top to bottom
 * @param box where it sits, padding included
 * @param align how the lines are aligned in the box
 * @param anchorX x of the point the leader runs to; {@code NaN} for labels without a leader
 * @param anchorY y of the point the leader runs to; {@code NaN} for labels without a leader
 * @param state verdict state for badges and markers; {@code OK} otherwise
 * @param target what the label describes, as a box: the part's body for part labels, badges, gauges
 *     and markers, the anchor point for tags; a layout keeps a label where it was only while its
 *     target stays put
 */
public record PlacedLabel(Kind kind, String owner, List<String> lines, Box box, TextStyle.HAnchor align,
                          double anchorX, double anchorY, Annotations.State state, Box target) {

    /** What a label is. */
    public enum Kind { PART, TEST_POINT, VOLTAGE, CURRENT, BADGE, GAUGE, MARKER,
        /**
         * A net's tag with the meter readings of a fault hunt under it; its owner is the net, its lines
         * the net's name, its solved voltage (empty if not shown), then a row per pin state read.
         */
        READING }

    public PlacedLabel {
        lines = List.copyOf(lines);
        if (target == null) {
            throw new IllegalArgumentException("a placed label needs a target");
        }
    }

    /** True when the label has a leader line to an anchor point. */
    public boolean hasLeader() {
        return !Double.isNaN(anchorX);
    }
}
