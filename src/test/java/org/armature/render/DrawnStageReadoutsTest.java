package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.armature.analysis.TopologyCheck;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.StageDisguise;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.model.TestPoint;
import org.armature.model.Wire;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.SolveOptions;
import org.armature.solver.SwitchVerdict;
import org.armature.solver.timedomain.TransientAnalysis;
import org.armature.solver.timedomain.TransientMetrics;
import org.armature.solver.timedomain.TransientOptions;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * A stage drawn with other designators, elsewhere on the grid, in another order and with no test
 * points reads exactly like the template it equals: the same voltage tags under the same names, the
 * same switch verdict, coil gauge and edges. Before the roles were found from connectivity, the
 * verdict came from a test point named "switch" and the voltage tags only from test points, so the
 * disguised stages had no verdict and no tags: these tests failed then.
 */
class DrawnStageReadoutsTest {

    /** Equal figures from two solves of the same circuit numbered differently: 1e-9 relative (derived). */
    private static final double SAME = 1e-9;

    private static void assertSame(double expected, double actual, String what) {
        assertEquals(expected, actual, SAME * Math.max(1e-3, Math.abs(expected)), what);
    }

    private static Annotations readouts(Stage s, boolean pinHigh) {
        OperatingPoint op = new DcAnalysis().solve(s, SolveOptions.DEFAULT.withPinHigh(pinHigh));
        List<Finding> findings = TopologyCheck.check(s);
        return ReadoutBuilder.build(s, op, findings);
    }

    private static void assertSameReadouts(Annotations expected, Annotations actual, StageDisguise x) {
        assertEquals(expected.voltages().size(), actual.voltages().size(), actual.voltages().toString());
        for (int i = 0; i < expected.voltages().size(); i++) {
            Annotations.NodeVoltage e = expected.voltages().get(i);
            Annotations.NodeVoltage a = actual.voltages().get(i);
            assertEquals(e.net(), a.net(), "the same name for the same net");
            assertSame(e.volts(), a.volts(), e.net());
        }
        assertEquals(expected.badges().size(), actual.badges().size());
        for (Annotations.PartBadge e : expected.badges()) {
            Annotations.PartBadge a = actual.badges().stream().filter(b -> b.ref().equals(x.ref(e.ref()))).findFirst()
                    .orElseThrow(() -> new AssertionError("no badge on " + x.ref(e.ref())));
            assertEquals(e.text(), a.text(), e.ref());
            assertEquals(e.state(), a.state(), e.ref());
        }
        assertEquals(expected.gauges().size(), actual.gauges().size());
        for (int i = 0; i < expected.gauges().size(); i++) {
            Annotations.RelayGauge e = expected.gauges().get(i);
            Annotations.RelayGauge a = actual.gauges().get(i);
            assertEquals(x.ref(e.ref()), a.ref());
            assertSame(e.coilAmps(), a.coilAmps(), "coil current");
            assertEquals(e.operated(), a.operated());
        }
        assertEquals(expected.currents().size(), actual.currents().size());
    }

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    @DisplayName("disguised template, no test points: the same tags, verdict badge and coil gauge, pin high and low")
    void sameReadouts(StageTemplate t) {
        Stage template = Templates.build(t);
        StageDisguise x = StageDisguise.of(template, 42, -9, 13, false, 1, true);
        for (boolean high : new boolean[] {true, false}) {
            Annotations expected = readouts(template, high);
            Annotations actual = readouts(x.stage(), high);
            assertEquals(4, expected.voltages().size(), "pin, control, switch, supply");
            assertSameReadouts(expected, actual, x);
        }
    }

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    @DisplayName("disguised template, no test points: the same switch verdict and margin")
    void sameVerdict(StageTemplate t) {
        Stage template = Templates.build(t);
        StageDisguise x = StageDisguise.of(template, 5, 17, -4, false, 3, false);
        SwitchVerdict e = new DcAnalysis().solve(template).switchVerdict().orElseThrow();
        SwitchVerdict a = new DcAnalysis().solve(x.stage()).switchVerdict()
                .orElseThrow(() -> new AssertionError("no verdict for the disguised " + t));
        assertEquals(x.ref(e.ref()), a.ref());
        assertEquals(e.fullyOn(), a.fullyOn());
        assertSame(e.margin(), a.margin(), "margin");
    }

