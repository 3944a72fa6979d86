package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.armature.model.GridPoint;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinSpec;
import org.armature.model.Placement;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class PartGeometryTest {

    static Stream<Arguments> placements() {
        Random rnd = new Random(20240611L);
        List<Arguments> out = new ArrayList<>();
        for (PartKind k : PartKind.values()) {
            for (int rot = 0; rot < 360; rot += 90) {
                for (boolean m : new boolean[] {false, true}) {
                    out.add(Arguments.of(k, new Placement(new GridPoint(rnd.nextInt(40) - 20, rnd.nextInt(40) - 20), rot, m)));
                }
            }
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0} at {1}")
    @MethodSource("placements")
    @DisplayName("the symbol frame maps pin offsets exactly as Placement.apply does (derived: same mirror-rotate-translate)")
    void frameAgreesWithPlacement(PartKind kind, Placement placement) {
        Affine f = PartGeometry.frame(placement);
        for (PinSpec pin : kind.pins()) {
            GridPoint expected = placement.apply(pin.localX(), pin.localY());
            assertEquals(expected.gridX(), f.mapX(pin.localX(), pin.localY()), 1e-12);
            assertEquals(expected.gridY(), f.mapY(pin.localX(), pin.localY()), 1e-12);
        }
    }

    @ParameterizedTest(name = "{0} at {1}")
    @MethodSource("placements")
    @DisplayName("bounds hold every pin and body; a quarter turn swaps width and height (derived)")
    void boundsHoldPinsAndBodies(PartKind kind, Placement placement) {
        Part p = Part.of("X1", kind, placement);
        Box bounds = PartGeometry.bounds(p);
        for (PinSpec pin : kind.pins()) {
            GridPoint g = p.pinPoint(pin.name());
            assertTrue(bounds.contains(g.gridX(), g.gridY()), pin.name());
        }
        Box local = PartGeometry.localBodies(p).get(0);
        Box mapped = PartGeometry.bodies(p).get(0);
        boolean quarter = placement.rotationDegrees() % 180 != 0;
        assertEquals(quarter ? local.height() : local.width(), mapped.width(), 1e-12);
    }

    @Test
    @DisplayName("a resistor turned 90° lies across: its body is wider than tall (derived from the frame)")
    void turnedResistorLiesAcross() {
        Part r = Part.of("R1", PartKind.RESISTOR, Placement.at(12, 12).rotated(90));
        assertTrue(!PartGeometry.isUpright(r));
        assertEquals(new GridPoint(14, 12), r.pinPoint("a"), "pin a at (0,-2) turns to (+2, 0)");
    }
}
