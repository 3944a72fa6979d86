package org.armature.solver.timedomain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class StageRunTest {

    private static TransientResult off(StageTemplate t, Suppressor s) {
        return Runs.run(Templates.build(t, s, HighSideDrive.LEVEL_SHIFT), TransientOptions.turnOff());
    }

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    @DisplayName("every template with its diode: switch peak = supply + about one forward drop (check-values.md: Vsupply + Vc)")
    void everyTemplateWithDiode(StageTemplate t) {
        TransientMetrics m = off(t, Suppressor.DIODE).metrics();
        assertEquals(12.75, m.peakSwitchVolts(), 0.25); // 12 V + VF of a rectifier at ~30 mA (common practice)
        assertFalse(m.switchBreakdown());
        assertTrue(m.decayToReleaseCurrentSeconds() > 3e-3, "slow decay through a plain diode");
        assertTrue(m.releaseTimeSeconds() > m.decayToReleaseCurrentSeconds());
    }

    @ParameterizedTest
    @EnumSource(value = Suppressor.class, names = {"DIODE", "DIODE_ZENER", "TVS", "NONE", "RESISTOR", "RC"})
    @DisplayName("energy balance on the low-side NPN stage: ½·L·I0² − field energy left − work of the pull on the armature (+ rail energy while it feeds) = coil R + suppressor + switch within 1 % (derived)")
    void energyBalance(Suppressor s) {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN, s, HighSideDrive.LEVEL_SHIFT);
        TimeDomainCircuit c = StageCircuit.build(stage, stage.conditions().ambientCelsius(), true);
        TransientResult r = Runs.run(c, new DriveWaveform.TurnOff(TransientOptions.DEFAULT_EDGE_SECONDS),
                0.04, StepOptions.DEFAULTS.withTolerance(1e-4));
        TransientMetrics m = r.metrics();
        Waveform w = r.waveform();
        // energy the 12 V rail delivers after the edge (into the coil while the switch or a snubber conducts)
        double supplied = 0;
        Trace iCoil = w.require(Waveform.COIL_CURRENT);
        Trace iSw = w.require("I(Q1)");
        for (int k = 1; k < w.size(); k++) {
            if (w.time(k - 1) >= TransientOptions.DEFAULT_EDGE_SECONDS) {
                double dt = w.time(k) - w.time(k - 1);
                supplied += 12 * 0.5 * (iSw.value(k) + iSw.value(k - 1)) * dt;
            }
        }
        double supp = Double.isNaN(m.suppressorEnergyJoules()) ? 0 : m.suppressorEnergyJoules();
        double out = m.coilResistiveEnergyJoules() + supp + m.switchEnergyJoules();
        // the template relay has a moving armature (1.2 H / 2.4 H): account for the field energy
        // left at the end and the work of the pull while the spring opens the gap (derived)
        double motion = c.armatures.isEmpty() ? 0 : Circuits.endFieldEnergyJoules(w, c.armatures.get(0).model)
                + Circuits.pullWorkJoules(w, c.armatures.get(0).model, TransientOptions.DEFAULT_EDGE_SECONDS);
        assertEquals(m.storedEnergyJoules() + supplied - motion, out, 0.01 * m.storedEnergyJoules(),
                "coil " + m.coilResistiveEnergyJoules() + " supp " + supp + " switch " + m.switchEnergyJoules()
                        + " rail " + supplied + " motion " + motion + " coil current at end " + iCoil.value(w.size() - 1));
    }

    @Test
    @DisplayName("SU-0/SU-1: unsuppressed turn-off drives the 40 V NPN into breakdown, which absorbs the energy")
    void unsuppressedBreaksDown() {
        TransientMetrics m = off(StageTemplate.LOW_SIDE_NPN, Suppressor.NONE).metrics();
        assertTrue(m.switchBreakdown());
        assertEquals(40, m.peakSwitchVolts(), 0.1 * 40); // VCEO 40 V default: clamps at the rating (BreakdownClamp)
        assertTrue(m.switchEnergyJoules() > 0.5 * m.storedEnergyJoules());
    }

    @Test
    @DisplayName("diode + 12 V zener: peak = supply + VZ + VF; faster decay to drop-out than a plain diode (SU-12, DESIGN relay notes)")
    void zenerFaster() {
        TransientMetrics dz = off(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER).metrics();
        TransientMetrics d = off(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE).metrics();
        assertEquals(24.8, dz.peakSwitchVolts(), 0.5); // 12 + 12 + ~0.8 V (check-values.md: Vsupply + Vc)
        assertTrue(d.decayToReleaseCurrentSeconds() > 2.5 * dz.decayToReleaseCurrentSeconds(),
                d.decayToReleaseCurrentSeconds() + " vs " + dz.decayToReleaseCurrentSeconds());
    }

    @Test
    @DisplayName("turn-on: contacts close after pick-up; operate time from the armature physics near the datasheet's 8 ms (1 g default armature: 8–9 ms, RelayArmatureDatasheet, derived)")
    void turnOn() {
        TransientResult r = Runs.run(Templates.defaultStage(), TransientOptions.turnOn());
        assertTrue(r.waveform().firstEvent(TransientEvent.PICK_UP).isPresent());
        assertEquals(8e-3, r.metrics().operateTimeSeconds(), 1e-3); // RELAY default operate time 8 ms (typical)
    }

    @Test
    @DisplayName("template relay: once the freewheeling diode stops, the core loss damps the winding's ring (Q = R·√(C/L) < 1, derived)")
    void noRingAfterDiodeStops() {
        TransientResult r = off(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE);
        Waveform w = r.waveform();
        double zero = TransientOptions.DEFAULT_EDGE_SECONDS + r.metrics().decayToZeroSeconds();
        Trace i = w.require(Waveform.COIL_CURRENT);
        double worst = 0;
        for (int k = 0; k < w.size(); k++) {
            if (w.time(k) > zero + 1e-3) {
                worst = Math.max(worst, Math.abs(i.value(k)));
            }
        }
        // 1 ms after the current reached zero: with Q below 1 nothing rings (derived); 1 µA is a
        // thirtieth of a percent of the 30 mA on-current and a three-thousandth of the drop-out current
        assertTrue(worst < 1e-6, "coil current " + worst + " A");
        // the ring would need steps of a fraction of its 70 µs period: without it the 20 ms window
        // takes a few hundred points (derived from the 200 µs largest step and the events)
        assertTrue(r.acceptedSteps() < 400, r.acceptedSteps() + " steps");
    }

    @Test
    @DisplayName("Darlington channel: its clamp diode to the common pin is the suppressor; the coil's energy goes there, not into the switch")
    void darlingtonClampIsTheSuppressor() {
        TransientResult r = off(StageTemplate.DARLINGTON_CHANNEL, Suppressor.DIODE);
        TransientMetrics m = r.metrics();
        double onAmps = r.waveform().valueAt(Waveform.COIL_CURRENT, 0.5 * TransientOptions.DEFAULT_EDGE_SECONDS);
        // the clamp carries the coil current at the edge (a freewheeling path: common practice); no
        // trapezoidal overshoot when the clamp switches on (NM-7): within 10 %
        assertEquals(onAmps, m.peakSuppressorAmps(), 0.1 * onAmps);
        // energy left after the winding's own loss goes into the clamp (check-values.md energy balance, derived):
        // at least 9 % of ½LI², against a switch that only sees its saturated drop
        assertTrue(m.suppressorEnergyJoules() > 0.09 * m.storedEnergyJoules(), m.toString());
        assertTrue(m.switchEnergyJoules() < 1e-3 * m.suppressorEnergyJoules(), m.toString());
    }

    @ParameterizedTest
    @EnumSource(value = StageTemplate.class, names = {"LOW_SIDE_NPN", "DARLINGTON_CHANNEL"})
    @DisplayName("NM-7: once the freewheeling path conducts, the suppressor current does not ring from point to point")
    void noPointToPointRinging(StageTemplate t) {
        TransientResult r = off(t, Suppressor.DIODE);
        Waveform w = r.waveform();
        double[] i = w.require(Waveform.COIL_CURRENT).values();
        String name = w.traceNames().stream().filter(n -> n.equals("I(D1)") || n.equals("I(U2)")).findFirst()
                .orElseThrow();
        double[] d = w.require(name).values();
        int alternations = 0;
        double edge = TransientOptions.DEFAULT_EDGE_SECONDS;
        for (int k = 3; k < w.size(); k++) {
            if (w.time(k - 3) > edge && w.time(k) < edge + 1e-3) {
                double d1 = d[k] - d[k - 1];
                double d2 = d[k - 1] - d[k - 2];
                double d3 = d[k - 2] - d[k - 3];
                // a change of more than 0.1 % of the coil current, reversing on three steps running
                double floor = 1e-3 * Math.abs(i[k]);
                if (d1 * d2 < 0 && d2 * d3 < 0 && Math.abs(d1) > floor && Math.abs(d2) > floor) {
                    alternations++;
                }
            }
        }
        // derived: the decay through a diode is monotonic; the trapezoidal rule alone would
        // alternate for dozens of points (the capacitor-diode mode is 0.1 ns against µs steps)
        assertTrue(alternations <= 2, alternations + " alternations in " + name);
    }
}
