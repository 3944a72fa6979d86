package org.armature.units;

/**
 * Physical constants of the SI (exact since the 2019 redefinition, CODATA 2018) and the small
 * conversions every junction model needs: thermal voltage and Celsius/kelvin.
 *
 * <p>Source: BIPM, SI Brochure, 9th edition 2019, table 1; CODATA 2018 recommended values.
 */
public final class PhysicalConstants {

    /** Boltzmann constant k, in joules per kelvin; exact. */
    public static final double BOLTZMANN_JOULES_PER_KELVIN = 1.380649e-23;

    /** Elementary charge q, in coulombs; exact. */
    public static final double ELEMENTARY_CHARGE_COULOMBS = 1.602176634e-19;

    /** The kelvin temperature of 0 °C, by definition of the Celsius scale. */
    public static final double ZERO_CELSIUS_KELVIN = 273.15;

    private PhysicalConstants() {
    }

    /**
     * The thermal voltage V_T = kT/q of a junction at an absolute temperature: 25.852 mV at 300 K.
     *
     * @param kelvin absolute temperature; finite and above zero
     * @return V_T in volts
     * @throws IllegalArgumentException if kelvin is not finite or not above zero
     */
    public static double thermalVoltage(double kelvin) {
        if (!(kelvin > 0 && Double.isFinite(kelvin))) {
            throw new IllegalArgumentException(
                    "kelvin must be a finite temperature above absolute zero, was " + kelvin);
        }
        return BOLTZMANN_JOULES_PER_KELVIN * kelvin / ELEMENTARY_CHARGE_COULOMBS;
    }

    /**
     * The thermal voltage at a Celsius temperature: 25.693 mV at 25 °C.
     *
     * @param celsius temperature in °C; finite and above −273.15
     * @return V_T in volts
     * @throws IllegalArgumentException if the temperature is not above absolute zero
     */
    public static double thermalVoltageAtCelsius(double celsius) {
        return thermalVoltage(celsiusToKelvin(celsius));
    }

    /**
     * Converts a Celsius temperature to kelvin (adds 273.15). Does not check the result, so it
     * also converts a temperature below absolute zero; callers that need a real temperature check
     * it, as {@link #thermalVoltage(double)} does.
     *
     * @param celsius temperature in °C
     * @return temperature in K
     */
    public static double celsiusToKelvin(double celsius) {
        return celsius + ZERO_CELSIUS_KELVIN;
    }

    /**
     * Converts a kelvin temperature to Celsius (subtracts 273.15).
     *
     * @param kelvin temperature in K
     * @return temperature in °C
     */
    public static double kelvinToCelsius(double kelvin) {
        return kelvin - ZERO_CELSIUS_KELVIN;
    }
}
