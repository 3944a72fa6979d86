package org.armature.render;

/**
 * How a piece of text is set. Text is always drawn upright, whatever the pen's transform.
 *
 * @param size font size (em height) in the pen's user units, positive
 * @param bold heavy weight when true
 * @param hAnchor which horizontal point of the text lies on the given x
 * @param vAnchor which vertical point of the text lies on the given y
 */
public record TextStyle(double size, boolean bold, HAnchor hAnchor, VAnchor vAnchor) {

    /**
     * Average advance of one character in ems, used by {@link #width(String)}. 0.6 em slightly
     * over-estimates a proportional sans-serif (about 0.5 em average, from memory), so that label boxes
     * computed without a font never come out narrower than the drawn text.
     */
    public static final double AVERAGE_ADVANCE_EM = 0.6;

    /** Line height in ems for {@link #height()}; covers ascent and descent (common practice 1.2). */
    public static final double LINE_HEIGHT_EM = 1.2;

    /** Horizontal anchor. */
    public enum HAnchor { START, MIDDLE, END }

    /** Vertical anchor. */
    public enum VAnchor { TOP, MIDDLE, BASELINE, BOTTOM }

    public TextStyle {
        if (!(size > 0)) {
            throw new IllegalArgumentException("size must be positive, was " + size);
        }
        if (hAnchor == null || vAnchor == null) {
            throw new IllegalArgumentException("anchors must not be null");
        }
    }

    /** Regular weight, anchored at its middle. */
    public static TextStyle centred(double size) {
        return new TextStyle(size, false, HAnchor.MIDDLE, VAnchor.MIDDLE);
    }

    /** The same style with other anchors. */
    public TextStyle anchored(HAnchor h, VAnchor v) {
        return new TextStyle(size, bold, h, v);
    }

    /** The same style in bold or regular weight. */
    public TextStyle weight(boolean heavy) {
        return new TextStyle(size, heavy, hAnchor, vAnchor);
    }

    /** Estimated width of a text in user units (no font needed): characters times the average advance. */
    public double width(String text) {
        return text.codePointCount(0, text.length()) * AVERAGE_ADVANCE_EM * size * (bold ? 1.05 : 1.0);
    }

    /** Estimated line height in user units. */
    public double height() {
        return LINE_HEIGHT_EM * size;
    }

    /** The box the text occupies when drawn at (x, y) with this style's anchors, estimated. */
    public Box box(String text, double x, double y) {
        double w = width(text);
        double h = height();
        double left = switch (hAnchor) {
            case START -> x;
            case MIDDLE -> x - w / 2;
            case END -> x - w;
        };
        double top = switch (vAnchor) {
            case TOP -> y;
            case MIDDLE -> y - h / 2;
            case BASELINE -> y - 0.9 * size;
            case BOTTOM -> y - h;
        };
        return new Box(left, top, left + w, top + h);
    }
}
