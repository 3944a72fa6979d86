package org.armature.devices;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class BreakdownClampTest {

    @Test
    @DisplayName("Clamp: zero at 0 V, knee current at the rating, 1 A about 7 % above it (derived from the form)")
    void clampShape() {
        BreakdownClamp clamp = BreakdownClamp.atRating(40.0);
        JunctionEvaluation e = new JunctionEvaluation();
        clamp.evaluate(0.0, e);
        assertEquals(0.0, e.currentAmps(), 1e-30);
        clamp.evaluate(40.0, e);
        assertEquals(1e-3, e.currentAmps(), 1e-12);
        clamp.evaluate(35.0, e);
        assertTrue(e.currentAmps() < 1e-8, "blocks below the rating");
        double vAtOneAmp = 40.0 + 0.4 * Math.log(1.0 / 1e-3);
        clamp.evaluate(vAtOneAmp, e);
        assertEquals(1.0, e.currentAmps(), 1e-9);
    }

    @Test
    @DisplayName("Coil kickback into the clamp: 30 mA settles just above the rating (derived by Newton with the clamp's limiting)")
    void clampsInductiveCurrent() {
        BreakdownClamp clamp = BreakdownClamp.atRating(40.0);
        JunctionEvaluation e = new JunctionEvaluation();
        double v = 0.0;
        for (int i = 0; i < 200; i++) {
            clamp.evaluate(v, e);
            double proposed = v + (30e-3 - e.currentAmps()) / e.conductanceSiemens();
            v = clamp.limitVoltage(proposed, v);
        }
        assertEquals(40.0 + 0.4 * Math.log(30.0), v, 1e-6);
    }

    @Test
    @DisplayName("Conductance matches a central finite difference (derived)")
    void conductance() {
        BreakdownClamp clamp = new BreakdownClamp(60.0, 1e-3, 0.8);
        JunctionEvaluation e = new JunctionEvaluation();
        for (double v : new double[] {10, 55, 60, 61.5, 63}) {
            clamp.evaluate(v + 1e-6, e);
            double ip = e.currentAmps();
            clamp.evaluate(v - 1e-6, e);
            double im = e.currentAmps();
            clamp.evaluate(v, e);
            assertEquals((ip - im) / 2e-6, e.conductanceSiemens(), 1e-6 * e.conductanceSiemens() + 1e-15);
        }
    }
}
