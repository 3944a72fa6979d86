package org.armature.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.Stream;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.armature.solver.DcAnalysis;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Verdicts that read right (issue 16, item 5). The first two tests reproduce the defects found: a
 * value beyond its limit reported only as a warning ("WARN 53.0 V (limit 48.0 V)"), and a verdict
 * naming two limits ("(limit 480 mA)" beside "rating of 600 mA"); both failed before the fix.
 */
class VerdictWordingTest {

    private static final CheckOptions QUICK = new CheckOptions(0.10, 0.10, 2.0, 0.8, 20, 0.7, OptionalDouble.empty(), 0,
            1, new CornerOptions(0, 64, false), 50, 120, false);

    private static final DcAnalysis DC = new DcAnalysis();

    /** Checks whose value must reach at least the limit; all others must stay at or below it. */
    private static final List<String> AT_LEAST = List.of("relay.operates", "switch.saturated");

    @Test
    @DisplayName("reproduction: a peak switch voltage beyond its derated limit fails, and the verdict says what is derated and by how much")
    void beyondDeratedLimitFails() {
        // 13.2 V supply maximum + the diode's forward drop (derived, check-values.md suppression) against a 15 V VCEO:
        // inside the rating, beyond the 80 % derating (12 V; common practice). Before the fix: WARN.
        Stage s = Templates.build(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT)
                .updatePart("Q1", q -> q.with("vceoVolts", 15));
        CheckResult c = StageChecks.run(s, QUICK, DC).check("rating.switch-voltage").orElseThrow();
        assertTrue(c.value() > 13.2 && c.value() < 15, () -> c.toString());
        assertEquals(12.0, c.limit(), 1e-9);
        assertEquals(CheckStatus.FAIL, c.status(), c.explanation());
        assertTrue(c.explanation().contains("the 15.0 V VCEO, 80.0 % derating → 12.0 V limit"), c.explanation());
    }

    @Test
    @DisplayName("reproduction: a rating verdict names one limit, the derated one, with the rating it comes from")
    void oneLimitPerVerdict() {
        CheckReport r = StageChecks.run(Templates.defaultStage(), QUICK, DC);
        CheckResult c = r.check("rating.switch-current").orElseThrow();
        // before the fix: "(limit 480 mA)" beside "... against a rating of 600 mA."
        assertTrue(c.explanation().contains("against the 600 mA IC max, 80.0 % derating → 480 mA limit"), c.explanation());
        assertEquals(0.48, c.limit(), 1e-12);
    }

    @Test
    @DisplayName("reproduction: a coil voltage short of the wanted 110 % never reads as '110 % of it; 110 % wanted'")
    void marginWording() {
        CheckResult c = StageChecks.run(Templates.defaultStage(), QUICK, DC).check("relay.operates").orElseThrow();
        assertEquals(CheckStatus.WARN, c.status());
        assertTrue(c.value() >= c.limit(), "a warning lies inside its limit");
        assertFalse(c.explanation().contains("110 % wanted"), c.explanation());
        assertTrue(c.explanation().contains("short of the 110.0 % margin RC-18 wants"), c.explanation());
    }

    static Stream<Stage> stages() {
        List<Stage> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            for (Suppressor s : Suppressor.values()) {
                out.add(Templates.build(t, s, HighSideDrive.LEVEL_SHIFT));
            }
        }
        out.add(Templates.build(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE, HighSideDrive.DIRECT));
        return out.stream();
    }

    @ParameterizedTest
    @MethodSource("stages")
    @DisplayName("every template and suppressor: a value beyond its limit fails, a warning lies inside it, each explanation ends a sentence")
    void beyondLimitIsFailure(Stage stage) {
        for (CheckResult c : StageChecks.run(stage, QUICK, DC).checks()) {
            if (Double.isNaN(c.value()) || Double.isNaN(c.limit())) {
                continue;
            }
            boolean beyond = AT_LEAST.contains(c.id()) ? c.value() < c.limit() : c.value() > c.limit();
            assertEquals(beyond, c.status() == CheckStatus.FAIL, () -> stage.name() + ": " + c);
            assertTrue(c.explanation().strip().endsWith(".") || c.explanation().strip().endsWith(")"),
                    () -> c.explanation());
            if (c.id().startsWith("rating.")) {
                assertTrue(c.explanation().contains("derating →"), () -> c.id() + ": " + c.explanation());
            }
        }
    }
}
