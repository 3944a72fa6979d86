package org.armature.analysis.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The meter's accuracy and counts as written, and what the tolerance does to the ambiguity groups. */
class MeterTest {

    @Test
    void accuracyAndCountsAreReadAsMeterSheetsWriteThem() {
        Meter m = Meter.DEFAULT.withAccuracy("0.5%+3").withCounts("6000");
        assertEquals(new Meter(10e6, 6000, 0.5, 3), m);
        assertEquals("0.5%+3", m.accuracyText());
        assertEquals(new Meter(10e6, 4000, 1, 2), Meter.DEFAULT.withAccuracy(" 1 % + 2 "));
        // derived (FH-4 form): a 6,000-count meter shows 5 V on its 6 V range, one digit 1 mV:
        // ±(0.5 % × 5 V + 3 mV) = ±28 mV; a 4,000-count meter needs its 40 V range, digit 10 mV:
        // ±(1 % × 5 V + 20 mV) = ±70 mV
        assertEquals(0.028, m.toleranceVolts(5), 1e-12);
        assertEquals(0.070, Meter.DEFAULT.toleranceVolts(5), 1e-12);
    }

    @ParameterizedTest
    @ValueSource(strings = {"1%", "1+2", "-1%+2", "1%+x", "abc", "150%+2", "1%+2%"})
    void badAccuracyIsOneSentenceWithAnExample(String text) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Meter.DEFAULT.withAccuracy(text));
        assertTrue(e.getMessage().contains("for example 1%+2 or 0.5%+3"), e.getMessage());
        assertEquals(1, e.getMessage().lines().count());
    }

    @ParameterizedTest
    @ValueSource(strings = {"9", "4k", "-4000", "4000.5", "", "99999999999"})
    void badCountsAreOneSentenceWithAnExample(String text) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Meter.DEFAULT.withCounts(text));
        assertTrue(e.getMessage().contains("for example 4000 or 6000"), e.getMessage());
    }

    @Test
    void aWiderToleranceMergesAmbiguityGroups() {
        // derived: two entries are alike when every reading lies within twice their combined spread,
        // and the spread grows with the meter's tolerance, so a wider meter can only join more
        var stage = Templates.build(StageTemplate.LOW_SIDE_NPN);
        FaultDictionary fine = FaultDictionary.build(stage, Meter.DEFAULT);
        FaultDictionary coarse = FaultDictionary.build(stage, Meter.DEFAULT.withAccuracy("20%+50"));
        List<List<String>> a = fine.ambiguityGroups(Spread.DEFAULT);
        List<List<String>> b = coarse.ambiguityGroups(Spread.DEFAULT);
        assertTrue(b.size() < a.size(), a.size() + " groups at 1%+2, " + b.size() + " at 20%+50");
        // a pair told apart at 1 % + 2 digits and joined at 20 % + 50 digits
        boolean merged = false;
        for (FaultDictionary.Entry x : fine.entries()) {
            for (FaultDictionary.Entry y : fine.entries()) {
                if (x != y && x.solved() && y.solved() && !fine.alike(x, y, Spread.DEFAULT)
                        && coarse.alike(coarse.entries().get(fine.entries().indexOf(x)),
                                coarse.entries().get(fine.entries().indexOf(y)), Spread.DEFAULT)) {
                    merged = true;
                }
            }
        }
        assertTrue(merged);
    }
}
