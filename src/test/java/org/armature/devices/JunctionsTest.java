package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class JunctionsTest {

    @Test
    @DisplayName("PC-3: VT(300 K) = 25.8520 mV (derived from CODATA 2018)")
    void thermalVoltageAt300K() {
        assertEquals(25.8520e-3, Junctions.thermalVoltage(300.0), 0.00005e-3);
    }

    @ParameterizedTest(name = "PC-5 (derived): VT({0} °C) = {1} mV")
    @CsvSource(textBlock = """
            25,  25.6926
            85,  30.8630
            125, 34.3099
            """)
    void thermalVoltageCorners(double celsius, double millivolts) {
        assertEquals(millivolts, 1e3 * Junctions.thermalVoltage(TestPhysics.kelvin(celsius)), 0.00005);
    }

    @Test
    @DisplayName("DI-11: vcrit = nVT·ln(nVT/(√2·IS)) = 0.72991 V at IS = 1e-14, 300 K (Nagel ERL M520, from memory)")
    void criticalVoltage() {
        double vt = Junctions.thermalVoltage(300.0);
        assertEquals(0.72991, Junctions.criticalVoltage(vt, 1e-14), 0.000005);
    }

    @Test
    @DisplayName("Nagel limiting: big forward jumps are cut, small steps and steps below vcrit pass (derived)")
    void junctionLimiting() {
        double vt = Junctions.thermalVoltage(300.0);
        double vcrit = Junctions.criticalVoltage(vt, 1e-14);
        assertEquals(0.5, Junctions.limitJunction(0.5, 0.0, vt, vcrit), 0.0);
        assertEquals(0.70, Junctions.limitJunction(0.70, 0.69, vt, vcrit), 0.0);
        // from vOld = 0.7 a jump to 5 V: vOld + VT·ln(1 + 4.3/VT) (derived)
        double expected = 0.7 + vt * Math.log(1 + 4.3 / vt);
        assertEquals(expected, Junctions.limitJunction(5.0, 0.7, vt, vcrit), 1e-15);
        // from a reverse-biased start: VT·ln(vNew/VT) (derived)
        assertEquals(vt * Math.log(5.0 / vt), Junctions.limitJunction(5.0, -1.0, vt, vcrit), 1e-15);
        assertTrue(Junctions.limitJunction(5.0, 0.7, vt, vcrit) < 0.9);
    }

    @Test
    @DisplayName("safeExp is e^x to the cap, then linear and finite; its slope is continuous (derived)")
    void safeExponential() {
        assertEquals(Math.exp(3.0), Junctions.safeExp(3.0), 0.0);
        double cap = Junctions.EXP_ARGUMENT_CAP;
        assertEquals(Math.exp(cap) * 2.0, Junctions.safeExp(cap + 1.0), Math.exp(cap) * 1e-12);
        assertTrue(Double.isFinite(Junctions.safeExp(1e250)));
        assertEquals(Math.expm1(1e-9), Junctions.safeExpm1(1e-9), 1e-24);
        assertEquals(Junctions.safeExpSlope(cap), Junctions.safeExpSlope(cap + 1e-9), Math.exp(cap) * 1e-8);
        assertEquals(0.0, Junctions.safeExp(-1e6), 0.0);
    }

    @Test
    @DisplayName("Gate step limit: bounded by 0.5 V + |overdrive|, lands 0.5 V above threshold from cutoff (our rule)")
    void gateStepLimiting() {
        GateStepOptions o = GateStepOptions.DEFAULTS;
        assertEquals(2.0, Junctions.limitGateStep(10.0, 0.0, 1.5, o), 1e-15);
        assertEquals(3.0, Junctions.limitGateStep(10.0, 2.0, 1.5, o), 1e-15);
        assertEquals(3.2, Junctions.limitGateStep(3.2, 3.0, 1.5, o), 1e-15);
        assertEquals(0.0, Junctions.limitGateStep(-5.0, 1.0, 1.5, o), 1e-15);
        double v = 0.0;
        int steps = 0;
        while (v != 10.0 && steps < 20) {
            v = Junctions.limitGateStep(10.0, v, 1.5, o);
            steps++;
        }
        assertEquals(10.0, v, 0.0);
        assertTrue(steps <= 8, "steps " + steps);
    }
}
