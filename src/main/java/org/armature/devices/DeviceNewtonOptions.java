package org.armature.devices;

/**
 * Tolerances of the small Newton helpers in this package (one diode in series with a resistor,
 * a BJT's junction voltages for given terminal currents, datasheet fits). The circuit solver has
 * its own options; these only govern the closed little problems solved here.
 *
 * @param maxIterations iteration limit, at least 1; default 200, ample for junction-limited
 *     Newton from a zero start (it usually needs 5 to 30)
 * @param voltageToleranceVolts convergence when every junction-voltage step is below this;
 *     default 1e-12 V, far below any figure quoted in a datasheet yet well above the rounding
 *     noise of a 1 V quantity (about 1e-16 V)
 */
public record DeviceNewtonOptions(int maxIterations, double voltageToleranceVolts) {

    /** Default: 200 iterations, 1e-12 V. */
    public static final DeviceNewtonOptions DEFAULTS = new DeviceNewtonOptions(200, 1e-12);

    /** Validates the limits. */
    public DeviceNewtonOptions {
        if (maxIterations < 1) {
            throw new IllegalArgumentException("maxIterations must be at least 1: " + maxIterations);
        }
        if (!(voltageToleranceVolts > 0) || Double.isInfinite(voltageToleranceVolts)) {
            throw new IllegalArgumentException(
                    "voltageToleranceVolts must be positive and finite: " + voltageToleranceVolts);
        }
    }
}
