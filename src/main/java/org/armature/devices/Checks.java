package org.armature.devices;

/** Compact-constructor validation helpers; every message names the offending field. */
final class Checks {

    private Checks() {
    }

    static void positiveFinite(double value, String field) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(field + " must be positive and finite: " + value);
        }
    }

    /** Positive; {@link Double#POSITIVE_INFINITY} allowed (meaning "not modelled"). */
    static void positiveOrInfinite(double value, String field) {
        if (!(value > 0)) {
            throw new IllegalArgumentException(field + " must be positive (or infinite): " + value);
        }
    }

    static void nonNegativeFinite(double value, String field) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(field + " must be zero or positive and finite: " + value);
        }
    }

    static void finite(double value, String field) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(field + " must be finite: " + value);
        }
    }

    static void inClosedRange(double value, double low, double high, String field) {
        if (!(value >= low && value <= high)) {
            throw new IllegalArgumentException(field + " must lie in [" + low + ", " + high + "]: " + value);
        }
    }
}
