package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.armature.model.FaultHunt;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The fault hunt of a stage file (format version 4): written, read back, bad fields named. */
class FaultHuntJsonTest {

    /**
     * A document of two stages with a hunt on the second: a symptom, a meter other than the default,
     * three readings in both pin states (one of them negative and one fractional in binary) and two
     * changed priors. The figures are made up for the test; nothing is computed from them here.
     */
    static StageDocument huntDocument() {
        Stage npn = Templates.build(StageTemplate.LOW_SIDE_NPN);
        Stage nmos = Templates.build(StageTemplate.LOW_SIDE_NMOS);
        Map<String, Double> weights = new LinkedHashMap<>();
        weights.put("ds-short", 4.0);
        weights.put(FaultHunt.NONE, 0.5);
        FaultHunt hunt = FaultHunt.start(1)
                .withSymptom(Optional.of("no-release"))
                .withMeter(new FaultHunt.MeterSetting(1e6, 6000, 0.5, 3))
                .withReadings(List.of(new FaultHunt.HuntReading("switch", false, 0.013),
                        new FaultHunt.HuntReading("coil", false, 11.87),
                        new FaultHunt.HuntReading("control", true, -0.1)))
                .withPriorWeights(weights);
        return new StageDocument("Hunted", List.of(npn, nmos)).withFaultHunt(Optional.of(hunt));
    }

    @Test
    @DisplayName("a fault hunt survives save and reopen exactly, as version 4, byte for byte")
    void roundTrip() {
        StageDocument doc = huntDocument();
        String text = StageJson.write(doc);
        assertTrue(text.contains("\"version\": 4,"), text);
        assertTrue(text.contains("\"faultHunt\": {"), text);
        assertTrue(text.contains("{\"net\": \"coil\", \"pinState\": \"low\", \"volts\": 11.87}"), text);
        StageDocument back = StageJson.parse(text);
        assertEquals(doc, back);
        assertEquals(doc.faultHunt(), back.faultHunt());
        assertEquals(text, StageJson.write(back), "writing the reopened document gives the same text");
    }

    @Test
    @DisplayName("a hunt with a line-up: both blocks, version 4, round trip")
    void huntAndLineUp() {
        StageDocument hunt = huntDocument();
        LineUp l = new LineUp(List.of(0, 1), LineUpContext.of(hunt.first()));
        StageDocument doc = hunt.withLineUp(Optional.of(l));
        String text = StageJson.write(doc);
        assertTrue(text.contains("\"version\": 4,"), text);
        assertEquals(doc, StageJson.parse(text));
    }

    @Test
    @DisplayName("an empty hunt (no symptom, no readings, default meter and priors) round-trips")
    void emptyHunt() {
        StageDocument doc = StageDocument.of(Templates.build(StageTemplate.DARLINGTON_CHANNEL))
                .withFaultHunt(Optional.of(FaultHunt.start(0)));
        String text = StageJson.write(doc);
        assertFalse(text.contains("\"symptom\""), text);
        assertEquals(doc, StageJson.parse(text));
    }

    @Test
    @DisplayName("a document without a hunt keeps its older version (1, 2 or 3)")
    void noHuntNoNewVersion() {
        StageDocument doc = huntDocument().withFaultHunt(Optional.empty());
        String text = StageJson.write(doc);
        assertTrue(text.contains("\"version\": 1,"), text);
        assertEquals(Optional.empty(), StageJson.parse(text).faultHunt());
    }

    @Test
    @DisplayName("a hunt block left without its meter, readings and priors takes the defaults")
    void defaults() {
        String text = StageJson.write(huntDocument());
        int from = text.indexOf("\"faultHunt\"");
        String minimal = text.substring(0, from) + "\"faultHunt\": {\"stage\": 0}\n}\n";
        FaultHunt h = StageJson.parse(minimal).faultHunt().orElseThrow();
        assertEquals(FaultHunt.start(0), h);
    }

