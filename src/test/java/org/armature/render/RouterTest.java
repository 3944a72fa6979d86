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
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.armature.model.Wire;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

class RouterTest {

    private static Stage empty() {
        return new Stage("t", "", List.of(), List.of(), List.of(), null);
    }

    @Test
    @DisplayName("aligned points get one straight segment")
    void straight() {
        assertEquals(List.of(Wire.of(0, 0, 5, 0)), Router.route(empty(), new GridPoint(0, 0), new GridPoint(5, 0)));
    }

    @Test
    @DisplayName("on empty paper the L goes horizontal first (tie keeps the first candidate)")
    void horizontalFirst() {
        assertEquals(List.of(Wire.of(0, 0, 4, 0), Wire.of(4, 0, 4, 3)),
                Router.route(empty(), new GridPoint(0, 0), new GridPoint(4, 3)));
    }

    @Test
    @DisplayName("an L whose corner leg would land on a foreign pin turns the other way")
    void avoidsForeignPin() {
        // a ground symbol's pin at (2, 0) sits on the horizontal-first leg
        Stage s = empty().withPart(Part.of("GND1", PartKind.GROUND, Placement.at(2, 0)));
        List<Wire> r = Router.route(s, new GridPoint(0, 0), new GridPoint(4, 3));
        assertEquals(List.of(Wire.of(0, 0, 0, 3), Wire.of(0, 3, 4, 3)), r);
    }

    @Test
    @DisplayName("when both Ls hit pins a Z-shape between them is used")
    void zShape() {
        Stage s = empty().withPart(Part.of("GND1", PartKind.GROUND, Placement.at(2, 0)))
                .withPart(Part.of("GND2", PartKind.GROUND, Placement.at(0, 2)));
        List<Wire> r = Router.route(s, new GridPoint(0, 0), new GridPoint(4, 4));
        assertEquals(3, r.size());
        for (Wire w : r) {
            assertTrue(!w.contains(new GridPoint(2, 0)) && !w.contains(new GridPoint(0, 2)), w.toString());
        }
    }

    static Stream<Arguments> pairs() {
        Random rnd = new Random(77L);
        List<Arguments> out = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            out.add(Arguments.of(new GridPoint(rnd.nextInt(30) - 2, rnd.nextInt(22) - 2),
                    new GridPoint(rnd.nextInt(30) - 2, rnd.nextInt(22) - 2)));
        }
        return out.stream();
    }

    @ParameterizedTest(name = "{0} to {1}")
    @MethodSource("pairs")
    @DisplayName("routes on the default stage are orthogonal chains from start to end with at most three legs")
    void routeInvariants(GridPoint a, GridPoint b) {
        Stage s = Templates.defaultStage();
        List<Wire> r = Router.route(s, a, b);
        if (a.equals(b)) {
            assertTrue(r.isEmpty());
            return;
        }
        assertTrue(r.size() >= 1 && r.size() <= 3);
        assertEquals(a, r.get(0).from());
        assertEquals(b, r.get(r.size() - 1).to());
        for (int i = 0; i + 1 < r.size(); i++) {
            assertEquals(r.get(i).to(), r.get(i + 1).from());
        }
        int pinsHit = 0;
        for (Part p : s.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                GridPoint g = p.pinPoint(pin.name());
                if (!g.equals(a) && !g.equals(b) && r.stream().anyMatch(w -> w.contains(g))) {
                    pinsHit++;
                }
            }
        }
        // a route that lands on a pin must be no worse than both plain L-shapes
        if (pinsHit > 0) {
            List<Wire> h = List.of(new Wire(a, new GridPoint(b.gridX(), a.gridY())), new Wire(new GridPoint(b.gridX(), a.gridY()), b));
            List<Wire> v = List.of(new Wire(a, new GridPoint(a.gridX(), b.gridY())), new Wire(new GridPoint(a.gridX(), b.gridY()), b));
            assertTrue(countPins(s, h, a, b) >= pinsHit && countPins(s, v, a, b) >= pinsHit);
        }
    }

    private static int countPins(Stage s, List<Wire> route, GridPoint a, GridPoint b) {
        int n = 0;
        for (Part p : s.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                GridPoint g = p.pinPoint(pin.name());
                if (!g.equals(a) && !g.equals(b) && route.stream().anyMatch(w -> w.contains(g))) {
                    n++;
                }
            }
        }
        return n;
    }
}
