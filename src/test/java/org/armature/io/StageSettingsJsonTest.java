package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageSettings;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The stage settings of format version 2: written only when set, read back equal, older files open. */
class StageSettingsJsonTest {

    @Test
    @DisplayName("settings round-trip and raise the written version to 2")
    void roundTrip() {
        Stage s = Templates.defaultStage().withSettings(new StageSettings(OptionalDouble.of(0.012), 500, 42));
        String text = StageJson.write(StageDocument.of(s));
        assertTrue(text.contains("\"version\": 2,"), text);
        assertTrue(text.contains("\"settings\": {\"releaseTimeSeconds\": 0.012, \"monteCarloSamples\": 500, "
                + "\"monteCarloSeed\": 42},"), text);
        assertEquals(StageDocument.of(s), StageJson.parse(text));
    }

    @Test
    @DisplayName("a document without settings is still written as version 1, with no settings field")
    void defaultsWriteVersionOne() {
        String text = StageJson.write(StageDocument.of(Templates.defaultStage()));
        assertTrue(text.contains("\"version\": 1,"));
        assertFalse(text.contains("\"settings\""));
        assertEquals(StageSettings.DEFAULT, StageJson.parse(text).first().settings());
    }

    @Test
    @DisplayName("a negative sample count is refused with the field's path")
    void badSamples() {
        String text = StageJson.write(StageDocument.of(Templates.defaultStage()
                .withSettings(new StageSettings(OptionalDouble.empty(), 3, 1)))).replace("\"monteCarloSamples\": 3", "\"monteCarloSamples\": -3");
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(text));
        assertEquals(StageFileException.INVALID_VALUE, e.key());
        assertTrue(e.getMessage().startsWith("stages[0].settings.monteCarloSamples"), e.getMessage());
    }
}
