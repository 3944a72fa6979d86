package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import javafx.event.ActionEvent;
import javafx.geometry.Point2D;
import javafx.scene.control.Label;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.TitledPane;
import javafx.scene.input.KeyCode;
import org.armature.analysis.faults.Diagnosis;
import org.armature.model.Connectivity;
import org.armature.model.FaultHunt;
import org.armature.model.Templates;
import org.armature.model.Wire;
import org.armature.render.PlacedLabel;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The window's fault hunt as a technician uses it: with the diagnosis pane open, a click on a net
 * of the drawing offers to enter a reading there; Enter adds it to the readings table, the drawing
 * tags the net with it and the ranking follows; a prior weight changed re-ranks; the meter's input
 * resistance changed builds the dictionary again; everything entered is the document's fault hunt
 * and Undo takes it back step by step. The stage is the low-side NPN template (12 V supply, 400 Ω
 * coil, R1 1 kΩ base resistor, pin high).
 */
@ExtendWith(ApplicationExtension.class)
class FaultHuntWindowTest {

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

    private static void waitFor(String what, BooleanSupplier condition) {
        try {
            WaitForAsyncUtils.waitFor(20, TimeUnit.SECONDS, condition::getAsBoolean);
        } catch (java.util.concurrent.TimeoutException e) {
            throw new AssertionError("not within 20 s: " + what, e);
        }
    }

    private DiagnosisPanel panel(FxRobot robot) {
        return robot.lookup("#diag-ranking").queryAs(Label.class).getParent() instanceof DiagnosisPanel p ? p
                : (DiagnosisPanel) robot.lookup(n -> n instanceof DiagnosisPanel).query();
    }

    private void openPane(FxRobot robot) {
        robot.interact(() -> robot.lookup("#diagnosis-pane").queryAs(TitledPane.class).setExpanded(true));
        Label ranking = robot.lookup("#diag-ranking").queryAs(Label.class);
        waitFor("the fault dictionary", () -> !ranking.getText().equals(DiagnosisPanel.BUILDING)
                && !ranking.getText().isEmpty());
    }

    /** The screen point of the middle of the longest wire of a net. */
    private Point2D onNet(String net) {
        Connectivity c = Connectivity.of(vm.stage());
        Wire best = null;
        for (int i = 0; i < vm.stage().wires().size(); i++) {
            Wire w = vm.stage().wires().get(i);
            if (c.netOfWire().get(i).equals(net) && (best == null || w.from().manhattan(w.to()) > best.from().manhattan(best.to()))) {
                best = w;
            }
        }
        assertTrue(best != null, "the stage has a wire on " + net);
        SchematicCanvas canvas = window.canvas();
        double gx = (best.from().gridX() + best.to().gridX()) / 2.0;
        double gy = (best.from().gridY() + best.to().gridY()) / 2.0;
        var v = canvas.view();
        return canvas.localToScreen(v.mapX(gx, gy), v.mapY(gx, gy));
    }

    private static String first(String ranking) {
        return ranking.lines().findFirst().orElse("");
    }

