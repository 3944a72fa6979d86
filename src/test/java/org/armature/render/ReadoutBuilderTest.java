package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.armature.model.Finding;
import org.armature.model.PinRef;
import org.armature.model.Severity;
import org.armature.model.Stage;
import org.armature.model.TestPoint;
import org.armature.model.Templates;
import org.armature.solver.DcAnalysis;
import org.armature.solver.OperatingPoint;
import org.armature.solver.PartResult;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Readouts from known operating points of the default low-side NPN stage. */
class ReadoutBuilderTest {

    private static final Stage STAGE = Templates.defaultStage();

    private static Optional<Annotations.PartBadge> badge(Annotations a, String ref) {
        return a.badges().stream().filter(b -> b.ref().equals(ref)).findFirst();
    }

    private static double current(Annotations a, String ref, String pin) {
        return a.currents().stream().filter(c -> c.pin().equals(new PinRef(ref, pin))).findFirst()
                .orElseThrow(() -> new AssertionError("no current at " + ref + "." + pin)).ampsIntoPin();
    }

    @Test
    @DisplayName("every test point gets its net's voltage from the operating point, once per net")
    void voltagesAtTestPoints() {
        OperatingPoint op = new DcAnalysis().solve(STAGE);
        Annotations a = ReadoutBuilder.build(STAGE, op, List.of());
        List<String> nets = STAGE.testPoints().stream().map(TestPoint::net).distinct().toList();
        assertEquals(nets, a.voltages().stream().map(Annotations.NodeVoltage::net).toList());
        for (Annotations.NodeVoltage v : a.voltages()) {
            // derived: the readout is the engine's node voltage itself
            assertEquals(op.voltage(v.net()), v.volts(), 1e-12, v.net());
        }
    }

    @Test
    @DisplayName("currents are the engine's pin currents, signed into the pin, at pin, base, collector and load")
    void currentsAtPins() {
        OperatingPoint op = new DcAnalysis().solve(STAGE);
        Annotations a = ReadoutBuilder.build(STAGE, op, List.of());
        PartResult q1 = op.requirePart("Q1");
        assertEquals(q1.pinCurrents().get("b"), current(a, "Q1", "b"), 1e-15, "derived: IB as solved");
        assertEquals(q1.pinCurrents().get("c"), current(a, "Q1", "c"), 1e-15, "derived: IC as solved");
        assertTrue(current(a, "U1", "out") < 0, "derived: the pin sources current, so it flows out of the pin");
        assertEquals(op.requirePart("E1").pinCurrents().get("a"), current(a, "E1", "a"), 1e-15);
    }

    @Test
    @DisplayName("pin high: the switch badge reads 'saturated, ×m margin' with m = hFE(min)·IB/IC, OK above ×2")
    void saturatedBadge() {
        OperatingPoint op = new DcAnalysis().solve(STAGE);
        Annotations a = ReadoutBuilder.build(STAGE, op, List.of());
        PartResult q1 = op.requirePart("Q1");
        // derived: margin = hFE(min) · IB / IC (check-values.md BJ-19, common practice)
        double margin = STAGE.require("Q1").value("hfeMin") * q1.quantity("ib") / q1.quantity("ic");
        Annotations.PartBadge b = badge(a, "Q1").orElseThrow();
        assertEquals("saturated, ×" + String.format(Locale.ROOT, "%.2g", margin) + " margin", b.text());
        assertEquals(margin >= ReadoutBuilder.COMFORTABLE_MARGIN ? Annotations.State.OK : Annotations.State.WARN, b.state());
    }

    @Test
    @DisplayName("a 22 kΩ base resistor starves Q1: the badge names the base current it lacks, IC/hFE(min) − IB")
    void notSaturatedBadge() {
        Stage starved = STAGE.updatePart("R1", p -> p.with("resistanceOhms", 22_000));
        OperatingPoint op = new DcAnalysis().solve(starved);
        PartResult q1 = op.requirePart("Q1");
        Annotations a = ReadoutBuilder.build(starved, op, List.of());
        // derived: the shortfall is IC / hFE(min) − IB
        double lacking = q1.quantity("ic") / starved.require("Q1").value("hfeMin") - q1.quantity("ib");
        assertTrue(lacking > 0, "derived: (3.5 − 0.75) V / 22 kΩ less 75 µA in the pull-down leaves about 50 µA, short of 26 mA / 100");
        Annotations.PartBadge b = badge(a, "Q1").orElseThrow();
        assertEquals("not saturated: needs " + Notation.format(lacking, "A") + " more base current", b.text());
        assertEquals(Annotations.State.FAIL, b.state());
    }

