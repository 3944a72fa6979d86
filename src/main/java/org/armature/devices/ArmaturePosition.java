package org.armature.devices;

/** What the coil current alone says about a relay's armature, from {@link RelayThresholds#classify}. */
public enum ArmaturePosition {
    /** At or above the must-operate (pick-up) current: every sample is operated. */
    OPERATED,
    /** At or below the must-release (drop-out) current: every sample is released. */
    RELEASED,
    /** Between the two: the hysteresis band, where the armature's history decides. */
    EITHER
}
