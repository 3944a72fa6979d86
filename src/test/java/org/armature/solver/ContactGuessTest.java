package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A re-solve starts with the relay contacts of the last solve (or of the start point) as a guess;
 * the answer must be the one of a start with released contacts (or the caller's previous states):
 * the hysteresis band between drop-out and pick-up keeps its power-up and previous-state rules.
 */
class ContactGuessTest {

    /**
     * Low-side NPN template: 400 Ω coil, pick-up 22.5 mA, drop-out 3 mA; at a 6 V supply the coil
     * current (about 14 mA) is inside the band (the figures of SweepTest, derived from the template),
     * at 12 V above pick-up and at 1 V below drop-out.
     */
    private static final double BAND_VOLTS = 6.0;
    private static final double OPERATE_VOLTS = 12.0;
    private static final double RELEASE_VOLTS = 1.0;

    private static Stage supplyAt(Stage s, double volts) {
        Part v1 = s.require("V1");
        return s.withPart(v1.with("volts", volts));
    }

    private static DcAnalysis cold() {
        return new DcAnalysis(DcOptions.DEFAULT.withWarmStart(false));
    }

    private static void assertSameContacts(OperatingPoint expected, OperatingPoint actual, String what) {
        PartResult e = expected.requirePart("K1");
        PartResult a = actual.requirePart("K1");
        assertEquals(e.state("contacts"), a.state("contacts"), what + ": contacts");
        assertEquals(e.state("state"), a.state("state"), what + ": implied state");
        assertEquals(e.state("contactsFrom"), a.state("contactsFrom"), what + ": where the contact state came from");
    }

    @Test
    @DisplayName("operated, then a supply inside the band without previous states: released, as after power-up")
    void bandAfterOperatedIsPowerUp() {
        Stage s = Templates.defaultStage();
        DcAnalysis warm = new DcAnalysis();
        OperatingPoint on = warm.solve(supplyAt(s, OPERATE_VOLTS));
        assertEquals("operated", on.requirePart("K1").state("contacts"));
        OperatingPoint band = warm.solve(supplyAt(s, BAND_VOLTS));
        assertEquals("either", band.requirePart("K1").state("state"), "6 V is inside the band (SweepTest, derived)");
        assertEquals("released", band.requirePart("K1").state("contacts"), "no history: power-up state");
        assertEquals(OperatingPoint.CONTACTS_FROM_POWER_UP, band.requirePart("K1").state("contactsFrom"));
        OperatingPoint c = cold().solve(supplyAt(s, BAND_VOLTS));
        assertSameContacts(c, band, "band");
        WarmStartTest.assertSamePoint(c, band, "band");
    }

    @Test
    @DisplayName("operated, then a supply inside the band with the previous states: stays operated")
    void bandWithPreviousStaysOperated() {
        Stage s = Templates.defaultStage();
        DcAnalysis warm = new DcAnalysis();
        OperatingPoint on = warm.solve(supplyAt(s, OPERATE_VOLTS));
        SolveOptions so = SolveOptions.DEFAULT.withPreviousRelayStates(on);
        OperatingPoint band = warm.solve(supplyAt(s, BAND_VOLTS), so);
        assertEquals("operated", band.requirePart("K1").state("contacts"), "hysteresis keeps the previous state");
        assertEquals(OperatingPoint.CONTACTS_FROM_PREVIOUS, band.requirePart("K1").state("contactsFrom"));
        OperatingPoint c = cold().solve(supplyAt(s, BAND_VOLTS), so);
        assertSameContacts(c, band, "band with previous");
        WarmStartTest.assertSamePoint(c, band, "band with previous");
    }

    @Test
    @DisplayName("a start point with operated contacts and a supply inside the band: released (power-up)")
    void startPointInBand() {
        Stage s = Templates.defaultStage();
        OperatingPoint on = cold().solve(supplyAt(s, OPERATE_VOLTS));
        OperatingPoint band = new DcAnalysis().solve(supplyAt(s, BAND_VOLTS), SolveOptions.DEFAULT.withStart(on));
        OperatingPoint c = cold().solve(supplyAt(s, BAND_VOLTS));
        assertEquals("released", band.requirePart("K1").state("contacts"), "no history: power-up state");
        assertSameContacts(c, band, "start point");
        WarmStartTest.assertSamePoint(c, band, "start point");
    }

    @Test
    @DisplayName("operated, below drop-out, operated again: each warm re-solve equals a cold solve")
    void releaseAndOperateAgain() {
        Stage s = Templates.defaultStage();
        DcAnalysis warm = new DcAnalysis();
        for (double v : new double[] {OPERATE_VOLTS, RELEASE_VOLTS, OPERATE_VOLTS, BAND_VOLTS, OPERATE_VOLTS}) {
            OperatingPoint w = warm.solve(supplyAt(s, v));
            OperatingPoint c = cold().solve(supplyAt(s, v));
            assertSameContacts(c, w, v + " V");
            WarmStartTest.assertSamePoint(c, w, v + " V");
            assertTrue(w.converged());
        }
    }

    @Test
    @DisplayName("a warm re-solve after a value edit with the relay operated spends no pass with released contacts")
    void operatedReSolveSkipsReleasedPass() {
        Stage s = Templates.defaultStage();
        DcAnalysis warm = new DcAnalysis();
        warm.solve(s);
        Part r = s.parts().stream().filter(p -> p.kind() == PartKind.RESISTOR).findFirst()
                .orElseThrow();
        Stage edited = s.withPart(r.with("resistanceOhms", r.value("resistanceOhms") * 1.01));
        OperatingPoint guessed = warm.solve(edited);
        // the same re-solve told the contacts were released before: a released pass, then an operated one
        DcAnalysis other = new DcAnalysis();
        OperatingPoint first = other.solve(s);
        OperatingPoint fromReleased = other.solve(edited, SolveOptions.DEFAULT.withStart(first)
                .withPreviousRelayStates(cold().solve(supplyAt(s, RELEASE_VOLTS))));
        assertEquals("operated", guessed.requirePart("K1").state("contacts"));
        assertSameContacts(fromReleased, guessed, "edited");
        assertTrue(guessed.iterations() < fromReleased.iterations(),
                guessed.iterations() + " against " + fromReleased.iterations() + " iterations");
    }

    /**
     * A self-holding relay: its normally-open contact shorts the switch, so with the pin low both
     * contact states are consistent (operated: the contact carries 12 V / 400 Ω = 30 mA, above the
     * 22.5 mA pick-up; released: no coil current). Derived from the values below.
     */
    private static Stage latching() {
        return new StageSketch()
                .part("V1", PartKind.SUPPLY, "volts", 12)
                .part("K1", PartKind.RELAY, "coilResistanceOhms", 400, "referenceTemperatureCelsius", 25,
                        "coilThermalResistanceKelvinPerWatt", 0, "mustOperateVolts", 9, "mustReleaseVolts", 1.2)
                .part("Q1", PartKind.NPN, "hfeMin", 100)
                .part("U1", PartKind.DRIVE_PIN, "highVolts", 5, "outputResistanceOhms", 0.01)
                .part("R1", PartKind.RESISTOR, "resistanceOhms", 1000)
                .wire("V1.p", "supply", "K1.a1", "supply", "K1.a2", "switch", "Q1.c", "switch", "Q1.e", "gnd",
                        "U1.out", "pin", "R1.a", "pin", "R1.b", "control", "Q1.b", "control",
                        "K1.com", "switch", "K1.no", "gnd", "K1.nc", "spare")
                .build();
    }

    @Test
    @DisplayName("self-holding relay, pin low, started from the operated pin-high point: released (power-up)")
    void selfHoldingStartPoint() {
        Stage s = latching();
        DcAnalysis dc = new DcAnalysis();
        SolveOptions low = SolveOptions.DEFAULT.withPinHigh(false);
        OperatingPoint on = dc.solve(s, SolveOptions.DEFAULT.withPinHigh(true));
        assertEquals("operated", on.requirePart("K1").state("contacts"), "30 mA is above the 22.5 mA pick-up");
        OperatingPoint off = dc.solve(s, low.withStart(on));
        OperatingPoint c = cold().solve(s, low);
        assertEquals("released", c.requirePart("K1").state("contacts"), "no history: power-up state");
        assertSameContacts(c, off, "pin low from the operated point");
        WarmStartTest.assertSamePoint(c, off, "pin low from the operated point");
        // the same with the previous states: latched
        OperatingPoint held = dc.solve(s, low.withStart(on).withPreviousRelayStates(on));
        assertEquals("operated", held.requirePart("K1").state("contacts"), "the contact holds the coil");
        assertSameContacts(cold().solve(s, low.withPreviousRelayStates(on)), held, "latched");
    }

    @Test
    @DisplayName("self-holding relay: a warm pin-low re-solve after a latched one, without previous states, is released")
    void selfHoldingWarm() {
        Stage s = latching();
        DcAnalysis dc = new DcAnalysis();
        SolveOptions low = SolveOptions.DEFAULT.withPinHigh(false);
        OperatingPoint on = dc.solve(s, SolveOptions.DEFAULT.withPinHigh(true));
        OperatingPoint held = dc.solve(s, low.withPreviousRelayStates(on));
        assertEquals("operated", held.requirePart("K1").state("contacts"));
        Part r1 = s.require("R1");
        Stage edited = s.withPart(r1.with("resistanceOhms", 1100));
        OperatingPoint again = dc.solve(edited, low);
        OperatingPoint c = cold().solve(edited, low);
        assertEquals("released", c.requirePart("K1").state("contacts"), "no history: power-up state");
        assertSameContacts(c, again, "warm pin low");
        WarmStartTest.assertSamePoint(c, again, "warm pin low");
    }

    /** Seeded supply sequences over 0–15 V for every template (the band, above pick-up, below drop-out). */
    static Stream<Arguments> sequences() {
        Random r = new Random(20261202L);
        List<Arguments> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            for (int k = 0; k < 3; k++) {
                out.add(Arguments.of(t, r.nextLong()));
            }
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0}, seed {1}: warm re-solves across the relay's thresholds equal cold solves (NM-6)")
    @MethodSource("sequences")
    void randomSupplySequence(StageTemplate t, long seed) {
        Random r = new Random(seed);
        Stage s = WarmStartTest.template(t);
        DcAnalysis warm = new DcAnalysis();
        for (int k = 0; k < 8; k++) {
            for (boolean pin : new boolean[] {true, false}) {
                Stage at = supplyAt(s, 15.0 * r.nextDouble());
                SolveOptions so = SolveOptions.DEFAULT.withPinHigh(pin);
                OperatingPoint w = warm.solve(at, so);
                OperatingPoint c = cold().solve(at, so);
                assertSameContacts(c, w, t.id() + " step " + k);
                WarmStartTest.assertSamePoint(c, w, t.id() + " step " + k);
            }
        }
    }
}
