package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Map;
import org.armature.model.StageTemplate;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The on-demand readers of an operating point ({@link OperatingPoint#part}, {@link
 * OperatingPoint#quantity}, {@link OperatingPoint#powerWatts}, a verdict's reason formatted on
 * first use) give exactly what the full result map gives.
 */
class PartReadoutTest {

    @ParameterizedTest(name = "{0}: one part at a time equals the full result map")
    @EnumSource(StageTemplate.class)
    void onDemandEqualsFull(StageTemplate t) {
        for (boolean pin : new boolean[] {true, false}) {
            SolveOptions so = SolveOptions.DEFAULT.withPinHigh(pin);
            OperatingPoint lazy = new DcAnalysis().solve(WarmStartTest.template(t), so);
            OperatingPoint full = new DcAnalysis().solve(WarmStartTest.template(t), so);
            for (Map.Entry<String, PartResult> e : full.parts().entrySet()) {
                String ref = e.getKey();
                PartResult r = e.getValue();
                for (Map.Entry<String, Double> q : r.quantities().entrySet()) {
                    assertEquals(q.getValue(), lazy.quantity(ref, q.getKey()), 0.0, ref + " " + q.getKey());
                }
                assertEquals(r.powerWatts(), lazy.powerWatts(ref), 0.0, ref + " power");
                assertEquals(r, lazy.part(ref).orElseThrow(), ref);
            }
            assertEquals(full.parts(), lazy.parts());
            assertEquals(full.switchVerdict(), lazy.switchVerdict());
            assertThrows(IllegalArgumentException.class, () -> lazy.quantity("NO-SUCH-PART", "current"));
        }
    }

    @ParameterizedTest(name = "{0}: a verdict's reason is the same text whenever it is asked for")
    @EnumSource(StageTemplate.class)
    void verdictReasonStable(StageTemplate t) {
        OperatingPoint op = new DcAnalysis().solve(WarmStartTest.template(t));
        SwitchVerdict v = op.switchVerdict().orElseThrow();
        SwitchVerdict same = new SwitchVerdict(v.ref(), v.fullyOn(), v.margin(), v.reason());
        assertEquals(same, v);
        assertEquals(same.hashCode(), v.hashCode());
        assertEquals(v.reason(), op.switchVerdict().orElseThrow().reason());
    }
}
