package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class LogicOutputPinTest {

    @Test
    @DisplayName("GP-7: VOH(8 mA) = VDD − 0.4, VOH(20 mA) = VDD − 1.3 at VDD 3.3 -> Rout 75 Ω, V0 = VDD + 0.2 V (derived)")
    void theveninFromTwoPoints() {
        double vdd = 3.3;
        LogicOutputPin pin = LogicOutputPin.fromTwoPoints(vdd - 0.4, 8e-3, vdd - 1.3, 20e-3);
        assertEquals(75.0, pin.outputResistanceOhms(), 1e-9);
        assertEquals(vdd + 0.2, pin.openCircuitVolts(), 1e-9);
        assertEquals(vdd - 0.4, pin.voltsAt(8e-3), 1e-12);
        // into 1 kΩ to ground: 3.5 V / 1075 Ω (derived)
        assertEquals(3.5 / 1075.0, pin.currentInto(1000.0, 0.0), 1e-12);
    }

    @Test
    @DisplayName("Sink side: VOL 0.4 V at −8 mA, 1.0 V at −20 mA -> Rout 50 Ω, V0 0 V (derived)")
    void sinkSide() {
        LogicOutputPin pin = LogicOutputPin.fromTwoPoints(0.4, -8e-3, 1.0, -20e-3);
        assertEquals(50.0, pin.outputResistanceOhms(), 1e-9);
        assertEquals(0.0, pin.openCircuitVolts(), 1e-12);
    }

    @Test
    void rejectsEqualCurrentsAndRisingVoltage() {
        assertThrows(IllegalArgumentException.class, () -> LogicOutputPin.fromTwoPoints(3.0, 8e-3, 2.5, 8e-3));
        assertThrows(IllegalArgumentException.class, () -> LogicOutputPin.fromTwoPoints(2.0, 8e-3, 2.5, 20e-3));
    }
}
