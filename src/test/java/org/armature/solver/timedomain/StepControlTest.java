package org.armature.solver.timedomain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class StepControlTest {

    private final StepController controller = new StepController(StepOptions.DEFAULTS);

    @ParameterizedTest(name = "h = {0}, ratio {1}, p = {2} -> {3}")
    @DisplayName("NM-10 h_new = h·0.9·(tol/|E|)^(1/(p+1)), bounded ×0.1 to ×2 (common practice)")
    @CsvSource(textBlock = """
            1e-3, 8,      2, 0.45e-3
            1e-3, 0.125,  2, 1.8e-3
            1e-3, 0.25,   1, 1.8e-3
            1e-3, 1e-9,   2, 2e-3
            1e-3, 1e6,    2, 0.1e-3
            """)
    void rule(double h, double ratio, int order, double expected) {
        assertEquals(expected, controller.propose(h, ratio, order), expected * 1e-12);
    }

    @Test
    void acceptsAtOrBelowOne() {
        assertTrue(controller.accept(1.0));
        assertFalse(controller.accept(1.0000001));
    }

    @Test
    @DisplayName("divided-difference derivative is exact for a cubic (derived)")
    void dividedDifferences() {
        double[] t = {0.7, 0.5, 0.2, 0.1};
        double[] x = new double[4];
        for (int i = 0; i < 4; i++) {
            x[i] = 3 * Math.pow(t[i], 3) - t[i] * t[i] + 2;
        }
        assertEquals(18, TruncationError.derivative(t, x, 3), 1e-9); // derived: x''' = 18
        double[] q = {x[0], x[1], x[2]};
        double[] t3 = {t[0], t[1], t[2]};
        // second divided difference of a cubic: 2·(3(t0+t1+t2)·... ) = 6·(t0+t1+t2)·... derived exactly below
        double expected = 2 * (3 * (t[0] + t[1] + t[2]) - 1);
        assertEquals(expected, TruncationError.derivative(t3, q, 2), 1e-9); // derived: 2·DD[x0,x1,x2]
    }

    @Test
    void optionsNameTheBadField() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new StepOptions(IntegrationMethod.TRAPEZOIDAL, -1, 1e-4, 1e-7, 1e-8, 0.9, 2, 0.1, 1e-9, 1e-15,
                        0.01, 1e-7, 40, 1e-6, 1e-6, 1e-12, 0.125, 100));
        assertTrue(e.getMessage().contains("relativeTolerance"));
    }

    @Test
    @DisplayName("Illinois regula falsi finds the root of a nonlinear function within the tolerance")
    void eventLocator() {
        // g(t) = e^(−t/τ)·I0 − Idrop with τ = 3 ms: crosses at τ·ln(I0/Idrop) (derived)
        double tau = 3e-3;
        double i0 = 0.03;
        double idrop = 0.003;
        double expected = tau * Math.log(i0 / idrop);
        EventLocator loc = new EventLocator(0, i0 - idrop, 0.02, i0 * Math.exp(-0.02 / tau) - idrop, 1e-9);
        int n = 0;
        while (!loc.located() && n++ < 100) {
            double t = loc.nextTrial();
            loc.update(t, i0 * Math.exp(-t / tau) - idrop);
        }
        assertTrue(n < 30, "iterations " + n);
        assertTrue(loc.eventTime() >= expected - 1e-12 && loc.eventTime() <= expected + 1e-9,
                "located " + loc.eventTime() + " vs " + expected);
    }

    @Test
    void driveWaveforms() {
        DriveWaveform pulse = new DriveWaveform.Pulse(1e-3, 5e-3);
        assertFalse(pulse.initialHigh());
        assertTrue(pulse.highAt(1e-3));
        assertTrue(pulse.highAt(5.9e-3));
        assertFalse(pulse.highAt(6e-3));
        assertEquals(List.of(1e-3, 6e-3), pulse.edgeTimes());
        assertFalse(new DriveWaveform.TurnOff(0).highAt(0));
        assertTrue(new DriveWaveform.TurnOff(1).highAt(0.5));
        assertThrows(IllegalArgumentException.class,
                () -> new DriveWaveform.EdgeSequence(false, List.of(2e-3, 1e-3)));
        assertEquals(List.of(2e-3), new DriveWaveform.EdgeSequence(true, List.of(1e-3, 2e-3, 3e-3))
                .edgesBetween(1e-3, 3e-3));
    }
}
