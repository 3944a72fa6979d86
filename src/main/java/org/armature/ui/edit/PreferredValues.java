package org.armature.ui.edit;

import org.armature.units.ESeries;

/** Stepping a value through an IEC 60063 preferred-value series, for arrow keys and the scroll wheel. */
public final class PreferredValues {

    /** The series the editor steps resistors through. */
    public static final ESeries DEFAULT_SERIES = ESeries.E24;

    private PreferredValues() {
    }

    /**
     * The value {@code steps} places above (positive) or below (negative) {@code value} in the
     * {@link #DEFAULT_SERIES}. A value between two series values first steps to the neighbour in the
     * chosen direction.
     *
     * @param value positive value
     * @param steps number of series steps, may be negative; 0 returns the value
     */
    public static double step(double value, int steps) {
        return step(DEFAULT_SERIES, value, steps);
    }

    /** As {@link #step(double, int)} in a given series. */
    public static double step(ESeries series, double value, int steps) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be positive and finite, was " + value);
        }
        double v = value;
        for (int i = 0; i < Math.abs(steps); i++) {
            v = steps > 0 ? series.next(v) : series.previous(v);
        }
        return v;
    }
}
