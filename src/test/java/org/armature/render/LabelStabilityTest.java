package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * While only numbers change (a supply or ambient slider drag), labels stay where they are when the
 * previous layout is handed on, as the canvas does between solves (issue 17: labels must not jump
 * during a slider drag).
 */
class LabelStabilityTest {

    static Stream<Arguments> drags() {
        List<Arguments> out = new ArrayList<>();
        for (StageTemplate t : StageTemplate.values()) {
            out.add(Arguments.of(t.id() + " supply 9 to 15 V", t, "supply"));
            out.add(Arguments.of(t.id() + " ambient -10 to 60 °C", t, "ambient"));
        }
        return out.stream();
    }

    private static Stage step(Stage base, String slider, int i) {
        if (slider.equals("supply")) {
            Part v1 = base.require("V1");
            return base.withPart(v1.with("volts", 9 + 0.25 * i));
        }
        return base.withConditions(base.conditions().withAmbient(-10 + 2.5 * i));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("drags")
    @DisplayName("a slider drag moves no label: each box keeps the edge that faces its anchor")
    void noJumping(String name, StageTemplate t, String slider) {
        Stage base = Templates.build(t);
        Layout previous = Layout.NONE;
        Map<String, PlacedLabel> first = new HashMap<>();
        for (int i = 0; i <= 24; i++) {
            Stage st = step(base, slider, i);
            Layout layout = SchematicRenderer.layout(st, LabelGeometryTest.readouts(st), previous);
            for (PlacedLabel l : layout.labels()) {
                String key = l.kind() + "|" + l.owner();
                PlacedLabel was = first.putIfAbsent(key, l);
                if (was != null && was.lines().size() == l.lines().size()) {
                    assertTrue(sameFacingEdges(was, l), name + " step " + i + ": " + key + " moved from "
                            + was.box() + " to " + l.box());
                }
            }
            previous = layout;
        }
        assertTrue(first.size() > 5, "the drag drew readouts");
        assertEquals(base.parts().stream().filter(p -> p.kind() != PartKind.GROUND).count(),
                first.keySet().stream().filter(k -> k.startsWith("PART|")).count());
    }

    /** Same anchor, and the edges of the box that face the anchor (or the part body) unchanged. */
    private static boolean sameFacingEdges(PlacedLabel a, PlacedLabel b) {
        double eps = 1e-9;
        if (Double.compare(a.anchorX(), b.anchorX()) != 0 || Double.compare(a.anchorY(), b.anchorY()) != 0) {
            return false;
        }
        Box r = a.target();
        double cx = r.centreX();
        double cy = r.centreY();
        boolean x = a.box().minX() >= cx ? Math.abs(a.box().minX() - b.box().minX()) < eps
                : a.box().maxX() <= cx ? Math.abs(a.box().maxX() - b.box().maxX()) < eps
                : Math.abs(a.box().centreX() - b.box().centreX()) < eps;
        boolean y = a.box().minY() >= cy ? Math.abs(a.box().minY() - b.box().minY()) < eps
                : a.box().maxY() <= cy ? Math.abs(a.box().maxY() - b.box().maxY()) < eps
                : Math.abs(a.box().centreY() - b.box().centreY()) < eps;
        return x && y;
    }
}
