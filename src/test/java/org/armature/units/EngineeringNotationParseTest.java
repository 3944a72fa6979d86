package org.armature.units;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class EngineeringNotationParseTest {

    /** Values are exact decimals, so the parsed double must be the one nearest the decimal. */
    private static void assertReads(String text, Unit unit, String expectedDecimal) {
        assertEquals(Double.parseDouble(expectedDecimal), EngineeringNotation.parse(text, unit),
                0.0, text);
    }

    @ParameterizedTest(name = "{0} as {1} -> {2}")
    @DisplayName("reproduction: the trade's unit-letter codes (3V3 = 3.3 V, 1A5 = 1.5 A) are read; 3V3 was refused")
    @CsvSource(delimiter = '|', textBlock = """
            3V3    | VOLT    | 3.3
            1V8    | VOLT    | 1.8
            12V0   | VOLT    | 12
            V6     | VOLT    | 0.6
            -3V3   | VOLT    | -3.3
            3V3 V  | VOLT    | 3.3
            1A5    | AMPERE  | 1.5
            0W25   | WATT    | 0.25
            4H7    | HENRY   | 4.7
            2R2    | OHM     | 2.2
            4k7    | OHM     | 4700
            4n7    | FARAD   | 4.7e-9
            4u7    | HENRY   | 4.7e-6
            """)
    void readsUnitLetterCodes(String text, Unit unit, String expected) {
        // trade practice (schematic rail names 3V3, 1V8): common practice; RKM codes: IEC 60062
        assertReads(text, unit, expected);
    }

    @ParameterizedTest(name = "{0} as {1} is refused")
    @CsvSource({"3V3, OHM", "1A5, VOLT", "3V3V3, VOLT", "V, VOLT", "3VV3, VOLT"})
    void unitLetterOfAnotherUnitIsRefused(String text, Unit unit) {
        assertFalse(EngineeringNotation.tryParse(text, unit).isValid(), text);
    }

    @ParameterizedTest(name = "{0} -> {1}")
    @DisplayName("RKM: IEC 60062 letter codes (4k7 = 4700, 2R2 = 2.2, 1M0 = 1e6, 0R47 = 0.47)")
    @CsvSource(delimiter = '|', textBlock = """
            4k7   | 4700
            2R2   | 2.2
            1M0   | 1e6
            0R47  | 0.47
            R47   | 0.47
            100R  | 100
            4R    | 4
            10k   | 10000
            4K7   | 4700
            2r2   | 2.2
            1G5   | 1.5e9
            """)
    void readsLetterCodesForResistance(String text, String expected) {
        assertReads(text, Unit.OHM, expected);
    }

    @ParameterizedTest(name = "{0} -> {1}")
    @DisplayName("IEC 60062 capacitor letter codes: 4n7 = 4.7 nF, 2p2, 4µ7, 1u0")
    @CsvSource(delimiter = '|', textBlock = """
            4n7   | 4.7e-9
            2p2   | 2.2e-12
            4µ7   | 4.7e-6
            4μ7   | 4.7e-6
            1u0   | 1e-6
            100n  | 1e-7
            """)
    void readsLetterCodesForCapacitance(String text, String expected) {
        assertReads(text, Unit.FARAD, expected);
    }

    @ParameterizedTest(name = "{0} -> {2}")
    @DisplayName("SI prefixes and plain numbers (SI Brochure 2019, table 7; values derived)")
    @CsvSource(delimiter = '|', textBlock = """
            4700        | AMPERE | 4700
            1.5e-3      | AMPERE | 1.5e-3
            1.5E3       | AMPERE | 1500
            +2          | AMPERE | 2
            .5          | AMPERE | 0.5
            16.7m       | AMPERE | 16.7e-3
            16.7 mA     | AMPERE | 16.7e-3
            16.7mA      | AMPERE | 16.7e-3
            -1.2 A      | AMPERE | -1.2
            −1.2 A      | AMPERE | -1.2
            1f          | AMPERE | 1e-15
            22k         | OHM    | 22000
            4k7Ω        | OHM    | 4700
            4k7 Ω       | OHM    | 4700
            4.7 kΩ      | OHM    | 4700
            4.7 kΩ      | OHM    | 4700
            470 ohms    | OHM    | 470
            2M          | OHM    | 2e6
            2m          | OHM    | 2e-3
            1T          | OHM    | 1e12
            3G          | OHM    | 3e9
            22K         | OHM    | 22000
            100n        | FARAD  | 1e-7
            4.7u        | FARAD  | 4.7e-6
            4.7µ        | FARAD  | 4.7e-6
            4.7 µF      | FARAD  | 4.7e-6
            100 pF      | FARAD  | 1e-10
            12 V        | VOLT   | 12
            12V         | VOLT   | 12
            -0.7        | VOLT   | -0.7
            5 ms        | SECOND | 5e-3
            15.9 kHz    | HERTZ  | 15900
            300 K       | KELVIN | 300
            300K        | KELVIN | 300
            3kK         | KELVIN | 3000
            0.3m        | METRE  | 0.3
            0.3 mm      | METRE  | 0.3e-3
            -40 °C      | CELSIUS| -40
            25℃         | CELSIUS| 25
            200 K/W     | KELVIN_PER_WATT | 200
            5 %         | PERCENT| 5
            100         | RATIO  | 100
            1k          | RATIO  | 1000
            1e3k        | RATIO  | 1e6
            """)
    void readsPrefixedAndPlainNumbers(String text, Unit unit, String expected) {
        assertReads(text, unit, expected);
    }

    @Test
    @DisplayName("Blanks around the text and no-break spaces are ignored")
    void ignoresBlanks() {
        assertReads("  16.7\u00A0mA \t", Unit.AMPERE, "0.0167");
        assertReads("4.7\u202FkΩ", Unit.OHM, "4700");
    }

    @Test
    @DisplayName("m is milli and M is mega (SI Brochure 2019: prefix symbols are case-sensitive)")
    void milliAndMegaDiffer() {
        assertEquals(1e-3, EngineeringNotation.parse("1m", Unit.OHM), 0.0);
        assertEquals(1e6, EngineeringNotation.parse("1M", Unit.OHM), 0.0);
    }

    @Test
    @DisplayName("The parsed double is the one nearest the decimal, not 4.7 * 1e-9 (derived)")
    void parsesCorrectlyRounded() {
        double parsed = EngineeringNotation.parse("4n7", Unit.FARAD);
        assertEquals(Double.doubleToLongBits(Double.parseDouble("4.7e-9")),
                Double.doubleToLongBits(parsed));
        assertTrue(ESeries.E12.contains(parsed));
        assertEquals(parsed, ESeries.E12.roundDown(parsed), 0.0);
    }

    @Test
    @DisplayName("Minus zero reads as plain zero, also where negatives are refused")
    void minusZeroIsZero() {
        assertEquals(0L, Double.doubleToLongBits(EngineeringNotation.parse("-0", Unit.OHM)));
        assertEquals(0L, Double.doubleToLongBits(EngineeringNotation.parse("-0.0", Unit.VOLT)));
    }

    @ParameterizedTest(name = "\"{0}\" as {1} -> {2}")
    @DisplayName("Bad input gives a stable error kind (requirements of the input fields)")
    @CsvSource(delimiter = '|', textBlock = """
            4k7k        | OHM     | MALFORMED
            abc         | OHM     | MALFORMED
            --3         | VOLT    | MALFORMED
            +-3         | VOLT    | MALFORMED
            4 k7        | OHM     | MALFORMED
            1.2.3       | VOLT    | MALFORMED
            .           | VOLT    | MALFORMED
            k           | OHM     | MALFORMED
            R           | OHM     | MALFORMED
            Ω           | OHM     | MALFORMED
            1R5k        | OHM     | MALFORMED
            1,5         | VOLT    | MALFORMED
            4 K         | RATIO   | UNIT_MISMATCH
            1x          | VOLT    | MALFORMED
            1e999       | VOLT    | OUT_OF_RANGE
            1e308G      | VOLT    | OUT_OF_RANGE
            1e-999      | VOLT    | OUT_OF_RANGE
            1e99999999999999999999 | VOLT | OUT_OF_RANGE
            NaN         | VOLT    | NOT_FINITE
            Infinity    | VOLT    | NOT_FINITE
            -inf        | VOLT    | NOT_FINITE
            ∞ V         | VOLT    | NOT_FINITE
            -4k7        | OHM     | NEGATIVE
            -1 pF       | FARAD   | NEGATIVE
            -5 ms       | SECOND  | NEGATIVE
            12 V        | AMPERE  | UNIT_MISMATCH
            4k7Ω        | VOLT    | UNIT_MISMATCH
            5 ms        | VOLT    | UNIT_MISMATCH
            300 K       | OHM     | UNIT_MISMATCH
            200 K/W     | WATT    | UNIT_MISMATCH
            200 W       | KELVIN_PER_WATT | UNIT_MISMATCH
            5 %         | RATIO   | UNIT_MISMATCH
            """)
    void rejectsBadInput(String text, Unit unit, ParseErrorKind expected) {
        UnitParseException e = assertThrows(UnitParseException.class,
                () -> EngineeringNotation.parse(text, unit));
        assertEquals(expected, e.kind());
        assertEquals(expected, e.error().kind());
        ParseResult result = EngineeringNotation.tryParse(text, unit);
        assertFalse(result.isValid());
        assertEquals(expected, result.errorIfFailed().orElseThrow().kind());
        assertTrue(result.valueIfValid().isEmpty());
    }

    @ParameterizedTest(name = "\"{0}\"")
    @DisplayName("Empty or blank text is EMPTY")
    @CsvSource(delimiter = '|', quoteCharacter = '\'', textBlock = """
            ''
            '   '
            '\t'
            """)
    void rejectsEmpty(String text) {
        assertEquals(ParseErrorKind.EMPTY, assertThrows(UnitParseException.class,
                () -> EngineeringNotation.parse(text, Unit.OHM)).kind());
    }

    @Test
    @DisplayName("The message is a sentence naming the input, the quantity and valid examples")
    void messageNamesInputAndExamples() {
        String message = assertThrows(UnitParseException.class,
                () -> EngineeringNotation.parse("4k7k", Unit.OHM)).getMessage();
        assertAll(
                () -> assertTrue(message.startsWith("Cannot read \"4k7k\" as a resistance:"), message),
                () -> assertTrue(message.contains("such as " + Unit.OHM.examples()), message),
                () -> assertTrue(message.endsWith("."), message));
    }

    @Test
    @DisplayName("Each kind's message names the input and gives examples")
    void everyKindHasExamples() {
        String[][] cases = {{"", "OHM"}, {"x", "OHM"}, {"NaN", "OHM"}, {"1e999", "OHM"},
            {"-1", "OHM"}, {"12 V", "OHM"}};
        for (String[] c : cases) {
            Unit unit = Unit.valueOf(c[1]);
            String message = EngineeringNotation.tryParse(c[0], unit).errorIfFailed()
                    .orElseThrow().message();
            assertTrue(message.contains("such as " + unit.examples() + "."), message);
            assertTrue(message.contains("resistance"), message);
            if (!c[0].isEmpty()) {
                assertTrue(message.contains("\"" + c[0] + "\""), message);
            }
        }
    }

    @Test
    @DisplayName("A unit mismatch names the unit typed; negatives name the rule")
    void specificMessages() {
        String mismatch = assertThrows(UnitParseException.class,
                () -> EngineeringNotation.parse("12 V", Unit.AMPERE)).getMessage();
        assertTrue(mismatch.contains("V is the unit of voltage"), mismatch);
        assertTrue(mismatch.contains("in A"), mismatch);
        String negative = assertThrows(UnitParseException.class,
                () -> EngineeringNotation.parse("-4k7", Unit.OHM)).getMessage();
        assertTrue(negative.contains("cannot be negative"), negative);
        String comma = assertThrows(UnitParseException.class,
                () -> EngineeringNotation.parse("1,5", Unit.VOLT)).getMessage();
        assertTrue(comma.contains("decimal separator"), comma);
    }

    @Test
    @DisplayName("A pasted page is shortened in the message")
    void longInputIsShortened() {
        String longText = "9".repeat(500) + "x";
        String message = EngineeringNotation.tryParse(longText, Unit.VOLT).errorIfFailed()
                .orElseThrow().message();
        assertTrue(message.length() < 300, message);
        assertTrue(message.contains("\u2026"), message);
    }

    @Test
    @DisplayName("The caller may refuse or allow negatives, overriding the unit's default")
    void callerChoosesSignRule() {
        assertEquals(-12.0, EngineeringNotation.parse("-12", Unit.VOLT), 0.0);
        assertEquals(ParseErrorKind.NEGATIVE, assertThrows(UnitParseException.class,
                () -> EngineeringNotation.parse("-12", Unit.VOLT, false)).kind());
        assertEquals(-5.0, EngineeringNotation.parse("-5", Unit.OHM, true), 0.0);
    }

    @Test
    @DisplayName("tryParse returns the value without exceptions")
    void tryParseGivesValue() {
        ParseResult result = EngineeringNotation.tryParse("22k", Unit.OHM);
        assertTrue(result.isValid());
        assertEquals(22000.0, result.valueIfValid().orElseThrow(), 0.0);
        assertEquals(22000.0, result.orElseThrow(), 0.0);
        assertTrue(result.errorIfFailed().isEmpty());
        assertTrue(result instanceof ParseResult.Value v && v.value() == 22000.0);
    }

    @Test
    @DisplayName("Null text or unit is a programming error, not a parse failure")
    void nullIsRefused() {
        assertThrows(NullPointerException.class, () -> EngineeringNotation.tryParse(null, Unit.OHM));
        assertThrows(NullPointerException.class, () -> EngineeringNotation.tryParse("1", null));
    }
}
