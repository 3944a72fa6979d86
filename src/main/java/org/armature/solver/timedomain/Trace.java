package org.armature.solver.timedomain;

import java.util.Arrays;

/**
 * One named quantity sampled at every accepted time point of a run. Immutable: the values are
 * copied in and out.
 *
 * @param name stable name: {@code "V(switch)"} for a node voltage, {@code "I(D1)"} for a branch or part
 *     current, {@code "coil current"}, {@code "armature position"}, {@code "contact state"}
 * @param unit SI unit symbol of the values ({@code "V"}, {@code "A"}, {@code "m"}, {@code "1"} for a
 *     state that is 1 or 0)
 * @param values the samples, one per time point
 */
public record Trace(String name, String unit, double[] values) {

    public Trace {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("name must not be blank");
        }
        unit = unit == null ? "" : unit;
        values = values.clone();
    }

    /** A copy of the samples. */
    @Override
    public double[] values() {
        return values.clone();
    }

    /** The sample at an index. */
    public double value(int index) {
        return values[index];
    }

    /** Number of samples. */
    public int size() {
        return values.length;
    }

    /** Largest sample. */
    public double max() {
        return Arrays.stream(values).max().orElse(Double.NaN);
    }

    /** Smallest sample. */
    public double min() {
        return Arrays.stream(values).min().orElse(Double.NaN);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Trace t && t.name.equals(name) && t.unit.equals(unit) && Arrays.equals(t.values, values);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "Trace[" + name + " (" + unit + "), " + values.length + " samples]";
    }
}
