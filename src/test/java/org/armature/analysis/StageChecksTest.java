package org.armature.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.stream.Collectors;
import org.armature.model.Conditions;
import org.armature.model.Finding;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.solver.DcAnalysis;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

class StageChecksTest {

    /** Fewer factors so that the unit tests stay quick: supply, ambient, coil, gain, pin (32 corners). */
    private static final CheckOptions QUICK = new CheckOptions(0.10, 0.10, 2.0, 0.8, 20, 0.7, OptionalDouble.empty(), 0,
            1, new CornerOptions(0, 64, false), 50, 120, false);

    private static final DcAnalysis DC = new DcAnalysis();

    private static CheckReport darlington;

    @BeforeAll
    static void runOnce() {
        darlington = StageChecks.run(Fixtures.build(StageTemplate.DARLINGTON_CHANNEL), QUICK, DC);
    }

    private static Set<String> keys(CheckReport r) {
        return r.findings().stream().map(Finding::key).collect(Collectors.toSet());
    }

    @Test
    @DisplayName("every check id of the table is reported, in order, for a solvable stage")
    void allIds() {
        List<String> ids = darlington.checks().stream().map(CheckResult::id).toList();
        // without a release-time requirement and with a lamp (not inductive): no relay.release-time, no contact.break
        assertEquals(StageChecks.IDS.stream().filter(id -> !id.equals("relay.release-time") && !id.equals("contact.break"))
                .toList(), ids);
        assertEquals(32, darlington.cornerCount());
    }

    @Test
    @DisplayName("peak switch voltage, static estimate: VS,max + VF = 13.2 + 0.7 = 13.9 V (derived, check-values.md suppression)")
    void staticSwitchVoltage() {
        CheckResult c = darlington.check("rating.switch-voltage").orElseThrow();
        assertEquals(13.9, c.value(), 1e-9);
        assertEquals(CheckStatus.PASS, c.status());
        assertEquals(0.8 * 50, c.limit(), 1e-9);           // VCE max 50 V derated to 80 % (common practice)
        assertTrue(c.method().contains("transient engine is not used"));
    }

    @Test
    @DisplayName("operate check compares the coil voltage with must-operate moved to the solved coil temperature (RC-7)")
    void operateLimitFollowsCoilTemperature() {
        CheckResult c = darlington.check("relay.operates").orElseThrow();
        // the limit is 110 % (RC-18) of 9 V·(234.5 + T)/(234.5 + 20) at the corner's coil temperature: above 9.9 V
        assertTrue(c.limit() > 9.9, () -> c.toString());
        assertEquals(10.8, c.corner().get("supply"), 1e-9); // the minimum supply is the worst corner
        assertEquals(60, c.corner().get("ambient"), 1e-9);  // and the hottest ambient
    }

    @Test
    @DisplayName("release check: a cut-off switch leaves nanovolts on the coil, far below 90 % of must-release")
    void releases() {
        CheckResult c = darlington.check("relay.releases").orElseThrow();
        assertEquals(CheckStatus.PASS, c.status());
        assertTrue(c.value() < 1e-3);
    }

    @Test
    @DisplayName("no suppressor: the switch-voltage rating fails (SU-0) and the topology finding is carried")
    void unsuppressed() {
        CheckReport r = StageChecks.run(Fixtures.build(StageTemplate.LOW_SIDE_NPN, Suppressor.NONE,
                HighSideDrive.LEVEL_SHIFT), QUICK, DC);
        CheckResult c = r.check("rating.switch-voltage").orElseThrow();
        assertEquals(CheckStatus.FAIL, c.status());
        assertEquals(Double.POSITIVE_INFINITY, c.value());
        assertTrue(keys(r).contains("topology.suppressor-missing"));
        assertEquals(CheckStatus.FAIL, r.overall());
    }

    @Test
    @DisplayName("saturation at the low-gain corner uses hFE(min) at the coldest ambient (BJ-13 × BJ-19 rule)")
    void saturationAtLowGain() {
        CheckReport r = StageChecks.run(Fixtures.build(StageTemplate.LOW_SIDE_NPN, Suppressor.NONE,
                HighSideDrive.LEVEL_SHIFT), QUICK, DC);
        CheckResult c = r.check("switch.saturated").orElseThrow();
        assertEquals(100 * Math.pow(253.15 / 298.15, 1.5), c.corner().get("gain"), 1e-6);
        assertTrue(c.value() > 1, () -> c.explanation());
    }

    @Test
    @DisplayName("release-time requirement: decay to drop-out through the clamp diode, closed form (SU-7 form)")
    void releaseTime() {
        Stage stage = Fixtures.build(StageTemplate.DARLINGTON_CHANNEL);
        CheckOptions o = QUICK.withReleaseTimeRequirement(0.001);
        CheckResult c = StageChecks.run(stage, o, DC).check("relay.release-time").orElseThrow();
        assertEquals(CheckStatus.FAIL, c.status());
        assertTrue(c.value() > 0.001 && c.value() < 0.05, () -> c.explanation());
    }

