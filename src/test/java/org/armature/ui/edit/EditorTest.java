package org.armature.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Stream;
import org.armature.model.GridPoint;
import org.armature.model.ParamKeys;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinSpec;
import org.armature.model.Stage;
import org.armature.model.Templates;
import org.armature.model.Wire;
import org.armature.render.Selection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

class EditorTest {

    private final Stage start = Templates.defaultStage();

    @Test
    @DisplayName("deleting Q1 removes its three wires in the same undo step; undo restores the identical stage")
    void deleteCascade() {
        Editor e = new Editor(start);
        e.select(Selection.ofPart("Q1"));
        e.deleteSelection();
        assertTrue(e.stage().part("Q1").isEmpty());
        // template layout: Q1 has wires at its base (14,12)-(17,12), collector (20,8)-(20,10), emitter (20,14)-(20,16)
        assertEquals(start.wires().size() - 3, e.stage().wires().size());
        assertEquals(1, e.history().depth());
        assertTrue(e.undo());
        assertEquals(start, e.stage());
        assertTrue(e.redo());
        assertTrue(e.stage().part("Q1").isEmpty());
    }

    @Test
    @DisplayName("the dirty flag follows the saved mark through undo and redo")
    void dirtyFlag() {
        Editor e = new Editor(start);
        assertFalse(e.history().isDirty());
        e.setValue("R1", ParamKeys.RESISTANCE_OHMS, 2200);
        assertTrue(e.history().isDirty());
        e.history().markSaved();
        assertFalse(e.history().isDirty());
        e.undo();
        assertTrue(e.history().isDirty());
        e.redo();
        assertFalse(e.history().isDirty());
    }

    @Test
    @DisplayName("consecutive moves of one part merge into one step, and one undo takes them all back")
    void dragsMerge() {
        Editor e = new Editor(start);
        e.select(Selection.ofPart("R2"));
        e.moveSelection(1, 0);
        e.moveSelection(1, 0);
        e.moveSelection(0, 1);
        assertEquals(1, e.history().depth());
        assertEquals(new GridPoint(17, 17), e.stage().require("R2").placement().origin());
        e.undo();
        assertEquals(start, e.stage());
    }

    @Test
    @DisplayName("a move after a save does not merge into the saved step")
    void noMergeAcrossSave() {
        Editor e = new Editor(start);
        e.select(Selection.ofPart("R2"));
        e.moveSelection(1, 0);
        e.history().markSaved();
        e.moveSelection(1, 0);
        assertEquals(2, e.history().depth());
        e.undo();
        assertFalse(e.history().isDirty());
    }

    @Test
    @DisplayName("wires attached to a moved part follow its pins and stay orthogonal and connected")
    void wiresFollow() {
        Editor e = new Editor(start);
        e.select(Selection.ofPart("R2"));
        e.moveSelection(2, 1);
        Part r2 = e.stage().require("R2");
        GridPoint a = r2.pinPoint("a");
        assertTrue(e.stage().wires().stream().anyMatch(w -> w.from().equals(a) || w.to().equals(a)), "pin a still wired");
        // the base node at (15,12) is still reached
        assertTrue(e.stage().wires().stream().anyMatch(w -> w.contains(new GridPoint(15, 12))));
        // template layout: R2's end b sat on GND2's pin at (15,18); a wire now joins them
        assertEquals(org.armature.model.Connectivity.GROUND,
                org.armature.model.Connectivity.of(e.stage()).net("R2", "b"));
        assertEquals(org.armature.model.Connectivity.of(start).net("R2", "a"),
                org.armature.model.Connectivity.of(e.stage()).net("R2", "a"));
    }

    @Test
    @DisplayName("rotate then mirror then undo twice gives the identical stage")
    void rotateMirror() {
        Editor e = new Editor(start);
        e.select(Selection.ofPart("D1"));
        e.rotateSelection();
        assertEquals(270, e.stage().require("D1").placement().rotationDegrees(), "template D1 is at 180°");
        e.mirrorSelection();
        assertTrue(e.stage().require("D1").placement().mirrored());
        e.undo();
        e.undo();
        assertEquals(start, e.stage());
    }

