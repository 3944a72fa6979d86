package org.armature.ui.edit;

/**
 * Stepping through the IEC 60063 E24 preferred-value series (the E24 mantissas are the standard's
 * table: 1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1,
 * 5.6, 6.2, 6.8, 7.5, 8.2, 9.1).
 *
 * <p>Interim helper of the editor until the units package's E-series lands.
 */
public final class PreferredValues {

    private static final double[] E24 = {1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6,
        3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};

    /** Relative tolerance for deciding that a value already is a series value. */
    private static final double SAME = 1e-9;

    private PreferredValues() {
    }

    /**
     * The E24 value {@code steps} places above (positive) or below (negative) {@code value}. A value
     * between two series values first steps to the neighbour in the chosen direction.
     *
     * @param value positive value
     * @param steps number of series steps, may be negative; 0 returns the value
     */
    public static double step(double value, int steps) {
        if (!(value > 0) || !Double.isFinite(value)) {
            throw new IllegalArgumentException("value must be positive and finite, was " + value);
        }
        if (steps == 0) {
            return value;
        }
        int decade = (int) Math.floor(Math.log10(value));
        double mant = value / Math.pow(10, decade);
        // position as a fractional index into the series: exact for series values
        int below = 0;
        for (int i = 0; i < E24.length; i++) {
            if (E24[i] <= mant * (1 + SAME)) {
                below = i;
            }
        }
        boolean exact = Math.abs(E24[below] - mant) <= SAME * mant;
        long index = (long) decade * E24.length + below;
        if (!exact && steps > 0) {
            index += 1;
            steps -= 1;
        } else if (!exact) {
            steps += 1;
        }
        index += steps;
        int d = Math.toIntExact(Math.floorDiv(index, E24.length));
        int i = Math.floorMod(index, E24.length);
        // two-digit integer mantissa times a power of ten keeps 4.7 kΩ exactly 4700
        return Math.round(E24[i] * 10) * Math.pow(10, d - 1);
    }
}
