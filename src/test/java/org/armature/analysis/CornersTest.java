package org.armature.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import org.armature.model.HighSideDrive;
import org.armature.model.Part;
import org.armature.model.Placement;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

class CornersTest {

    static Stream<Arguments> variants() {
        return TopologyCheckTest.variants();
    }

    @ParameterizedTest
    @MethodSource("variants")
    @DisplayName("every template variant has at least 64 distinct corners, each a modified stage")
    void atLeast64Corners(StageTemplate t, Suppressor s, HighSideDrive d) {
        Stage stage = Fixtures.build(t, s, d);
        CornerPlan plan = Corners.enumerate(stage);
        assertTrue(plan.corners().size() >= 64, () -> plan.factors().toString());
        assertEquals(1 << plan.factors().size(), plan.corners().size());
        Set<Map<String, Double>> seen = new HashSet<>();
        for (Variant v : plan.corners()) {
            assertTrue(seen.add(v.levels()));
            assertEquals(plan.factors().size(), v.levels().size());
        }
        assertEquals(Fixtures.build(t, s, d), stage, "nominal stage untouched");
    }

    @Test
    @DisplayName("low-side NPN: eight factors, 256 corners, in a stable order")
    void lowSideFactors() {
        CornerPlan plan = Corners.enumerate(Fixtures.build(StageTemplate.LOW_SIDE_NPN));
        assertEquals(List.of("supply", "ambient", "coil-resistance", "gain", "vbe", "pin-level", "resistor:R1",
                "resistor:R2"), plan.factors().stream().map(Factor::id).toList());
        assertEquals(256, plan.corners().size());
    }

