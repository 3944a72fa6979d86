package org.armature.analysis.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.armature.model.Connectivity;
import org.armature.model.ParamKeys;
import org.armature.model.PinRef;
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
 * Each fault's change of the circuit against a hand-derived expectation (all derived: Ohm's law and
 * the junction drops of the parts' typical values). The low-side NPN template: 12 V coil supply,
 * 400 Ω coil, R1 1 kΩ base resistor, R2 10 kΩ pull-down, pin 3.5 V open circuit behind 75 Ω.
 */
class FaultInjectorTest {

    private static final Stage NPN = Templates.build(StageTemplate.LOW_SIDE_NPN);
    private static final Stage NMOS = Templates.build(StageTemplate.LOW_SIDE_NMOS);
    private static final Stage DARLINGTON = Templates.build(StageTemplate.DARLINGTON_CHANNEL);

    private static OperatingPoint solve(Stage s, boolean high) {
        return new DcAnalysis().solve(s, SolveOptions.DEFAULT.withPinHigh(high));
    }

    private static double v(Stage s, OperatingPoint op, String ref, String pin) {
        return op.voltage(Connectivity.of(s).net(ref, pin));
    }

    private static Stage fault(Stage s, String ref, FaultKind k) {
        return FaultInjector.apply(s, new Fault(ref, k));
    }

    private static boolean operated(OperatingPoint op) {
        return op.relayOperated().get("K1");
    }

    @Test
    void openBaseResistorCarriesNoCurrentAndTheRelayStaysOff() {
        Stage s = fault(NPN, "R1", FaultKind.OPEN);
        OperatingPoint op = solve(s, true);
        // derived: 3.5 V across 1 TΩ → 3.5 pA, below 1 nA
        assertTrue(Math.abs(op.quantity("Q1", Readings.IB)) < 1e-9);
        assertFalse(operated(op));
        assertEquals(s.require("R1").value(ParamKeys.RESISTANCE_OHMS), FaultInjector.OPEN_OHMS);
    }

    @Test
    void shortedBaseResistorPutsThePinOnTheBase() {
        Stage s = fault(NPN, "R1", FaultKind.SHORT);
        OperatingPoint op = solve(s, true);
        // derived: the pin's 75 Ω alone limits the base current, (3.5 − 1.1) V / 75 Ω = 32 mA;
        // across 0.1 Ω that is 3.2 mV between pin and base
        assertEquals(0.0032, Math.abs(v(s, op, "R1", "a") - v(s, op, "R1", "b")), 0.0005);
    }

    @Test
    void driftsScaleTheResistance() {
        assertEquals(10_000, fault(NPN, "R1", FaultKind.DRIFT_UP).require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9);
        assertEquals(100, fault(NPN, "R1", FaultKind.DRIFT_DOWN).require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9);
    }

    @Test
    void collectorEmitterShortPinsTheSwitchNodeNearGround() {
        Stage s = fault(NPN, "Q1", FaultKind.CE_SHORT);
        for (boolean high : new boolean[] {true, false}) {
            OperatingPoint op = solve(s, high);
            // derived: 12 V / 400 Ω = 30 mA through 0.1 Ω → 3 mV; relay on in both states
            assertEquals(0.003, v(s, op, "Q1", "c"), 0.002);
            assertTrue(operated(op));
        }
    }

    @Test
    void baseEmitterShortHoldsTheBaseAtGround() {
        Stage s = fault(NPN, "Q1", FaultKind.BE_SHORT);
        OperatingPoint op = solve(s, true);
        // derived: 2.5 mA of base drive into 0.1 Ω → 0.3 mV
        assertTrue(Math.abs(v(s, op, "Q1", "b")) < 1e-3);
        assertFalse(operated(op));
    }

    @Test
    void openBaseLeavesTheDividerOfPinAndPullDown() {
        Stage s = fault(NPN, "Q1", FaultKind.BE_OPEN);
        OperatingPoint op = solve(s, true);
        // derived: 3.5 V × 10 k / (75 + 1 k + 10 k) = 3.160 V at the base with no base current
        assertEquals(3.5 * 10_000 / 11_075, v(s, op, "Q1", "b"), 0.005);
        assertFalse(operated(op));
    }

    @Test
    void openCollectorLeavesTheSwitchNodeAtTheSupply() {
        Stage s = fault(NPN, "Q1", FaultKind.BC_OPEN);
        OperatingPoint op = solve(s, true);
        // derived: no collector current, no drop across the coil: the switch node at 12 V
        assertEquals(12, v(s, op, "Q1", "c"), 0.01);
        assertFalse(operated(op));
    }

