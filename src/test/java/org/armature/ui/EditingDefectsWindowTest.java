package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import javafx.event.ActionEvent;
import javafx.geometry.Point2D;
import javafx.scene.Node;
import javafx.scene.control.TextField;
import javafx.scene.control.ToggleButton;
import javafx.scene.input.KeyCode;
import org.armature.model.ParamKeys;
import org.armature.model.PartKind;
import org.armature.model.Templates;
import org.armature.render.Selection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window's editing defects found by trying it as a new user; each test failed before its fix
 * (run against the views of the commit before, with the evaluation view model already in place).
 */
@ExtendWith(ApplicationExtension.class)
class EditingDefectsWindowTest {

    private EditorViewModel vm;
    private MainWindow window;
    private final MainWindowTest.MemoryStore store = new MainWindowTest.MemoryStore();

    @Start
    void start(javafx.stage.Stage stage) {
        vm = new EditorViewModel(Templates.defaultStage(), store, ReadoutSource.NONE, Runnable::run, Runnable::run);
        window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(1200, 800));
        stage.show();
    }

    @Test
    @DisplayName("Up twice in R1's focused field steps 1 k → 1.1 k → 1.2 k (IEC 60063 E24) and leaving the field "
            + "does not write the old value back")
    void arrowStepsSurviveLeavingTheField(FxRobot robot) {
        robot.interact(() -> vm.select(Selection.ofPart("R1")));
        TextField f = robot.lookup("#param-resistanceOhms").queryAs(TextField.class);
        robot.interact(f::requestFocus);
        robot.type(KeyCode.UP, 2);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1200, vm.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9, "IEC 60063 E24");
        robot.type(KeyCode.TAB);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(1200, vm.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9, "leaving the field keeps the steps");
        assertEquals("Undo R1 resistance 1 kΩ → 1.2 kΩ", vm.undoLabelProperty().get());
    }

    @Test
    @DisplayName("after an edit in the part sheet the same field stays in the scene and Tab goes to the next value field")
    void sheetKeepsItsFieldsAfterItsOwnEdit(FxRobot robot) {
        robot.interact(() -> vm.select(Selection.ofPart("R1")));
        TextField f = robot.lookup("#param-resistanceOhms").queryAs(TextField.class);
        robot.interact(() -> {
            f.requestFocus();
            f.setText("2k2");
            f.fireEvent(new ActionEvent());
        });
        assertEquals(2200, vm.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 1e-9, "IEC 60062 letter code");
        assertSame(f, robot.lookup("#param-resistanceOhms").queryAs(TextField.class), "the field was not rebuilt");
        robot.type(KeyCode.TAB);
        WaitForAsyncUtils.waitForFxEvents();
        Node focused = f.getScene().getFocusOwner();
        assertTrue(focused instanceof TextField && focused.getId() != null && focused.getId().startsWith("param-"),
                "focus went to " + focused);
    }

    @Test
    @DisplayName("the pin toggle reads Pin LOW after switching low and Pin HIGH after switching back")
    void pinToggleText(FxRobot robot) {
        ToggleButton pin = robot.lookup("#pin-toggle").queryAs(ToggleButton.class);
        assertEquals("Pin HIGH", pin.getText());
        robot.interact(pin::fire);
        assertFalse(vm.stage().conditions().pinHigh());
        assertEquals("Pin LOW", pin.getText());
        robot.interact(pin::fire);
        assertEquals("Pin HIGH", pin.getText());
    }

    @Test
    @DisplayName("a figure typed in the datasheet helper stays when another value of the part is edited")
    void datasheetFigureKept(FxRobot robot) {
        robot.interact(() -> vm.select(Selection.ofPart("Q1")));
        TextField ic = robot.lookup("#fit-hfe-ic").queryAs(TextField.class);
        robot.interact(() -> ic.setText("20 mA"));
        robot.interact(() -> vm.setValue("Q1", ParamKeys.BETA_FORWARD, 150));
        assertEquals("20 mA", robot.lookup("#fit-hfe-ic").queryAs(TextField.class).getText());
    }

    @Test
    @DisplayName("a status message goes once the document changes after it")
    void staleMessageCleared(FxRobot robot) {
        robot.interact(() -> vm.saveAs(Path.of("memory", "a.stage.json")));
        assertEquals("Saved a.stage.json", vm.messageProperty().get());
        robot.interact(() -> vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 2200));
        assertEquals("", vm.messageProperty().get());
    }

    @Test
    @DisplayName("dragging a resistor from the palette onto the drawing places it where it is dropped")
    void paletteDrag(FxRobot robot) {
        Node button = robot.lookup("#palette-resistor").query();
        SchematicCanvas c = window.canvas();
        Point2D target = c.localToScreen(c.getWidth() * 0.8, c.getHeight() * 0.8);
        int before = vm.stage().parts().size();
        robot.drag(button).dropTo(target);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before + 1, vm.stage().parts().size(), "one part placed");
        var placed = vm.stage().parts().get(vm.stage().parts().size() - 1);
        assertEquals(PartKind.RESISTOR, placed.kind());
        Point2D local = c.screenToLocal(target);
        assertEquals(Math.round(c.gridX(local.getX())), placed.placement().origin().gridX(), 1);
        assertEquals(Math.round(c.gridY(local.getY())), placed.placement().origin().gridY(), 1);
    }

    @Test
    @DisplayName("a double click on a pin adds, renames and removes a test point there, each undoable")
    void testPointOnCanvas(FxRobot robot) {
        java.util.concurrent.atomic.AtomicReference<String> answer = new java.util.concurrent.atomic.AtomicReference<>();
        robot.interact(() -> window.setTestPointQuestion((where, now) -> java.util.Optional.of(answer.get())));
        var q1 = vm.stage().require("Q1");
        var b = q1.pinPoint("e");
        SchematicCanvas c = window.canvas();
        var v = c.view();
        Point2D screen = c.localToScreen(v.mapX(b.gridX(), b.gridY()), v.mapY(b.gridX(), b.gridY()));
        int before = vm.stage().testPoints().size();
        // pauses longer than the double-click interval keep the three double clicks apart
        answer.set("emitter");
        robot.doubleClickOn(screen);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(vm.stage().testPoints().contains(new org.armature.model.TestPoint("emitter", "Q1", "e")),
                vm.stage().testPoints().toString());
        robot.sleep(1000);
        answer.set("e_node");
        robot.doubleClickOn(screen);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals("Undo Rename test point emitter to e_node", vm.undoLabelProperty().get());
        robot.sleep(1000);
        answer.set("");
        robot.doubleClickOn(screen);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, vm.stage().testPoints().size());
        robot.interact(vm::undo);
        robot.interact(vm::undo);
        robot.interact(vm::undo);
        assertEquals(Templates.defaultStage(), vm.stage());
    }

    @Test
    @DisplayName("the part sheet's test point field follows an undo of a test point change")
    void testPointFieldFollowsUndo(FxRobot robot) {
        robot.interact(() -> vm.select(Selection.ofPart("Q1")));
        TextField e = robot.lookup("#testpoint-e").queryAs(TextField.class);
        robot.interact(() -> {
            e.setText("emitter");
            e.fireEvent(new ActionEvent());
        });
        assertTrue(vm.stage().testPoints().contains(new org.armature.model.TestPoint("emitter", "Q1", "e")));
        robot.interact(vm::undo);
        assertEquals("", robot.lookup("#testpoint-e").queryAs(TextField.class).getText());
    }
}
