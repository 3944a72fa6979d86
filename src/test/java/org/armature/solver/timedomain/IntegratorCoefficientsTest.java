package org.armature.solver.timedomain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class IntegratorCoefficientsTest {

    /** One step of x' = −x/τ (τ = 1) with the formula, solved for x(n+1). */
    private static double step(IntegratorCoefficients k, double xNow, double xBefore) {
        double history = k.history(xNow, xBefore, -xNow);
        return -history / (k.a0() + 1);
    }

    @ParameterizedTest(name = "h/τ = {0}: BE {1}, TR {2}")
    @DisplayName("NM-7 one-step factors for di/dt = −i/τ (derived)")
    @CsvSource(textBlock = """
            0.1, 0.909091,  0.904762
            0.5, 0.666667,  0.6
            2,   0.333333,  0
            10,  0.090909, -0.666667
            """)
    void oneStepFactors(double hOverTau, double be, double tr) {
        assertEquals(be, step(IntegratorCoefficients.of(IntegrationMethod.BACKWARD_EULER, hOverTau, hOverTau), 1, 1),
                1e-6); // NM-7, derived
        assertEquals(tr, step(IntegratorCoefficients.of(IntegrationMethod.TRAPEZOIDAL, hOverTau, hOverTau), 1, 1),
                1e-6); // NM-7, derived
    }

    @ParameterizedTest(name = "{0}: {1}")
    @DisplayName("NM-8 RL decay after 10 steps of h = 0.1τ (derived; exact 0.367879)")
    @CsvSource(textBlock = """
            BACKWARD_EULER, 0.385543
            TRAPEZOIDAL,    0.367573
            BDF2,           0.369549
            """)
    void tenSteps(IntegrationMethod method, double expected) {
        double h = 0.1;
        double before = 1;
        double now = 1;
        for (int n = 0; n < 10; n++) {
            // BDF2 starts with one backward-Euler step (NM-8)
            IntegrationMethod m = method == IntegrationMethod.BDF2 && n == 0 ? IntegrationMethod.BACKWARD_EULER : method;
            double next = step(IntegratorCoefficients.of(m, h, h), now, before);
            before = now;
            now = next;
        }
        assertEquals(expected, now, 1e-6); // NM-8, derived
    }

    @ParameterizedTest(name = "{0}, h = {1}, previous {2}")
    @DisplayName("NM-9 LTE constants: the formula's error on a polynomial of degree p+1 (Dahlquist 1963; Gear 1971)")
    @CsvSource(textBlock = """
            BACKWARD_EULER, 1e-3, 1e-3
            TRAPEZOIDAL,    2e-3, 1e-3
            BDF2,           1e-3, 1e-3
            BDF2,           3e-3, 1e-3
            BDF2,           0.5e-3, 2e-3
            """)
    void lteConstantMatchesFormulaError(IntegrationMethod method, double h, double hPrev) {
        IntegratorCoefficients k = IntegratorCoefficients.of(method, h, hPrev);
        int p = method.order();
        // x(t) = (t − t1)^(p+1)/(p+1)!: its (p+1)-th derivative is 1, x(t1) = 0 and x'(t1) = 0
        double fact = p == 1 ? 2 : 6;
        double xNow = Math.pow(-h, p + 1) / fact;
        double xBefore = Math.pow(-(h + hPrev), p + 1) / fact;
        double dxNow = Math.pow(-h, p) / (fact / (p + 1));
        double formulaDerivative = k.derivative(0, k.history(xNow, xBefore, dxNow));
        // the new value the formula gives with the true derivative 0 is −history/a0; the true value is 0
        double error = -(formulaDerivative - 0) / k.a0();
        assertEquals(Math.abs(k.lteConstant()), Math.abs(error), Math.abs(k.lteConstant()) * 1e-9);
    }

    @Test
    @DisplayName("NM-9 equal-step constants: BE h²/2, TR −h³/12, BDF2 −2/9·h³ (Dahlquist 1963; Gear 1971)")
    void equalStepConstants() {
        double h = 1e-3;
        assertEquals(h * h / 2, IntegratorCoefficients.of(IntegrationMethod.BACKWARD_EULER, h, h).lteConstant(), 1e-20);
        assertEquals(-h * h * h / 12, IntegratorCoefficients.of(IntegrationMethod.TRAPEZOIDAL, h, h).lteConstant(), 1e-22);
        assertEquals(-2.0 / 9 * h * h * h, IntegratorCoefficients.of(IntegrationMethod.BDF2, h, h).lteConstant(), 1e-22);
    }

    @Test
    void rejectsNonPositiveStep() {
        assertThrows(IllegalArgumentException.class,
                () -> IntegratorCoefficients.of(IntegrationMethod.TRAPEZOIDAL, 0, 1));
        assertThrows(IllegalArgumentException.class,
                () -> IntegratorCoefficients.of(IntegrationMethod.BDF2, 1e-3, -1));
    }

    @Test
    @DisplayName("companion of C and L: i = C·a0·v + C·history, v = L·a0·i + L·history (derived)")
    void companions() {
        IntegratorCoefficients k = IntegratorCoefficients.of(IntegrationMethod.TRAPEZOIDAL, 1e-6, 1e-6);
        Companion.Norton c = Companion.capacitor(1e-9, k, 2.0, 0, 1e-3);
        assertEquals(1e-9 * 2 / 1e-6, c.conductanceSiemens(), 1e-15); // derived: 2C/h
        assertEquals(-2e-3 * 2.0 - 1e-3, c.currentAmps(), 1e-12); // derived: −(2C/h)·v − i
        Companion.Thevenin l = Companion.inductor(1.0, k, 0.03, 0, -12);
        assertEquals(2e6, l.resistanceOhms(), 1e-6); // derived: 2L/h
        assertEquals(-2e6 * 0.03 + 12, l.volts(), 1e-6); // derived: −2L/h·i − v
    }

    @Test
    @DisplayName("transient capacitor stamp: backward Euler at h = 1 ms, 1 µF charged to 2 V: C/h and C/h·v(previous) into a (derived)")
    void transientCapacitorStamp() {
        StepState step = new StepState();
        TransientCapacitor c = new TransientCapacitor("C", 0, org.armature.netlist.Netlist.GROUND, 1e-6, step);
        c.initialise(new org.armature.netlist.ArraySolution(1, new double[] {2.0}, new double[0]));
        step.set(IntegratorCoefficients.of(IntegrationMethod.BACKWARD_EULER, 1e-3, 1e-3));
        org.armature.solver.MnaSystem m = new org.armature.solver.MnaSystem(1, 0);
        c.stamp(m, new org.armature.netlist.ArraySolution(1, new double[1], new double[0]),
                new org.armature.netlist.StampContext(org.armature.netlist.StampContext.Mode.TRANSIENT, 1, 1e-3, 1e-3, 1e3));
        assertEquals(1e-3, m.matrix()[0], 1e-15); // derived: C/h = 1 µF / 1 ms
        assertEquals(2e-3, m.rhs()[0], 1e-15); // derived: C/h·v(previous) = 1 mS · 2 V
    }
}
