package org.armature.analysis.faults;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.FaultHunt;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.Test;

class SavedHuntTest {

    @Test
    void aSavedHuntRanksLikeTheSameInputsGivenByHand() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN);
        FaultDictionary d = FaultDictionary.build(stage, Meter.DEFAULT);
        // Readings taken from the healthy entry itself: whatever the stage gives at its switch node.
        int sw = d.probeIndex(d.probes().get(0).name());
        double high = d.entries().get(0).high().volts()[sw];
        String net = d.probes().get(0).name();
        FaultHunt hunt = FaultHunt.start(0)
                .withSymptom(Optional.of("no-operate"))
                .withReadings(List.of(new FaultHunt.HuntReading(net, true, high)))
                .withPriorWeights(Map.of("none", 1.0));
        SavedHunt.Ranked saved = SavedHunt.rank(stage, hunt);
        Diagnosis.Result byHand = Diagnosis.rank(d, Spread.DEFAULT, new Priors(Priors.DEFAULT.kindWeights(), 1.0),
                Optional.of(Symptom.NO_OPERATE), List.of(new Reading(net, true, high)));
        assertEquals(byHand.candidates().size(), saved.result().candidates().size());
        for (int i = 0; i < byHand.candidates().size(); i++) {
            assertEquals(byHand.candidates().get(i).name(), saved.result().candidates().get(i).name());
            assertEquals(byHand.candidates().get(i).probability(), saved.result().candidates().get(i).probability(), 1e-12);
        }
    }

    @Test
    void badWordsAreOneSentenceNamingWhatIsValid() {
        Stage stage = Templates.build(StageTemplate.LOW_SIDE_NPN);
        IllegalArgumentException kind = assertThrows(IllegalArgumentException.class,
                () -> SavedHunt.rank(stage, FaultHunt.start(0).withPriorWeights(Map.of("melted", 2.0))));
        assertTrue(kind.getMessage().contains("ce-short"), kind.getMessage());
        IllegalArgumentException symptom = assertThrows(IllegalArgumentException.class,
                () -> SavedHunt.rank(stage, FaultHunt.start(0).withSymptom(Optional.of("smoke"))));
        assertTrue(symptom.getMessage().contains("no-operate"), symptom.getMessage());
        IllegalArgumentException net = assertThrows(IllegalArgumentException.class, () -> SavedHunt.rank(stage,
                FaultHunt.start(0).withReadings(List.of(new FaultHunt.HuntReading("nowhere", true, 1)))));
        assertTrue(net.getMessage().contains("valid:"), net.getMessage());
    }

    @Test
    void meterSettingRoundTrips() {
        Meter m = new Meter(1e6, 6000, 0.5, 3);
        assertEquals(m, SavedHunt.meter(SavedHunt.setting(m)));
    }
}
