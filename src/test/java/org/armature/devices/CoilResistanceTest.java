package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class CoilResistanceTest {

    private static double k(double celsius) {
        return TestPhysics.kelvin(celsius);
    }

    @Test
    @DisplayName("PC-7: copper α20 = 1/(234.5 + 20) = 0.003929 /°C (IEC 60028 via handbook tables)")
    void copperTempcoAt20() {
        assertEquals(0.003929, CoilResistance.copperTempcoPerKelvin(k(20)), 0.0000005);
    }

    @Test
    @DisplayName("PC-8: copper α25 = 1/(234.5 + 25) = 0.0038536 /°C (derived)")
    void copperTempcoAt25() {
        assertEquals(0.0038536, CoilResistance.copperTempcoPerKelvin(k(25)), 0.00000005);
    }

    @Test
    @DisplayName("RC-6: 320 Ω at 25 °C -> 443.3 Ω at 125 °C (relay maker's temperature note; derived)")
    void hotCoilResistance() {
        assertEquals(443.3, CoilResistance.copper(320, k(25)).resistanceOhms(k(125)), 0.05);
    }

    @Test
    @DisplayName("RC-7: pick-up 13.0 V at 25 °C -> 18.0 V at 125 °C at constant current (relay maker's note)")
    void pickUpRisesWithTemperature() {
        assertEquals(18.0, CoilResistance.copper(320, k(25)).scaledAtConstantCurrent(13.0, k(125)), 0.05);
    }

    @ParameterizedTest(name = "RC-9 (relay maker's note on pull-in at temperature): {0} °C -> {1} V")
    @CsvSource(textBlock = """
             85, 19.7
            100, 20.6
            -25, 12.9
            """)
    void pickUpCorners(double celsius, double volts) {
        CoilResistance coil = new CoilResistance(400, k(25), 0.003853);
        assertEquals(volts, coil.scaledAtConstantCurrent(16.0, k(celsius)), 0.05);
    }

    @Test
    @DisplayName("RC-10: 360 Ω -> 410 Ω from T1 = 23 °C gives ΔT = 35.8 K (relay maker's temperature note; derived)")
    void temperatureFromResistance() {
        CoilResistance coil = CoilResistance.copper(360, k(23));
        assertEquals(35.8, coil.temperatureKelvinAt(410) - k(23), 0.05);
    }

    @Test
    @DisplayName("Self-heating closed form satisfies T = Ta + Rth·V²/R(T) and matches a fixed-point iteration (derived)")
    void selfHeating() {
        CoilResistance coil = CoilResistance.copper(275, k(25));
        double rth = 150.0;
        CoilHeating h = coil.selfHeatedAtVoltage(12.0, k(40), rth);
        double t = k(40);
        for (int i = 0; i < 200; i++) {
            t = k(40) + rth * 144.0 / coil.resistanceOhms(t);
        }
        assertEquals(t, h.coilTemperatureKelvin(), 1e-9);
        assertEquals(k(40) + rth * h.powerWatts(), h.coilTemperatureKelvin(), 1e-9);
        assertEquals(12.0 / h.resistanceOhms(), h.currentAmps(), 1e-15);
        // 0.524 W cold: about 70 K rise at 150 K/W, reduced by the hotter, higher resistance (derived)
        assertTrue(h.coilTemperatureKelvin() - k(40) > 60 && h.coilTemperatureKelvin() - k(40) < 75);
    }

    @Test
    @DisplayName("Zero tempco: the rise is simply Rth·V²/R0 (derived)")
    void selfHeatingWithoutTempco() {
        CoilHeating h = new CoilResistance(100, k(25), 0).selfHeatedAtVoltage(10, k(25), 10);
        assertEquals(k(25) + 10.0, h.coilTemperatureKelvin(), 1e-12);
    }

    @Test
    void validation() {
        IllegalArgumentException ex = assertThrows(IllegalArgumentException.class,
                () -> new CoilResistance(-1, 300, 0.004));
        assertTrue(ex.getMessage().contains("referenceOhms"));
        ex = assertThrows(IllegalArgumentException.class,
                () -> new CoilResistance(100, 300, 0).temperatureKelvinAt(110));
        assertTrue(ex.getMessage().contains("tempcoPerKelvin"));
    }
}
