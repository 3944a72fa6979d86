package org.armature.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The nets are found once per drawing: values and conditions do not change them, a move does. */
class ConnectivityMemoTest {

    @Test
    @DisplayName("a value edit or another pin state reuses the nets; a moved part or a renamed test point does not")
    void oncePerDrawing() {
        Stage s = Templates.defaultStage();
        Connectivity first = Connectivity.of(s);
        assertEquals(Connectivity.compute(s), first, "the memo gives what a fresh search gives");
        Stage valued = s.updatePart("R1", p -> p.with("resistanceOhms", 2200));
        assertSame(first, Connectivity.of(valued));
        assertSame(first, Connectivity.of(s.withConditions(s.conditions().withPinHigh(false))));
        Stage moved = s.updatePart("R2", p -> p.withPlacement(p.placement().movedTo(p.placement().origin().plus(0, 3))));
        Connectivity afterMove = Connectivity.of(moved);
        assertNotSame(first, afterMove);
        assertEquals(Connectivity.compute(moved), afterMove);
        TestPoint tp = s.testPoints().get(0);
        List<TestPoint> renamed = new java.util.ArrayList<>(s.testPoints());
        renamed.set(0, new TestPoint(tp.net() + "x", tp.ref(), tp.pin()));
        Stage named = s.withTestPoints(renamed);
        assertEquals(Connectivity.compute(named), Connectivity.of(named));
        assertEquals(Connectivity.compute(s), Connectivity.of(s), "back to the first drawing");
    }
}
