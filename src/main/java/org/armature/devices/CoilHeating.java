package org.armature.devices;

/**
 * Steady self-heated state of a relay coil from {@link CoilResistance#selfHeatedAtVoltage}.
 *
 * @param coilTemperatureKelvin mean winding temperature, kelvin
 * @param resistanceOhms winding resistance at that temperature, ohms
 * @param currentAmps coil current, amperes
 * @param powerWatts dissipation V²/R, watts
 */
public record CoilHeating(double coilTemperatureKelvin, double resistanceOhms, double currentAmps,
        double powerWatts) {
}
