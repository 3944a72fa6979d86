package org.armature.devices;

/**
 * Mutable state of a {@link MovingArmature}, for integrators that keep one per relay: flux
 * linkage λ, gap g (0 attracted, travel released) and armature speed dg/dt (positive opening).
 * Not thread-safe; owned by one integrator.
 */
public final class ArmatureState {

    private double fluxLinkageWeberTurns;
    private double gapMetres;
    private double velocityMetresPerSecond;

    /**
     * @param fluxLinkageWeberTurns λ, weber-turns
     * @param gapMetres g, metres
     * @param velocityMetresPerSecond dg/dt, metres per second
     */
    public ArmatureState(double fluxLinkageWeberTurns, double gapMetres, double velocityMetresPerSecond) {
        set(fluxLinkageWeberTurns, gapMetres, velocityMetresPerSecond);
    }

    /**
     * Overwrites the whole state.
     *
     * @param flux λ, weber-turns
     * @param gap g, metres
     * @param velocity dg/dt, metres per second
     */
    public void set(double flux, double gap, double velocity) {
        this.fluxLinkageWeberTurns = flux;
        this.gapMetres = gap;
        this.velocityMetresPerSecond = velocity;
    }

    /** @return λ, weber-turns */
    public double fluxLinkageWeberTurns() {
        return fluxLinkageWeberTurns;
    }

    /** @return g, metres */
    public double gapMetres() {
        return gapMetres;
    }

    /** @return dg/dt, metres per second */
    public double velocityMetresPerSecond() {
        return velocityMetresPerSecond;
    }
}
