package org.armature.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import org.junit.jupiter.api.Test;

/** The fault badges: one per faulted part, in the fail state, before the readout badges. */
class FaultMarksTest {

    @Test
    void oneBadgePerPartBeforeTheOthers() {
        Annotations a = new Annotations(List.of(), List.of(),
                List.of(new Annotations.PartBadge("Q1", "cut off", Annotations.State.OK)), List.of(), List.of());
        Annotations m = FaultMarks.marked(a, List.of("R1:open", "Q1.b:track-open", "R1:drift-x10"));
        assertEquals(List.of(
                new Annotations.PartBadge("R1", "fault: open, drift-x10", Annotations.State.FAIL),
                new Annotations.PartBadge("Q1", "fault: track-open at b", Annotations.State.FAIL),
                new Annotations.PartBadge("Q1", "cut off", Annotations.State.OK)), m.badges());
        assertSame(a, FaultMarks.marked(a, List.of()));
    }
}
