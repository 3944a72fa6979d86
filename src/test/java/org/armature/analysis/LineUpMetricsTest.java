package org.armature.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.armature.model.HighSideDrive;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.ParamKeys;
import org.armature.model.SharedPart;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageRecognition;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.netlist.Readings;
import org.armature.solver.DcAnalysis;
import org.armature.solver.SolveOptions;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The line-up figures and the shared context, headless. */
class LineUpMetricsTest {

    @Test
    @DisplayName("plain diode vs diode + zener at the supply voltage on a moving-armature relay")
    void diodeAgainstDiodeZener() {
        Stage diode = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        Stage zener = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT);
        // the template relay has two inductances, so the run uses the moving-armature model
        assertTrue(diode.require(StageRecognition.of(diode).roles().orElseThrow().relayRef())
                .value(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES) > 0);
        LineUpContext context = LineUpContext.of(diode);
        LineUpMetrics.Column d = LineUpMetrics.evaluate(context.applyTo(diode));
        LineUpMetrics.Column z = LineUpMetrics.evaluate(context.applyTo(zener));
        assertEquals(List.of(), z.differences(), "both stages use the same relay, supply and pin");

        // SU-12 (relay makers' application notes): a plain diode lengthens the release time
        assertTrue(d.value("releaseTime") > z.value("releaseTime"),
                d.value("releaseTime") + " vs " + z.value("releaseTime"));
        // derived: the diode clamps the switch at the supply plus one forward drop, 12 V + ~0.8 V;
        // diode + 12 V zener at the supply plus zener plus forward drop, 12 + 12 + ~0.8 V (SU-15: zener about the supply)
        assertEquals(12.8, d.value("peakSwitchVoltage"), 0.3);
        assertEquals(24.8, z.value("peakSwitchVoltage"), 0.6);
        // SU-16 (relay maker's note on coil suppression and contact life): the plain diode's
        // recirculating current holds the armature back, so it is slower when the contacts part
        assertTrue(d.value("armatureSpeedAtBreak") < z.value("armatureSpeedAtBreak"),
                d.value("armatureSpeedAtBreak") + " vs " + z.value("armatureSpeedAtBreak"));
        assertTrue(d.value("armatureSpeedAtBreak") > 0);

        List<LineUpMetrics.Column> both = List.of(d, z);
        assertEquals(List.of(0), LineUpMetrics.best(metric("peakSwitchVoltage"), both));
        assertEquals(List.of(1), LineUpMetrics.best(metric("releaseTime"), both));
        assertEquals(List.of(1), LineUpMetrics.best(metric("armatureSpeedAtBreak"), both));
        assertEquals(List.of(0), LineUpMetrics.best(metric("partsCount"), both), "the zener is one part more");