    @Test
    @DisplayName("with the transient engine: the freewheeling diode holds the switch near VS,max + VF, no avalanche")
    void transientTurnOff() {
        CheckOptions o = QUICK.withTransient(true).withReleaseTimeRequirement(0.050);
        CheckReport r = StageChecks.run(Fixtures.build(StageTemplate.LOW_SIDE_NPN), o, DC);
        CheckResult v = r.check("rating.switch-voltage").orElseThrow();
        assertTrue(v.method().startsWith("transient engine"), v.method());
        // derived: 13.2 V supply maximum plus about one diode drop
        assertEquals(13.2 + 0.8, v.value(), 0.4);
        assertEquals(CheckStatus.PASS, v.status());
        assertEquals(13.2, v.corner().get("supply"), 1e-9);
        CheckResult t = r.check("relay.release-time").orElseThrow();
        assertEquals(CheckStatus.PASS, t.status(), t.explanation());
        assertTrue(t.value() > 0.002, t.explanation());   // a plain diode slows release (SU-12)
        CheckResult i = r.check("rating.suppressor-current").orElseThrow();
        assertTrue(i.value() > 0.020 && i.value() < 0.05, i.explanation());
    }

    @ParameterizedTest(name = "contact side {0} V {1}: cautions {2}")
    @CsvSource(textBlock = """
            24,  dc,     false
            130, dc,     true
            24,  ac-rms, false
            230, ac-rms, true
            """)
    @DisplayName("safety cautions above SELV (> 50 V AC rms or > 120 V DC, IEC 61140 band; common practice)")
    void cautions(double volts, String waveform, boolean expected) {
        Stage stage = Fixtures.build(StageTemplate.DARLINGTON_CHANNEL).updatePart("V2",
                p -> p.with("volts", volts).with("tolerancePercent", 0).withOption("waveform", waveform));
        CheckReport r = StageChecks.run(stage, QUICK, DC);
        Set<String> k = keys(r);
        for (String key : List.of("caution.above-selv", "caution.creepage-clearance", "caution.fusing",
                "caution.enclosure", "caution.qualified-installation")) {
            assertEquals(expected, k.contains(key), key);
        }
        assertFalse(r.findings().stream().anyMatch(f -> f.message().toLowerCase().contains(" is safe")));
    }

    @Test
    @DisplayName("Monte Carlo: the same seed gives the same yield; culprits only counted for failures")
    void monteCarloReproducible() {
        Stage stage = Fixtures.build(StageTemplate.DARLINGTON_CHANNEL);
        YieldResult a = StageChecks.run(stage, QUICK.withMonteCarlo(60, 11), DC).yield().orElseThrow();
        YieldResult b = StageChecks.run(stage, QUICK.withMonteCarlo(60, 11), DC).yield().orElseThrow();
        assertEquals(a, b);
        assertEquals(60, a.samples());
        int failed = a.samples() - a.passed() - a.unsolved();
        assertEquals(failed, a.culpritCounts().values().stream().mapToInt(Integer::intValue).sum());
        assertEquals(failed > 0, a.topCulprit().isPresent());
    }

    @Test
    @DisplayName("a cold, low supply makes the Monte Carlo yield fall and names the supply among the culprits")
    void lowSupplyCulprit() {
        Stage stage = Fixtures.build(StageTemplate.DARLINGTON_CHANNEL)
                .updatePart("V1", p -> p.with("volts", 10.2).with("tolerancePercent", 10))
                .withConditions(new Conditions(true, 25, 20, 30));
        YieldResult y = StageChecks.run(stage, QUICK.withMonteCarlo(80, 5), DC).yield().orElseThrow();
        assertTrue(y.yield() < 1, () -> y.toString());
        assertTrue(y.culpritCounts().containsKey("supply"), () -> y.toString());
    }

    static List<Stage> allVariants() {
        return TopologyCheckTest.variants().map(a -> {
            Object[] x = a.get();
            return Fixtures.build((StageTemplate) x[0], (Suppressor) x[1], (HighSideDrive) x[2]);
        }).toList();
    }

    @ParameterizedTest
    @MethodSource("allVariants")
    @DisplayName("never throws: every template variant gets a verdict per check or a not-solved finding")
    void neverThrows(Stage stage) {
        CheckReport r = StageChecks.run(stage, QUICK, DC);
        assertFalse(r.checks().isEmpty());
        for (CheckResult c : r.checks()) {
            assertTrue(StageChecks.IDS.contains(c.id()));
            if (Double.isNaN(c.value())) {
                assertTrue(keys(r).contains("check.not-solved"), c.id());
            }
        }
    }

    @Test
    @DisplayName("an unrecognised stage: no checks, one finding")
    void unrecognised() {
        CheckReport r = StageChecks.run(Fixtures.build(StageTemplate.LOW_SIDE_NPN).withoutPart("Q1"), QUICK, DC);
        assertTrue(r.checks().isEmpty());
        assertTrue(keys(r).contains("check.not-recognised"));
    }

    @ParameterizedTest(name = "RθJA {0} K/W, Tj max {1} °C: Pmax(25 °C) {2} W, derate {3} W/K")
    @CsvSource(textBlock = """
            200, 150, 0.625, 0.005
            """)
    @DisplayName("TH-1 (common datasheet values; derived): TO-92 Pmax 625 mW at 25 °C, derate 5.0 mW/°C")
    void th1(double rth, double tjMax, double pMax, double derate) {
        assertEquals(pMax, ThermalBudget.maxPowerWatts(tjMax, 25, rth), 1e-12);
        assertEquals(derate, ThermalBudget.deratingWattsPerKelvin(rth), 1e-15);
    }

    @ParameterizedTest(name = "RθJA {0} K/W: ΔT {1} K")
    @CsvSource(textBlock = """
            200, 20.0
            417, 41.7
            """)
    @DisplayName("TH-5 (derived): an under-driven BJT, 20 mA at 5 V = 100 mW")
    void th5(double rth, double rise) {
        double p = 0.020 * 5;
        assertEquals(rise, ThermalBudget.junctionCelsius(25, p, rth) - 25, 1e-9);
    }
}
