package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import javafx.scene.control.ContextMenu;
import javafx.scene.control.Label;
import javafx.scene.control.MenuItem;
import org.armature.model.ParamKeys;
import org.armature.model.Templates;
import org.armature.render.Annotations;
import org.armature.render.FaultMarks;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/**
 * Fault mode: a fault injected from a part's menu shows the faulted stage's readouts with the part
 * marked, says so in the status line, leaves the document and its undo history alone, and clears.
 * The default stage is the low-side NPN template (12 V, 400 Ω coil, R1 1 kΩ base resistor).
 */
@ExtendWith(ApplicationExtension.class)
class FaultModeTest {

    private EditorViewModel vm;
    private MainWindow window;

    @Start
    void start(javafx.stage.Stage stage) {
        vm = new EditorViewModel(Templates.defaultStage(), new MainWindowTest.MemoryStore(), new EngineReadouts(),
                Runnable::run, Runnable::run);
        window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(1200, 800));
        stage.show();
    }

    private Annotations drawn() {
        return vm.annotations(window.canvas().drawnEvaluation());
    }

    private double coilAmps() {
        return drawn().gauges().get(0).coilAmps();
    }

    private String badge(String ref) {
        return drawn().badges().stream().filter(b -> b.ref().equals(ref) && !b.text().startsWith(FaultMarks.PREFIX))
                .findFirst().orElseThrow().text();
    }

    private void choose(FxRobot robot, String ref, String id) {
        robot.interact(() -> {
            ContextMenu menu = window.canvas().faultMenu(ref);
            MenuItem item = menu.getItems().stream().filter(i -> id.equals(i.getId())).findFirst().orElseThrow();
            item.fire();
        });
    }

    @Test
    void openBaseResistorFromItsMenuTurnsTheSwitchOffAndClears(FxRobot robot) {
        Label status = robot.lookup("#status-faults").queryAs(Label.class);
        // healthy, pin high: saturated switch, coil current near 12 V / 400 Ω = 30 mA (derived)
        assertTrue(coilAmps() > 0.025, "healthy coil current " + coilAmps());
        assertEquals("", status.getText());
        choose(robot, "R1", "fault-R1:open");
        // derived: no base current through 1 TΩ, so Q1 is cut off and the coil carries under 1 µA
        assertTrue(Math.abs(coilAmps()) < 1e-6, "faulted coil current " + coilAmps());
        assertTrue(badge("Q1").contains("off"), badge("Q1"));
        assertTrue(drawn().badges().stream().anyMatch(b -> b.ref().equals("R1")
                && b.text().equals("fault: open") && b.state() == Annotations.State.FAIL));
        assertTrue(status.getText().contains("R1:open"), status.getText());
        // the document and its history are untouched
        assertEquals(1000, vm.stage().require("R1").value(ParamKeys.RESISTANCE_OHMS), 0);
        assertFalse(vm.canUndoProperty().get());
        // a second fault at once: the menu shows the first one ticked
        choose(robot, "K1", "fault-K1:welded");
        assertEquals(2, vm.faultsProperty().get().size());
        robot.interact(() -> assertTrue(((javafx.scene.control.CheckMenuItem) window.canvas().faultMenu("R1")
                .getItems().get(0)).isSelected()));
        choose(robot, "R1", "fault-clear");
        assertTrue(vm.faultsProperty().get().isEmpty());
        assertTrue(coilAmps() > 0.025, "cleared coil current " + coilAmps());
        assertTrue(drawn().badges().stream().noneMatch(b -> b.text().startsWith(FaultMarks.PREFIX)));
        assertEquals("", status.getText());
    }

    @Test
    void twoReadingsRankTheCandidatesAndNameTheNextMeasurement(FxRobot robot) {
        robot.interact(() -> robot.lookup("#diagnosis-pane").queryAs(javafx.scene.control.TitledPane.class).setExpanded(true));
        Label ranking = robot.lookup("#diag-ranking").queryAs(Label.class);
        Label next = robot.lookup("#diag-next").queryAs(Label.class);
        // the dictionary is built off the FX thread; the panel says so until it arrives
        try {
            org.testfx.util.WaitForAsyncUtils.waitFor(20, java.util.concurrent.TimeUnit.SECONDS,
                    () -> !ranking.getText().equals(DiagnosisPanel.BUILDING) && !ranking.getText().isEmpty());
        } catch (java.util.concurrent.TimeoutException e) {
            throw new AssertionError("no fault dictionary within 20 s: " + ranking.getText(), e);
        }
        // no readings: the healthy stage leads on its prior
        assertTrue(ranking.getText().startsWith("1. none"), ranking.getText());
        javafx.scene.control.TextField entry = robot.lookup("#diag-reading").queryAs(javafx.scene.control.TextField.class);
        javafx.scene.control.Button add = robot.lookup("#diag-add").queryAs(javafx.scene.control.Button.class);
        // derived for R1 open, pin high: Q1 off, so the switch node sits at the 12 V supply and the
        // base (control) is held at 0 V by the 10 kΩ pull-down
        robot.interact(() -> {
            entry.setText("switch@high=12");
            add.fire();
            entry.setText("control@high=0");
            add.fire();
        });
        assertEquals("", robot.lookup("#diag-error").queryAs(Label.class).getText());
        assertFalse(ranking.getText().startsWith("1. none"), ranking.getText());
        assertTrue(ranking.getText().contains("R1:open"), ranking.getText());
        assertTrue(ranking.getText().contains("switch@high expected"), ranking.getText());
        assertTrue(next.getText().startsWith("Next: measure "), next.getText());
        // a net the stage does not have is one sentence naming the valid ones
        robot.interact(() -> {
            entry.setText("nowhere@high=1");
            add.fire();
        });
        assertTrue(robot.lookup("#diag-error").queryAs(Label.class).getText().contains("valid: "));
    }

    @Test
    void aRightClickOnANetOffersTheTrackOpensThatSplitIt(FxRobot robot) {
        // the NPN template's switch net joins the coil, the diode and Q1's collector; the cut toward
        // the parts that also reach `control` (Q1) leaves the coil without a return path (derived)
        org.armature.analysis.faults.Fault cut = new org.armature.analysis.faults.Fault("switch~control",
                org.armature.analysis.faults.FaultKind.TRACK_OPEN);
        assertTrue(vm.trackFaultsOfNet("switch").contains(cut), vm.trackFaultsOfNet("switch").toString());
        org.armature.model.Connectivity c = org.armature.model.Connectivity.of(vm.stage());
        org.armature.model.Wire best = null;
        for (int i = 0; i < vm.stage().wires().size(); i++) {
            org.armature.model.Wire w = vm.stage().wires().get(i);
            if (c.netOfWire().get(i).equals("switch")
                    && (best == null || w.from().manhattan(w.to()) > best.from().manhattan(best.to()))) {
                best = w;
            }
        }
        assertTrue(best != null, "a wire on the switch net");
        SchematicCanvas canvas = window.canvas();
        double gx = (best.from().gridX() + best.to().gridX()) / 2.0;
        double gy = (best.from().gridY() + best.to().gridY()) / 2.0;
        var v = canvas.view();
        robot.rightClickOn(canvas.localToScreen(v.mapX(gx, gy), v.mapY(gx, gy)));
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("Track open on switch toward control");
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        assertEquals(java.util.List.of(cut), vm.faultsProperty().get());
        assertTrue(Math.abs(coilAmps()) < 1e-6, "coil current with its return cut " + coilAmps());
        // the cut is marked on the resistor that stands for it (before: a badge on no part, so no mark)
        assertTrue(drawn().badges().stream().anyMatch(b -> b.ref().startsWith("XF")
                && b.text().equals(FaultMarks.PREFIX + "track-open switch~control")), drawn().badges().toString());
    }

    @Test
    void aRightClickOnThePartOpensItsFaultMenu(FxRobot robot) {
        var r1 = org.armature.render.PartGeometry.bodyBounds(vm.stage().require("R1"));
        SchematicCanvas c = window.canvas();
        var v = c.view();
        var screen = c.localToScreen(v.mapX(r1.centreX(), r1.centreY()), v.mapY(r1.centreX(), r1.centreY()));
        robot.rightClickOn(screen);
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        robot.clickOn("Fault R1:open");
        org.testfx.util.WaitForAsyncUtils.waitForFxEvents();
        assertEquals(java.util.List.of(new org.armature.analysis.faults.Fault("R1",
                org.armature.analysis.faults.FaultKind.OPEN)), vm.faultsProperty().get());
        assertTrue(Math.abs(coilAmps()) < 1e-6, "faulted coil current " + coilAmps());
    }

    @Test
    void aTrackOpenAtTheBaseFromTheTransistorsMenu(FxRobot robot) {
        robot.interact(() -> {
            ContextMenu menu = window.canvas().faultMenu("Q1");
            javafx.scene.control.Menu sub = (javafx.scene.control.Menu) menu.getItems().stream()
                    .filter(i -> i instanceof javafx.scene.control.Menu).findFirst().orElseThrow();
            sub.getItems().stream().filter(i -> "fault-Q1.b:track-open".equals(i.getId())).findFirst().orElseThrow().fire();
        });
        // derived: the base cut off, Q1 carries no collector current: under 1 µA in the coil
        assertTrue(Math.abs(coilAmps()) < 1e-6, "faulted coil current " + coilAmps());
        assertTrue(drawn().badges().stream().anyMatch(b -> b.ref().equals("Q1") && b.text().equals("fault: track-open at b")));
    }
}
