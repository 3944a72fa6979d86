package org.armature.devices;

import org.armature.units.PhysicalConstants;

/**
 * Winding resistance against temperature, R(T) = R0·(1 + α·(T − T0)). For copper α is fixed by
 * the zero-resistance intercept −234.5 °C of IEC 60028 (the international standard of
 * resistance for copper): R(T) = R0·(234.5 + T°C)/(234.5 + T0°C), α20 = 0.003929 /K; relay makers'
 * notes use the same law with their own α (for example 0.003853 /K at 25 °C).
 *
 * <p>Since the coil's pick-up and drop-out are set by ampere-turns, they happen at a constant
 * current: the pick-up and drop-out voltages scale with R(T) ({@link #scaledAtConstantCurrent}).
 *
 * @param referenceOhms R0, resistance at the reference temperature, ohms, positive
 * @param referenceTemperatureKelvin T0, kelvin
 * @param tempcoPerKelvin α at T0, 1/K, zero or positive
 */
public record CoilResistance(double referenceOhms, double referenceTemperatureKelvin, double tempcoPerKelvin) {

    /** Copper's zero-resistance intercept, −234.5 °C (IEC 60028), in kelvin: 38.65 K. */
    public static final double COPPER_ZERO_INTERCEPT_KELVIN = PhysicalConstants.ZERO_CELSIUS_KELVIN - 234.5;

    /** Validates every field. */
    public CoilResistance {
        Checks.positiveFinite(referenceOhms, "referenceOhms");
        Checks.positiveFinite(referenceTemperatureKelvin, "referenceTemperatureKelvin");
        Checks.nonNegativeFinite(tempcoPerKelvin, "tempcoPerKelvin");
    }

    /**
     * @param referenceTemperatureKelvin T0, kelvin, above the intercept (38.65 K)
     * @return copper's α at T0, 1/(T0 − intercept), per kelvin
     */
    public static double copperTempcoPerKelvin(double referenceTemperatureKelvin) {
        if (!(referenceTemperatureKelvin > COPPER_ZERO_INTERCEPT_KELVIN)) {
            throw new IllegalArgumentException("referenceTemperatureKelvin must be above the copper intercept: "
                    + referenceTemperatureKelvin);
        }
        return 1.0 / (referenceTemperatureKelvin - COPPER_ZERO_INTERCEPT_KELVIN);
    }

    /**
     * A copper winding.
     *
     * @param referenceOhms resistance at T0, ohms
     * @param referenceTemperatureKelvin T0, kelvin (datasheets: 20 °C or 23 °C or 25 °C)
     * @return the resistance law with copper's α
     */
    public static CoilResistance copper(double referenceOhms, double referenceTemperatureKelvin) {
        return new CoilResistance(referenceOhms, referenceTemperatureKelvin,
                copperTempcoPerKelvin(referenceTemperatureKelvin));
    }

    /**
     * @param temperatureKelvin winding temperature, kelvin
     * @return R(T), ohms
     */
    public double resistanceOhms(double temperatureKelvin) {
        return referenceOhms * (1.0 + tempcoPerKelvin * (temperatureKelvin - referenceTemperatureKelvin));
    }

    /**
     * Mean winding temperature from a measured resistance (the resistance method of relay
     * makers' temperature-rise notes).
     *
     * @param measuredOhms measured resistance, ohms, positive
     * @return winding temperature, kelvin
     * @throws IllegalArgumentException if α is zero (no temperature can be inferred)
     */
    public double temperatureKelvinAt(double measuredOhms) {
        Checks.positiveFinite(measuredOhms, "measuredOhms");
        if (tempcoPerKelvin == 0.0) {
            throw new IllegalArgumentException("tempcoPerKelvin is zero: temperature cannot be inferred");
        }
        return referenceTemperatureKelvin + (measuredOhms / referenceOhms - 1.0) / tempcoPerKelvin;
    }

    /**
     * A coil voltage stated at T0 (pick-up, drop-out) moved to another coil temperature at the
     * same coil current: V(T) = V0·R(T)/R0.
     *
     * @param voltsAtReference voltage at T0, volts
     * @param temperatureKelvin coil temperature, kelvin
     * @return the voltage at that temperature, volts
     */
    public double scaledAtConstantCurrent(double voltsAtReference, double temperatureKelvin) {
        return voltsAtReference * resistanceOhms(temperatureKelvin) / referenceOhms;
    }

    /**
     * Steady self-heating of a coil held at a constant voltage: T = Ta + Rth·V²/R(T), solved in
     * closed form. With u = T − T0, ua = Ta − T0 and p = Rth·V²/R0 it is the quadratic
     * α·u² + (1 − α·ua)·u − (ua + p) = 0, whose positive-resistance root is taken (it is unique:
     * the heating power falls as the coil warms, so voltage-driven coils cannot run away).
     *
     * @param coilVolts coil voltage, volts
     * @param ambientKelvin ambient temperature around the relay, kelvin
     * @param thermalResistanceKelvinPerWatt coil-to-ambient thermal resistance, K/W, zero or positive
     * @return the steady state
     */
    public CoilHeating selfHeatedAtVoltage(double coilVolts, double ambientKelvin,
            double thermalResistanceKelvinPerWatt) {
        Checks.finite(coilVolts, "coilVolts");
        Thermal.requireKelvin(ambientKelvin, "ambientKelvin");
        Checks.nonNegativeFinite(thermalResistanceKelvinPerWatt, "thermalResistanceKelvinPerWatt");
        double ua = ambientKelvin - referenceTemperatureKelvin;
        double p = thermalResistanceKelvinPerWatt * coilVolts * coilVolts / referenceOhms;
        double u;
        if (tempcoPerKelvin == 0.0) {
            u = ua + p;
        } else {
            double b = 1.0 - tempcoPerKelvin * ua;
            double c = ua + p;
            // numerically stable root of α·u² + b·u − c = 0 with b > 0 (R(Ta) > 0)
            u = 2.0 * c / (b + Math.sqrt(b * b + 4.0 * tempcoPerKelvin * c));
        }
        double t = referenceTemperatureKelvin + u;
        double r = resistanceOhms(t);
        return new CoilHeating(t, r, coilVolts / r, coilVolts * coilVolts / r);
    }
}
