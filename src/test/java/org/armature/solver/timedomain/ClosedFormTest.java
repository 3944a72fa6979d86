package org.armature.solver.timedomain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ClosedFormTest {

    private static final double R = 400;
    private static final double L = 1.0;
    private static final double TAU = L / R;
    private static final double I0 = Circuits.VOLTS / R;
    private static final double EDGE = 1e-3;

    private static TransientResult off(TimeDomainCircuit c, double duration, StepOptions o) {
        return Runs.run(c, new DriveWaveform.TurnOff(EDGE), duration, o);
    }

    @Test
    @DisplayName("RL rise i = V/R·(1 − e^(−t/τ)) (derived, circuit theory)")
    void rlRise() {
        TimeDomainCircuit c = Circuits.lowSide(R, L, Circuits.Clamp.RESISTOR, 1e9, 0, 0);
        TransientResult r = Runs.run(c, new DriveWaveform.TurnOn(EDGE), 0.02, StepOptions.DEFAULTS);
        Waveform w = r.waveform();
        for (double t = 0.5e-3; t < 19e-3; t += 1.3e-3) {
            double expected = I0 * (1 - Math.exp(-t / TAU));
            // bound: LTE tolerance 1e-3 relative per step, accumulated over ~100 steps, plus interpolation
            assertEquals(expected, w.valueAt("coil current", EDGE + t), 3e-3 * I0 + 1e-6, "t = " + t);
        }
    }

    @ParameterizedTest(name = "Vc = {0} V")
    @DisplayName("decay through a constant clamp: i = (I0 + Vc/R)e^(−t/τ) − Vc/R, t0 = τ·ln(1 + I0·R/Vc) (check-values.md, derived)")
    @CsvSource(textBlock = """
            12
            24
            0.7
            """)
    void constantClamp(double vc) {
        TimeDomainCircuit c = Circuits.lowSide(R, L, Circuits.Clamp.CONSTANT, vc, 0, 0);
        TransientResult r = off(c, 0.02, StepOptions.DEFAULTS);
        Waveform w = r.waveform();
        double t0 = TAU * Math.log(1 + I0 * R / vc);
        for (double t = 0.1 * t0; t < 0.95 * t0; t += 0.1 * t0) {
            double expected = (I0 + vc / R) * Math.exp(-t / TAU) - vc / R;
            assertEquals(expected, w.valueAt("coil current", EDGE + t), 2e-3 * I0, "t = " + t);
        }
        assertEquals(t0, r.metrics().decayToZeroSeconds(), 2e-3 * t0); // derived, bound: 0.1 % zero threshold + LTE
        assertEquals(Circuits.VOLTS + vc, r.metrics().peakSwitchVolts(), 0.01); // check-values.md: switch peak = Vsupply + Vc
    }

    @Test
    @DisplayName("SU-10 resistor across the coil: peak coil voltage 12 V, τ' = 1.25 ms, to 10 % 2.878 ms (derived)")
    void resistorAcrossCoil() {
        TimeDomainCircuit c = Circuits.lowSide(R, L, Circuits.Clamp.RESISTOR, 400, 0, 0);
        c.dropOutAmps = 0.1 * I0;
        TransientResult r = off(c, 0.02, StepOptions.DEFAULTS);
        assertEquals(12.0, r.metrics().peakCoilReverseVolts(), 0.01); // SU-10
        assertEquals(2.878e-3, r.metrics().decayToReleaseCurrentSeconds(), 0.005e-3); // SU-10
        double tau = 1.25e-3; // SU-10 τ'
        assertEquals(I0 * Math.exp(-1), r.waveform().valueAt("coil current", EDGE + tau), 1e-3 * I0);
    }

    @Test
    @DisplayName("SU-7 plain diode to 10 %: between 4.749 ms (constant 0.7 V) and 5.756 ms (ideal)")
    void plainDiode() {
        TimeDomainCircuit c = Circuits.lowSide(R, L, Circuits.Clamp.DIODE, 0, 0, 0);
        c.dropOutAmps = 0.1 * I0;
        TransientResult r = off(c, 0.02, StepOptions.DEFAULTS);
        double t = r.metrics().decayToReleaseCurrentSeconds();
        // Bound: the Shockley diode's forward voltage falls from about 0.8 V at 30 mA to about
        // 0.7 V at 3 mA (N = 1.8: 0.107 V per decade), so its mean clamp lies between 0 V (ideal) and
        // a constant 0.7 V ... slightly above 0.7 V near I0, where the time matters least.
        // Hence the time lies in or just below [4.749, 5.756] ms; we allow 0.1 ms below (derived).
        assertTrue(t > 4.749e-3 - 0.1e-3 && t < 5.756e-3, "time to 10 % " + t);
    }

    @Test
    @DisplayName("SU-6 / PC-12: unsuppressed coil rings into its capacitance: Z0 = 100 kΩ, 15.915 kHz, I0·Z0 = 3.0 kV at 30 mA (derived)")
    void lcRing() {
        double c100p = 100e-12;
        double rCoil = 1e-3; // losses removed so that the lossless figures hold
        TimeDomainCircuit c = Circuits.lowSide(rCoil, L, Circuits.Clamp.NONE, 0, c100p, 0);
        // the coil current at the edge is set by a 400 Ω series resistance in the on-state
        c.driveHigh.set(0, new org.armature.netlist.Resistor("Q1 on", Circuits.SWITCH, Circuits.GND, 400 - rCoil));
        TransientResult r = off(c, EDGE + 0.2e-3, StepOptions.DEFAULTS);
        double peak = r.metrics().peakSwitchVolts() - Circuits.VOLTS;
        assertEquals(0.030 * 1e5, peak, 0.01 * 3000); // SU-6: 3.0 kV within 1 % (derived)
        // frequency from the zero crossings of the coil current
        Waveform w = r.waveform();
        Trace i = w.require("coil current");
        double first = Double.NaN;
        double last = Double.NaN;
        int crossings = 0;
        for (int k = 1; k < w.size(); k++) {
            if (w.time(k) > EDGE && Math.signum(i.value(k)) != Math.signum(i.value(k - 1))) {
                double tc = w.time(k - 1) + (w.time(k) - w.time(k - 1)) * i.value(k - 1) / (i.value(k - 1) - i.value(k));
                if (Double.isNaN(first)) {
                    first = tc;
                }
                last = tc;
                crossings++;
            }
        }
        double f = (crossings - 1) / 2.0 / (last - first);
        assertEquals(15.915e3, f, 0.005 * 15.915e3); // PC-12 (derived)
    }
}
