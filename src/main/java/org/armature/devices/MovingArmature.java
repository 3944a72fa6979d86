package org.armature.devices;

/**
 * Electromechanical relay: a coil on a lumped magnetic circuit whose air gap g is closed by the
 * armature against a spring (co-energy force; standard electromechanics, e.g. A. E. Fitzgerald
 * and C. Kingsley, <i>Electric Machinery</i>, from memory). Fitted by {@link RelayArmatureFit}.
 * <pre>
 *   L(g) = Lσ + K / (g + gi)                 inductance; Lσ is leakage that makes no pull
 *   F(i, g) = ½·i²·K / (g + gi)²              magnetic pull, closing the gap
 *   S(g) = S0 + (ST − S0)·g / T               spring force, opening (linear spring, S0 = ρ·ST)
 *   dλ/dt = v − R·i,  i = λ / L(g)            coil (v: coil terminal voltage, R: winding)
 *   dg/dt = u,  m·du/dt = S(g) − F(i, g) − c·u
 * </pre>
 * Sign convention: g = 0 is the attracted stop, g = T the released stop; u = dg/dt is positive
 * when the armature opens. At a stop, with the net force pushing into it, the armature rests
 * (zero gap rate and acceleration); {@link #applyStops(ArmatureState)} clamps the gap after an
 * integration step and reflects the speed with the coefficient of restitution.
 *
 * <p>For a transient solver the coil is a flux-state element: {@link #coilAmps(double, double)}
 * with {@link #dCurrentDFlux(double)} and {@link #dCurrentDGap(double, double)} linearise the
 * current, {@link #derivatives} gives the mechanical equations, and
 * {@link #contactsOperated(double)} tells the contact state at the set point. All methods are
 * pure and allocation-free.
 *
 * @param coilResistanceOhms R, ohms, positive
 * @param leakageInductanceHenries Lσ, henries, zero or positive
 * @param gapPermeanceHenryMetres K, henry-metres, positive
 * @param gapOffsetMetres gi, the iron path and residual gap as an equivalent air gap, metres, positive
 * @param travelMetres T, metres, positive
 * @param springForceReleasedNewtons ST, spring force at the released stop, newtons, positive
 * @param springForceAttractedNewtons S0, spring force at the attracted stop, newtons, ≥ ST
 * @param massKilograms m, kg, positive
 * @param dampingNewtonSecondsPerMetre c, N·s/m, zero or positive
 * @param restitution coefficient of restitution at the stops, [0, 1)
 * @param contactSetPointMetres gap at and below which the contacts are operated, metres, in (0, T)
 */
