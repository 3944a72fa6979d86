package org.armature.devices;

/**
 * Limits on how far one Newton iteration may move a MOSFET gate–source voltage, used by
 * {@link Junctions#limitGateStep(double, double, double, GateStepOptions)}. The quadratic
 * Shichman–Hodges law has no exponential to overflow, but a gate that jumps from cutoff to a
 * large overdrive in one step lets Newton overshoot into the wrong region and oscillate between
 * triode and saturation; a bounded step keeps the iterate near the last linearisation.
 *
 * @param minimumStepVolts step always allowed regardless of overdrive; default 0.5 V (about the
 *     spread of VGS(th) within one part class, so the threshold is never stepped over blindly)
 * @param overdriveStepFactor additional step allowed per volt of present overdrive
 *     |vOld − VT|; default 1.0 (the overdrive may at most double per iteration, so a 10 V
 *     drive is reached in about five steps)
 * @param thresholdLandingVolts a gate leaving cutoff lands at most this far above threshold
 *     first; default 0.5 V
 */
public record GateStepOptions(double minimumStepVolts, double overdriveStepFactor,
        double thresholdLandingVolts) {

    /** Defaults: 0.5 V, 1.0, 0.5 V. */
    public static final GateStepOptions DEFAULTS = new GateStepOptions(0.5, 1.0, 0.5);

    /** Validates the limits. */
    public GateStepOptions {
        Checks.positiveFinite(minimumStepVolts, "minimumStepVolts");
        Checks.nonNegativeFinite(overdriveStepFactor, "overdriveStepFactor");
        Checks.positiveFinite(thresholdLandingVolts, "thresholdLandingVolts");
    }
}
