package org.armature.solver;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.armature.model.PartKind;
import org.armature.model.Stage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class SingularCircuitTest {

    @Test
    @DisplayName("a MOSFET gate connected to nothing is a floating node, named with the part")
    void floatingGate() {
        Stage s = new StageSketch()
                .part("V1", PartKind.SUPPLY, "volts", 12)
                .part("R1", PartKind.RESISTOR, "resistanceOhms", 400)
                .part("Q1", PartKind.NMOS)
                .wire("V1.p", "supply", "R1.a", "supply", "R1.b", "drain", "Q1.d", "drain", "Q1.s", "gnd",
                        "Q1.g", "gate")
                .build();
        SingularCircuitException e = assertThrows(SingularCircuitException.class, () -> new DcAnalysis().solve(s));
        assertEquals("solver.floating-node", e.messageKey());
        assertEquals(SingularCircuitException.Cause.FLOATING_NODE, e.singularCause());
        assertEquals(java.util.List.of("gate"), e.nodes());
        assertTrue(e.parts().contains("Q1"), e.getMessage());
        assertTrue(e.getMessage().contains("gate") && e.getMessage().contains("Q1"), e.getMessage());
    }

    @Test
    @DisplayName("a resistor pair with no DC path to ground (joined by a capacitor only) floats, both nodes named")
    void floatingSubcircuit() {
        Stage s = new StageSketch()
                .part("V1", PartKind.SUPPLY, "volts", 12)
                .part("C1", PartKind.CAPACITOR)
                .part("R1", PartKind.RESISTOR)
                .wire("V1.p", "supply", "C1.a", "supply", "C1.b", "island1", "R1.a", "island1", "R1.b", "island2")
                .build();
        SingularCircuitException e = assertThrows(SingularCircuitException.class, () -> new DcAnalysis().solve(s));
        assertEquals(java.util.List.of("island1", "island2"), e.nodes());
        assertTrue(e.parts().contains("R1") && e.parts().contains("C1"), e.getMessage());
    }

    @Test
    @DisplayName("two supplies on one net form a voltage-source loop naming both")
    void twoSuppliesOnOneNet() {
        Stage s = new StageSketch()
                .part("V1", PartKind.SUPPLY, "volts", 12)
                .part("V2", PartKind.SUPPLY, "volts", 5)
                .part("R1", PartKind.RESISTOR)
                .wire("V1.p", "rail", "V2.p", "rail", "R1.a", "rail", "R1.b", "gnd")
                .build();
        SingularCircuitException e = assertThrows(SingularCircuitException.class, () -> new DcAnalysis().solve(s));
        assertEquals("solver.source-loop", e.messageKey());
        assertTrue(e.parts().contains("V1") && e.parts().contains("V2"), e.getMessage());
        assertTrue(e.getMessage().contains("V1") && e.getMessage().contains("V2"), e.getMessage());
    }

    @Test
    @DisplayName("a supply drawn onto ground is a loop of that one source")
    void supplyShortedToGround() {
        Stage s = new StageSketch()
                .part("V1", PartKind.SUPPLY, "volts", 12)
                .wire("V1.p", "gnd")
                .build();
        SingularCircuitException e = assertThrows(SingularCircuitException.class, () -> new DcAnalysis().solve(s));
        assertEquals(java.util.List.of("V1"), e.parts());
    }
}
