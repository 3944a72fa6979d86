package org.armature.solver;

import java.util.Optional;

/**
 * One point of a DC sweep: the value and either the operating point or the failure.
 *
 * @param value the swept variable's value
 * @param point the operating point, empty if the solve failed
 * @param failureKey message key of the failure ({@link SolverException#messageKey()}), empty on success
 * @param failureMessage the failure's sentence, empty on success
 */
public record SweepPoint(double value, Optional<OperatingPoint> point, String failureKey, String failureMessage) {

    public SweepPoint {
        if (point == null || failureKey == null || failureMessage == null) {
            throw new IllegalArgumentException("SweepPoint fields must not be null");
        }
    }

    static SweepPoint of(double value, OperatingPoint op) {
        return new SweepPoint(value, Optional.of(op), "", "");
    }

    static SweepPoint failed(double value, SolverException e) {
        return new SweepPoint(value, Optional.empty(), e.messageKey(), e.getMessage());
    }
}
