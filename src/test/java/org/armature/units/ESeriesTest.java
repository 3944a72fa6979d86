package org.armature.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.EnumSource;
import org.junit.jupiter.params.provider.MethodSource;
import org.junit.jupiter.params.provider.ValueSource;

class ESeriesTest {

    private static List<Integer> ints(String spaced) {
        return Stream.of(spaced.trim().split("\\s+")).map(Integer::valueOf)
                .collect(Collectors.toList());
    }

    /** round(scale·10^(i/n)), the rounded geometric series. */
    private static List<Integer> geometric(int n, int scale) {
        return IntStream.range(0, n).mapToObj(i -> (int) Math.round(scale * Math.pow(10, i / (double) n)))
                .collect(Collectors.toList());
    }

    @Test
    @DisplayName("PV-1: E6, E12, E24 decades (IEC 60063)")
    void shortSeriesMatchPublishedDecades() {
        assertEquals(ints("10 15 22 33 47 68"), ESeries.E6.mantissas());
        assertEquals(ints("10 12 15 18 22 27 33 39 47 56 68 82"), ESeries.E12.mantissas());
        List<Integer> e24 = new ArrayList<>(ESeries.E12.mantissas());
        e24.addAll(ints("11 13 16 20 24 30 36 43 51 62 75 91"));
        e24.sort(null);
        assertEquals(e24, ESeries.E24.mantissas());
    }

    @Test
    @DisplayName("PV-2: E24 is not the rounded geometric series (IEC 60063; derived)")
    void e24DepartsFromFormulaInEightPlaces() {
        List<Integer> formula = geometric(24, 10);
        List<Integer> stored = ESeries.E24.mantissas();
        List<Integer> formulaWhereDifferent = new ArrayList<>();
        List<Integer> storedWhereDifferent = new ArrayList<>();
        for (int i = 0; i < 24; i++) {
            if (!formula.get(i).equals(stored.get(i))) {
                formulaWhereDifferent.add(formula.get(i));
                storedWhereDifferent.add(stored.get(i));
            }
        }
        assertEquals(ints("26 29 32 35 38 42 46 83"), formulaWhereDifferent);
        assertEquals(ints("27 30 33 36 39 43 47 82"), storedWhereDifferent);
    }

    @ParameterizedTest
    @DisplayName("PV-3: E96 and E48 equal round(100·10^(i/n)) for every value (IEC 60063; derived)")
    @EnumSource(value = ESeries.class, names = {"E48", "E96"})
    void e48AndE96MatchFormula(ESeries series) {
        assertEquals(geometric(series.size(), 100), series.mantissas());
    }

    @Test
    @DisplayName("PV-4: E192 matches the formula except 920 where it gives 919 (IEC 60063, from memory)")
    void e192HasOneException() {
        List<Integer> formula = geometric(192, 100);
        List<Integer> stored = ESeries.E192.mantissas();
        List<Integer> differences = new ArrayList<>();
        for (int i = 0; i < 192; i++) {
            if (!formula.get(i).equals(stored.get(i))) {
                differences.add(i);
            }
        }
        assertEquals(List.of(185), differences);
        assertEquals(920, stored.get(185));
        assertEquals(919, formula.get(185));
    }

    @Test
    @DisplayName("Each longer series holds every second value of the next (IEC 60063 structure)")
    void seriesNest() {
        ESeries[] s = ESeries.values();
        for (int k = 0; k + 1 < s.length; k++) {
            if (s[k].significantDigits() != s[k + 1].significantDigits()) {
                continue;
            }
            List<Integer> longer = s[k + 1].mantissas();
            List<Integer> everySecond = IntStream.range(0, longer.size()).filter(i -> i % 2 == 0)
                    .mapToObj(longer::get).collect(Collectors.toList());
            assertEquals(s[k].mantissas(), everySecond, s[k] + " in " + s[k + 1]);
        }
    }

    @ParameterizedTest(name = "{0}: {1} per decade, ±{2} %")
    @DisplayName("PV-7: series and tolerance (IEC 60063)")
    @CsvSource(delimiter = '|', textBlock = """
            E6   | 6   | 20
            E12  | 12  | 10
            E24  | 24  | 5
            E48  | 48  | 2
            E96  | 96  | 1
            E192 | 192 | 0.5
            """)
    void tolerances(ESeries series, int size, double tolerancePercent) {
        assertEquals(size, series.size());
        assertEquals(size, series.mantissas().size());
        assertEquals(tolerancePercent, series.tolerancePercent(), 0.0);
        assertEquals(tolerancePercent / 100, series.toleranceFraction(), 1e-15);
    }

