package org.armature.devices;

/** Test-side constants and conversions (kept independent of the product code on purpose). */
final class TestPhysics {

    /** k/q with the exact SI 2019 constants, V/K (check-values.md constants). */
    static final double K_OVER_Q = 1.380649e-23 / 1.602176634e-19;
    static final double ZERO_CELSIUS_KELVIN = 273.15;

    private TestPhysics() {
    }

    /** Temperature at which kT/q equals the given thermal voltage. */
    static double kelvinForThermalVoltage(double vtVolts) {
        return vtVolts / K_OVER_Q;
    }

    static double kelvin(double celsius) {
        return celsius + ZERO_CELSIUS_KELVIN;
    }
}
