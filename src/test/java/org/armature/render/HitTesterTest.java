package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import org.armature.model.GridPoint;
import org.armature.model.PinRef;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.armature.model.Wire;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class HitTesterTest {

    private final Stage stage = Templates.defaultStage();

    @Test
    @DisplayName("a point on Q1's base pin hits the pin (template layout: Q1 at (19,12), base offset (-2,0))")
    void pinWinsOverBody() {
        HitTester.Hit h = HitTester.at(stage, 17.1, 12.05, 0.3);
        assertEquals(new HitTester.PinHit(new PinRef("Q1", "b"), new GridPoint(17, 12)), h);
    }

    @ParameterizedTest(name = "({0}, {1}) hits {2}")
    @CsvSource(textBlock = """
            12.0, 12.1, R1
            19.3, 12.0, Q1
            20.1,  6.0, K1
            25.0,  6.3, K1
            26.0, 12.1, E1
            """)
    @DisplayName("points inside symbol bodies hit the part (template layout, derived from PartGeometry boxes)")
    void bodyHits(double x, double y, String ref) {
        assertEquals(new HitTester.PartHit(ref), HitTester.at(stage, x, y, 0.2));
    }

    @Test
    @DisplayName("a point beside a wire within tolerance hits it; outside the tolerance it does not")
    void wireTolerance() {
        int index = stage.wires().indexOf(Wire.of(20, 0, 20, 4));
        assertEquals(new HitTester.WireHit(index), HitTester.at(stage, 20.15, 2.0, 0.2));
        assertInstanceOf(HitTester.NoHit.class, HitTester.at(stage, 20.35, 2.0, 0.2));
    }

    @Test
    @DisplayName("empty paper hits nothing")
    void emptyPaper() {
        assertInstanceOf(HitTester.NoHit.class, HitTester.at(stage, -30, -30, 1));
    }

    @Test
    @DisplayName("a rubber band around the drive network selects R1, R2, U1 and the wires inside it")
    void rubberBand() {
        Box band = new Box(3, 10, 16, 17.5);
        assertEquals(java.util.Set.of("U1", "R1", "R2"), HitTester.partsWithin(stage, band));
        int w = stage.wires().indexOf(Wire.of(8, 12, 10, 12));
        assertEquals(true, HitTester.wiresWithin(stage, band).contains(w));
    }

    @ParameterizedTest(name = "distance from ({0}, {1}) is {2}")
    @CsvSource(textBlock = """
            0, 0, 0
            2, 1, 1
            -3, 0, 3
            7, 4, 5
            """)
    @DisplayName("distance to the segment (0,0)-(4,0), derived by Pythagoras")
    void distance(double x, double y, double d) {
        assertEquals(d, HitTester.distanceToSegment(Wire.of(0, 0, 4, 0), x, y), 1e-12);
    }
}
