package org.armature.ui.edit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.OptionalDouble;
import java.util.Set;
import org.armature.model.GridPoint;
import org.armature.model.ParamKeys;
import org.armature.model.Part;
import org.armature.model.PartKind;
import org.armature.model.PinSpec;
import org.armature.model.Placement;
import org.armature.model.Stage;
import org.armature.model.StageSettings;
import org.armature.model.Templates;
import org.armature.model.TestPoint;
import org.armature.model.Wire;
import org.armature.render.Selection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Editing defects found by trying the editor as a new user. Each test here failed on the code before
 * its fix (checked against commit 8d44398 with the same steps): the undo label read
 * "Change R1 resistanceOhms", the delete threw "stage has no part R1", and the paste landed R3 at
 * (2, 2) exactly on R2.
 */
class EditorDefectsTest {

    @Test
    @DisplayName("undo names a value change in the user's words: R1 resistance 1 kΩ → 1.5 kΩ")
    void undoLabelInUsersWords() {
        Editor e = new Editor(Templates.defaultStage());
        e.setValue("R1", ParamKeys.RESISTANCE_OHMS, 1500);
        assertEquals("R1 resistance 1 kΩ → 1.5 kΩ", e.history().undoLabel().orElseThrow());
        e.undo();
        assertEquals("R1 resistance 1 kΩ → 1.5 kΩ", e.history().redoLabel().orElseThrow(), "redo repeats the same words");
    }

    @Test
    @DisplayName("stepping through E24 merges into one step whose words run from the first value to the last "
            + "(IEC 60063 E24: 1.0, 1.1, 1.2)")
    void steppedLabelRunsFirstToLast() {
        Editor e = new Editor(Templates.defaultStage());
        e.stepPreferred("R1", ParamKeys.RESISTANCE_OHMS, 1);
        e.stepPreferred("R1", ParamKeys.RESISTANCE_OHMS, 1);
        assertEquals(1200, e.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9, "IEC 60063 E24");
        assertEquals(1, e.history().depth());
        assertEquals("R1 resistance 1 kΩ → 1.2 kΩ", e.history().undoLabel().orElseThrow());
    }

    @Test
    @DisplayName("the pin toggle and the ambient slider read as changes, not keys")
    void conditionWords() {
        Editor e = new Editor(Templates.defaultStage());
        e.setPinHigh(false);
        assertEquals("Drive pin high → low", e.history().undoLabel().orElseThrow());
        e.setAmbient(30);
        e.setAmbient(35);
        assertEquals("Ambient 25 °C → 35 °C", e.history().undoLabel().orElseThrow());
    }

    @Test
    @DisplayName("deleting one of two parts that share a designator removes one; undo restores the stage exactly")
    void deleteDuplicateDesignator() {
        List<Part> parts = new ArrayList<>(Templates.defaultStage().parts());
        parts.add(Part.of("R1", PartKind.RESISTOR, Placement.at(50, 40)));
        Stage base = Templates.defaultStage();
        Stage two = new Stage("dup", "", parts, base.wires(), base.testPoints(), base.conditions());
        Editor e = new Editor(two);
        e.select(Selection.ofPart("R1"));
        e.deleteSelection();
        assertEquals(1, e.stage().parts().stream().filter(p -> p.ref().equals("R1")).count());
        assertEquals(Placement.at(50, 40), e.stage().require("R1").placement(), "the first in drawing order went");
        e.undo();
        assertEquals(two, e.stage());
    }

    @Test
    @DisplayName("a paste that would land on a part moves further along the diagonal and touches no pin or wire")
    void pasteNeverLandsOnParts() {
        Stage s = new Stage("p", "", List.of(Part.of("R1", PartKind.RESISTOR, Placement.at(0, 0)),
                Part.of("R2", PartKind.RESISTOR, Placement.at(2, 2))), List.of(Wire.of(1, 6, 8, 6)), List.of(), null);
        Editor e = new Editor(s);
        e.select(Selection.ofPart("R1"));
        e.paste(e.copy());
        Part pasted = e.stage().require("R3");
        Set<GridPoint> existing = new HashSet<>();
        for (Part p : s.parts()) {
            for (PinSpec pin : p.kind().pins()) {
                existing.add(p.pinPoint(pin.name()));
            }
        }
        for (PinSpec pin : pasted.kind().pins()) {
            GridPoint g = pasted.pinPoint(pin.name());
            assertFalse(existing.contains(g), "pin " + pin.name() + " of the copy lands on a pin at " + g);
            assertFalse(s.wires().get(0).contains(g), "pin " + pin.name() + " of the copy lands on the wire at " + g);
        }
        assertEquals(0, pasted.placement().origin().gridX() % Editor.PASTE_OFFSET, "still along the diagonal");
        assertEquals(pasted.placement().origin().gridX(), pasted.placement().origin().gridY());
    }

    @Test
    @DisplayName("test points are added, renamed and removed as undoable steps")
    void testPointsUndoable() {
        Stage s = Templates.defaultStage().withTestPoints(List.of());
        Editor e = new Editor(s);
        e.nameTestPoint("Q1", "b", "base");
        assertEquals(List.of(new TestPoint("base", "Q1", "b")), e.stage().testPoints());
        assertEquals("Add test point base", e.history().undoLabel().orElseThrow());
        e.nameTestPoint("Q1", "b", "b_node");
        assertEquals(List.of(new TestPoint("b_node", "Q1", "b")), e.stage().testPoints());
        assertEquals("Rename test point base to b_node", e.history().undoLabel().orElseThrow());
        e.removeTestPoint("b_node");
        assertTrue(e.stage().testPoints().isEmpty());
        e.undo();
        e.undo();
        assertEquals(List.of(new TestPoint("base", "Q1", "b")), e.stage().testPoints());
        e.undo();
        assertEquals(s, e.stage());
    }

    @Test
    @DisplayName("the stage's name, description and settings are undoable steps of that stage")
    void headerUndoable() {
        Stage s = Templates.defaultStage();
        Editor e = new Editor(s);
        e.rename("Zone 2 valve");
        e.describe("Second zone.");
        e.setSettings(new StageSettings(OptionalDouble.of(0.01), 100, 3));
        e.setAmbientRange(0, 40);
        assertEquals("Zone 2 valve", e.stage().name());
        assertEquals("Second zone.", e.stage().description());
        assertEquals(100, e.stage().settings().monteCarloSamples());
        assertEquals("Ambient range 0 °C to 40 °C", e.history().undoLabel().orElseThrow().replaceAll(".* → ", "Ambient range "));
        for (int i = 0; i < 4; i++) {
            e.undo();
        }
        assertEquals(s, e.stage());
    }
}
