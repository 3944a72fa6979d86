package org.armature.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class PhysicalConstantsTest {

    /** check-values.md values are given to 4 decimals in mV: half a unit of the last place. */
    private static final double HALF_LAST_PLACE_VOLTS = 0.5e-7;

    @Test
    @DisplayName("k and q are the exact SI 2019 values (CODATA 2018)")
    void exactConstants() {
        assertEquals(1.380649e-23, PhysicalConstants.BOLTZMANN_JOULES_PER_KELVIN, 0.0);
        assertEquals(1.602176634e-19, PhysicalConstants.ELEMENTARY_CHARGE_COULOMBS, 0.0);
        assertEquals(273.15, PhysicalConstants.ZERO_CELSIUS_KELVIN, 0.0);
    }

    @Test
    @DisplayName("PC-3: VT at 300 K = 25.8520 mV (derived from CODATA 2018)")
    void thermalVoltageAt300K() {
        assertEquals(25.8520e-3, PhysicalConstants.thermalVoltage(300), HALF_LAST_PLACE_VOLTS);
    }

    @ParameterizedTest(name = "{0} °C -> {1} mV")
    @DisplayName("PC-5: VT at 25 / 85 / 125 °C = 25.6926 / 30.8630 / 34.3099 mV (derived)")
    @CsvSource(delimiter = '|', textBlock = """
            25  | 25.6926
            85  | 30.8630
            125 | 34.3099
            """)
    void thermalVoltageAtCelsius(double celsius, double expectedMillivolts) {
        assertEquals(expectedMillivolts * 1e-3, PhysicalConstants.thermalVoltageAtCelsius(celsius),
                HALF_LAST_PLACE_VOLTS);
        assertEquals(expectedMillivolts * 1e-3,
                PhysicalConstants.thermalVoltage(PhysicalConstants.celsiusToKelvin(celsius)),
                HALF_LAST_PLACE_VOLTS);
    }

    @ParameterizedTest(name = "{0} °C = {1} K")
    @DisplayName("Celsius and kelvin differ by 273.15 (SI Brochure 2019)")
    @CsvSource(delimiter = '|', textBlock = """
            0       | 273.15
            25      | 298.15
            -273.15 | 0
            -40     | 233.15
            """)
    void celsiusKelvin(double celsius, double kelvin) {
        assertEquals(kelvin, PhysicalConstants.celsiusToKelvin(celsius), 1e-12);
        assertEquals(celsius, PhysicalConstants.kelvinToCelsius(kelvin), 1e-12);
    }

    @ParameterizedTest
    @DisplayName("No thermal voltage at or below absolute zero or for non-finite input")
    @ValueSource(doubles = {0, -1, Double.NaN, Double.POSITIVE_INFINITY})
    void refusesImpossibleTemperatures(double kelvin) {
        assertThrows(IllegalArgumentException.class, () -> PhysicalConstants.thermalVoltage(kelvin));
    }

    @Test
    @DisplayName("Celsius below absolute zero is refused by thermalVoltageAtCelsius")
    void refusesBelowAbsoluteZeroCelsius() {
        assertThrows(IllegalArgumentException.class,
                () -> PhysicalConstants.thermalVoltageAtCelsius(-300));
    }
}
