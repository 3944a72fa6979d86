package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The reproducers of issue 10 ("Engine truth"), each found by a differential probe before the fix
 * and each failing on the engine before it (noted per test).
 */
class EngineTruthRegressionTest {

    private static Stage withSupply(StageTemplate t, Suppressor s, double volts) {
        Stage st = Templates.build(t, s, HighSideDrive.LEVEL_SHIFT);
        return st.withPart(st.require("V1").with("volts", volts));
    }

    @Test
    @DisplayName("a zener in breakdown no longer passes KCL by counting its companion terms as current (failed before: 12.5 mA from nowhere)")
    void zenerCurrentThatNothingSupplies() {
        // found by the differential probe (seed 2, sequence 32): the fresh engine's zener carried 12.5 mA,
        // its series diode 7 nA, and the node test counted g·v of the zener's companion model as current
        Stage s = withSupply(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE_ZENER, 4.539628123783912);
        s = s.withPart(s.require("D1").with("breakdownCurrentAmps", 4.302479365126851E-5).with("breakdownVolts", 41.11432531518278)
                .with("emissionCoefficient", 4.678839388995175));
        s = s.withPart(s.require("D2").with("breakdownCurrentAmps", 0.007302228566990333).with("breakdownVolts", 19.087891713461836)
                .with("emissionCoefficient", 0.5).with("saturationCurrentAmps", 4.630365551147949E-13));
        s = s.withPart(s.require("Q1").with("emitterResistanceOhms", 0.0758111460588626).with("kneeCurrentAmps", 0.20059767701828723));
        s = s.withPart(s.require("R2").with("resistanceOhms", 4374.284362766907));
        s = s.withPart(s.require("V2").with("volts", 2.669681241331765));
        s = s.withPart(s.require("E1").with("resistanceOhms", 13.564756724372568));
        s = s.withPart(s.require("K1").with("referenceTemperatureCelsius", 27.834013875287113)
                .with("inductanceReleasedHenries", 0.5555044714193909));
        SolveOptions so = SolveOptions.DEFAULT.withAmbient(99.6562417713346).withPinHigh(true);
        OperatingPoint fresh = new DcAnalysis().solve(s, so);
        HonestResidual.assertHonest(s, fresh, "fresh");
        // the zener and its series diode carry one current (KCL at their shared node, NM-6)
        assertEquals(fresh.requirePart("D1").quantity("current"), -fresh.requirePart("D2").quantity("current"), 1e-9,
                "series diode and zener carry the same current (KCL, derived)");
    }

    @Test
    @DisplayName("ambient slider 125 °C → −40 °C on a high-side stage with a zener: the warm answer meets KCL and equals fresh (probe before: 76 µA miss)")
    void ambientStepKeepsKcl() {
        // the probe's 27.6 V case at 150 °C now ends, rightly, in the coil finding (250 °C): 24 V keeps the coil valid
        Stage s = withSupply(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE_ZENER, 24);
        DcAnalysis live = new DcAnalysis();
        live.solve(s, SolveOptions.DEFAULT.withAmbient(125));
        OperatingPoint warm = live.solve(s, SolveOptions.DEFAULT.withAmbient(-40));
        OperatingPoint fresh = new DcAnalysis().solve(s, SolveOptions.DEFAULT.withAmbient(-40));
        HonestResidual.assertHonest(s, warm, "warm");
        assertEquals(null, EngineDifferentialTest.difference(warm, fresh), "warm = fresh (NM-6)");
    }

    @Test
    @DisplayName("TVS across a 30 V coil, ambient 85 °C → −40 °C: the warm answer meets KCL and equals fresh (a guard: it passed before the fix too)")
    void tvsAmbientStepReportsItsOwnResidual() {
        Stage s = withSupply(StageTemplate.LOW_SIDE_NPN, Suppressor.TVS, 30);
        DcAnalysis live = new DcAnalysis();
        live.solve(s, SolveOptions.DEFAULT.withAmbient(85));
        OperatingPoint warm = live.solve(s, SolveOptions.DEFAULT.withAmbient(-40));
        OperatingPoint fresh = new DcAnalysis().solve(s, SolveOptions.DEFAULT.withAmbient(-40));
        HonestResidual.assertHonest(s, warm, "warm");
        assertEquals(null, EngineDifferentialTest.difference(warm, fresh), "warm = fresh (NM-6)");
    }

