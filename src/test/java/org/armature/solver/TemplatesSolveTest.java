package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.armature.model.HighSideDrive;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class TemplatesSolveTest {

    static Stream<Arguments> variants() {
        List<Arguments> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            for (Suppressor s : Suppressor.values()) {
                for (boolean high : new boolean[] {true, false}) {
                    out.add(Arguments.of(t, s, HighSideDrive.LEVEL_SHIFT, high));
                    if (t == StageTemplate.HIGH_SIDE_PNP) {
                        out.add(Arguments.of(t, s, HighSideDrive.DIRECT, high));
                    }
                }
            }
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0} {1} {2} pin high {3}")
    @MethodSource("variants")
    void everyVariantSolvesWithTheRelayFollowingThePin(StageTemplate t, Suppressor s, HighSideDrive d, boolean high) {
        Stage stage = Templates.build(t, s, d);
        OperatingPoint op = new DcAnalysis().solve(stage, SolveOptions.DEFAULT.withPinHigh(high));
        assertTrue(op.converged());
        HonestResidual.assertHonest(stage, op, t.id() + " pin high " + high);
        PartResult k = op.requirePart("K1");
        // the high-side direct-drive variant exists to show the classic mistake: a 3.3 V pin cannot
        // pull the PNP's base up to a 12 V emitter, so the relay stays operated with the pin low
        // (check-values.md, "what practitioners need", item 4; common practice)
        boolean expectOperated = high || d == HighSideDrive.DIRECT && t == StageTemplate.HIGH_SIDE_PNP;
        String expected = expectOperated ? "operated" : "released";
        assertEquals(expected, k.state("state"), () -> k.quantities().toString());
        assertEquals(expected, k.state("contacts"));
        SwitchVerdict v = op.switchVerdict().orElseThrow();
        assertEquals(expectOperated, v.margin() > 0, v.reason());
        for (double value : op.nodeVoltages().values()) {
            assertTrue(Double.isFinite(value));
        }
        for (PartResult r : op.parts().values()) {
            for (Map.Entry<String, Double> e : r.quantities().entrySet()) {
                assertTrue(Double.isFinite(e.getValue()), r.ref() + " " + e.getKey());
            }
        }
    }
}