    @Test
    void lowGainDividesBetaByTen() {
        Stage s = fault(NPN, "Q1", FaultKind.GAIN_LOW);
        assertEquals(20, s.require("Q1").value(ParamKeys.BETA_FORWARD), 1e-9);
        // derived: IB ≈ (3.3 − 0.77) V / 1 kΩ ≈ 2.5 mA; × 20 = 50 mA > 30 mA coil current: still saturated
        assertTrue(operated(solve(s, true)));
    }

    @Test
    void shortedDiodeShortsTheCoil() {
        Stage s = fault(NPN, "D1", FaultKind.SHORT);
        OperatingPoint op = solve(s, true);
        // derived: the coil in parallel with 0.1 Ω: almost no coil voltage, no operation
        assertTrue(Math.abs(v(s, op, "K1", "a1") - v(s, op, "K1", "a2")) < 0.1);
        assertFalse(operated(op));
    }

    @Test
    void reversedDiodeClampsTheCoilAtOneForwardDrop() {
        Stage s = fault(NPN, "D1", FaultKind.REVERSED);
        OperatingPoint op = solve(s, true);
        double coil = v(s, op, "K1", "a1") - v(s, op, "K1", "a2");
        // derived: a forward diode across the coil: 0.6–1.2 V, far below 9 V must-operate
        assertTrue(coil > 0.5 && coil < 1.3, "coil " + coil);
        assertFalse(operated(op));
    }

    @Test
    void openDiodeChangesNothingAtDc() {
        OperatingPoint healthy = solve(NPN, true);
        Stage s = fault(NPN, "D1", FaultKind.OPEN);
        OperatingPoint op = solve(s, true);
        // derived: a reverse-biased diode carries nanoamps; open or not, the DC point is the same
        assertEquals(v(NPN, healthy, "Q1", "c"), v(s, op, "Q1", "c"), 1e-3);
    }

    @Test
    void mosfetFaults() {
        Stage ds = fault(NMOS, "Q1", FaultKind.DS_SHORT);
        OperatingPoint op = solve(ds, false);
        // derived: 30 mA × 0.1 Ω = 3 mV at the drain with the pin low; the relay on
        assertEquals(0.003, v(ds, op, "Q1", "d"), 0.002);
        assertTrue(operated(op));
        Stage gs = fault(NMOS, "Q1", FaultKind.GS_SHORT);
        op = solve(gs, true);
        assertTrue(Math.abs(v(gs, op, "Q1", "g")) < 0.01);
        assertFalse(operated(op));
        Stage open = fault(NMOS, "Q1", FaultKind.OPEN);
        op = solve(open, true);
        // derived: no channel current: the drain at the 12 V supply
        assertEquals(12, v(open, op, "Q1", "d"), 0.01);
        assertFalse(operated(op));
    }

    @Test
    void darlingtonFaults() {
        Stage ce = fault(DARLINGTON, "U2", FaultKind.CE_SHORT);
        OperatingPoint op = solve(ce, false);
        assertTrue(v(ce, op, "U2", "out") < 0.01);
        assertTrue(operated(op));
        Stage open = fault(DARLINGTON, "U2", FaultKind.OPEN);
        op = solve(open, true);
        assertEquals(12, v(open, op, "U2", "out"), 0.01);
        assertFalse(operated(op));
    }

    @Test
    void relayFaults() {
        OperatingPoint healthy = solve(NPN, true);
        OperatingPoint open = solve(fault(NPN, "K1", FaultKind.COIL_OPEN), true);
        // derived: 12 V across 1 TΩ: 12 pA
        assertTrue(Math.abs(open.quantity("K1", Readings.COIL_CURRENT)) < 1e-9);
        assertFalse(operated(open));
        OperatingPoint turns = solve(fault(NPN, "K1", FaultKind.SHORTED_TURNS), true);
        // derived: half the resistance, nearly the same voltage: twice the current (±10 % for the switch drop and heating)
        assertEquals(2, turns.quantity("K1", Readings.COIL_CURRENT) / healthy.quantity("K1", Readings.COIL_CURRENT), 0.2);
        assertTrue(operated(solve(fault(NPN, "K1", FaultKind.WELDED), false)));
        assertFalse(operated(solve(fault(NPN, "K1", FaultKind.STUCK_OPEN), true)));
    }