    @Test
    @DisplayName("Darlington stage, 198 °C ambient, −469 V coil rail: a coil finding naming K1, not 'converged' at thousands of °C")
    void reversedRailCoilHasNoSteadyState() {
        // without a suppressor the reversed rail drives the coil through the channel: the winding would pass 2,800 °C
        Stage s = withSupply(StageTemplate.DARLINGTON_CHANNEL, Suppressor.NONE, -469);
        ModelLimitException e = assertThrows(ModelLimitException.class,
                () -> new DcAnalysis().solve(s, SolveOptions.DEFAULT.withAmbient(198)));
        assertEquals(ModelLimitException.COIL_TOO_HOT, e.messageKey());
        assertEquals("K1", e.partRef());
        assertTrue(e.valueReached() > 220, "past class R, 220 °C (IEC 60085, CHECKS CT-1)");
        assertTrue(e.getMessage().contains("K1") && e.getMessage().contains("°C"), e.getMessage());
    }

    @Test
    @DisplayName("−250 °C (below copper's −234.5 °C intercept) is refused with the valid range, not 'last KCL residual 0.0 A'")
    void ambientBelowCopperIntercept() {
        Stage s = Templates.defaultStage();
        ModelLimitException e = assertThrows(ModelLimitException.class,
                () -> new DcAnalysis().solve(s, SolveOptions.DEFAULT.withAmbient(-250)));
        assertEquals(ModelLimitException.AMBIENT_OUT_OF_RANGE, e.messageKey());
        assertTrue(e.getMessage().contains("from -60 °C to 200 °C"), e.getMessage());
    }

    @Test
    @DisplayName("a turn-off at −250 °C ends in the engine's own failure, not IllegalArgumentException from the coil")
    void transientBelowCopperIntercept() {
        Stage s = Templates.defaultStage();
        SolverException e = assertThrows(SolverException.class, () -> org.armature.solver.timedomain.TransientAnalysis.run(s,
                withAmbient(org.armature.solver.timedomain.TransientOptions.turnOff(), -250)));
        assertEquals(ModelLimitException.AMBIENT_OUT_OF_RANGE, e.messageKey());
    }

    private static org.armature.solver.timedomain.TransientOptions withAmbient(org.armature.solver.timedomain.TransientOptions o,
                                                                             double celsius) {
        return new org.armature.solver.timedomain.TransientOptions(o.drive(), o.durationSeconds(), o.step(), celsius);
    }

    @Test
    @DisplayName("a relay whose must-release is above its must-operate ends in the engine's own failure")
    void dropOutAbovePickUp() {
        Stage s = Templates.defaultStage();
        Stage bad = s.withPart(s.require("K1").with("mustReleaseVolts", 10.0));
        SolverException e = assertThrows(SolverException.class, () -> new DcAnalysis().solve(bad));
        assertEquals(ModelLimitException.PART_OUTSIDE_MODEL, e.messageKey());
        // the same through a warm engine's re-flatten
        DcAnalysis live = new DcAnalysis();
        live.solve(s);
        assertEquals(ModelLimitException.PART_OUTSIDE_MODEL,
                assertThrows(SolverException.class, () -> live.solve(bad)).messageKey());
    }

