package org.armature.solver.timedomain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;
import org.armature.devices.MovingArmature;
import org.armature.devices.RelayArmatureDatasheet;
import org.armature.devices.RelayArmatureFit;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ArmatureRunTest {

    private static final double VOLTS = 12;
    private static final double OHMS = 275;
    /** Must-operate 75 % and must-release 10 % of rated over the coil resistance (DESIGN.md "Relay model"). */
    private static final double PICK_UP_AMPS = 0.75 * VOLTS / OHMS;
    private static final double DROP_OUT_AMPS = 0.10 * VOLTS / OHMS;
    private static final double EDGE = 1e-3;

    /** The RC-13 relay: 275 Ω, 1.15 H released, 2.29 H attracted, travel 0.3 mm, ρ = 2 (check-values.md RC-13, DESIGN). */
    private static MovingArmature rc13() {
        return RelayArmatureFit.fit(RelayArmatureDatasheet.typical(OHMS, 1.15, 2.29, PICK_UP_AMPS, DROP_OUT_AMPS,
                0.3e-3)).moving().orElseThrow();
    }

    private static boolean happened(TransientResult r, String what) {
        return r.waveform().firstEvent(what).isPresent();
    }

    private static double currentAt(TransientResult r, String what) {
        return r.waveform().valueAt(Waveform.COIL_CURRENT, r.waveform().firstEvent(what).orElseThrow().timeSeconds());
    }

    @ParameterizedTest(name = "steady current {0} × pick-up")
    @DisplayName("quasi-static pick-up: the fitted armature stays released at 0.98 × must-operate current and operates at 1.02 × (brief: within 2 %)")
    @CsvSource(textBlock = """
            0.98, false
            1.02, true
            """)
    void pickUpThreshold(double fraction, boolean operates) {
        MovingArmature m = rc13();
        double onOhms = VOLTS / (fraction * PICK_UP_AMPS) - OHMS;
        TimeDomainCircuit c = Circuits.armature(VOLTS, m, onOhms, 1e9, false, 0, false);
        TransientResult r = Runs.run(c, new DriveWaveform.TurnOn(EDGE), 0.04, StepOptions.DEFAULTS);
        assertEquals(operates, happened(r, TransientEvent.PICK_UP));
        assertEquals(operates, happened(r, TransientEvent.CONTACTS_CLOSED));
        assertEquals(operates, happened(r, TransientEvent.ATTRACTED));
        if (operates) {
            // the located event sits at the datasheet's must-operate current (fit: pick-up balance, derived)
            assertEquals(PICK_UP_AMPS, currentAt(r, TransientEvent.PICK_UP), 0.02 * PICK_UP_AMPS);
        }
    }

    @ParameterizedTest(name = "steady current {0} × drop-out")
    @DisplayName("quasi-static drop-out: the fitted armature holds at 1.02 × must-release current and releases at 0.98 × (brief: within 2 %)")
    @CsvSource(textBlock = """
            1.02, false
            0.98, true
            """)
    void dropOutThreshold(double fraction, boolean releases) {
        MovingArmature m = rc13();
        double offOhms = VOLTS / (fraction * DROP_OUT_AMPS) - OHMS;
        TimeDomainCircuit c = Circuits.armature(VOLTS, m, 1e-3, offOhms, false, 0, true);
        TransientResult r = Runs.run(c, new DriveWaveform.TurnOff(EDGE), 0.06, StepOptions.DEFAULTS);
        assertEquals(releases, happened(r, TransientEvent.DROP_OUT));
        assertEquals(releases, happened(r, TransientEvent.CONTACTS_OPEN));
        assertEquals(releases, happened(r, TransientEvent.RELEASED));
        if (releases) {
            // drop-out balance at the attracted stop (fit, derived)
            assertEquals(DROP_OUT_AMPS, currentAt(r, TransientEvent.DROP_OUT), 0.02 * DROP_OUT_AMPS);
        }
    }

    @Test
    @DisplayName("RC-13 relay, plain diode: decay to drop-out about 16–19 ms (DESIGN.md sanity figure, derived: τ·ln((I0 + VF/R)/(Ido + VF/R)), τ = 8.3 ms)")
    void rc13PlainDiodeDecay() {
        TimeDomainCircuit c = Circuits.armature(VOLTS, rc13(), 1e-3, 1e9, true, 0, true);
        TransientResult r = Runs.run(c, new DriveWaveform.TurnOff(EDGE), 0.03, StepOptions.DEFAULTS);
        double decay = r.metrics().decayToReleaseCurrentSeconds();
        assertEquals(17.5e-3, decay, 2.0e-3, "decay " + decay); // DESIGN 16–19 ms; 15.5 ms allows VF ≈ 0.75 V (derived)
        assertTrue(happened(r, TransientEvent.CONTACTS_OPEN));
        // the armature moves only after the current has fallen to drop-out (DESIGN.md)
        assertTrue(r.waveform().firstEvent(TransientEvent.CONTACTS_OPEN).orElseThrow().timeSeconds() > EDGE + decay);
    }

    @Test
    @DisplayName("RC-13 relay, 12.7 V clamp (diode + 12 V zener): decay to drop-out about 5 ms (DESIGN.md; check-values.md closed form τ·ln((I0 + Vc/R)/(Ido + Vc/R)) = 4.79 ms, derived)")
    void rc13ZenerDecay() {
        TimeDomainCircuit c = Circuits.armature(VOLTS, rc13(), 1e-3, 1e9, false, 12.7, true);
        TransientResult r = Runs.run(c, new DriveWaveform.TurnOff(EDGE), 0.008, StepOptions.DEFAULTS);
        double tau = 2.29 / OHMS;
        double i0 = VOLTS / (OHMS + 1e-3);
        double vcOverR = 12.7 / OHMS;
        double expected = tau * Math.log((i0 + vcOverR) / (DROP_OUT_AMPS + vcOverR)); // check-values.md "Suppression and kickback"
        assertEquals(expected, r.metrics().decayToReleaseCurrentSeconds(), 0.01 * expected);
    }

    private static TransientResult templateOff(Suppressor s) {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN, s, HighSideDrive.LEVEL_SHIFT);
        return Runs.run(stage, TransientOptions.turnOff().withDuration(0.04));
    }

    @Test
    @DisplayName("SU-12/SU-16: template relay (1.2 H / 2.4 H) releases several times slower with a plain diode than with diode + 12 V zener")
    void plainDiodeReleasesSlower() {
        TransientMetrics d = templateOff(Suppressor.DIODE).metrics();
        TransientMetrics dz = templateOff(Suppressor.DIODE_ZENER).metrics();
        double ratio = d.releaseTimeSeconds() / dz.releaseTimeSeconds();
        // SU-12 says about ×3 to ×8; with the zener at the supply voltage (SU-15) the armature's own
        // flight of about 1.5–2 ms, common to both, pulls this relay's ratio to about 2.6 (measured);
        // "several times" (the words) is kept as more than ×2.2
        assertTrue(ratio > 2.2 && ratio < 8, "release ratio " + ratio + ": " + d.releaseTimeSeconds() + " s vs "
                + dz.releaseTimeSeconds() + " s");
        // decay to drop-out alone: SU-12 band ×3 to ×8
        double decayRatio = d.decayToReleaseCurrentSeconds() / dz.decayToReleaseCurrentSeconds();
        assertTrue(decayRatio > 3 && decayRatio < 8, "decay ratio " + decayRatio);
        // SU-16: a plain diode slows the armature itself: flight from drop-out to contacts open is longer
        double flightD = d.releaseTimeSeconds() - d.decayToReleaseCurrentSeconds();
        double flightDz = dz.releaseTimeSeconds() - dz.decayToReleaseCurrentSeconds();
        assertTrue(flightD > flightDz, "flight " + flightD + " vs " + flightDz);
    }

    @Test
    @DisplayName("SU-12: release penalty of a plain diode ×3 to ×8 against no suppressor and against a 24 V zener the 40 V switch allows")
    void plainDiodePenaltyBand() {
        double d = templateOff(Suppressor.DIODE).metrics().releaseTimeSeconds();
        TransientMetrics none = templateOff(Suppressor.NONE).metrics();
        Stage zener = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT);
        org.armature.model.Part z = zener.parts().stream()
                .filter(p -> p.kind() == org.armature.model.PartKind.ZENER).findFirst().orElseThrow();
        TransientMetrics dz24 = Runs.run(zener.withPart(z.with("breakdownVolts", 24)),
                TransientOptions.turnOff().withDuration(0.04)).metrics();
        // SU-12 (relay makers' application notes): about ×3 to ×8
        assertTrue(d / none.releaseTimeSeconds() > 3 && d / none.releaseTimeSeconds() < 8,
                "against none: " + d / none.releaseTimeSeconds());
        assertTrue(d / dz24.releaseTimeSeconds() > 3 && d / dz24.releaseTimeSeconds() < 8,
                "against a 24 V zener: " + d / dz24.releaseTimeSeconds());
        // the 24 V zener keeps the switch out of breakdown: 12 V + 24 V + VF ≈ 36.7 V < 40 V VCEO (derived)
        assertFalse(dz24.switchBreakdown());
        assertEquals(36.7, dz24.peakSwitchVolts(), 0.5);
    }

    @Test
    @DisplayName("template turn-on: operate time from the physics, after the L/R rise to pick-up (derived: τ·ln(I/(I − Ipu)))")
    void templateOperateTime() {
        TransientResult r = Runs.run(Templates.defaultStage(), TransientOptions.turnOn());
        double operate = r.metrics().operateTimeSeconds();
        double pickUp = r.waveform().firstEvent(TransientEvent.PICK_UP).orElseThrow().timeSeconds() - EDGE;
        double attracted = r.waveform().firstEvent(TransientEvent.ATTRACTED).orElseThrow().timeSeconds() - EDGE;
        // rise to pick-up with the released inductance: 1.2 H / 400 Ω = 3 ms, to 22.5 of 30 mA: 4.16 ms (derived,
        // the switch drop and the coil's warm resistance make it a little longer)
        assertEquals(4.16e-3, pickUp, 0.5e-3);
        assertTrue(operate > pickUp && operate < attracted, pickUp + " < " + operate + " < " + attracted);
        // flight of the 1 g default armature: operate time about 8–9 ms (RelayArmatureDatasheet, derived)
        assertEquals(8.5e-3, operate, 1.0e-3);
    }

    @Test
    @DisplayName("current dip at pull-in: the coil current peaks before the armature closes, falls, then rises again (DESIGN.md)")
    void currentDipAtPullIn() {
        TransientResult r = Runs.run(Templates.defaultStage(), TransientOptions.turnOn());
        Waveform w = r.waveform();
        Trace i = w.require(Waveform.COIL_CURRENT);
        double closed = w.firstEvent(TransientEvent.ATTRACTED).orElseThrow().timeSeconds();
        double peak = 0;
        int k = 0;
        for (; k < w.size() && w.time(k) <= closed; k++) {
            peak = Math.max(peak, i.value(k));
        }
        double atClose = w.valueAt(Waveform.COIL_CURRENT, closed);
        double end = i.value(w.size() - 1);
        assertTrue(atClose < 0.8 * peak, "dip: peak " + peak + " A, at closing " + atClose + " A");
        assertTrue(end > atClose * 1.2, "rises again: " + end + " A after " + atClose + " A");
        // the peak sits at or just after pick-up (the current rises until the moving armature's EMF takes over)
        assertTrue(peak >= currentAt(r, TransientEvent.PICK_UP));
    }

    @Test
    @DisplayName("energy balance with a moving armature: ½·L0·I0² − ½·L·I² at the end − work of the pull on the armature (+ rail) = coil R + suppressor + switch within 1 % (derived)")
    void energyBalanceWithMotion() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        TimeDomainCircuit c = StageCircuit.build(stage, stage.conditions().ambientCelsius(), true);
        ArmatureDynamics a = c.armatures.get(0);
        TransientResult r = Runs.run(c, new DriveWaveform.TurnOff(EDGE), 0.04,
                StepOptions.DEFAULTS.withTolerance(1e-4));
        TransientMetrics m = r.metrics();
        Waveform w = r.waveform();
        Trace iSw = w.require("I(Q1)");
        double supplied = 0;
        for (int k = 1; k < w.size(); k++) {
            if (w.time(k - 1) >= EDGE) {
                supplied += 12 * 0.5 * (iSw.value(k) + iSw.value(k - 1)) * (w.time(k) - w.time(k - 1));
            }
        }
        double pullWork = Circuits.pullWorkJoules(w, a.model, EDGE);
        assertTrue(pullWork < 0, "the spring opens the armature against the pull: " + pullWork);
        double endEnergy = Circuits.endFieldEnergyJoules(w, a.model);
        double out = m.coilResistiveEnergyJoules() + m.suppressorEnergyJoules() + m.switchEnergyJoules();
        double in = m.storedEnergyJoules() - endEnergy - pullWork + supplied;
        assertEquals(in, out, 0.01 * m.storedEnergyJoules(), "pull work " + pullWork + " J, end " + endEnergy + " J");
    }

    @Test
    @DisplayName("contact bounce: with restitution 0.3 the armature strikes the attracted stop several times, then rests with the contacts closed (DESIGN.md: stops with restitution)")
    void bounceAtTheStop() {
        MovingArmature m = RelayArmatureFit.fit(RelayArmatureDatasheet.typical(OHMS, 1.15, 2.29, PICK_UP_AMPS,
                DROP_OUT_AMPS, 0.3e-3).withMechanics(RelayArmatureDatasheet.DEFAULT_MASS_KILOGRAMS,
                RelayArmatureDatasheet.DEFAULT_DAMPING_NEWTON_SECONDS_PER_METRE, 0.3)).moving().orElseThrow();
        TransientResult r = Runs.run(Circuits.armature(VOLTS, m, 1e-3, 1e9, false, 0, false),
                new DriveWaveform.TurnOn(EDGE), 0.03, StepOptions.DEFAULTS);
        long strikes = r.waveform().events().stream().filter(e -> e.what().equals(TransientEvent.ATTRACTED)).count();
        // each rebound keeps 0.3 of the speed until it falls below 1 mm/s: several strikes (derived)
        assertTrue(strikes >= 3, "strikes " + strikes);
        Trace contacts = r.waveform().require(Waveform.CONTACT_STATE);
        assertEquals(1.0, contacts.value(contacts.size() - 1), 0.0); // closed at the end (no chatter at mid-travel)
        Trace pos = r.waveform().require(Waveform.ARMATURE_POSITION);
        assertEquals(m.travelMetres(), pos.value(pos.size() - 1), 1e-9); // at the attracted stop, within 1 nm
    }

    @Test
    @DisplayName("no attracted inductance: the template relay keeps the constant-inductance threshold model (DESIGN.md)")
    void constantInductanceKept() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        Stage constant = stage.withPart(stage.require("K1").with("inductanceAttractedHenries", 0));
        TimeDomainCircuit c = StageCircuit.build(constant, 25, true);
        assertTrue(c.armatures.isEmpty());
        assertFalse(c.relays.isEmpty());
        TransientResult r = Runs.run(constant, TransientOptions.turnOff());
        Optional<TransientEvent> stop = r.waveform().firstEvent(TransientEvent.RELEASED);
        assertTrue(stop.isEmpty(), "no armature motion events without an attracted inductance");
    }

    @Test
    @DisplayName("the armature mass is a relay parameter: four times the mass, about twice the flight (derived: t ∝ √m under a given force)")
    void heavierArmatureFliesLonger() {
        Stage light = Templates.defaultStage();
        org.armature.model.Part k1 = light.part("K1").orElseThrow();
        Stage heavy = light.withPart(k1.with("armatureMassGrams", 4));
        double flightLight = flight(Runs.run(light, TransientOptions.turnOn().withDuration(0.04)));
        double flightHeavy = flight(Runs.run(heavy, TransientOptions.turnOn().withDuration(0.04)));
        // under a force that did not change with time the flight would scale as √4 = 2; the pull
        // grows as the gap closes and the current dips, so allow ±25 % (derived)
        assertEquals(2.0, flightHeavy / flightLight, 0.5, flightLight + " s vs " + flightHeavy + " s");
    }

    /** Pick-up to contacts closed, seconds. */
    private static double flight(TransientResult r) {
        double pickUp = r.waveform().firstEvent(TransientEvent.PICK_UP).orElseThrow().timeSeconds();
        double closed = r.waveform().firstEvent(TransientEvent.CONTACTS_CLOSED).orElseThrow().timeSeconds();
        return closed - pickUp;
    }
}