    @ParameterizedTest(name = "{0} {1}: down {2}, up {3}, nearest {4}")
    @DisplayName("Selection at and between preferred values (IEC 60063 tables; derived)")
    @CsvSource(delimiter = '|', textBlock = """
            E12  | 4700      | 4700  | 4700  | 4700
            E12  | 4699.999  | 3900  | 4700  | 4700
            E12  | 4700.001  | 4700  | 5600  | 4700
            E12  | 10000     | 10000 | 10000 | 10000
            E12  | 9999.999  | 8200  | 10000 | 10000
            E12  | 8300      | 8200  | 10000 | 8200
            E12  | 9100      | 8200  | 10000 | 10000
            E12  | 2143      | 1800  | 2200  | 2200
            E24  | 168000    | 160000 | 180000 | 160000
            E24  | 0.0167    | 0.016 | 0.018 | 0.016
            E96  | 30000     | 29400 | 30100 | 30100
            E192 | 919.5     | 909   | 920   | 920
            E6   | 1e-12     | 1e-12 | 1e-12 | 1e-12
            E6   | 1.2e-12   | 1e-12 | 1.5e-12 | 1e-12
            """)
    void selects(ESeries series, double value, double down, double up, double nearest) {
        assertEquals(down, series.roundDown(value), 0.0);
        assertEquals(up, series.roundUp(value), 0.0);
        assertEquals(nearest, series.nearest(value), 0.0);
    }

    @Test
    @DisplayName("BJ-16 / check-values.md 'beyond the hand calculation' 6: 2.143 kΩ rounds down to 1.8 kΩ in E12")
    void baseResistorRoundsDown() {
        assertEquals(1800.0, ESeries.E12.roundDown(2143), 0.0);
        assertEquals(2000.0, ESeries.E24.roundDown(2143), 0.0);
    }

    @Test
    @DisplayName("Nearest is on a log scale: E6 switches from 1.0 to 1.5 at sqrt(1.5) = 1.2247, not 1.25 (derived)")
    void nearestIsLogarithmic() {
        assertEquals(1.5, ESeries.E6.nearest(1.23), 0.0);
        assertEquals(1.0, ESeries.E6.nearest(1.22), 0.0);
    }

    @ParameterizedTest(name = "{0} {1}: next {2}, previous {3}")
    @DisplayName("Stepping one preferred value, across decades (IEC 60063 tables)")
    @CsvSource(delimiter = '|', textBlock = """
            E12  | 4700   | 5600   | 3900
            E12  | 4800   | 5600   | 4700
            E12  | 8200   | 10000  | 6800
            E12  | 10000  | 12000  | 8200
            E12  | 1      | 1.2    | 0.82
            E24  | 91     | 100    | 82
            E96  | 976    | 1000   | 953
            E192 | 100    | 101    | 98.8
            E6   | 6.8e-9 | 1e-8   | 4.7e-9
            """)
    void steps(ESeries series, double value, double next, double previous) {
        assertEquals(next, series.next(value), 0.0);
        assertEquals(previous, series.previous(value), 0.0);
    }

    @Test
    @DisplayName("A value computed with rounding error still counts as the preferred value")
    void snapsComputedValues() {
        double computed = 0.1 * 3 * 4700 / 0.3;
        assertTrue(computed > 4700.0, "the arithmetic leaves a rounding error");
        double below = 4700.0;
        for (int ulps = 0; ulps < 10; ulps++) {
            below = Math.nextDown(below);
        }
        for (double v : new double[] {computed, below}) {
            assertEquals(4700.0, ESeries.E12.roundDown(v), 0.0);
            assertEquals(4700.0, ESeries.E12.roundUp(v), 0.0);
            assertEquals(4700.0, ESeries.E12.nearest(v), 0.0);
            assertEquals(5600.0, ESeries.E12.next(v), 0.0);
            assertEquals(3900.0, ESeries.E12.previous(v), 0.0);
            assertTrue(ESeries.E12.contains(v));
        }
    }