    @Test
    @DisplayName("supply step 204 V → 49.9 V on a high-side stage with a zener: warm and fresh end with the same coil finding (before: 'converged' at 78 V against 49.5 V)")
    void supplyStepLeavesNoNodeAboveTheRail() {
        // found by EngineDifferentialTest's sequence on the engine before this work (sequence 11, edit 154): the
        // warm answer put the node between diode and zener at 78 V on a 49.9 V rail, with a KCL miss of 5 µA
        Stage s = Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE_ZENER, HighSideDrive.LEVEL_SHIFT);
        s = s.withPart(s.require("V1").with("tolerancePercent", 1.318648709769313));
        s = s.withPart(s.require("V1").with("volts", 204.49202485303329));
        s = s.withPart(s.require("Q1").with("betaReverse", 2.261939616644116));
        s = s.withPart(s.require("Q1").with("hfeMin", 223.65506786128498));
        s = s.withPart(s.require("Q1").with("icMaxAmps", 1.2366375272118482));
        s = s.withPart(s.require("Q1").with("saturationCurrentAmps", 7.894888301251686E-15));
        s = s.withPart(s.require("Q1").with("vbeSatVolts", 2.6745468948596947));
        s = s.withPart(s.require("K1").with("coilCapacitanceFarads", 2.0733006740318364E-10));
        s = s.withPart(s.require("K1").with("coreLossOhms", 24540.585380673434));
        s = s.withPart(s.require("K1").with("inductanceAttractedHenries", 2.226910732355786));
        s = s.withPart(s.require("K1").with("referenceTemperatureCelsius", 40.35072552431028));
        s = s.withPart(s.require("D1").with("breakdownCurrentAmps", 5.0575691814843355E-6));
        s = s.withPart(s.require("D1").with("maxCurrentAmps", 4.526909673738766));
        s = s.withPart(s.require("D1").with("powerRatingWatts", 2.372890768801262));
        s = s.withPart(s.require("D1").with("saturationCurrentAmps", 2.0665567032849574E-10));
        s = s.withPart(s.require("D1").with("seriesResistanceOhms", 0.05223931323099162));
        s = s.withPart(s.require("D2").with("breakdownCurrentAmps", 0.0043118589309015885));
        s = s.withPart(s.require("D2").with("breakdownVolts", 28.501888155408984));
        s = s.withPart(s.require("D2").with("emissionCoefficient", 1.114395937850376));
        s = s.withPart(s.require("D2").with("maxCurrentAmps", 0.15553311682055176));
        s = s.withPart(s.require("D2").with("powerRatingWatts", 0.7755439285985268));
        s = s.withPart(s.require("D2").with("saturationCurrentAmps", 2.0834284341931553E-12));
        s = s.withPart(s.require("R3").with("powerRatingWatts", 0.35607579730628613));
        s = s.withPart(s.require("R3").with("resistanceOhms", 14878.747802539516));
        s = s.withPart(s.require("R3").with("tolerancePercent", 8.981778320987877));
        s = s.withPart(s.require("R4").with("powerRatingWatts", 0.06531544767053434));
        s = s.withPart(s.require("R4").with("resistanceOhms", 1102.9788088573835));
        s = s.withPart(s.require("R4").with("tolerancePercent", 9.407325256278881));
        s = s.withPart(s.require("Q2").with("baseResistanceOhms", 17.653286718671723));
        s = s.withPart(s.require("Q2").with("kneeCurrentAmps", 0.15864967552085546));
        s = s.withPart(s.require("Q2").with("vceoVolts", 122.1102194173193));
        s = s.withPart(s.require("R1").with("powerRatingWatts", 0.12667905905566715));
        s = s.withPart(s.require("R1").with("resistanceOhms", 7934.579751149315));
        s = s.withPart(s.require("R1").with("tolerancePercent", 0.6362440696498725));
        s = s.withPart(s.require("U1").with("highToleranceVolts", 0.09662069360988539));
        s = s.withPart(s.require("U1").with("highVolts", 3.2478276675058573));
        s = s.withPart(s.require("U1").with("lowVolts", 0.0));
        s = s.withPart(s.require("U1").with("packageCurrentLimitAmps", 0.1403147287378102));
        s = s.withPart(s.require("R2").with("powerRatingWatts", 0.2858693574571203));
        s = s.withPart(s.require("R2").with("resistanceOhms", 197255.2684375678));
        s = s.withPart(s.require("R2").with("tolerancePercent", 3.571449210601814));
        s = s.withPart(s.require("V2").with("tolerancePercent", 10.508035496698426));
        s = s.withPart(s.require("V2").with("volts", 21.24795490075774));
        s = s.withPart(s.require("E1").with("ratedWatts", 55.78758209466914));
        s = s.withPart(s.require("E1").with("resistanceOhms", 271.0476882138024));
        SolveOptions so = SolveOptions.DEFAULT.withAmbient(-25.195098675518516).withPinHigh(true);
        DcAnalysis live = new DcAnalysis();
        try {
            live.solve(s, so);
        } catch (SolverException e) {
            // 204 V on a 12 V coil: the coil finding is a right answer too; the step below must still be right
        }
        Stage low = s.withPart(s.require("V1").with("volts", 49.91802635313026));
        // 49.9 V across a 12 V coil heats it to about 296 °C: both engines must end with the same coil finding
        // (before, both called it converged, with different answers)
        ModelLimitException warm = assertThrows(ModelLimitException.class, () -> live.solve(low, so));
        ModelLimitException fresh = assertThrows(ModelLimitException.class, () -> new DcAnalysis().solve(low, so));
        assertEquals(ModelLimitException.COIL_TOO_HOT, warm.messageKey());
        assertEquals(ModelLimitException.COIL_TOO_HOT, fresh.messageKey());
        assertEquals(fresh.valueReached(), warm.valueReached(), 1.0, "the same coil temperature, °C");
    }
}
