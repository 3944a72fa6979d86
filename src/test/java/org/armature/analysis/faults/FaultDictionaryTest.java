package org.armature.analysis.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;

class FaultDictionaryTest {

    @ParameterizedTest
    @EnumSource(StageTemplate.class)
    void everyFaultOfEveryTemplateIsSolvedAtBothPinStates(StageTemplate t) {
        FaultDictionary d = FaultDictionary.build(Templates.build(t), Meter.DEFAULT);
        assertEquals(FaultCatalog.of(d.stage()).size() + 1, d.entries().size());
        for (FaultDictionary.Entry e : d.entries()) {
            assertTrue(e.solved(), e.name() + ": " + e.failure());
        }
        assertEquals("none", d.entries().get(0).name());
        // derived: the healthy stage operates with the pin high and releases with it low
        assertTrue(d.entries().get(0).high().operated());
        assertTrue(!d.entries().get(0).low().operated());
        assertTrue(d.probeIndex(Probe.COIL) >= 0);
    }













    @ParameterizedTest
    @CsvSource(textBlock = """
            # volts, tolerance: FH-4 (common practice), ±(1 % + 2 digits) on a 4,000-count meter
            3.3,    0.035
            0.1,    0.0012
            12,     0.14
            """)
    void meterTolerance(double volts, double tolerance) {
        assertEquals(tolerance, Meter.DEFAULT.toleranceVolts(volts), 1e-9);
    }

    @Test
    void meterInputResistanceLoadsADivider() {
        // FH-3 (derived): 1 MΩ / 1 MΩ divider from 12 V reads 6 V × (10 M ∥ 1 M = 0.909 M) / 1.909 M = 5.714 V
        org.armature.model.Stage s = Templates.build(StageTemplate.LOW_SIDE_NPN);
        // R1 1 MΩ and R2 1 MΩ: with the pin high at 3.5 V and Q1 base-open, the base net is the divider
        s = s.withPart(s.require("R1").with(org.armature.model.ParamKeys.RESISTANCE_OHMS, 1e6))
                .withPart(s.require("R2").with(org.armature.model.ParamKeys.RESISTANCE_OHMS, 1e6));
        FaultDictionary d = FaultDictionary.build(s, Meter.DEFAULT, List.of(new Fault("Q1", FaultKind.BE_OPEN)));
        double open = 3.5 * 1e6 / (2e6 + 75);
        double thevenin = 1e6 * (1e6 + 75) / (2e6 + 75);
        double loaded = open * 10e6 / (10e6 + thevenin);
        assertEquals(loaded, d.entries().get(1).high().volts()[d.probeIndex("control")], 1e-4);
    }
}
