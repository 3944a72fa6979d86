package org.armature.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class EngineeringNotationFormatTest {

    @ParameterizedTest(name = "{0} {1} ({2} digits) -> {3}")
    @DisplayName("Engineering notation, mantissa in [1, 1000) (SI Brochure 2019 prefixes; derived)")
    @CsvSource(delimiter = '|', textBlock = """
            0.016666666 | AMPERE | 3 | 16.7 mA
            4700        | OHM    | 3 | 4.70 kΩ
            0.025852    | VOLT   | 3 | 25.9 mV
            0           | VOLT   | 3 | 0 V
            -0.0        | VOLT   | 3 | 0 V
            -1.2        | AMPERE | 3 | -1.20 A
            1e-7        | FARAD  | 3 | 100 nF
            999.96      | VOLT   | 3 | 1.00 kV
            999.4       | VOLT   | 3 | 999 V
            0.0009999   | AMPERE | 2 | 1.0 mA
            1           | OHM    | 1 | 1 Ω
            2.5         | OHM    | 1 | 3 Ω
            -2.5        | OHM    | 1 | -3 Ω
            470         | OHM    | 2 | 470 Ω
            1e-15       | AMPERE | 3 | 1.00 fA
            1e-14       | AMPERE | 2 | 10 fA
            1.5e12      | OHM    | 3 | 1.50 TΩ
            1e-18       | AMPERE | 3 | 1.00e-18 A
            -2.5e-20    | AMPERE | 2 | -2.5e-20 A
            1.234e15    | OHM    | 3 | 1.23e15 Ω
            1.7976931348623157e308 | VOLT | 3 | 1.80e308 V
            4.9e-324    | VOLT   | 2 | 4.9e-324 V
            25          | CELSIUS | 3 | 25.0 °C
            -40         | CELSIUS | 3 | -40.0 °C
            0.5         | PERCENT | 3 | 0.500 %
            200         | KELVIN_PER_WATT | 3 | 200 K/W
            100         | RATIO  | 3 | 100
            0.001       | RATIO  | 3 | 0.00100
            123456      | RATIO  | 3 | 123000
            1234567     | RATIO  | 3 | 1.23e6
            0.00012     | RATIO  | 2 | 1.2e-4
            0.0167      | WATT   | 3 | 16.7 mW
            """)
    void formatsWithUnit(double value, Unit unit, int digits, String expected) {
        assertEquals(expected, EngineeringNotation.format(value, unit, digits));
    }

    @ParameterizedTest(name = "{0} \"{1}\" -> {3}")
    @DisplayName("Any symbol, always prefixed; an empty symbol gives a bare prefix")
    @CsvSource(delimiter = '|', textBlock = """
            0.0167 | A   | 3 | 16.7 mA
            0.0167 | ''  | 3 | 16.7m
            4700   | ''  | 2 | 4.7k
            12     | ''  | 3 | 12.0
            0      | ''  | 3 | 0
            160    | A/s | 3 | 160 A/s
            """)
    void formatsWithAnySymbol(double value, String symbol, int digits, String expected) {
        assertEquals(expected, EngineeringNotation.format(value, symbol, digits));
    }

    @Test
    @DisplayName("Default of three significant digits")
    void defaultDigits() {
        assertEquals("4.70 kΩ", EngineeringNotation.format(4700, Unit.OHM));
    }

    @ParameterizedTest
    @DisplayName("Non-finite values print as a placeholder, never NaN or Infinity")
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void nonFiniteIsPlaceholder(double value) {
        assertEquals(EngineeringNotation.NOT_A_NUMBER_TEXT,
                EngineeringNotation.format(value, Unit.VOLT, 3));
        assertEquals(EngineeringNotation.NOT_A_NUMBER_TEXT,
                EngineeringNotation.format(value, "V", 3));
        assertEquals(EngineeringNotation.NOT_A_NUMBER_TEXT,
                EngineeringNotation.formatLetterCode(value));
        assertFalse(EngineeringNotation.NOT_A_NUMBER_TEXT.contains("NaN"));
    }

    @ParameterizedTest(name = "{0} -> {1}")
    @DisplayName("RKM: IEC 60062 letter codes (4k7, 2R2, 1M0, 0R47) and more of the same rule")
    @CsvSource(delimiter = '|', textBlock = """
            4700      | 4k7
            2.2       | 2R2
            1e6       | 1M0
            0.47      | 0R47
            100       | 100R
            47        | 47R
            1         | 1R0
            1000      | 1k0
            10000     | 10k
            22000     | 22k
            220000    | 220k
            4990      | 4k99
            4991      | 4k99
            0.047     | 0R047
            0.0047    | 4m7
            4.7e-9    | 4n7
            1e-7      | 100n
            1e-6      | 1µ0
            2.2e-12   | 2p2
            1.5e9     | 1G5
            1e12      | 1T0
            -4700     | -4k7
            0         | 0R
            999.6     | 1k0
            1e15      | 1.00e15
            1e-16     | 1.00e-16
            """)
    void formatsLetterCodes(double value, String expected) {
        assertEquals(expected, EngineeringNotation.formatLetterCode(value));
    }

    @Test
    @DisplayName("Letter codes with more digits keep only the significant ones")
    void letterCodeDigits() {
        assertEquals("4k75", EngineeringNotation.formatLetterCode(4750, 4));
        assertEquals("5k0", EngineeringNotation.formatLetterCode(4750, 1));
        assertEquals("12k34", EngineeringNotation.formatLetterCode(12340, 5));
    }

    @ParameterizedTest
    @DisplayName("Significant digits outside 1 to 17 are refused")
    @ValueSource(ints = {0, -1, 18})
    void refusesBadDigits(int digits) {
        assertThrows(IllegalArgumentException.class,
                () -> EngineeringNotation.format(1, Unit.VOLT, digits));
        assertThrows(IllegalArgumentException.class,
                () -> EngineeringNotation.formatLetterCode(1, digits));
    }
}
