package org.armature.solver;

import java.util.ArrayList;
import java.util.List;

/**
 * A DC sweep: the variable, its values and the base solve options (pin state, start guess,
 * previous relay states of the first point).
 *
 * @param variable what is swept
 * @param values the values in sweep order (unit of the variable), finite
 * @param options base options of every point
 */
public record SweepSpec(SweepVariable variable, List<Double> values, SolveOptions options) {

    public SweepSpec {
        if (variable == null || options == null) {
            throw new IllegalArgumentException("variable and options must not be null");
        }
        values = List.copyOf(values);
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("sweep values must be finite, found " + v);
            }
        }
    }

    /**
     * Evenly spaced values from start to stop inclusive.
     *
     * @param variable what is swept
     * @param start first value
     * @param stop last value
     * @param points number of points, ≥ 2
     * @return the spec with default options
     */
    public static SweepSpec linear(SweepVariable variable, double start, double stop, int points) {
        if (points < 2) {
            throw new IllegalArgumentException("a sweep needs at least 2 points, was " + points);
        }
        List<Double> v = new ArrayList<>(points);
        for (int i = 0; i < points; i++) {
            v.add(start + (stop - start) * i / (points - 1));
        }
        return new SweepSpec(variable, v, SolveOptions.DEFAULT);
    }

    /** @return the same sweep with other base options */
    public SweepSpec withOptions(SolveOptions o) {
        return new SweepSpec(variable, values, o);
    }
}
