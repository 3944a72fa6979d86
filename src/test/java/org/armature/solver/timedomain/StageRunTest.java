package org.armature.solver.timedomain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.HighSideDrive;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class StageRunTest {

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    void everyTemplateWithDiodeTurnsOff(StageTemplate t) {
        TransientResult r = TransientAnalysis.run(Templates.build(t, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT),
                TransientOptions.turnOff());
        TransientMetrics m = r.metrics();
        System.out.println(t + " " + m + " steps " + r.acceptedSteps() + "/" + r.rejectedSteps() + " events " + r.waveform().events());
        assertTrue(m.peakSwitchVolts() < 15, "diode clamps near supply + VF: " + m.peakSwitchVolts());
        assertFalse(m.switchBreakdown());
    }

    @ParameterizedTest
    @EnumSource(Suppressor.class)
    void lowSideNpnVariants(Suppressor s) {
        TransientResult r = TransientAnalysis.run(Templates.build(StageTemplate.LOW_SIDE_NPN, s, HighSideDrive.LEVEL_SHIFT),
                TransientOptions.turnOff());
        System.out.println(s + " " + r.metrics() + " steps " + r.acceptedSteps() + "/" + r.rejectedSteps());
    }

    @Test
    void turnOn() {
        TransientResult r = TransientAnalysis.run(Templates.defaultStage(), TransientOptions.turnOn());
        System.out.println("on " + r.metrics() + " " + r.waveform().events());
    }
}
