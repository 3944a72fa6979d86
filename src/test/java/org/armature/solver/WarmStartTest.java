package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.stream.Stream;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Warm starts (the last solution of the same compiled stage, after a value change) and cold starts
 * (0 V with the junction preset) reach the same operating point within the NM-6 tolerances.
 */
class WarmStartTest {

    private static final ConvergenceTolerances TOL = ConvergenceTolerances.DEFAULT;

    /** The main value of each editable kind, edited by the generator. */
    private static final Map<PartKind, String> MAIN_VALUE = Map.of(PartKind.RESISTOR, "resistanceOhms",
            PartKind.SUPPLY, "volts", PartKind.DRIVE_PIN, "highVolts", PartKind.RELAY, "coilResistanceOhms",
            PartKind.LOAD, "resistanceOhms");

    static Stage template(StageTemplate t) {
        return Templates.build(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
    }

    /** A seeded sequence of edits: template, pin state, and five value changes of ×0.7 to ×1.4. */
    static Stream<Arguments> edits() {
        Random r = new Random(20261201L);
        List<Arguments> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            for (boolean pin : new boolean[] {true, false}) {
                for (int k = 0; k < 3; k++) {
                    out.add(Arguments.of(t, pin, r.nextLong()));
                }
            }
        }
        return out.stream();
    }

    static Stage edit(Stage s, Random r) {
        List<Part> editable = s.parts().stream().filter(p -> MAIN_VALUE.containsKey(p.kind())).toList();
        Part p = editable.get(r.nextInt(editable.size()));
        String key = MAIN_VALUE.get(p.kind());
        return s.withPart(p.with(key, p.value(key) * (0.7 + 0.7 * r.nextDouble())));
    }

    /** Two converged solutions may each sit one tolerance from the exact one: 2·(reltol·|v| + vntol). */
    static void assertSamePoint(OperatingPoint cold, OperatingPoint warm, String what) {
        assertEquals(cold.relayOperated(), warm.relayOperated(), what + ": relay contacts");
        for (Map.Entry<String, Double> e : cold.nodeVoltages().entrySet()) {
            double v = e.getValue();
            assertEquals(v, warm.voltage(e.getKey()), 2 * (TOL.reltol() * Math.abs(v) + TOL.vntolVolts()),
                    what + ": " + e.getKey() + " (NM-6 tolerances, common practice)");
        }
    }

    @ParameterizedTest(name = "{0}, pin high {1}, edits seed {2}: warm start after each edit = cold start (NM-6)")
    @MethodSource("edits")
    void warmEqualsCold(StageTemplate t, boolean pinHigh, long seed) {
        Random r = new Random(seed);
        SolveOptions so = SolveOptions.DEFAULT.withPinHigh(pinHigh);
        DcAnalysis warm = new DcAnalysis();
        Stage s = template(t);
        warm.solve(s, so);
        for (int k = 0; k < 5; k++) {
            s = edit(s, r);
            OperatingPoint w = warm.solve(s, so);
            OperatingPoint c = new DcAnalysis(DcOptions.DEFAULT.withWarmStart(false)).solve(s, so);
            assertSamePoint(c, w, t.id() + " edit " + k);
            HonestResidual.assertHonest(s, w, t.id() + " edit " + k + " warm");
            HonestResidual.assertHonest(s, c, t.id() + " edit " + k + " cold");
            assertTrue(w.converged() && c.converged());
        }
    }

    @ParameterizedTest(name = "{0}: the warm re-solve after a value change needs fewer iterations than a cold start")
    @MethodSource("templates")
    void warmIsCheaper(StageTemplate t) {
        Stage s = template(t);
        DcAnalysis warm = new DcAnalysis();
        OperatingPoint first = warm.solve(s);
        Part r = s.parts().stream().filter(p -> p.kind() == PartKind.RESISTOR).findFirst().orElseThrow();
        OperatingPoint again = warm.solve(s.withPart(r.with("resistanceOhms", r.value("resistanceOhms") * 1.1)));
        assertTrue(again.iterations() < first.iterations(),
                "warm " + again.iterations() + " against cold " + first.iterations() + " iterations");
    }

