package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.armature.model.StageDocument;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/** Each way a stage file can be wrong gives its own key and one sentence naming the place. */
class StageJsonErrorTest {

    private static final ObjectMapper JSON = new ObjectMapper();

    /** A valid file of the default stage, edited by {@code change}. */
    private static String edited(Consumer<ObjectNode> change) {
        try {
            ObjectNode root = (ObjectNode) JSON.readTree(StageJson.write(StageDocument.of(Templates.defaultStage())));
            change.accept(root);
            return JSON.writeValueAsString(root);
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    private static ObjectNode stage0(ObjectNode root) {
        return (ObjectNode) root.get("stages").get(0);
    }

    private static ObjectNode part(ObjectNode root, int i) {
        return (ObjectNode) stage0(root).get("parts").get(i);
    }

    static Stream<Arguments> brokenFiles() {
        return Stream.of(
                Arguments.of("top level is a list", "[1, 2]", StageFileException.WRONG_TYPE, "top level"),
                Arguments.of("no format", edited(r -> r.remove("format")), StageFileException.UNKNOWN_FORMAT,
                        "no \"format\""),
                Arguments.of("other format", edited(r -> r.put("format", "circuit")),
                        StageFileException.UNKNOWN_FORMAT, "not an Armature stage file"),
                Arguments.of("newer version", edited(r -> r.put("version", 5)), StageFileException.NEWER_VERSION,
                        "newer Armature (stage file version 5)"),
                Arguments.of("version as text", edited(r -> r.put("version", "1")),
                        StageFileException.UNKNOWN_VERSION, "\"version\" is \"1\""),
                Arguments.of("version zero", edited(r -> r.put("version", 0)), StageFileException.UNKNOWN_VERSION,
                        "reads versions 1 to 4"),
                Arguments.of("version 1.5", edited(r -> r.put("version", 1.5)), StageFileException.UNKNOWN_VERSION,
                        "1.5"),
                Arguments.of("no version", edited(r -> r.remove("version")), StageFileException.MISSING_FIELD,
                        "no \"version\""),
                Arguments.of("no stages", edited(r -> r.remove("stages")), StageFileException.MISSING_FIELD,
                        "has no \"stages\""),
                Arguments.of("empty stages", edited(r -> r.putArray("stages")), StageFileException.INVALID_VALUE,
                        "at least one stage"),
                Arguments.of("stages not a list", edited(r -> r.put("stages", "x")), StageFileException.WRONG_TYPE,
                        "stages must be a list"),
                Arguments.of("misspelt top field", edited(r -> r.put("titel", "x")), StageFileException.UNKNOWN_FIELD,
                        "\"titel\""),
                Arguments.of("stage without name", edited(r -> stage0(r).remove("name")),
                        StageFileException.MISSING_FIELD, "stages[0] has no \"name\""),
                Arguments.of("stage without parts", edited(r -> stage0(r).remove("parts")),
                        StageFileException.MISSING_FIELD, "stages[0] has no \"parts\""),
                Arguments.of("name is a number", edited(r -> stage0(r).put("name", 5)), StageFileException.WRONG_TYPE,
                        "stages[0].name must be text, not the number 5"),
                Arguments.of("part without kind", edited(r -> part(r, 0).remove("kind")),
                        StageFileException.MISSING_FIELD, "stages[0].parts[0] (V1) has no \"kind\""),
                Arguments.of("part without ref", edited(r -> part(r, 0).remove("ref")),
                        StageFileException.MISSING_FIELD, "stages[0].parts[0] has no \"ref\""),
                Arguments.of("part without at", edited(r -> part(r, 1).remove("at")), StageFileException.MISSING_FIELD,
                        "(K1) has no \"at\""),
                Arguments.of("unknown kind", edited(r -> part(r, 1).put("kind", "triac")),
                        StageFileException.UNKNOWN_KIND, "kind \"triac\", which is not a part kind"),
                Arguments.of("upper-case kind", edited(r -> part(r, 1).put("kind", "RELAY")),
                        StageFileException.UNKNOWN_KIND, "\"RELAY\""),
                Arguments.of("value as text", edited(r -> ((ObjectNode) part(r, 1).get("values"))
                        .put("coilResistanceOhms", "400R")), StageFileException.WRONG_TYPE,
                        "(K1).values.coilResistanceOhms must be a number"),
                Arguments.of("option as number", edited(r -> part(r, 1).putObject("options").put("mode", 3)),
                        StageFileException.WRONG_TYPE, "(K1).options.mode must be text"),
                Arguments.of("at with one number", edited(r -> part(r, 1).putArray("at").add(3)),
                        StageFileException.WRONG_TYPE, "(K1).at must be two whole numbers"),
                Arguments.of("at with fractions", edited(r -> part(r, 1).putArray("at").add(3.5).add(1)),
                        StageFileException.WRONG_TYPE, "[x, y]"),
                Arguments.of("rotation as text", edited(r -> part(r, 1).put("rotation", "90")),
                        StageFileException.WRONG_TYPE, "rotation must be a whole number"),
                Arguments.of("rotation 45", edited(r -> part(r, 1).put("rotation", 45)),
                        StageFileException.INVALID_VALUE, "0, 90, 180 or 270"),
                Arguments.of("mirrored as text", edited(r -> part(r, 1).put("mirrored", "yes")),
                        StageFileException.WRONG_TYPE, "mirrored must be true or false"),
                Arguments.of("misspelt part field", edited(r -> part(r, 1).put("mirorred", true)),
                        StageFileException.UNKNOWN_FIELD, "(K1) has a field \"mirorred\""),
                Arguments.of("values a list", edited(r -> part(r, 1).putArray("values")), StageFileException.WRONG_TYPE,
                        "(K1).values must be an object"),
                Arguments.of("diagonal wire", edited(r -> ((ArrayNode) stage0(r).get("wires")).set(0,
                        JSON.createArrayNode().add(0).add(0).add(2).add(3))), StageFileException.INVALID_VALUE,
                        "stages[0].wires[0] runs diagonally"),
                Arguments.of("wire of three numbers", edited(r -> ((ArrayNode) stage0(r).get("wires")).set(0,
                        JSON.createArrayNode().add(0).add(0).add(2))), StageFileException.WRONG_TYPE,
                        "stages[0].wires[0] must be four whole numbers"),
                Arguments.of("test point without pin", edited(r -> ((ObjectNode) stage0(r).get("testPoints").get(0))
                        .remove("pin")), StageFileException.MISSING_FIELD, "stages[0].testPoints[0] has no \"pin\""),
                Arguments.of("bad net name", edited(r -> ((ObjectNode) stage0(r).get("testPoints").get(0))
                        .put("net", "1st")), StageFileException.INVALID_VALUE, "starts with a letter"),
                Arguments.of("pin state on", edited(r -> ((ObjectNode) stage0(r).get("conditions"))
                        .put("pinState", "on")), StageFileException.INVALID_VALUE, "\"high\" or \"low\""),
                Arguments.of("ambient range reversed", edited(r -> ((ObjectNode) stage0(r).get("conditions"))
                        .put("ambientMinCelsius", 70)), StageFileException.INVALID_VALUE, "must not exceed"),
                Arguments.of("ambient below absolute zero", edited(r -> ((ObjectNode) stage0(r).get("conditions"))
                        .put("ambientCelsius", -300)), StageFileException.INVALID_VALUE, "absolute zero"),
                Arguments.of("ambient as text", edited(r -> ((ObjectNode) stage0(r).get("conditions"))
                        .put("ambientCelsius", "warm")), StageFileException.WRONG_TYPE,
                        "stages[0].conditions.ambientCelsius must be a number"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenFiles")
    @DisplayName("structural problems: one key and one sentence naming where")
    void structuralProblems(String what, String text, String key, String fragment) {
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(text));
        assertEquals(key, e.key(), e.getMessage());
        assertTrue(e.getMessage().contains(fragment), e.getMessage());
        assertOneSentence(e.getMessage());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', textBlock = """
            # column: derived, the quote after two spaces of indent is the third character (1-based)
            missing comma      | {"format": "armature-stage"\\n  "version": 1}          | line 2, column 3
            unclosed object    | {"format": "armature-stage",\\n"version": 1            | line 2
            duplicate key      | {"version": 1,\\n "version": 1}                         | line 2
            trailing content   | {"format": "armature-stage"} x                          | line 1
            bare word          | {"format": armature}                                    | line 1, column 12
            """)
    @DisplayName("malformed JSON gives json.malformed with line and column")
    void malformedJson(String what, String text, String where) {
        String json = text.replace("\\n", "\n");
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(json));
        assertEquals(StageFileException.MALFORMED_JSON, e.key());
        assertTrue(e.getMessage().contains(where), e.getMessage());
        assertTrue(e.getMessage().startsWith("The file is not valid JSON"), e.getMessage());
        assertOneSentence(e.getMessage());
    }

    @Test
    @DisplayName("an empty file is malformed, not a crash")
    void emptyFile() {
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse("  \n"));
        assertEquals(StageFileException.MALFORMED_JSON, e.key());
    }

    @Test
    @DisplayName("invalid UTF-8 bytes are reported as malformed with a position")
    void invalidUtf8() {
        byte[] bytes = "{\"format\": \"x\u00e9\"}".getBytes(java.nio.charset.StandardCharsets.ISO_8859_1);
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(bytes));
        assertEquals(StageFileException.MALFORMED_JSON, e.key());
        assertTrue(e.getMessage().contains("line 1"), e.getMessage());
    }

    private static void assertOneSentence(String message) {
        assertFalse(message.contains("\n"), message);
        assertFalse(message.contains("Exception"), message);
        assertTrue(message.endsWith("."), message);
    }
}
