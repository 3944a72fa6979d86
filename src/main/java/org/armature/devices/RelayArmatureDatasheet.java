package org.armature.devices;

/**
 * What the relay armature fit ({@link RelayArmatureFit#fit(RelayArmatureDatasheet)}) needs: the
 * coil's datasheet figures plus a few mechanical figures that datasheets rarely state and that
 * default to typical values.
 *
 * @param coilResistanceOhms coil resistance at the temperature of the current thresholds, ohms, positive
 * @param releasedInductanceHenries small-signal coil inductance with the armature released, H, positive
 * @param attractedInductanceHenries inductance with the armature attracted, H; 0 (or equal to
 *     the released value) when not known, which gives a constant-inductance threshold model
 * @param pickUpAmps must-operate current, amperes, positive
 * @param dropOutAmps must-release current, amperes, positive, below pick-up
 * @param travelMetres armature travel between the stops, metres, positive (about 0.3 mm for a
 *     small PCB relay, from memory)
 * @param springForceRatio ρ = spring force attracted / spring force released, at least 1;
 *     typical 1.5–3 (from memory), default {@link #DEFAULT_SPRING_FORCE_RATIO}
 * @param massKilograms effective moving mass at the pole face, kg, positive
 * @param dampingNewtonSecondsPerMetre viscous damping, N·s/m, zero or positive
 * @param restitution coefficient of restitution at the stops, in [0, 1): 0 stops dead, higher
 *     values bounce (contact bounce)
 * @param contactSetPointFraction fraction of the travel from the released stop at which the
 *     contacts change over, in (0, 1); default ½ (mid-travel)
 */
public record RelayArmatureDatasheet(
        double coilResistanceOhms,
        double releasedInductanceHenries,
        double attractedInductanceHenries,
        double pickUpAmps,
        double dropOutAmps,
        double travelMetres,
        double springForceRatio,
        double massKilograms,
        double dampingNewtonSecondsPerMetre,
        double restitution,
        double contactSetPointFraction) {

    /** Spring force ratio ρ when none is given: 2 (from memory; DESIGN.md "Relay model"). */
    public static final double DEFAULT_SPRING_FORCE_RATIO = 2.0;
    /**
     * Effective moving mass when none is given: 1 g. From memory: the armature and moving contact
     * spring of a small PCB relay weigh on the order of a gram. With the DESIGN.md figures for a
     * 12 V, 275 Ω relay it gives an armature flight of about 1–2 ms and an operate time of about
     * 8–9 ms (derived by integrating the model), inside the ≤ 10 ms typical of such datasheets.
     */
    public static final double DEFAULT_MASS_KILOGRAMS = 1e-3;
    /**
     * Viscous damping when none is given: 0.1 N·s/m (our choice: light air and pivot damping,
     * m/c = 10 ms, longer than the flight so it barely slows it; adjust to match the datasheet's
     * operate and release times).
     */
    public static final double DEFAULT_DAMPING_NEWTON_SECONDS_PER_METRE = 0.1;
    /** Contact change-over at mid-travel when none is given. */
    public static final double DEFAULT_CONTACT_SET_POINT_FRACTION = 0.5;

    /** Validates every field. */
    public RelayArmatureDatasheet {
        Checks.positiveFinite(coilResistanceOhms, "coilResistanceOhms");
        Checks.positiveFinite(releasedInductanceHenries, "releasedInductanceHenries");
        Checks.nonNegativeFinite(attractedInductanceHenries, "attractedInductanceHenries");
        Checks.positiveFinite(pickUpAmps, "pickUpAmps");
        Checks.positiveFinite(dropOutAmps, "dropOutAmps");
        if (!(dropOutAmps < pickUpAmps)) {
            throw new IllegalArgumentException("dropOutAmps must be below pickUpAmps: " + dropOutAmps);
        }
        Checks.positiveFinite(travelMetres, "travelMetres");
        Checks.finite(springForceRatio, "springForceRatio");
        if (!(springForceRatio >= 1.0)) {
            throw new IllegalArgumentException("springForceRatio must be at least 1: " + springForceRatio);
        }
        Checks.positiveFinite(massKilograms, "massKilograms");
        Checks.nonNegativeFinite(dampingNewtonSecondsPerMetre, "dampingNewtonSecondsPerMetre");
        if (!(restitution >= 0.0 && restitution < 1.0)) {
            throw new IllegalArgumentException("restitution must lie in [0, 1): " + restitution);
        }
        if (!(contactSetPointFraction > 0.0 && contactSetPointFraction < 1.0)) {
            throw new IllegalArgumentException("contactSetPointFraction must lie in (0, 1): " + contactSetPointFraction);
        }
    }

    /**
     * Datasheet figures with the default ρ, mass, damping, no bounce and mid-travel contacts.
     *
     * @param coilResistanceOhms coil resistance, ohms
     * @param releasedInductanceHenries L released, H
     * @param attractedInductanceHenries L attracted, H (0 when unknown)
     * @param pickUpAmps must-operate current, A
     * @param dropOutAmps must-release current, A
     * @param travelMetres armature travel, m
     * @return the inputs
     */
    public static RelayArmatureDatasheet typical(double coilResistanceOhms, double releasedInductanceHenries,
            double attractedInductanceHenries, double pickUpAmps, double dropOutAmps, double travelMetres) {
        return new RelayArmatureDatasheet(coilResistanceOhms, releasedInductanceHenries, attractedInductanceHenries,
                pickUpAmps, dropOutAmps, travelMetres, DEFAULT_SPRING_FORCE_RATIO, DEFAULT_MASS_KILOGRAMS,
                DEFAULT_DAMPING_NEWTON_SECONDS_PER_METRE, 0.0, DEFAULT_CONTACT_SET_POINT_FRACTION);
    }

    /** @return a copy with the given spring force ratio ρ */
    public RelayArmatureDatasheet withSpringForceRatio(double rho) {
        return new RelayArmatureDatasheet(coilResistanceOhms, releasedInductanceHenries, attractedInductanceHenries,
                pickUpAmps, dropOutAmps, travelMetres, rho, massKilograms, dampingNewtonSecondsPerMetre, restitution,
                contactSetPointFraction);
    }

    /**
     * @param kilograms moving mass, kg
     * @param newtonSecondsPerMetre damping, N·s/m
     * @param restitutionAtStops coefficient of restitution
     * @return a copy with the given mechanics
     */
    public RelayArmatureDatasheet withMechanics(double kilograms, double newtonSecondsPerMetre,
            double restitutionAtStops) {
        return new RelayArmatureDatasheet(coilResistanceOhms, releasedInductanceHenries, attractedInductanceHenries,
                pickUpAmps, dropOutAmps, travelMetres, springForceRatio, kilograms, newtonSecondsPerMetre,
                restitutionAtStops, contactSetPointFraction);
    }
}
