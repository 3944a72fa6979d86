package org.armature.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class FaultHuntTest {

    private static Stage stage() {
        return Templates.build(StageTemplate.LOW_SIDE_NPN);
    }

    @Test
    void startIsEmptyWithTheHandheldMeter() {
        FaultHunt h = FaultHunt.start(0);
        assertTrue(h.readings().isEmpty());
        assertTrue(h.symptom().isEmpty());
        // 10 MΩ input, 4,000 counts, ±(1 % + 2 digits): common practice for a handheld meter.
        assertEquals(10e6, h.meter().inputOhms());
        assertEquals(4000, h.meter().counts());
        assertEquals(1.0, h.meter().percentOfReading());
        assertEquals(2.0, h.meter().digits());
    }

    @Test
    void copiesKeepTheOtherFields() {
        FaultHunt h = FaultHunt.start(1)
                .withSymptom(Optional.of("no-operate"))
                .withReadings(List.of(new FaultHunt.HuntReading("switch", true, 11.9)))
                .withPriorWeights(Map.of("open", 3.0));
        FaultHunt moved = h.onStage(0);
        assertEquals(0, moved.stageIndex());
        assertEquals(Optional.of("no-operate"), moved.symptom());
        assertEquals(11.9, moved.readings().get(0).volts());
        assertEquals(3.0, moved.priorWeights().get("open"));
    }

    @Test
    void refusesWhatCannotBeMeasured() {
        assertThrows(IllegalArgumentException.class, () -> new FaultHunt.HuntReading("switch", true, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> new FaultHunt.HuntReading(" ", true, 1));
        assertThrows(IllegalArgumentException.class, () -> new FaultHunt.MeterSetting(0, 4000, 1, 2));
        assertThrows(IllegalArgumentException.class, () -> new FaultHunt.MeterSetting(10e6, 5, 1, 2));
        assertThrows(IllegalArgumentException.class, () -> FaultHunt.start(0).withPriorWeights(Map.of("open", -1.0)));
    }

    @Test
    void theDocumentRefusesAHuntOnAMissingStage() {
        Stage s = stage();
        StageDocument doc = StageDocument.of(s);
        assertThrows(IllegalArgumentException.class, () -> doc.withFaultHunt(Optional.of(FaultHunt.start(1))));
        StageDocument withHunt = doc.withFaultHunt(Optional.of(FaultHunt.start(0)));
        assertEquals(0, withHunt.plus(s).faultHunt().orElseThrow().stageIndex());
    }
}