    @Test
    void aReadingEnteredAtTheNetOnTheDrawingRanksTheFaults(FxRobot robot) {
        openPane(robot);
        Label ranking = robot.lookup("#diag-ranking").queryAs(Label.class);
        // no readings: the healthy stage leads on its prior
        assertTrue(ranking.getText().startsWith("1. none"), ranking.getText());

        // a click on the switch net opens the editor there, named after the net
        robot.clickOn(onNet("switch"));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(window.canvas().editor().isPresent(), "an editor near the click");
        assertEquals("Reading at switch", robot.lookup("#net-reading-title").queryAs(Label.class).getText());
        assertTrue(robot.lookup("#net-reading-high").queryAs(javafx.scene.control.ToggleButton.class).isSelected(),
                "the stage's pin state (high) first");
        // bad text: one sentence with an example, nothing lost
        robot.clickOn("#net-reading-volts").write("12x").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        String problem = robot.lookup("#net-reading-error").queryAs(Label.class).getText();
        assertTrue(problem.contains("for example") && problem.endsWith("."), problem);
        assertEquals("12x", robot.lookup("#net-reading-volts").queryAs(TextField.class).getText());
        assertEquals(List.of(), vm.huntOrStart().readings());
        // derived for R1 open, pin high: Q1 off, so the switch node sits at the 12 V supply
        robot.interact(() -> robot.lookup("#net-reading-volts").queryAs(TextField.class).setText("12"));
        robot.clickOn("#net-reading-volts").type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(window.canvas().editor().isPresent(), "Enter adds and closes");
        @SuppressWarnings("unchecked")
        TableView<DiagnosisPanel.Row> table = robot.lookup("#diag-readings").queryAs(TableView.class);
        assertEquals(List.of(new DiagnosisPanel.Row("switch", "high", "12 V", "")), table.getItems());
        assertFalse(ranking.getText().startsWith("1. none"), ranking.getText());
        assertTrue(ranking.getText().contains("switch@high expected"), ranking.getText());
        // volts in engineering notation, as on the drawing (it printed "4.08e-09 V" before)
        assertFalse(ranking.getText().matches("(?s).*\\de-\\d.*"), ranking.getText());
        assertTrue(ranking.getText().contains("read 12 V") || ranking.getText().contains("read 12.0 V"), ranking.getText());
        // the reading is tagged on the drawing at its net, by the renderer
        assertTrue(window.canvas().lastLayout().labels().stream().anyMatch(l -> l.kind() == PlacedLabel.Kind.READING
                && l.owner().equals("switch") && l.lines().subList(2, l.lines().size()).equals(List.of("high 12 V"))),
                "a reading tag at the switch net");

        // Esc closes a second editor without a reading
        robot.clickOn(onNet("switch"));
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(window.canvas().editor().isPresent());
        robot.clickOn("#net-reading-volts").write("5").type(KeyCode.ESCAPE);
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(window.canvas().editor().isPresent(), "Esc cancels");
        assertEquals(1, vm.huntOrStart().readings().size());

        // the top candidate's fault kind weighed 0: it is no longer first
        DiagnosisPanel panel = (DiagnosisPanel) robot.lookup(n -> n instanceof DiagnosisPanel).query();
        Diagnosis.Candidate top = panel.result().orElseThrow().candidates().get(0);
        String kind = top.name().substring(top.name().indexOf(':') + 1);
        TextField weight = robot.lookup("#diag-prior-" + kind).queryAs(TextField.class);
        robot.interact(() -> {
            weight.setText("0");
            weight.fireEvent(new ActionEvent());
        });
        String nowFirst = first(ranking.getText());
        assertFalse(nowFirst.contains(top.name() + " "), "was " + top.name() + ", now " + nowFirst);
        assertEquals(Map.of(kind, 0.0), vm.document().faultHunt().orElseThrow().priorWeights());

        // the meter's input resistance changed: the dictionary is built again with it
        int builds = panel.dictionaryBuilds();
        TextField ohms = robot.lookup("#diag-meter-ohms").queryAs(TextField.class);
        robot.interact(() -> {
            ohms.setText("1M");
            ohms.fireEvent(new ActionEvent());
        });
        waitFor("a dictionary with the 1 MΩ meter", () -> panel.builtDictionary()
                .map(d -> d.meter().inputOhms() == 1e6).orElse(false));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(builds + 1, panel.dictionaryBuilds());
        String status = robot.lookup("#diag-dictionary").queryAs(Label.class).getText();
        assertTrue(status.contains("meter 1 MΩ"), status);

        // all of it is the document's hunt; Undo takes it back step by step in the user's words
        FaultHunt h = vm.document().faultHunt().orElseThrow();
        assertEquals(List.of(new FaultHunt.HuntReading("switch", true, 12)), h.readings());
        assertEquals(1e6, h.meter().inputOhms(), 0);
        assertTrue(vm.dirtyProperty().get());
        assertEquals("Undo Meter input 10 MΩ → 1 MΩ", vm.undoLabelProperty().get());
        robot.interact(vm::undo);
        assertEquals("Undo Prior weight " + kind + " " + weightWords(kind) + " → 0", vm.undoLabelProperty().get());
        robot.interact(vm::undo);
        assertEquals("Undo Add reading switch@high", vm.undoLabelProperty().get());
        robot.interact(vm::undo);
        assertTrue(vm.document().faultHunt().isEmpty(), "undo removed what was entered");
        assertTrue(table.getItems().isEmpty());
        // the 10 MΩ meter again: its dictionary is built anew, then the healthy stage leads again
        waitFor("the ranking with nothing entered", () -> ranking.getText().startsWith("1. none"));
        assertTrue(window.canvas().lastLayout().labels().stream().noneMatch(l -> l.kind() == PlacedLabel.Kind.READING));
    }

    private static String weightWords(String kind) {
        return DiagnosisPanel.weightText(DiagnosisPanel.defaultWeight(kind));
    }

    @Test
    void aClickOnANetDoesNothingWhileThePaneIsClosed(FxRobot robot) {
        robot.clickOn(onNet("switch"));
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(window.canvas().editor().isPresent());
    }
}