    @Test
    @DisplayName("disguised template, no test points: the same turn-off edge (peak, decay, release, suppressor energy)")
    void sameEdges() {
        Stage template = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT);
        StageDisguise x = StageDisguise.of(template, 9, 3, 3, false);
        TransientMetrics e = TransientAnalysis.run(template, TransientOptions.turnOff()).metrics();
        TransientMetrics a = TransientAnalysis.run(x.stage(), TransientOptions.turnOff()).metrics();
        // the same circuit numbered differently: step control may choose other points, so agree to 1e-6 (derived)
        assertEquals(e.peakSwitchVolts(), a.peakSwitchVolts(), 1e-6 * e.peakSwitchVolts());
        assertEquals(e.decayToReleaseCurrentSeconds(), a.decayToReleaseCurrentSeconds(), 1e-6 * e.decayToReleaseCurrentSeconds());
        assertEquals(e.releaseTimeSeconds(), a.releaseTimeSeconds(), 1e-6 * e.releaseTimeSeconds());
        assertEquals(e.suppressorEnergyJoules(), a.suppressorEnergyJoules(), 1e-6 * e.suppressorEnergyJoules());
        assertFalse(Double.isNaN(a.suppressorEnergyJoules()), "the suppressor was found in the disguised stage");
    }

    /**
     * The low-side NPN stage built part by part, as a user would from the palette: Q7, R9, K3 and
     * the rest with other designators, placed elsewhere, added one by one with their values typed in,
     * wired segment by segment, with no test point. Before the roles, it had no switch verdict.
     */
    @Test
    @DisplayName("low-side NPN built part by part as Q7, R9, K3 with no test points: the template's verdict and coil current")
    void builtPartByPart() {
        Stage template = Templates.build(StageTemplate.LOW_SIDE_NPN);
        Map<String, String> names = Map.of("Q1", "Q7", "R1", "R9", "K1", "K3", "R2", "R4", "U1", "U3", "V1", "V5",
                "V2", "V6", "E1", "E2", "D1", "D4");
        int dx = 30;
        int dy = -12;
        Stage drawn = new Stage("my stage", "", List.of(), List.of(), List.of(), template.conditions());
        List<Part> backwards = new ArrayList<>(template.parts());
        java.util.Collections.reverse(backwards);
        for (Part p : backwards) {
            String ref = names.getOrDefault(p.ref(), p.ref().startsWith("GND") ? "GND" + (10 + drawn.parts().size())
                    : p.ref());
            Placement at = p.placement().movedTo(p.placement().origin().plus(dx, dy));
            Part fresh = Part.of(ref, p.kind(), at);
            for (Map.Entry<String, Double> v : p.values().entrySet()) {
                fresh = fresh.with(v.getKey(), v.getValue());
            }
            for (Map.Entry<String, String> o : p.options().entrySet()) {
                fresh = fresh.withOption(o.getKey(), o.getValue());
            }
            drawn = drawn.withPart(fresh);
        }
        for (Wire w : template.wires()) {
            drawn = drawn.withWire(new Wire(w.from().plus(dx, dy), w.to().plus(dx, dy)));
        }
        assertTrue(drawn.testPoints().isEmpty());
        assertTrue(drawn.part("Q7").isPresent() && drawn.part("R9").isPresent() && drawn.part("K3").isPresent());

        OperatingPoint e = new DcAnalysis().solve(template);
        OperatingPoint a = new DcAnalysis().solve(drawn);
        SwitchVerdict ve = e.switchVerdict().orElseThrow();
        SwitchVerdict va = a.switchVerdict().orElseThrow(() -> new AssertionError("no switch verdict"));
        assertEquals("Q7", va.ref());
        assertEquals(ve.fullyOn(), va.fullyOn());
        assertSame(ve.margin(), va.margin(), "saturation margin");
        assertSame(e.quantity("K1", "coilCurrent"), a.quantity("K3", "coilCurrent"), "coil current");
        Annotations ra = ReadoutBuilder.build(drawn, a, TopologyCheck.check(drawn));
        Annotations re = ReadoutBuilder.build(template, e, TopologyCheck.check(template));
        assertEquals(re.voltages().stream().map(Annotations.NodeVoltage::net).toList(),
                ra.voltages().stream().map(Annotations.NodeVoltage::net).toList());
        assertEquals(re.badges().stream().filter(b -> b.ref().equals("Q1")).findFirst().orElseThrow().text(),
                ra.badges().stream().filter(b -> b.ref().equals("Q7")).findFirst().orElseThrow().text());
        // the nets the roles name are the template's test point names, so the tags read the same
        for (TestPoint tp : template.testPoints()) {
            assertSame(e.voltage(tp.net()), a.voltage(tp.net()), tp.net());
        }
    }
}