public record MovingArmature(
        double coilResistanceOhms,
        double leakageInductanceHenries,
        double gapPermeanceHenryMetres,
        double gapOffsetMetres,
        double travelMetres,
        double springForceReleasedNewtons,
        double springForceAttractedNewtons,
        double massKilograms,
        double dampingNewtonSecondsPerMetre,
        double restitution,
        double contactSetPointMetres) {

    /** Validates every field. */
    public MovingArmature {
        Checks.positiveFinite(coilResistanceOhms, "coilResistanceOhms");
        Checks.nonNegativeFinite(leakageInductanceHenries, "leakageInductanceHenries");
        Checks.positiveFinite(gapPermeanceHenryMetres, "gapPermeanceHenryMetres");
        Checks.positiveFinite(gapOffsetMetres, "gapOffsetMetres");
        Checks.positiveFinite(travelMetres, "travelMetres");
        Checks.positiveFinite(springForceReleasedNewtons, "springForceReleasedNewtons");
        Checks.positiveFinite(springForceAttractedNewtons, "springForceAttractedNewtons");
        if (!(springForceAttractedNewtons >= springForceReleasedNewtons)) {
            throw new IllegalArgumentException("springForceAttractedNewtons must be at least springForceReleasedNewtons: "
                    + springForceAttractedNewtons);
        }
        Checks.positiveFinite(massKilograms, "massKilograms");
        Checks.nonNegativeFinite(dampingNewtonSecondsPerMetre, "dampingNewtonSecondsPerMetre");
        if (!(restitution >= 0.0 && restitution < 1.0)) {
            throw new IllegalArgumentException("restitution must lie in [0, 1): " + restitution);
        }
        if (!(contactSetPointMetres > 0.0 && contactSetPointMetres < travelMetres)) {
            throw new IllegalArgumentException("contactSetPointMetres must lie inside the travel: " + contactSetPointMetres);
        }
    }

    /**
     * @param gapMetres g, metres (clamped to the travel)
     * @return L(g), henries
     */
    public double inductanceHenries(double gapMetres) {
        return leakageInductanceHenries + gapPermeanceHenryMetres / (clamp(gapMetres) + gapOffsetMetres);
    }

    /**
     * @param gapMetres g, metres
     * @return dL/dg, henries per metre (negative: inductance falls as the gap opens)
     */
    public double dInductanceDGap(double gapMetres) {
        double d = clamp(gapMetres) + gapOffsetMetres;
        return -gapPermeanceHenryMetres / (d * d);
    }

    /**
     * @param fluxLinkageWeberTurns λ, weber-turns
     * @param gapMetres g, metres
     * @return coil current λ/L(g), amperes
     */
    public double coilAmps(double fluxLinkageWeberTurns, double gapMetres) {
        return fluxLinkageWeberTurns / inductanceHenries(gapMetres);
    }

    /**
     * @param gapMetres g, metres
     * @return ∂i/∂λ = 1/L(g), per henry
     */
    public double dCurrentDFlux(double gapMetres) {
        return 1.0 / inductanceHenries(gapMetres);
    }

    /**
     * @param fluxLinkageWeberTurns λ, weber-turns
     * @param gapMetres g, metres
     * @return ∂i/∂g = −λ·L'(g)/L(g)², amperes per metre
     */
    public double dCurrentDGap(double fluxLinkageWeberTurns, double gapMetres) {
        double l = inductanceHenries(gapMetres);
        return -fluxLinkageWeberTurns * dInductanceDGap(gapMetres) / (l * l);
    }

    /**
     * @param coilAmps coil current, amperes
     * @param gapMetres g, metres
     * @return λ = L(g)·i, weber-turns
     */
    public double fluxLinkage(double coilAmps, double gapMetres) {
        return inductanceHenries(gapMetres) * coilAmps;
    }

    /**
     * @param coilAmps coil current, amperes (either sign)
     * @param gapMetres g, metres
     * @return magnetic pull ½·i²·K/(g + gi)², newtons, closing
     */
    public double magneticForceNewtons(double coilAmps, double gapMetres) {
        double d = clamp(gapMetres) + gapOffsetMetres;
        return 0.5 * coilAmps * coilAmps * gapPermeanceHenryMetres / (d * d);
    }

    /**
     * @param gapMetres g, metres
     * @return spring force, newtons, opening
     */
    public double springForceNewtons(double gapMetres) {
        return springForceAttractedNewtons
                + (springForceReleasedNewtons - springForceAttractedNewtons) * clamp(gapMetres) / travelMetres;
    }

    /** @return the current that balances the spring at the released stop (the model's pick-up), amperes */
    public double pickUpAmps() {
        double d = travelMetres + gapOffsetMetres;
        return Math.sqrt(2.0 * springForceReleasedNewtons / gapPermeanceHenryMetres) * d;
    }

    /** @return the current that balances the spring at the attracted stop (the model's drop-out), amperes */
    public double dropOutAmps() {
        return Math.sqrt(2.0 * springForceAttractedNewtons / gapPermeanceHenryMetres) * gapOffsetMetres;
    }

    /**
     * @param gapMetres g, metres
     * @return true when the contacts are in the operated state (g at or below the set point)
     */
    public boolean contactsOperated(double gapMetres) {
        return gapMetres <= contactSetPointMetres;
    }

    /**
     * State derivative at one state and coil voltage.
     *
     * @param fluxLinkageWeberTurns λ, weber-turns
     * @param gapMetres g, metres
     * @param velocityMetresPerSecond u = dg/dt, m/s
     * @param coilVolts coil terminal voltage (winding resistance included), volts
     * @param out overwritten with dλ/dt, dg/dt, du/dt, the coil current and the pull
     */
    public void derivatives(double fluxLinkageWeberTurns, double gapMetres, double velocityMetresPerSecond,
            double coilVolts, ArmatureDerivatives out) {
        double i = coilAmps(fluxLinkageWeberTurns, gapMetres);
        double pull = magneticForceNewtons(i, gapMetres);
        double net = springForceNewtons(gapMetres) - pull - dampingNewtonSecondsPerMetre * velocityMetresPerSecond;
        double gapRate = velocityMetresPerSecond;
        double acceleration = net / massKilograms;
        boolean restingReleased = gapMetres >= travelMetres && net >= 0 && velocityMetresPerSecond >= 0;
        boolean restingAttracted = gapMetres <= 0 && net <= 0 && velocityMetresPerSecond <= 0;
        if (restingReleased || restingAttracted) {
            gapRate = 0.0;
            acceleration = 0.0;
        }
        out.set(coilVolts - coilResistanceOhms * i, gapRate, acceleration, i, pull);
    }

    /**
     * Enforces the stops after an integration step: a gap beyond a stop is set to the stop and
     * the speed into the stop is reversed and scaled by the restitution (0: it stops dead).
     *
     * @param state modified in place
     */
    public void applyStops(ArmatureState state) {
        double g = state.gapMetres();
        double u = state.velocityMetresPerSecond();
        if (g <= 0.0 && u <= 0.0) {
            state.set(state.fluxLinkageWeberTurns(), 0.0, -restitution * u);
        } else if (g >= travelMetres && u >= 0.0) {
            state.set(state.fluxLinkageWeberTurns(), travelMetres, -restitution * u);
        } else if (g < 0.0 || g > travelMetres) {
            state.set(state.fluxLinkageWeberTurns(), clamp(g), u);
        }
    }

    /**
     * The released, de-energised state (λ = 0, g = T, at rest).
     *
     * @return a new state
     */
    public ArmatureState releasedAtRest() {
        return new ArmatureState(0.0, travelMetres, 0.0);
    }

    private double clamp(double gapMetres) {
        return Math.max(0.0, Math.min(travelMetres, gapMetres));
    }
}
