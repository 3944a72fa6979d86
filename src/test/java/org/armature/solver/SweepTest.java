package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SweepTest {

    @Test
    @DisplayName("supply swept up and back down: the relay picks up late and drops out late (hysteresis, RC-1 terms)")
    void supplyHysteresis() {
        Stage stage = Templates.defaultStage();
        List<Double> values = new ArrayList<>();
        for (int i = 0; i <= 24; i++) {
            values.add(0.5 * i);
        }
        for (int i = 23; i >= 0; i--) {
            values.add(0.5 * i);
        }
        DcSweep sweep = new DcAnalysis().sweep(stage,
                new SweepSpec(SweepVariable.supplyVolts("V1"), values, SolveOptions.DEFAULT));
        assertEquals(values.size(), sweep.points().size());
        // at 6 V the coil current (≈14 mA) is between drop-out (3 mA) and pick-up (22.5 mA)
        OperatingPoint up = sweep.points().get(12).point().orElseThrow();
        OperatingPoint down = sweep.points().get(values.size() - 13).point().orElseThrow();
        assertEquals(6.0, sweep.points().get(12).value(), 0.0);
        assertEquals(6.0, sweep.points().get(values.size() - 13).value(), 0.0);
        assertEquals("either", up.requirePart("K1").state("state"));
        assertEquals("released", up.requirePart("K1").state("contacts"));
        assertEquals("operated", down.requirePart("K1").state("contacts"));
        assertEquals(OperatingPoint.CONTACTS_FROM_PREVIOUS, down.requirePart("K1").state("contactsFrom"));
        // pick-up current = must-operate volts / coil resistance at the reference temperature (RC-1 terms; derived)
        assertEquals(9.0 / 400, up.requirePart("K1").quantity("pickUpCurrent"), 1e-12);
    }

    @Test
    @DisplayName("ambient sweep: a hot coil draws less current (copper +0.39 %/K, check-values.md practitioners' item 2)")
    void ambientSweep() {
        DcSweep sweep = new DcAnalysis().sweep(Templates.defaultStage(),
                SweepSpec.linear(SweepVariable.ambient(), -20, 80, 6));
        double previous = Double.MAX_VALUE;
        for (SweepPoint p : sweep.points()) {
            double i = p.point().orElseThrow().requirePart("K1").quantity("coilCurrent");
            assertTrue(i < previous, "coil current falls with ambient");
            previous = i;
            assertEquals(p.value(), p.point().orElseThrow().ambientCelsius(), 0.0);
        }
    }
}