    @Test
    @DisplayName("Preferred values equal the doubles parsed from their letter codes")
    void valuesMatchParsedText() {
        for (ESeries series : ESeries.values()) {
            for (int m : series.mantissas()) {
                for (int k = -15; k <= 12; k++) {
                    double parsed = Double.parseDouble(m + "e" + k);
                    assertEquals(parsed, series.roundDown(parsed), 0.0, series + " " + parsed);
                    assertEquals(parsed, series.roundUp(parsed), 0.0, series + " " + parsed);
                }
            }
        }
    }

    @Test
    @DisplayName("Membership")
    void contains() {
        assertTrue(ESeries.E12.contains(4700));
        assertTrue(ESeries.E12.contains(4.7e-9));
        assertFalse(ESeries.E12.contains(5100));
        assertTrue(ESeries.E24.contains(5100));
        assertFalse(ESeries.E12.contains(0));
        assertFalse(ESeries.E12.contains(-4700));
        assertFalse(ESeries.E12.contains(Double.NaN));
    }

    @ParameterizedTest
    @DisplayName("Non-positive, non-finite or out-of-range values are refused")
    @ValueSource(doubles = {0, -1, Double.NaN, Double.POSITIVE_INFINITY, 1e-310, 1e301})
    void refusesBadValues(double value) {
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.roundDown(value));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.roundUp(value));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.nearest(value));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.next(value));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.previous(value));
    }

    @Test
    @DisplayName("Both ends of the supported range work")
    void rangeEnds() {
        assertEquals(1e-300, ESeries.E12.roundDown(ESeries.MIN_SUPPORTED_VALUE), 0.0);
        assertEquals(8.2e-301, ESeries.E12.previous(ESeries.MIN_SUPPORTED_VALUE), 0.0);
        assertEquals(1e300, ESeries.E12.roundUp(ESeries.MAX_SUPPORTED_VALUE), 0.0);
        assertEquals(1.2e300, ESeries.E12.next(ESeries.MAX_SUPPORTED_VALUE), 0.0);
    }

    @ParameterizedTest(name = "\"{0}\" -> {1}")
    @DisplayName("Series by name")
    @CsvSource(delimiter = '|', textBlock = """
            E12    | E12
            e96    | E96
            ' E6 ' | E6
            E192   | E192
            """)
    void byName(String name, ESeries expected) {
        assertEquals(expected, ESeries.parse(name));
        assertEquals(expected, ESeries.fromName(name).orElseThrow());
    }

    @Test
    @DisplayName("An unknown name is refused with the valid names")
    void unknownName() {
        assertTrue(ESeries.fromName("E13").isEmpty());
        String message = assertThrows(IllegalArgumentException.class, () -> ESeries.parse("E13"))
                .getMessage();
        assertTrue(message.contains("\"E13\"") && message.contains("E6, E12, E24, E48, E96, E192"),
                message);
    }

    static Stream<Arguments> randomValues() {
        Random random = new Random(60063L);
        ESeries[] all = ESeries.values();
        return Stream.generate(() -> Arguments.of(all[random.nextInt(all.length)],
                Math.pow(10, -15 + 27 * random.nextDouble()))).limit(300);
    }

    @ParameterizedTest(name = "[{index}] {0} {1}")
    @MethodSource("randomValues")
    @DisplayName("Property: down <= value <= up, both members and neighbours; nearest is one of them")
    void selectionInvariants(ESeries series, double value) {
        double down = series.roundDown(value);
        double up = series.roundUp(value);
        assertTrue(down <= value && value <= up, down + " " + value + " " + up);
        assertTrue(series.contains(down) && series.contains(up));
        assertTrue(down == up || series.next(down) == up, "no preferred value between");
        double nearest = series.nearest(value);
        assertTrue(nearest == down || nearest == up);
        assertEquals(up, series.previous(series.next(up)), 0.0);
        assertEquals(down, series.next(series.previous(down)), 0.0);
        assertTrue(series.next(value) > value && series.previous(value) < value);
        // Neighbours are never further apart than the series' step: E6 steps at most 1.5x (22/15).
        assertTrue(series.next(down) / down < 1.6);
    }
}