        String tsv = LineUpMetrics.tabSeparated(List.of("diode", "diode + zener"), both);
        List<String> lines = tsv.lines().toList();
        assertEquals("figure\tunit\tdiode\tdiode + zener", lines.get(0));
        String peak = lines.stream().filter(l -> l.startsWith("peak switch voltage\t")).findFirst().orElseThrow();
        assertEquals("peak switch voltage\tV\t" + d.value("peakSwitchVoltage") + " *\t" + z.value("peakSwitchVoltage"),
                peak);
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("check relay.operates\t\t")), tsv);
    }

    @Test
    @DisplayName("changing the shared supply re-solves every stage; the old context gives the old figures back")
    void sharedSupplyChangeReachesEveryStage() {
        List<Stage> stages = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            stages.add(Templates.build(t));
        }
        LineUpContext before = LineUpContext.of(stages.get(0));
        StageDocument doc = new StageDocument("four", stages, Optional.of(new LineUp(List.of(0, 1, 2, 3), before)));
        List<Double> coilBefore = coilCurrents(doc);
        SharedPart supply = before.coilSupply().orElseThrow();
        double volts = supply.values().get(ParamKeys.VOLTS);
        StageDocument raised = doc.withLineUp(Optional.of(doc.lineUp().get()
                .withContext(before.withCoilSupply(supply.with(ParamKeys.VOLTS, 1.1 * volts)))));
        List<Double> coilAfter = coilCurrents(raised);
        for (int i = 0; i < 4; i++) {
            // derived: a 10 % higher supply across the coil (less a switch drop that hardly moves)
            // raises the coil current by about 10 %; self-heating of the coil takes a little back
            double ratio = coilAfter.get(i) / coilBefore.get(i);
            assertTrue(ratio > 1.07 && ratio < 1.12, stages.get(i).name() + ": ratio " + ratio);
        }
        assertEquals(stages, raised.stages(), "the stored stages are untouched");
        assertEquals(coilBefore, coilCurrents(raised.withLineUp(doc.lineUp())), "undo: the old context, the old figures");
        assertNotEquals(coilBefore, coilAfter);
    }

    private static List<Double> coilCurrents(StageDocument doc) {
        List<Double> out = new ArrayList<>();
        for (LineUpContext.Applied a : doc.lineUp().orElseThrow().applied(doc)) {
            String relay = StageRecognition.of(a.stage()).roles().orElseThrow().relayRef();
            out.add(new DcAnalysis().solve(a.stage(), SolveOptions.DEFAULT).quantity(relay, Readings.COIL_CURRENT));
        }
        return out;
    }

    private static LineUpMetrics.Metric metric(String key) {
        return LineUpMetrics.METRICS.stream().filter(m -> m.key().equals(key)).findFirst().orElseThrow();
    }

    @Test
    @DisplayName("a column of some phases: their figures in, the others NaN and pending, no checks yet")
    void partialColumn() {
        Stage npn = Templates.build(StageTemplate.LOW_SIDE_NPN);
        LineUpContext.Applied a = LineUpContext.of(npn).applyTo(npn);
        LineUpMetrics.PhaseResult dc = LineUpMetrics.dc(a.stage());
        LineUpMetrics.PhaseResult off = LineUpMetrics.turnOff(a.stage());
        LineUpMetrics.Column c = LineUpMetrics.column(a, List.of(off, dc));
        LineUpMetrics.Column whole = LineUpMetrics.evaluate(a);
        for (LineUpMetrics.Metric m : LineUpMetrics.METRICS) {
            LineUpMetrics.Phase p = LineUpMetrics.phaseOf(m);
            boolean in = p == LineUpMetrics.Phase.DC || p == LineUpMetrics.Phase.TURN_OFF;
            assertEquals(!in, c.pending(m), m.key());
            // the phases that ran give evaluate's figure bit for bit; the others are not there yet
            assertEquals(in ? whole.value(m.key()) : Double.NaN, c.value(m.key()), m.key());
        }
        assertTrue(c.report().checks().isEmpty(), "no checks before the checks phase");
        assertTrue(c.turnOff().isPresent());
        assertEquals(whole.switchFullyOn(), c.switchFullyOn());
        assertThrows(IllegalArgumentException.class, () -> LineUpMetrics.column(a, List.of(dc, dc)));
    }

    @Test
    @DisplayName("after a turn-off that could not be simulated the turn-on is not run, as evaluate did in one try")
    void turnOnSkippedAfterFailedTurnOff() {
        Stage npn = Templates.build(StageTemplate.LOW_SIDE_NPN);
        LineUpMetrics.PhaseResult failed = new LineUpMetrics.PhaseResult(LineUpMetrics.Phase.TURN_OFF,
                java.util.Map.of(), Optional.empty(), Optional.empty(), Optional.empty(),
                List.of("could not be simulated: test"));
        LineUpMetrics.PhaseResult on = LineUpMetrics.turnOn(npn, failed);
        assertEquals(LineUpMetrics.Phase.TURN_ON, on.phase());
        assertEquals(Double.NaN, on.values().get("operateTime"));
        assertEquals(List.of(), on.notes(), "one note (the turn-off's) says why");
        // derived: the template relay operates within the 20 ms window (7.8 ms, ArmatureRunTest)
        assertTrue(LineUpMetrics.turnOn(npn, LineUpMetrics.turnOff(npn)).values().get("operateTime") > 0);
    }
}