    @Test
    @DisplayName("placing from the palette picks the next free designator: R3 on the default stage")
    void placeNextRef() {
        Editor e = new Editor(start);
        String ref = e.place(PartKind.RESISTOR, new GridPoint(30, 10));
        assertEquals("R3", ref);
        assertEquals(Selection.ofPart("R3"), e.selection());
    }

    @Test
    @DisplayName("a drawn wire is routed orthogonally and undoes in one step")
    void drawWire() {
        Editor e = new Editor(start);
        e.drawWire(new GridPoint(30, 0), new GridPoint(34, 3));
        assertEquals(start.wires().size() + 2, e.stage().wires().size());
        assertEquals(1, e.history().depth());
        e.undo();
        assertEquals(start, e.stage());
    }

    @Test
    @DisplayName("copy and paste duplicates the drive network with fresh designators, offset by two units")
    void copyPaste() {
        Editor e = new Editor(start);
        e.select(new Selection(Set.of("R1", "R2"), Set.of()));
        Editor.Clip clip = e.copy();
        e.paste(clip);
        assertTrue(e.stage().part("R3").isPresent() && e.stage().part("R4").isPresent());
        assertEquals(start.require("R1").placement().origin().plus(2, 2), e.stage().require("R3").placement().origin());
        assertEquals(Set.of("R3", "R4"), e.selection().refs());
        e.undo();
        assertEquals(start, e.stage());
    }

    @ParameterizedTest(name = "{0} Ω stepped {1} is {2} Ω")
    @CsvSource(textBlock = """
            1000, 1, 1100
            1000, -1, 910
            4700, 2, 5600
            9100, 1, 10000
            1050, 1, 1100
            1050, -1, 1000
            100, -24, 10
            """)
    @DisplayName("E24 stepping (IEC 60063 E24 table)")
    void e24(double from, int steps, double to) {
        assertEquals(to, PreferredValues.step(from, steps), to * 1e-12);
    }

    @Test
    @DisplayName("arrow-key stepping of R1 merges into one step; undo restores the default-valued document")
    void steppingMerges() {
        Editor e = new Editor(start);
        e.stepPreferred("R1", ParamKeys.RESISTANCE_OHMS, 1);
        e.stepPreferred("R1", ParamKeys.RESISTANCE_OHMS, 1);
        assertEquals(1200, e.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9, "E24: 1k -> 1k1 -> 1k2");
        assertEquals(1, e.history().depth());
        e.undo();
        assertEquals(start, e.stage());
    }

    static Stream<Long> seeds() {
        return Stream.of(1L, 2L, 3L, 5L, 8L, 13L, 21L, 34L);
    }

    @ParameterizedTest(name = "seed {0}")
    @MethodSource("seeds")
    @DisplayName("any random sequence of edits undoes back to the identical stage and redoes to the same end")
    void randomEditsUndo(long seed) {
        Random rnd = new Random(seed);
        Editor e = new Editor(start);
        for (int i = 0; i < 25; i++) {
            List<String> refs = e.stage().parts().stream().map(Part::ref).toList();
            if (refs.isEmpty()) {
                break;
            }
            String ref = refs.get(rnd.nextInt(refs.size()));
            e.select(Selection.ofPart(ref));
            switch (rnd.nextInt(7)) {
                case 0 -> e.moveSelection(rnd.nextInt(5) - 2, rnd.nextInt(5) - 2);
                case 1 -> e.rotateSelection();
                case 2 -> e.mirrorSelection();
                case 3 -> e.deleteSelection();
                case 4 -> e.place(PartKind.values()[rnd.nextInt(PartKind.values().length)],
                        new GridPoint(rnd.nextInt(30), rnd.nextInt(20)));
                case 5 -> e.drawWire(new GridPoint(rnd.nextInt(30), rnd.nextInt(20)), new GridPoint(rnd.nextInt(30), rnd.nextInt(20)));
                default -> e.setPinHigh(rnd.nextBoolean());
            }
        }
        Stage end = e.stage();
        while (e.undo()) {
            // back to the start
        }
        assertEquals(start, e.stage());
        while (e.redo()) {
            // forward to the end
        }
        assertEquals(end, e.stage());
        assertNotEquals(0, e.history().depth());
        for (Wire w : end.wires()) {
            assertTrue(w.from().gridX() == w.to().gridX() || w.from().gridY() == w.to().gridY());
        }
        for (Part p : end.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                p.pinPoint(pin.name());
            }
        }
    }
}
