package org.armature.devices;

/**
 * Thermal voltage and temperature conversions used by the device models.
 * Package-private; it will delegate to {@code org.armature.units.PhysicalConstants} once
 * that class is on this branch.
 */
final class Thermal {

    /** Boltzmann constant, J/K (exact, SI 2019). */
    private static final double BOLTZMANN_JOULES_PER_KELVIN = 1.380649e-23;
    /** Elementary charge, C (exact, SI 2019). */
    private static final double ELEMENTARY_CHARGE_COULOMBS = 1.602176634e-19;

    private Thermal() {
    }

    /** @return kT/q in volts at the given absolute temperature */
    static double voltage(double temperatureKelvin) {
        return BOLTZMANN_JOULES_PER_KELVIN * temperatureKelvin / ELEMENTARY_CHARGE_COULOMBS;
    }

    /** Throws if the temperature is not a positive finite kelvin value. */
    static double requireKelvin(double temperatureKelvin, String field) {
        if (!(temperatureKelvin > 0) || Double.isInfinite(temperatureKelvin)) {
            throw new IllegalArgumentException(field + " must be a positive finite kelvin value: "
                    + temperatureKelvin);
        }
        return temperatureKelvin;
    }
}
