package org.armature.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Property: printing then reading gives the value back within the printed precision, for values
 * spread over the whole double range. Bound (derived): rounding to s significant digits moves a
 * value by at most half a unit in the last printed place, 0.5·10^(1−s)·|v|; reading is correctly
 * rounded, which adds at most one ulp, covered by the relative slack.
 */
class EngineeringNotationRoundTripTest {

    private static final long SEED = 20240611L;
    private static final int CASES = 400;
    private static final double RELATIVE_SLACK = 1e-15;

    static Stream<Arguments> randomValues() {
        Random random = new Random(SEED);
        Unit[] units = Unit.values();
        return Stream.generate(() -> {
            // Mostly the range of real parts (1e-18 .. 1e15), sometimes anywhere in the doubles.
            double exponent = random.nextInt(10) == 0
                    ? -320 + 628 * random.nextDouble()
                    : -18 + 33 * random.nextDouble();
            double magnitude = Math.pow(10, exponent);
            Unit unit = units[random.nextInt(units.length)];
            double value = unit.negativesAllowed() && random.nextBoolean() ? -magnitude : magnitude;
            int digits = 1 + random.nextInt(EngineeringNotation.MAX_SIGNIFICANT_DIGITS);
            return Arguments.of(value, unit, digits);
        }).limit(CASES);
    }

    private static double allowedError(double value, int digits) {
        return Math.abs(value) * (0.5 * Math.pow(10, 1 - digits) + RELATIVE_SLACK);
    }

    @ParameterizedTest(name = "[{index}] {0} {1} {2} digits")
    @MethodSource("randomValues")
    @DisplayName("format then parse returns the value within the printed precision (derived)")
    void formatThenParse(double value, Unit unit, int digits) {
        String text = EngineeringNotation.format(value, unit, digits);
        double back = EngineeringNotation.parse(text, unit);
        assertEquals(value, back, allowedError(value, digits), text);
        assertEquals(text, EngineeringNotation.format(back, unit, digits), "printing is stable");
    }

    @ParameterizedTest(name = "[{index}] {0} {2} digits")
    @MethodSource("randomValues")
    @DisplayName("formatLetterCode then parse returns the value within the printed precision (derived)")
    void letterCodeThenParse(double value, Unit unit, int digits) {
        String code = EngineeringNotation.formatLetterCode(value, digits);
        double back = EngineeringNotation.parse(code, Unit.RATIO);
        assertEquals(value, back, allowedError(value, digits), code);
        assertTrue(code.length() <= digits + 8, code);
    }

    @ParameterizedTest(name = "[{index}] {0} {2} digits")
    @MethodSource("randomValues")
    @DisplayName("format with a bare symbol then parse returns the value (derived)")
    void bareSymbolThenParse(double value, Unit unit, int digits) {
        String text = EngineeringNotation.format(value, "", digits);
        assertEquals(value, EngineeringNotation.parse(text, Unit.RATIO),
                allowedError(value, digits), text);
    }
}