    static Stream<StageTemplate> templates() {
        return Stream.of(StageTemplate.values());
    }

    @Test
    @DisplayName("solving the pin-high and pin-low states in turn keeps both warm and gives the cold answers (NM-6)")
    void bothPinStatesAlternate() {
        Stage s = template(StageTemplate.LOW_SIDE_NPN);
        DcAnalysis warm = new DcAnalysis();
        DcAnalysis cold = new DcAnalysis(DcOptions.DEFAULT.withWarmStart(false));
        Random r = new Random(7);
        for (int k = 0; k < 4; k++) {
            s = edit(s, r);
            for (boolean pin : new boolean[] {true, false}) {
                SolveOptions so = SolveOptions.DEFAULT.withPinHigh(pin);
                assertSamePoint(cold.solve(s, so), warm.solve(s, so), "edit " + k + " pin " + pin);
            }
        }
    }

    @Test
    @DisplayName("a structural change (a part added) after warm solves still gives the cold answer")
    void topologyChange() {
        Stage s = template(StageTemplate.LOW_SIDE_NPN);
        DcAnalysis warm = new DcAnalysis();
        warm.solve(s);
        Part q = s.parts().stream().filter(p -> p.kind() == PartKind.NPN).findFirst().orElseThrow();
        // a base resistance of 0 Ω removes the transistor's internal base node: a new netlist shape
        Stage changed = s.withPart(q.with("baseResistanceOhms", 0.0));
        assertSamePoint(new DcAnalysis(DcOptions.DEFAULT.withWarmStart(false)).solve(changed), warm.solve(changed),
                "RB = 0");
        assertSamePoint(new DcAnalysis(DcOptions.DEFAULT.withWarmStart(false)).solve(s), warm.solve(s), "RB back");
    }

    @Test
    @DisplayName("sweep points equal independent cold solves with the sweep's previous relay states (NM-6)")
    void sweepEqualsColdSolves() {
        Stage stage = Templates.defaultStage();
        DcSweep sweep = new DcAnalysis().sweep(stage, SweepSpec.linear(SweepVariable.supplyVolts("V1"), 0, 15, 61));
        Part v1 = stage.require("V1");
        for (int i = 1; i < sweep.points().size(); i += 6) {
            SweepPoint p = sweep.points().get(i);
            OperatingPoint before = sweep.points().get(i - 1).point().orElseThrow();
            SolveOptions so = SolveOptions.DEFAULT.withPreviousRelayStates(before);
            OperatingPoint cold = new DcAnalysis(DcOptions.DEFAULT.withWarmStart(false))
                    .solve(stage.withPart(v1.with("volts", p.value())), so);
            assertSamePoint(cold, p.point().orElseThrow(), "sweep point " + p.value() + " V");
        }
    }

    @Test
    @DisplayName("an ambient sweep re-flattens every part in place and matches cold solves (NM-6)")
    void ambientSweep() {
        Stage stage = Templates.defaultStage();
        DcSweep sweep = new DcAnalysis().sweep(stage, SweepSpec.linear(SweepVariable.ambient(), -40, 85, 6));
        SolveOptions so = SolveOptions.DEFAULT;
        for (SweepPoint p : sweep.points()) {
            OperatingPoint op = p.point().orElseThrow();
            assertEquals(p.value(), op.ambientCelsius(), 0.0);
            // a hot coil may sit between drop-out and pick-up: the sweep keeps the previous point's contacts
            OperatingPoint cold = new DcAnalysis(DcOptions.DEFAULT.withWarmStart(false))
                    .solve(stage, so.withAmbient(p.value()));
            so = SolveOptions.DEFAULT.withPreviousRelayStates(op);
            assertSamePoint(cold, op, "ambient " + p.value() + " °C");
        }
    }
}
