package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.stream.Collectors;
import org.armature.devices.Bjt;
import org.armature.devices.BjtEvaluation;
import org.armature.devices.BjtJunctionSolution;
import org.armature.devices.DeviceNewtonOptions;
import org.armature.devices.DiodeParams;
import org.armature.model.HighSideDrive;
import org.armature.model.ParamKeys;
import org.armature.model.Part;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.ui.edit.Editor;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class DatasheetFitTest {

    private static final double VDD = 3.3;

    private static EditorViewModel vm(Stage s) {
        return new EditorViewModel(s, new MainWindowTest.MemoryStore(), ReadoutSource.NONE, Runnable::run, Runnable::run);
    }

    private static Map<String, Double> byKey(DatasheetFit.Result r) {
        return r.changes().stream().collect(Collectors.toMap(Editor.ValueChange::key, Editor.ValueChange::value));
    }

    @Test
    @DisplayName("GP-7 (derived from a typical 3.3 V microcontroller output table): VOH(8 mA) = VDD − 0.4, "
            + "VOH(20 mA) = VDD − 1.3 gives 75 Ω and 3.5 V, applied as one step that one undo takes back")
    void pinGp7ThroughViewModel() {
        Stage start = Templates.defaultStage();
        start = start.withPart(start.require("U1").with(ParamKeys.HIGH_VOLTS, 5.05).with(ParamKeys.OUTPUT_RESISTANCE_OHMS, 50));
        EditorViewModel vm = vm(start);
        StageDocument before = vm.document();
        DatasheetFit.Result r = DatasheetFit.pin(vm.stage().require("U1"),
                new DatasheetFit.PinFigures(VDD - 0.4, 8e-3, VDD - 1.3, 20e-3));
        assertTrue(r.fitted(), r.problem().orElse(""));
        assertTrue(vm.applyDatasheetFit("U1", r));
        Part u1 = vm.stage().require("U1");
        assertEquals(75, u1.value(ParamKeys.OUTPUT_RESISTANCE_OHMS), 1e-9, "GP-7: Rout = 0.9 V / 12 mA");
        assertEquals(3.5, u1.value(ParamKeys.HIGH_VOLTS), 1e-9, "GP-7: V0 = 2.9 V + 75 Ω · 8 mA = VDD + 0.2 V");
        assertEquals("Undo Fit U1 to datasheet", vm.undoLabelProperty().get());
        vm.undo();
        assertEquals(before, vm.document());
        assertFalse(vm.canUndoProperty().get());
    }

    @Test
    @DisplayName("VOH rising with load is refused with a message; the document is unchanged")
    void pinRisingRefused() {
        EditorViewModel vm = vm(Templates.defaultStage());
        StageDocument before = vm.document();
        DatasheetFit.Result r = DatasheetFit.pin(vm.stage().require("U1"),
                new DatasheetFit.PinFigures(2.0, 8e-3, 2.9, 20e-3));
        assertFalse(r.fitted());
        assertFalse(vm.applyDatasheetFit("U1", r));
        assertEquals(before, vm.document());
        assertFalse(vm.messageProperty().get().isEmpty());
    }

    @Test
    @DisplayName("MOSFET fit reproduces both stated points (derived: Shichman–Hodges, threshold in saturation, "
            + "RDS(on) in triode) and writes the figures as entered; one undo restores the document")
    void mosfetFit() {
        EditorViewModel vm = vm(Templates.build(StageTemplate.LOW_SIDE_NMOS, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT));
        StageDocument before = vm.document();
        // small-signal logic-level N-MOSFET class, figures from memory: VGS(th) 1.6 V at 250 µA, 2 Ω at 4.5 V, 200 mA
        double vth = 1.6;
        double ith = 250e-6;
        double rds = 2.0;
        double vgs = 4.5;
        double id = 0.2;
        DatasheetFit.Result r = DatasheetFit.mosfet(vm.stage().require("Q1"),
                new DatasheetFit.MosfetFigures(vth, ith, rds, vgs, id));
        assertTrue(r.fitted(), r.problem().orElse(""));
        assertTrue(vm.applyDatasheetFit("Q1", r));
        Part q = vm.stage().require("Q1");
        double vt0 = q.value(ParamKeys.THRESHOLD_VOLTS);
        double beta = q.value(ParamKeys.TRANSCONDUCTANCE_AMPS_PER_VOLT_SQUARED);
        double lambda = q.value(ParamKeys.LAMBDA_PER_VOLT);
        assertEquals(ith, beta / 2 * Math.pow(vth - vt0, 2) * (1 + lambda * vth), ith * 1e-9,
                "derived: ID(th) = β/2·(VGS(th) − VT0)²·(1 + λ·VGS(th))");
        double vds = id * rds;
        assertEquals(id, beta * (vgs - vt0 - vds / 2) * vds * (1 + lambda * vds), id * 1e-9,
                "derived: ID = β·(VGS − VT0 − VDS/2)·VDS·(1 + λ·VDS) at VDS = ID·RDS(on)");
        assertEquals(vth, q.value(ParamKeys.VGS_TH_MAX_VOLTS), 0, "as entered");
        assertEquals(rds, q.value(ParamKeys.RDS_ON_OHMS), 0, "as entered");
        assertEquals(vgs, q.value(ParamKeys.RDS_ON_GATE_VOLTS), 0, "as entered");
        vm.undo();
        assertEquals(before, vm.document());
    }

    @Test
    @DisplayName("MOSFET RDS(on) stated below VGS(th) is refused with the device's message")
    void mosfetInconsistentRefused() {
        Stage s = Templates.build(StageTemplate.LOW_SIDE_NMOS, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT);
        DatasheetFit.Result r = DatasheetFit.mosfet(s.require("Q1"), new DatasheetFit.MosfetFigures(2.0, 250e-6, 2, 1.5, 0.1));
        assertFalse(r.fitted());
        assertTrue(r.problem().orElseThrow().contains("VGS(th)"));
    }

    @Test
    @DisplayName("BJT fit: βF and IS only, one undo step; a PNP with the same figures gets the same values "
            + "(derived: Ebers–Moll is symmetric under the polarity sign)")
    void bjtFitAndPolaritySymmetry() {
        // general-purpose small-signal NPN class, figures from memory: hFE 200 at 10 mA, VCE 1 V; VBE(sat) 0.85 V at 50 mA
        DatasheetFit.BjtFigures f = new DatasheetFit.BjtFigures(200, 10e-3, 1, 0.85, 50e-3);
        EditorViewModel vm = vm(Templates.defaultStage());
        StageDocument before = vm.document();
        Part npn = vm.stage().require("Q1");
        DatasheetFit.Result r = DatasheetFit.bjt(npn, f);
        assertTrue(r.fitted(), r.problem().orElse(""));
        assertEquals(java.util.Set.of(ParamKeys.BETA_FORWARD, ParamKeys.SATURATION_CURRENT_AMPS), byKey(r).keySet());
        assertTrue(vm.applyDatasheetFit("Q1", r));
        assertEquals(byKey(r).get(ParamKeys.BETA_FORWARD), vm.stage().require("Q1").value(ParamKeys.BETA_FORWARD), 0);
        // derived: the fitted model reproduces both statements at the terminals (hFE at 10 mA, 1 V; VBE(sat) at 50 mA, 5 mA)
        Bjt fitted = new Bjt(DatasheetFit.bjtParams(vm.stage().require("Q1")));
        double t = DiodeParams.DATASHEET_TEMPERATURE_KELVIN;
        var q1 = fitted.params();
        double ib = 10e-3 / 200;
        double vceIntrinsic = 1 - 10e-3 * q1.collectorResistanceOhms() - (10e-3 + ib) * q1.emitterResistanceOhms();
        BjtJunctionSolution active = fitted.vbeForCollectorCurrent(10e-3, vceIntrinsic, t, DeviceNewtonOptions.DEFAULTS);
        BjtEvaluation ev = new BjtEvaluation();
        fitted.evaluate(active.vbeVolts(), active.vbcVolts(), t, ev);
        assertEquals(200, ev.collectorAmps() / ev.baseAmps(), 200 * 1e-6, "derived: hFE = IC/IB");
        BjtJunctionSolution sat = fitted.junctionsForCurrents(50e-3, 5e-3, t, DeviceNewtonOptions.DEFAULTS);
        double terminalVbe = sat.vbeVolts() + 5e-3 * q1.baseResistanceOhms() + 55e-3 * q1.emitterResistanceOhms();
        assertEquals(0.85, terminalVbe, 1e-6, "derived: terminal VBE(sat) = VBE' + IB·RB + IE·RE at IC/IB = 10");
        vm.undo();
        assertEquals(before, vm.document());

        Part pnp = Part.of("Q9", org.armature.model.PartKind.PNP, npn.placement());
        for (var e : npn.values().entrySet()) {
            pnp = pnp.with(e.getKey(), e.getValue());
        }
        Map<String, Double> a = byKey(r);
        Map<String, Double> b = byKey(DatasheetFit.bjt(pnp, f));
        assertEquals(a.get(ParamKeys.BETA_FORWARD), b.get(ParamKeys.BETA_FORWARD), a.get(ParamKeys.BETA_FORWARD) * 1e-9);
        assertEquals(a.get(ParamKeys.SATURATION_CURRENT_AMPS), b.get(ParamKeys.SATURATION_CURRENT_AMPS), a.get(ParamKeys.SATURATION_CURRENT_AMPS) * 1e-9);
    }

    @Test
    @DisplayName("a fit asked of the wrong kind of part is refused, not thrown")
    void wrongKindRefused() {
        Stage s = Templates.defaultStage();
        assertFalse(DatasheetFit.pin(s.require("Q1"), new DatasheetFit.PinFigures(2.9, 8e-3, 2.0, 20e-3)).fitted());
        assertFalse(DatasheetFit.bjt(s.require("U1"), new DatasheetFit.BjtFigures(200, 1e-2, 1, 0.85, 5e-2)).fitted());
    }
}
