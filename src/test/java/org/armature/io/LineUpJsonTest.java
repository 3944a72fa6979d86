package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Optional;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.ParamKeys;
import org.armature.model.SharedPart;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.Test;

/** The line-up of a stage file (format version 3): written, read back, older files unchanged. */
class LineUpJsonTest {

    private static StageDocument lineUpDocument() {
        Stage npn = Templates.build(StageTemplate.LOW_SIDE_NPN);
        Stage nmos = Templates.build(StageTemplate.LOW_SIDE_NMOS);
        LineUpContext context = LineUpContext.of(npn);
        SharedPart supply = context.coilSupply().orElseThrow().with(ParamKeys.TOLERANCE_PERCENT, 7.5);
        LineUp lineUp = new LineUp(List.of(1, 0), context.withCoilSupply(supply).withAmbient(30, -5, 55));
        return new StageDocument("Two drivers", List.of(npn, nmos), Optional.of(lineUp));
    }

    @Test
    void lineUpSurvivesSaveAndReopenExactly() {
        StageDocument doc = lineUpDocument();
        String text = StageJson.write(doc);
        assertTrue(text.contains("\"version\": 3,"), text);
        assertTrue(text.contains("\"lineUp\": {"), text);
        StageDocument back = StageJson.parse(text);
        assertEquals(doc, back);
        assertEquals(text, StageJson.write(back), "writing the reopened document gives the same text");
    }

    @Test
    void documentWithoutLineUpKeepsItsOlderVersion() {
        StageDocument doc = new StageDocument("One", List.of(Templates.build(StageTemplate.LOW_SIDE_NPN)));
        String text = StageJson.write(doc);
        assertTrue(text.contains("\"version\": 1,"), text);
        assertEquals(Optional.empty(), StageJson.parse(text).lineUp());
    }

    @Test
    void olderFilesStillOpen() throws java.io.IOException {
        // these examples are written as version 1, before line-ups
        for (String name : List.of("pool-pump-timer", "dust-extractor-interlock")) {
            java.nio.file.Path file = java.nio.file.Path.of("examples", name + ".stage.json");
            assertTrue(java.nio.file.Files.readString(file).contains("\"version\": 1,"), name);
            StageDocument doc = StageFiles.open(file);
            assertEquals(Optional.empty(), doc.lineUp(), name);
        }
        // and the greenhouse example holds its three channels' line-up (version 3)
        StageDocument greenhouse = StageFiles.open(java.nio.file.Path.of("examples", "greenhouse-valves.stage.json"));
        assertEquals(List.of(0, 1, 2), greenhouse.lineUp().orElseThrow().stageIndices());
    }

    @Test
    void lineUpInAVersionTwoFileIsRefused() {
        String text = StageJson.write(lineUpDocument()).replace("\"version\": 3,", "\"version\": 2,");
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(text));
        assertEquals(StageFileException.UNKNOWN_FIELD, e.key());
    }

    @Test
    void lineUpNamingAMissingStageIsRefusedWithItsPath() {
        String text = StageJson.write(lineUpDocument()).replace("\"stages\": [1, 0]", "\"stages\": [1, 5]");
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(text));
        assertEquals(StageFileException.INVALID_VALUE, e.key());
        assertTrue(e.getMessage().startsWith("lineUp.stages[1] is 5;"), e.getMessage());
    }

    @Test
    void sharedRoleOfTheWrongKindIsRefused() {
        String text = StageJson.write(lineUpDocument()).replace("\"coilSupply\": {\"kind\": \"supply\"",
                "\"coilSupply\": {\"kind\": \"relay\"");
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(text));
        assertEquals(StageFileException.INVALID_VALUE, e.key());
        assertTrue(e.getMessage().contains("lineUp.context.coilSupply"), e.getMessage());
    }

    @Test
    void oneStageLineUpIsRefused() {
        String text = StageJson.write(lineUpDocument()).replace("\"stages\": [1, 0]", "\"stages\": [1]");
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(text));
        assertEquals(StageFileException.INVALID_VALUE, e.key());
    }
}
