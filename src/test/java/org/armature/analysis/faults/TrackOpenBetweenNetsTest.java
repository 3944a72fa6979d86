package org.armature.analysis.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.armature.model.Connectivity;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.armature.netlist.Readings;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SolveOptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * {@code NET~TOWARD:track-open}: the netlist change against hand-derived expectations (derived:
 * a part whose pins no longer reach a closed path carries no current; 1 TΩ across 12 V is 12 pA).
 * Low-side NPN template: net {@code switch} joins the coil's low end K1.a2, the diode's anode D1.a
 * and the collector Q1.c; net {@code control} joins R1.a, R2.a and the base Q1.b.
 */
class TrackOpenBetweenNetsTest {

    private static final Stage NPN = Templates.build(StageTemplate.LOW_SIDE_NPN);

    private static Stage cut(Stage s, String text) {
        FaultCatalog.Parsed p = FaultCatalog.parse(s, text);
        assertTrue(p.fault().isPresent(), p.error());
        return FaultInjector.apply(s, p.fault().get());
    }

    private static OperatingPoint solve(Stage s, boolean high) {
        return new DcAnalysis().solve(s, SolveOptions.DEFAULT.withPinHigh(high));
    }

    @Test
    void cuttingTheTrackBetweenTheCoilAndTheSwitchStopsBothCurrents() {
        Stage s = cut(NPN, "switch~supply:track-open");
        Connectivity c = Connectivity.of(s);
        // the coil's low end and the diode stay together, the collector is on its own
        assertEquals(c.net("K1", "a2"), c.net("D1", "a"));
        assertNotEquals(c.net("K1", "a2"), c.net("Q1", "c"));
        OperatingPoint op = solve(s, true);
        // derived: the collector reaches the coil only through 1 TΩ: at most 12 V / 1 TΩ = 12 pA
        assertTrue(Math.abs(op.quantity("Q1", Readings.IC)) < 1e-9, "ic " + op.quantity("Q1", Readings.IC));
        // the coil and diode hang from the supply with no way back but the engine's own tiny
        // conductances to ground (nanoamps): below 1 µA against 30 mA healthy
        assertTrue(Math.abs(op.quantity("K1", Readings.COIL_CURRENT)) < 1e-6, "coil " + op.quantity("K1",
                Readings.COIL_CURRENT));
        assertFalse(op.relayOperated().get("K1"));
        // healthy, pin high: the same coil carries tens of milliamps (derived: about 12 V over a
        // coil of about 400 Ω is at most 30 mA) and the relay operates
        OperatingPoint healthy = solve(NPN, true);
        assertTrue(healthy.quantity("K1", Readings.COIL_CURRENT) > 0.02);
        assertTrue(healthy.relayOperated().get("K1"));
    }

    @Test
    void cuttingTheBaseOffTheDividerStopsTheBaseCurrentOnly() {
        Stage s = cut(NPN, "control~switch:track-open");
        Connectivity c = Connectivity.of(s);
        assertEquals(c.net("R1", "a"), c.net("R2", "a"));
        assertNotEquals(c.net("R1", "a"), c.net("Q1", "b"));
        OperatingPoint op = solve(s, true);
        // derived: no base current; R1 and R2 still divide the pin: 3.5 V behind 75 Ω + 1 kΩ into
        // 10 kΩ gives 3.5 · 10 / 11.075 = 3.160 V at the divider
        assertTrue(Math.abs(op.quantity("Q1", Readings.IB)) < 1e-9);
        assertEquals(3.160, op.voltage(c.net("R2", "a")), 0.01);
    }

    @Test
    void everyTemplateListsTrackOpensBetweenNetsAndEachIsARealCut() {
        for (StageTemplate t : StageTemplate.values()) {
            Stage s = Templates.build(t);
            List<Fault> tracks = FaultCatalog.of(s).stream().filter(f -> f.kind() == FaultKind.TRACK_OPEN).toList();
            assertTrue(tracks.size() >= 4, t + ": " + tracks);
            Connectivity before = Connectivity.of(s);
            for (Fault f : tracks) {
                FaultInjector.TrackBetween tb = FaultInjector.trackBetween(f.ref()).orElseThrow();
                List<org.armature.model.PinRef> off = FaultInjector.cutOffPins(before, tb.net(), tb.toward());
                Connectivity after = Connectivity.of(FaultInjector.apply(s, f));
                // the cut-off pins share one net, the rest of the old net another
                String a = after.net(off.get(0).ref(), off.get(0).pin());
                for (org.armature.model.PinRef p : before.pinsOn(tb.net())) {
                    assertEquals(off.contains(p), after.net(p.ref(), p.pin()).equals(a), t + " " + f + " " + p);
                }
            }
        }
    }

    @Test
    void badSpellingsAreOneSentenceListingWhatIsValid() {
        String unknown = FaultCatalog.parse(NPN, "switch~nowhere:track-open").error();
        assertTrue(unknown.contains("nowhere") && unknown.contains("contact-common, contact-nc, contact-no, control, "
                + "pin, supply, switch"), unknown);
        String kind = FaultCatalog.parse(NPN, "switch~supply:open").error();
        assertTrue(kind.contains("NET~TOWARD:track-open"), kind);
        String none = FaultCatalog.parse(NPN, "contact-nc~gnd:track-open").error();
        assertTrue(none.contains("No track of net contact-nc"), none);
        String pin = FaultCatalog.parse(NPN, "Q9.z:track-open").error();
        assertTrue(pin.contains("NET~TOWARD:track-open") && pin.contains("PART.PIN:track-open"), pin);
        assertThrows(IllegalArgumentException.class, () -> FaultInjector.cutNet(NPN, "gnd", "switch"));
    }

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    void theOldPinSpellingStillWorks(StageTemplate t) {
        Stage s = Templates.build(t);
        // the drive pin's output: a pin at the end of one wire in every template
        Stage cut = cut(s, "U1.out:track-open");
        Connectivity c = Connectivity.of(cut);
        assertNotEquals(c.net("U1", "out"), c.net("R1", "b"));
    }
}