    @Test
    @DisplayName("pin low: Q1 reads cut off (OK) and the relay gauge reads released below drop-out")
    void pinLow() {
        Stage low = STAGE.withConditions(STAGE.conditions().withPinHigh(false));
        OperatingPoint op = new DcAnalysis().solve(low);
        Annotations a = ReadoutBuilder.build(low, op, List.of());
        assertEquals(new Annotations.PartBadge("Q1", "cut off", Annotations.State.OK), badge(a, "Q1").orElseThrow());
        Annotations.RelayGauge g = a.gauges().get(0);
        assertFalse(g.operated());
        assertTrue(g.coilAmps() < g.dropOutAmps(), "derived: leakage only, far below drop-out");
    }

    @Test
    @DisplayName("the relay gauge carries the coil current and the thresholds the engine solved with")
    void gauge() {
        OperatingPoint op = new DcAnalysis().solve(STAGE);
        Annotations a = ReadoutBuilder.build(STAGE, op, List.of());
        PartResult k1 = op.requirePart("K1");
        Annotations.RelayGauge g = a.gauges().get(0);
        assertEquals("K1", g.ref());
        assertEquals(Math.abs(k1.quantity("coilCurrent")), g.coilAmps(), 1e-15);
        assertEquals(k1.quantity("pickUpCurrent"), g.pickUpAmps(), 1e-15);
        assertEquals(k1.quantity("dropOutCurrent"), g.dropOutAmps(), 1e-15);
        assertEquals(op.relayOperated().get("K1"), g.operated());
    }

    @Test
    @DisplayName("the pin badge states the pin current against its limit and warns above 80 %")
    void pinBadge() {
        OperatingPoint op = new DcAnalysis().solve(STAGE);
        Annotations a = ReadoutBuilder.build(STAGE, op, List.of());
        double out = Math.abs(op.requirePart("U1").quantity("current"));
        double limit = STAGE.require("U1").value("pinCurrentLimitAmps");
        Annotations.PartBadge b = badge(a, "U1").orElseThrow();
        assertEquals(Notation.format(out, "A") + " of " + Notation.format(limit, "A") + " limit", b.text());
        assertEquals(out > 0.8 * limit ? Annotations.State.WARN : Annotations.State.OK, b.state(),
                "common practice: derate to 80 % of the limit");
        Stage hungry = STAGE.updatePart("R1", p -> p.with("resistanceOhms", 82));
        OperatingPoint op2 = new DcAnalysis().solve(hungry);
        Annotations a2 = ReadoutBuilder.build(hungry, op2, List.of());
        // derived: 3.5 V through 75 Ω + 82 Ω into a base at about 0.85 V takes about 17 mA, over 80 % of 20 mA
        assertEquals(Annotations.State.WARN, badge(a2, "U1").orElseThrow().state());
    }

    @Test
    @DisplayName("warnings and errors naming a part become one marker each, errors first; info is not marked")
    void markers() {
        List<Finding> f = List.of(
                new Finding(Severity.INFO, "topology.recognised", "Q1", "", "recognised"),
                new Finding(Severity.WARNING, "topology.suppressor-missing", "K1", "", "no suppressor"),
                new Finding(Severity.ERROR, "topology.suppressor-reversed", "D1", "", "reversed"),
                new Finding(Severity.WARNING, "topology.other", "D1", "", "second on D1"),
                new Finding(Severity.ERROR, "solver.floating-node", "", "", "no part"));
        List<Annotations.FindingMarker> m = ReadoutBuilder.markers(STAGE, f);
        assertEquals(List.of(new Annotations.FindingMarker("D1", Annotations.State.FAIL, "suppressor reversed"),
                new Annotations.FindingMarker("K1", Annotations.State.WARN, "suppressor missing")), m);
    }
}
