package org.armature.devices;

/**
 * Caller-owned result holder for a two-terminal nonlinear branch (diode junction, breakdown
 * clamp): the branch current and its conductance at one voltage. Reuse one instance per device
 * in the solver's hot loop; every {@code evaluate} call overwrites both fields.
 *
 * <p>Sign convention: current flows from the anode (positive terminal) to the cathode through
 * the device, for a voltage anode minus cathode.
 */
public final class JunctionEvaluation {

    private double currentAmps;
    private double conductanceSiemens;

    /** Creates a holder with both values zero. */
    public JunctionEvaluation() {
        // fields start at zero
    }

    void set(double current, double conductance) {
        this.currentAmps = current;
        this.conductanceSiemens = conductance;
    }

    /** @return branch current, amperes, anode to cathode */
    public double currentAmps() {
        return currentAmps;
    }

    /** @return dI/dV at the evaluated voltage, siemens (non-negative for these devices) */
    public double conductanceSiemens() {
        return conductanceSiemens;
    }
}