    @Test
    @DisplayName("the stacked operate corner: 10.8 V, 60 °C, 440 Ω, hFE(min) at −20 °C frozen, pin 3.4 V")
    void worstOperateCorner() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN);
        List<Factor> factors = Corners.factors(stage);
        Stage worst = Corners.at(stage, factors, Map.of("supply", -1.0, "ambient", 1.0, "coil-resistance", 1.0,
                "gain", -1.0, "pin-level", -1.0));
        assertEquals(10.8, worst.require("V1").value("volts"), 1e-12);          // 12 V −10 %, derived
        assertEquals(60, worst.conditions().ambientCelsius(), 1e-12);          // Conditions.DEFAULT max
        assertEquals(440, worst.require("K1").value("coilResistanceOhms"), 1e-9); // 400 Ω +10 %
        // BJ-13 (derived, XTB from memory): 100·(253.15/298.15)^1.5 = 78.24
        assertEquals(78.24, worst.require("Q1").value("betaForward"), 0.01);
        assertEquals(0, worst.require("Q1").value("gainTempExponent"), 0);
        assertEquals(3.4, worst.require("U1").value("highVolts"), 1e-12);
    }

    @Test
    @DisplayName("gain at +1: (2·200 − 100)·(333.15/298.15)^1.5 (BJ-20 spread 100–300, BJ-13 scaling)")
    void highGain() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN);
        Factor gain = Corners.factors(stage).stream().filter(f -> f.id().equals("gain")).findFirst().orElseThrow();
        assertEquals(300 * Math.pow(333.15 / 298.15, 1.5), gain.valueAt(1), 1e-9);
    }

    @Test
    @DisplayName("VBE +30 mV divides IS by exp(30 mV / VT(25 °C)) (derived)")
    void vbeSpread() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN);
        Factor vbe = Corners.factors(stage).stream().filter(f -> f.id().equals("vbe")).findFirst().orElseThrow();
        double is = vbe.apply(stage, 1).require("Q1").value("saturationCurrentAmps");
        assertEquals(1e-14 * Math.exp(-0.030 / 0.0256926), is, 1e-18);     // VT at 25 °C: PC-5
    }

    @Test
    @DisplayName("MOSFET threshold spans 2·VT0 − VGS(th)max to VGS(th)max")
    void threshold() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NMOS);
        Factor th = Corners.factors(stage).stream().filter(f -> f.id().equals("threshold")).findFirst().orElseThrow();
        assertEquals(1.5, th.valueAt(1), 1e-12);
        assertEquals(0.9, th.valueAt(-1), 1e-12);
    }

    @ParameterizedTest(name = "{0} Ω, entered {1} → ±{2} %")
    @CsvSource(textBlock = """
            4700, NaN, 5
            2430, NaN, 1
            2050, NaN, 2
            2030, NaN, 0.5
            2011, NaN, 5
            4700, 1,   1
            """)
    @DisplayName("resistor tolerance from its E-series class when none was entered (IEC 60063, PV-7)")
    void resistorClass(double ohms, double entered, double expected) {
        Part r = Part.of("R9", PartKind.RESISTOR, Placement.at(0, 0)).with("resistanceOhms", ohms);
        if (!Double.isNaN(entered)) {
            r = r.with("tolerancePercent", entered);
        }
        assertEquals(expected, Corners.resistorTolerancePercent(r), 1e-12);
    }

    @Test
    @DisplayName("too many resistors: grouped into one weak/strong-drive factor, pull resistors opposite")
    void grouped() {
        Stage stage = Fixtures.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.RESISTOR, HighSideDrive.LEVEL_SHIFT);
        CornerPlan plan = Corners.enumerate(stage);
        assertTrue(plan.factors().stream().anyMatch(f -> f.id().equals("resistors")));
        assertTrue(plan.corners().size() <= CornerOptions.DEFAULT.maxCorners());
        Factor g = plan.factors().stream().filter(f -> f.id().equals("resistors")).findFirst().orElseThrow();
        Stage weak = g.apply(stage, 1);
        assertTrue(weak.require("R1").value("resistanceOhms") > 4700);     // series up
        assertTrue(weak.require("R2").value("resistanceOhms") < 47_000);   // pull-down down
        assertTrue(weak.require("R3").value("resistanceOhms") < 10_000);   // PNP pull-up down
    }

    @Test
    @DisplayName("Monte Carlo: seeded, reproducible, levels in [−1, 1], normal spread σ ≈ 1/3 of the limit")
    void monteCarlo() {
        Stage stage = Fixtures.build(StageTemplate.LOW_SIDE_NPN);
        List<Factor> factors = Corners.factors(stage);
        List<Variant> a = Corners.monteCarlo(stage, factors, 2000, 42);
        List<Variant> b = Corners.monteCarlo(stage, factors, 2000, 42);
        List<Variant> c = Corners.monteCarlo(stage, factors, 2000, 43);
        assertEquals(a.stream().map(Variant::levels).toList(), b.stream().map(Variant::levels).toList());
        assertNotEquals(a.get(0).levels(), c.get(0).levels());
        double sum = 0;
        double sq = 0;
        for (Variant v : a) {
            for (double u : v.levels().values()) {
                assertTrue(u >= -1 && u <= 1);
            }
            double u = v.level("supply");
            sum += u;
            sq += u * u;
        }
        double mean = sum / a.size();
        double sd = Math.sqrt(sq / a.size() - mean * mean);
        assertEquals(0, mean, 0.03);
        // truncation at 3σ trims σ by about 1.5 % (derived): 0.328
        assertEquals(1.0 / 3, sd, 0.02);
        assertEquals(a.get(7).level("supply") * 1.2 + 12, a.get(7).stage().require("V1").value("volts"), 1e-12);
    }

    @Test
    @DisplayName("a level outside [−1, 1] is refused")
    void levelRange() {
        Factor f = Corners.factors(Fixtures.build(StageTemplate.LOW_SIDE_NPN)).get(0);
        assertThrows(IllegalArgumentException.class, () -> f.apply(Fixtures.build(StageTemplate.LOW_SIDE_NPN), 1.5));
    }

    @org.junit.jupiter.api.Test
    @org.junit.jupiter.api.DisplayName("the VBE spread reads as a shift in corner descriptions, its id stays vbe (README check ids)")
    void vbeReadsAsAShift() {
        Factor vbe = Corners.factors(org.armature.model.Templates.defaultStage()).stream()
                .filter(f -> f.id().equals("vbe")).findFirst().orElseThrow();
        assertEquals("vbe shift", vbe.word());
        Factor supply = Corners.factors(org.armature.model.Templates.defaultStage()).stream()
                .filter(f -> f.id().equals("supply")).findFirst().orElseThrow();
        assertEquals("supply", supply.word());
    }
}