    @Test
    void pinAndSupplyFaults() {
        assertFalse(operated(solve(fault(NPN, "U1", FaultKind.STUCK_LOW), true)));
        assertTrue(operated(solve(fault(NPN, "U1", FaultKind.STUCK_HIGH), false)));
        Stage weak = fault(NPN, "U1", FaultKind.WEAK);
        OperatingPoint op = solve(weak, true);
        // derived: 7.5 kΩ output + 1 kΩ + VBE 0.7 V: pin ≈ 0.7 + 2.8 × 1/8.5 ≈ 1.03 V (pull-down aside)
        assertEquals(1.03, v(weak, op, "U1", "out"), 0.1);
        Stage missing = fault(NPN, "V1", FaultKind.MISSING);
        op = solve(missing, true);
        assertEquals(0, v(missing, op, "V1", "p"), 1e-9);
        assertFalse(operated(op));
        Stage sag = fault(NPN, "V1", FaultKind.SAG);
        assertEquals(9, v(sag, solve(sag, true), "V1", "p"), 1e-9);
    }

    @Test
    void openGroundOfTheEmitterStopsTheCoilCurrent() {
        // the ground symbol on Q1's emitter (the one whose net holds Q1.e)
        String ref = NPN.parts().stream().filter(p -> p.kind() == org.armature.model.PartKind.GROUND)
                .filter(p -> Connectivity.of(NPN).pinsOn(Connectivity.of(NPN).net("Q1", "e")).contains(new PinRef(p.ref(), "g")))
                .findFirst().orElseThrow().ref();
        Stage s = fault(NPN, ref, FaultKind.OPEN);
        OperatingPoint op = solve(s, true);
        // derived: the coil current's only return is 1 TΩ (12 pA) and the collector junction's reverse
        // leakage (nanoamps): far below the 22.5 mA pick-up, the relay stays released
        assertTrue(Math.abs(op.quantity("K1", Readings.COIL_CURRENT)) < 1e-6);
        assertFalse(operated(op));
    }

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    void bridgesKeepEveryNetAndJoinOnlyTheirTwo(StageTemplate t) {
        Stage s = Templates.build(t);
        Connectivity c = Connectivity.of(s);
        List<String> nets = c.nets().stream().filter(n -> c.pinsOn(n).size() >= 2).toList();
        List<FaultInjector.Bridge> bridges = nets.stream()
                .map(n -> new FaultInjector.Bridge(n, Connectivity.GROUND, 1e6)).toList();
        Stage b = FaultInjector.bridgeAll(s, c, bridges);
        Connectivity after = Connectivity.of(b);
        // two original pins share a net after exactly when they did before
        Map<String, String> map = new HashMap<>();
        for (Map.Entry<PinRef, String> e : c.netOfPin().entrySet()) {
            String was = map.putIfAbsent(e.getValue(), after.net(e.getKey().ref(), e.getKey().pin()));
            if (was != null) {
                assertEquals(was, after.net(e.getKey().ref(), e.getKey().pin()), "pin " + e.getKey());
            }
        }
        assertEquals(map.size(), map.values().stream().distinct().count(), "no two nets merged");
        for (int i = 0; i < bridges.size(); i++) {
            String ref = FaultInjector.ADDED_PREFIX + (i + 1);
            assertEquals(map.get(nets.get(i)), after.net(ref, "a"));
            assertEquals(after.net(s.parts().stream().filter(p -> p.kind() == org.armature.model.PartKind.GROUND)
                    .findFirst().orElseThrow().ref(), "g"), after.net(ref, "b"));
        }
    }

    @Test
    void clampOpenCutsTheCommonPinAndIsInvisibleAtDc() {
        Stage s = fault(DARLINGTON, "U2", FaultKind.CLAMP_OPEN);
        Connectivity c = Connectivity.of(s);
        // the common pin no longer shares the coil supply's net; 1 TΩ joins them
        assertFalse(c.net("U2", "com").equals(c.net("V1", "p")));
        assertEquals(FaultInjector.OPEN_OHMS, s.require("XF1").value(ParamKeys.RESISTANCE_OHMS));
        assertTrue(Connectivity.of(s).pinsOn(c.net("U2", "com")).size() == 2);
        for (boolean high : new boolean[] {true, false}) {
            OperatingPoint healthy = solve(DARLINGTON, high);
            OperatingPoint op = solve(s, high);
            // derived: at DC the output never rises above the 12 V supply, so the clamp diode
            // (output to common) is never forward biased; opening it changes no reading
            assertEquals(v(DARLINGTON, healthy, "U2", "out"), v(s, op, "U2", "out"), 1e-6);
            assertEquals(healthy.relayOperated().get("K1"), operated(op));
        }
        // and so the dictionary cannot tell it from the healthy stage
        FaultDictionary d = FaultDictionary.build(DARLINGTON, Meter.DEFAULT);
        assertTrue(d.ambiguityGroups(Spread.DEFAULT).stream()
                .anyMatch(g -> g.contains(Fault.NONE) && g.contains("U2:clamp-open")));
    }

