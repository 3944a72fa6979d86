package org.armature.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The corner stages built by shared prefixes and the Monte Carlo samples drawn one at a time are
 * the stages of the plain definitions: corner i applies factor j at the level of bit j of i, in
 * factor order (derived from the definition in {@link Corners#enumerate}); sample k is the k-th of
 * the seeded list.
 */
class CornerPlanBuildTest {

    @ParameterizedTest(name = "{0}: every corner equals the factors applied one after another")
    @EnumSource(StageTemplate.class)
    void cornersMatchSequentialApplication(StageTemplate t) {
        Stage stage = Templates.build(t);
        CornerPlan plan = Corners.enumerate(stage);
        List<Factor> factors = plan.factors();
        assertEquals(1 << factors.size(), plan.corners().size());
        for (Variant v : plan.corners()) {
            Stage expected = stage;
            for (int j = 0; j < factors.size(); j++) {
                double level = ((v.index() >> j) & 1) == 1 ? 1.0 : -1.0;
                assertEquals(level, v.level(factors.get(j).id()), 0.0, "corner " + v.index());
                expected = factors.get(j).apply(expected, level);
            }
            assertEquals(expected, v.stage(), "corner " + v.index());
        }
    }

    @ParameterizedTest(name = "{0}: samples drawn one at a time equal the seeded list")
    @EnumSource(StageTemplate.class)
    void samplesMatchList(StageTemplate t) {
        Stage stage = Templates.build(t);
        List<Factor> factors = Corners.factors(stage);
        List<Variant> list = Corners.monteCarlo(stage, factors, 25, 7L);
        Iterator<Variant> it = Corners.monteCarloSamples(stage, factors, 25, 7L);
        List<Variant> drawn = new ArrayList<>();
        it.forEachRemaining(drawn::add);
        assertEquals(list, drawn);
        assertFalse(it.hasNext());
    }
}
