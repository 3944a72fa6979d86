package org.armature.devices;

/**
 * Pick-up (must-operate) and drop-out (must-release) coil currents (IEC 61810-1 terms, check-values.md
 * RC-1), the minimal relay model: the armature operates at or above pick-up, releases at or
 * below drop-out, and keeps its state in between. Thresholds are currents, not voltages,
 * because ampere-turns move the armature; a datasheet voltage V at temperature T0 becomes
 * V/R(T0). The coil current's magnitude is used (a DC relay without polarity operates either way).
 *
 * @param pickUpAmps must-operate current, amperes, positive
 * @param dropOutAmps must-release current, amperes, positive and below pick-up
 */
public record RelayThresholds(double pickUpAmps, double dropOutAmps) {

    /** Validates the thresholds. */
    public RelayThresholds {
        Checks.positiveFinite(pickUpAmps, "pickUpAmps");
        Checks.positiveFinite(dropOutAmps, "dropOutAmps");
        if (!(dropOutAmps < pickUpAmps)) {
            throw new IllegalArgumentException("dropOutAmps must be below pickUpAmps: " + dropOutAmps);
        }
    }

    /**
     * Thresholds from datasheet voltages at the coil's reference temperature.
     *
     * @param pickUpVolts must-operate voltage, volts
     * @param dropOutVolts must-release voltage, volts
     * @param coilOhms coil resistance at the same temperature, ohms
     * @return the thresholds
     */
    public static RelayThresholds fromVolts(double pickUpVolts, double dropOutVolts, double coilOhms) {
        Checks.positiveFinite(coilOhms, "coilOhms");
        return new RelayThresholds(pickUpVolts / coilOhms, dropOutVolts / coilOhms);
    }

    /**
     * @param coilAmps coil current, amperes (either sign)
     * @return OPERATED, RELEASED or EITHER (hysteresis band)
     */
    public ArmaturePosition classify(double coilAmps) {
        double magnitude = Math.abs(coilAmps);
        if (magnitude >= pickUpAmps) {
            return ArmaturePosition.OPERATED;
        }
        if (magnitude <= dropOutAmps) {
            return ArmaturePosition.RELEASED;
        }
        return ArmaturePosition.EITHER;
    }

    /**
     * The armature state after the coil current has been {@code coilAmps}, given its state before.
     *
     * @param operatedBefore whether the armature was operated
     * @param coilAmps coil current, amperes
     * @return whether it is operated now
     */
    public boolean operatedAfter(boolean operatedBefore, double coilAmps) {
        return switch (classify(coilAmps)) {
            case OPERATED -> true;
            case RELEASED -> false;
            case EITHER -> operatedBefore;
        };
    }
}
