package org.armature.solver.timedomain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.ParamKeys;
import org.armature.model.Stage;
import org.armature.model.StageRecognition;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The armature's speed when the normally-open contacts part (new metric of issue 12). */
class ArmatureSpeedAtBreakTest {

    @Test
    @DisplayName("moving armature: the metric is the slope of the armature position trace at the break (derived: speed = dx/dt)")
    void movingArmatureSpeedIsThePositionSlope() {
        TransientResult r = TransientAnalysis.run(Templates.defaultStage(), TransientOptions.turnOff());
        double speed = r.metrics().armatureSpeedAtBreakMetresPerSecond();
        double open = r.waveform().firstEvent(TransientEvent.CONTACTS_OPEN).orElseThrow().timeSeconds();
        Waveform w = r.waveform();
        Trace x = w.require(Waveform.ARMATURE_POSITION);
        int k = 0;
        while (k + 1 < w.size() && w.time(k + 1) <= open) {
            k++;
        }
        // a secant over the points either side of the event, a few microseconds apart
        int a = Math.max(0, k - 1);
        int b = Math.min(w.size() - 1, k + 1);
        double slope = Math.abs((x.value(b) - x.value(a)) / (w.time(b) - w.time(a)));
        assertTrue(speed > 0, "the armature moves when the contacts part");
        assertEquals(slope, speed, 0.05 * slope);
    }

    @Test
    @DisplayName("constant inductance: the linear transit's speed, travel ÷ release time (derived)")
    void constantInductanceSpeedIsTheTransitSpeed() {
        Stage s = Templates.defaultStage();
        String relay = StageRecognition.of(s).roles().orElseThrow().relayRef();
        s = s.updatePart(relay, p -> p.with(ParamKeys.INDUCTANCE_ATTRACTED_HENRIES, 0));
        double travel = s.require(relay).value(ParamKeys.TRAVEL_METRES);
        double release = s.require(relay).value(ParamKeys.RELEASE_TIME_SECONDS);
        TransientResult r = TransientAnalysis.run(s, TransientOptions.turnOff());
        assertEquals(travel / release, r.metrics().armatureSpeedAtBreakMetresPerSecond(), 1e-12 * travel / release);
    }

    @Test
    @DisplayName("no turn-off edge: no break, NaN")
    void noBreakNoSpeed() {
        TransientResult r = TransientAnalysis.run(Templates.defaultStage(), TransientOptions.turnOn());
        assertTrue(Double.isNaN(r.metrics().armatureSpeedAtBreakMetresPerSecond()));
    }
}