    @Test
    @DisplayName("a hunt in a file of version 3 is refused as a field that version does not hold")
    void huntInOlderVersion() {
        String text = StageJson.write(huntDocument()).replace("\"version\": 4,", "\"version\": 3,");
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(text));
        assertEquals(StageFileException.UNKNOWN_FIELD, e.key());
        assertTrue(e.getMessage().contains("from version 4"), e.getMessage());
    }

    /**
     * One bad field at a time: the file is refused (nothing is read, nothing is changed on disk)
     * with its key and one sentence naming the field's path and what was expected.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '`', textBlock = """
            unknown symptom word     | "symptom": "no-release"          | "symptom": "smoke"              | field.invalid    | faultHunt.symptom is "smoke"; expected one of no-operate, no-release, chatter.
            symptom not text         | "symptom": "no-release"          | "symptom": 3                    | field.wrong-type | faultHunt.symptom must be text
            negative meter counts    | "counts": 6000                   | "counts": -6000                 | field.invalid    | faultHunt.meter.counts must be a whole number of display counts, at least 10
            fractional meter counts  | "counts": 6000                   | "counts": 6000.5                | field.wrong-type | faultHunt.meter.counts must be a whole number
            zero input resistance    | "inputOhms": 1000000             | "inputOhms": 0                  | field.invalid    | faultHunt.meter.inputOhms must be a positive, finite resistance in ohms
            negative accuracy        | "percentOfReading": 0.5          | "percentOfReading": -1          | field.invalid    | faultHunt.meter.percentOfReading must be a finite number not below 0
            infinite digits          | "digits": 3                      | "digits": "Infinity"            | field.invalid    | faultHunt.meter.digits must be a finite number not below 0
            non-finite volts         | "volts": 11.87                   | "volts": "NaN"                  | field.invalid    | faultHunt.readings[1].volts must be a finite number of volts
            volts as text            | "volts": 11.87                   | "volts": "11V87"                | field.wrong-type | faultHunt.readings[1].volts must be a number
            pin state                | "pinState": "low", "volts": 11.87 | "pinState": "on", "volts": 11.87 | field.invalid   | faultHunt.readings[1].pinState is "on"; it must be "high" or "low".
            blank net                | "net": "coil"                    | "net": " "                      | field.invalid    | faultHunt.readings[1].net is blank
            reading without volts    | , "volts": 11.87                 | ``                              | field.missing    | faultHunt.readings[1] has no "volts".
            stage that does not exist | "stage": 1                      | "stage": 2                      | field.invalid    | faultHunt.stage is 2; expected the index of one of the file's 2 stages, from 0 to 1.
            negative stage           | "stage": 1                       | "stage": -1                     | field.invalid    | faultHunt.stage is -1
            unknown prior kind       | "ds-short": 4                    | "melted": 4                     | field.invalid    | faultHunt.priorWeights weighs "melted", which is not a fault kind; expected none (the healthy stage) or one of open, short,
            negative prior weight    | "ds-short": 4                    | "ds-short": -4                  | field.invalid    | faultHunt.priorWeights.ds-short must be a finite weight not below 0
            misspelt hunt field      | "readings": [                    | "reading": [                    | field.unknown    | faultHunt has a field "reading" that stage files do not define
            """)
    void badFieldIsOneSentenceNamingIt(String label, String find, String replace, String key, String message) {
        String text = StageJson.write(huntDocument());
        assertTrue(text.contains(find), label + ": the test's text to change is in the file");
        String bad = text.replaceFirst(java.util.regex.Pattern.quote(find),
                java.util.regex.Matcher.quoteReplacement(replace));
        StageFileException e = assertThrows(StageFileException.class, () -> StageJson.parse(bad));
        assertEquals(key, e.key(), e.getMessage());
        assertTrue(e.getMessage().startsWith(message), e.getMessage());
        assertFalse(e.getMessage().contains("\n"), "one line: " + e.getMessage());
        assertTrue(e.getMessage().endsWith("."), "one sentence: " + e.getMessage());
    }

    @Test
    @DisplayName("a reading's net is kept as written: names follow the drawing and are checked where the hunt is ranked")
    void netNamesAreKeptAsWritten() {
        String text = StageJson.write(huntDocument()).replace("\"net\": \"control\"", "\"net\": \"R9-b\"");
        FaultHunt h = StageJson.parse(text).faultHunt().orElseThrow();
        assertEquals("R9-b", h.readings().get(2).net());
    }
}
