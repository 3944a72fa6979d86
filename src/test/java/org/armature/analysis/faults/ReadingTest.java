package org.armature.analysis.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.Test;

/** {@code NET@high=VOLTS} as the window's diagnosis panel reads it. */
class ReadingTest {

    private static final FaultDictionary D = FaultDictionary.build(Templates.build(StageTemplate.LOW_SIDE_NPN), Meter.DEFAULT);

    @Test
    void readsNetStateAndVoltsWithPrefixes() {
        assertEquals(new Reading("switch", true, 11.9), Reading.parse(D, " switch@high=11.9 "));
        assertEquals(new Reading("coil", false, 0.25), Reading.parse(D, "coil@low=250m"));
    }

    @Test
    void badInputIsOneSentenceSayingWhatIsValid() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> Reading.parse(D, "nowhere@high=1"))
                .getMessage().contains("valid: "));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> Reading.parse(D, "switch@up=1"))
                .getMessage().contains("high or low"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> Reading.parse(D, "switch@high=lots"))
                .getMessage().contains("number of volts"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> Reading.parse(D, "switch=1"))
                .getMessage().contains("NET@high=VOLTS"));
    }
}
