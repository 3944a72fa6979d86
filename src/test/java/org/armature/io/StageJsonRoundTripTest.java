package org.armature.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.DoubleStream;
import java.util.stream.Stream;
import org.armature.model.Conditions;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.model.Validator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

class StageJsonRoundTripTest {

    static Stream<Arguments> variants() {
        List<Arguments> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            for (Suppressor s : Suppressor.values()) {
                out.add(Arguments.of(t, s, HighSideDrive.LEVEL_SHIFT));
                if (t == StageTemplate.HIGH_SIDE_PNP) {
                    out.add(Arguments.of(t, s, HighSideDrive.DIRECT));
                }
            }
        }
        return out.stream();
    }

    @ParameterizedTest
    @MethodSource("variants")
    @DisplayName("every template variant saves and opens to an equal document (record equality)")
    void everyTemplateVariantRoundTrips(StageTemplate t, Suppressor s, HighSideDrive d) {
        StageDocument doc = StageDocument.of(Templates.build(t, s, d));
        String text = StageJson.write(doc);
        assertEquals(doc, StageJson.parse(text));
        assertEquals(text, StageJson.write(StageJson.parse(text)), "writing is stable");
    }

    @Test
    @DisplayName("several stages, rotation, mirroring, pin low, unicode and quotes in names round-trip")
    void everythingTheModelHoldsRoundTrips() {
        Stage a = Templates.defaultStage()
                .updatePart("R1", r -> r.withPlacement(r.placement().rotated(270).mirror()))
                .withConditions(new Conditions(false, -12.5, -40, 85))
                .withName("Ventil \"A\" — 24 V, Ω ±5 %\n2nd line\tTab");
        Stage b = Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.RC, HighSideDrive.DIRECT);
        StageDocument doc = new StageDocument("Line-up ✓ \\ back-slash", List.of(a, b));
        assertEquals(doc, StageJson.parse(StageJson.write(doc)));
    }

    @Test
    @DisplayName("unknown parameter keys, unknown options and out-of-range values are kept for the validator")
    void userDataIsKept() {
        Stage s = Templates.defaultStage()
                .updatePart("R1", r -> r.with("resistanceOhms", -5).with("wattage", 3))
                .updatePart("E1", e -> e.withOption("loadKind", "heater-fan").withOption("colour", "red"));
        StageDocument back = StageJson.parse(StageJson.write(StageDocument.of(s)));
        assertEquals(s, back.first());
        List<String> keys = Validator.validate(back.first()).stream().map(Finding::key).toList();
        assertTrue(keys.containsAll(List.of("param.out-of-range", "param.unknown", "option.not-allowed",
                "option.unknown")), keys.toString());
    }

    @Test
    @DisplayName("a stage with no parts, wires or test points round-trips")
    void emptyStageRoundTrips() {
        StageDocument doc = StageDocument.of(new Stage("empty", "", List.of(), List.of(), List.of(), null));
        assertEquals(doc, StageJson.parse(StageJson.write(doc)));
    }

    @ParameterizedTest
    @CsvSource(textBlock = """
            # value,      written as      (derived: shortest form that reads back exactly)
            12,           12
            -0.5,         -0.5
            0.0025,       0.0025
            1e-14,        1e-14
            2.2e-10,      2.2e-10
            1e12,         1000000000000
            1e20,         1e20
            -273.15,      -273.15
            """)
    @DisplayName("numbers are written plainly: whole numbers without fraction, lower-case exponents")
    void numbersAreReadable(double value, String text) {
        assertEquals(text, StageWriter.number(value));
    }

    static DoubleStream randomDoubles() {
        SplittableRandom rnd = new SplittableRandom(20_240_601L);
        DoubleStream special = DoubleStream.of(0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY,
                Double.NEGATIVE_INFINITY, Double.MIN_VALUE, Double.MAX_VALUE, 0.1, 1.0 / 3, 9.007199254740993e15);
        DoubleStream random = DoubleStream.generate(() -> {
            double mantissa = rnd.nextDouble(-10, 10);
            return mantissa * Math.pow(10, rnd.nextInt(-20, 20));
        }).limit(300);
        DoubleStream bits = DoubleStream.generate(() -> Double.longBitsToDouble(rnd.nextLong())).limit(100);
        return DoubleStream.concat(special, DoubleStream.concat(random, bits));
    }

    @ParameterizedTest
    @MethodSource("randomDoubles")
    @DisplayName("any double value of a part reads back bit for bit (seeded random values)")
    void anyValueRoundTrips(double value) {
        Part p = new Part("R1", PartKind.RESISTOR, Map.of("resistanceOhms", value), Map.of(), Placement.at(0, 0));
        Stage s = new Stage("n", "", List.of(p), List.of(), List.of(), null);
        Part back = StageJson.parse(StageJson.write(StageDocument.of(s))).first().parts().get(0);
        // Double.equals: same bits, except that every NaN is one value and -0.0 differs from 0.0
        assertEquals(Double.valueOf(value), back.values().get("resistanceOhms"));
        assertEquals(p, back);
    }
}