    @Test
    void trackOpenAtTheBaseStopsTheBaseCurrent() {
        FaultCatalog.Parsed parsed = FaultCatalog.parse(NPN, "Q1.b:track-open");
        assertTrue(parsed.fault().isPresent(), parsed.error());
        Stage s = FaultInjector.apply(NPN, parsed.fault().get());
        Connectivity c = Connectivity.of(s);
        Connectivity before = Connectivity.of(NPN);
        // the base stands alone, R1 and R2 stay together on the old net
        List<PinRef> others = before.pinsOn(before.net("Q1", "b")).stream().filter(q -> !q.ref().equals("Q1")).toList();
        assertEquals(2, others.size()); // R1's base end and R2's top end
        String rest = c.net(others.get(0).ref(), others.get(0).pin());
        assertEquals(rest, c.net(others.get(1).ref(), others.get(1).pin()));
        assertFalse(rest.equals(c.net("Q1", "b")));
        OperatingPoint op = solve(s, true);
        // derived: only 1 TΩ feeds the base, (3.5 − 0.6) V / 1 TΩ ≈ 3 pA, below 1 nA; no coil current
        assertTrue(Math.abs(op.quantity("Q1", Readings.IB)) < 1e-9);
        assertFalse(operated(op));
        // healthy, pin high: the relay operates
        assertTrue(operated(solve(NPN, true)));
    }

    @Test
    void trackOpenSpellingsThatAreNotAPinAreRefusedWithASentence() {
        assertTrue(FaultCatalog.parse(NPN, "Q1.x:track-open").error().contains("PART.PIN:track-open"));
        assertTrue(FaultCatalog.parse(NPN, "Q1:track-open").error().contains("PART.PIN:track-open"));
        assertTrue(FaultCatalog.parse(NPN, "Q1.b:open").error().contains("only have the fault track-open"));
    }

    @Test
    void clampOpenLetsTheTurnOffSpikeRiseAboveTheClamp() {
        var healthy = org.armature.solver.timedomain.TransientAnalysis.run(DARLINGTON,
                org.armature.solver.timedomain.TransientOptions.turnOff()).metrics();
        var open = org.armature.solver.timedomain.TransientAnalysis.run(fault(DARLINGTON, "U2", FaultKind.CLAMP_OPEN),
                org.armature.solver.timedomain.TransientOptions.turnOff()).metrics();
        // derived: clamped, the switch peaks near the 12 V supply plus one diode drop (under 14 V);
        // unclamped, the coil's current has no path but the channel, so the switch rises to the
        // channel's breakdown near its 50 V output rating (measured 12.6 V and 51.6 V)
        assertTrue(healthy.peakSwitchVolts() < 14, "healthy peak " + healthy.peakSwitchVolts());
        assertTrue(open.peakSwitchVolts() > 40, "clamp-open peak " + open.peakSwitchVolts());
    }

    @ParameterizedTest
    @EnumSource(value = FaultKind.class, names = {"COIL_OPEN", "SHORTED_TURNS", "WELDED", "STUCK_OPEN"})
    void aFaultedRelaysArmatureStaysBetweenItsStops(FaultKind k) {
        Stage s = fault(NPN, "K1", k);
        double travel = s.require("K1").value("travelMetres");
        for (var o : List.of(org.armature.solver.timedomain.TransientOptions.turnOn(),
                org.armature.solver.timedomain.TransientOptions.turnOff())) {
            double[] x = org.armature.solver.timedomain.TransientAnalysis.run(s, o).waveform()
                    .require(org.armature.solver.timedomain.Waveform.ARMATURE_POSITION).values();
            // derived: the armature moves from the released stop (0) to the attracted one (travel);
            // the stops are stiff, not rigid: pressed into one by up to 0.1 % of the travel (measured
            // 27 nm of 0.3 mm with shorted turns), never the metres of an unbounded trace
            for (double v : x) {
                assertTrue(v >= -1e-3 * travel && v <= travel * (1 + 1e-3), k + ": armature at " + v + " m, travel " + travel + " m");
            }
        }
    }
}
