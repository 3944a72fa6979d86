package org.armature.devices;

/**
 * Caller-owned holder for the state derivative of a {@link MovingArmature}, with the coil
 * current and magnetic pull at the evaluated state. Every
 * {@link MovingArmature#derivatives} call overwrites all values.
 */
public final class ArmatureDerivatives {

    private double fluxRateVolts;
    private double gapRateMetresPerSecond;
    private double accelerationMetresPerSecondSquared;
    private double coilAmps;
    private double magneticForceNewtons;

    /** Creates a holder with all values zero. */
    public ArmatureDerivatives() {
        // fields start at zero
    }

    void set(double fluxRate, double gapRate, double acceleration, double current, double force) {
        this.fluxRateVolts = fluxRate;
        this.gapRateMetresPerSecond = gapRate;
        this.accelerationMetresPerSecondSquared = acceleration;
        this.coilAmps = current;
        this.magneticForceNewtons = force;
    }

    /** @return dλ/dt, volts (weber-turns per second) */
    public double fluxRateVolts() {
        return fluxRateVolts;
    }

    /** @return dg/dt, metres per second (positive opening) */
    public double gapRateMetresPerSecond() {
        return gapRateMetresPerSecond;
    }

    /** @return dv/dt, metres per second squared (positive opening) */
    public double accelerationMetresPerSecondSquared() {
        return accelerationMetresPerSecondSquared;
    }

    /** @return coil current i = λ/L(g) at the evaluated state, amperes */
    public double coilAmps() {
        return coilAmps;
    }

    /** @return magnetic pull at the evaluated state, newtons (closing) */
    public double magneticForceNewtons() {
        return magneticForceNewtons;
    }
}
