package org.armature.devices;

import java.util.Objects;

/**
 * A problem found while fitting a device model to datasheet figures. Fits never throw for
 * inconsistent data; they return findings so the caller can show them next to the inputs.
 *
 * @param severity how serious the finding is
 * @param messageKey stable key for localisation and for tests (for example
 *     {@code relay.fit.leakageNegative}); never blank
 * @param detail plain-English explanation with the numbers involved; never blank
 */
public record DeviceFinding(Severity severity, String messageKey, String detail) {

    /** How serious a finding is. */
    public enum Severity {
        /** Worth knowing; the fitted model is usable. */
        INFO,
        /** The fitted model is usable but one input looks doubtful. */
        WARNING,
        /** The inputs contradict each other; the fitted part of the model that needs them is absent. */
        ERROR
    }

    /** Validates that all fields are present. */
    public DeviceFinding {
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(messageKey, "messageKey");
        Objects.requireNonNull(detail, "detail");
        if (messageKey.isBlank()) {
            throw new IllegalArgumentException("messageKey must not be blank");
        }
    }
}
