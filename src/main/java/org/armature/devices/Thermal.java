package org.armature.devices;

import org.armature.units.PhysicalConstants;

/**
 * Thermal voltage and temperature checks used by the device models; delegates to
 * {@link PhysicalConstants} (exact SI 2019 k and q).
 */
final class Thermal {

    private Thermal() {
    }

    /** @return kT/q in volts at the given absolute temperature */
    static double voltage(double temperatureKelvin) {
        return PhysicalConstants.thermalVoltage(temperatureKelvin);
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
