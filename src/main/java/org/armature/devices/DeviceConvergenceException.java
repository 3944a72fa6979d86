package org.armature.devices;

/**
 * Thrown by the small device-level Newton helpers (single diode with a series resistor, BJT
 * junction voltages for given terminal currents) when they do not converge within their
 * {@link DeviceNewtonOptions#maxIterations()}. Unchecked: a non-converging helper means the
 * inputs are outside the physical range the helper was written for.
 */
public final class DeviceConvergenceException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    /** Iterations performed before giving up. */
    private final int iterations;
    /** Magnitude of the last Newton step, volts. */
    private final double lastStepVolts;

    /**
     * @param what which helper failed, for the message
     * @param iterations iterations performed
     * @param lastStepVolts magnitude of the last Newton step, volts
     */
    public DeviceConvergenceException(String what, int iterations, double lastStepVolts) {
        super(what + " did not converge in " + iterations + " iterations (last step "
                + lastStepVolts + " V)");
        this.iterations = iterations;
        this.lastStepVolts = lastStepVolts;
    }

    /** @return the number of Newton iterations performed */
    public int iterations() {
        return iterations;
    }

    /** @return magnitude of the last Newton step, volts */
    public double lastStepVolts() {
        return lastStepVolts;
    }
}
