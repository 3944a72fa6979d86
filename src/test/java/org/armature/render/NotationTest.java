package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class NotationTest {

    @ParameterizedTest(name = "{0} {1} reads {2}")
    @DisplayName("engineering notation, expected strings derived by hand: mantissa in [1, 1000), 3 significant figures")
    @CsvSource(delimiter = '|', textBlock = """
            1000      | Ω  | 1 kΩ
            12        | V  | 12 V
            400       | Ω  | 400 Ω
            4700      | Ω  | 4.7 kΩ
            100e-9    | F  | 100 nF
            0.0296    | A  | 29.6 mA
            999.96    | Ω  | 1 kΩ
            0.0001234 | A  | 123 µA
            0         | V  | 0 V
            -0.5      | V  | -500 mV
            2.2e6     | Ω  | 2.2 MΩ
            10        | %  | 10 %
            100       |    | 100
            """)
    void formatsWithSiPrefixAndThreeFigures(double value, String unit, String expected) {
        // expected strings derived by hand: value / 1000^k with k chosen so 1 <= mantissa < 1000, 3 sig. figures
        assertEquals(expected, Notation.format(value, unit == null ? "" : unit));
    }
}
