package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import javafx.event.ActionEvent;
import javafx.scene.control.TextField;
import org.armature.analysis.CheckReport;
import org.armature.model.ParamKeys;
import org.armature.model.Stage;
import org.armature.model.StageSettings;
import org.armature.model.StageTemplate;
import org.armature.model.Templates;
import org.armature.render.Selection;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** The stage's own sheet: name and check settings edited in the window, undoable, used by the verdicts. */
@ExtendWith(ApplicationExtension.class)
class StageSheetTest {

    private EditorViewModel vm;

    @Start
    void start(javafx.stage.Stage stage) {
        vm = new EditorViewModel(Templates.defaultStage(), new MainWindowTest.MemoryStore(), ReadoutSource.NONE,
                Runnable::run, Runnable::run);
        MainWindow window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(1200, 800));
        stage.show();
    }

    private void type(FxRobot robot, String id, String text) {
        TextField f = robot.lookup("#" + id).queryAs(TextField.class);
        robot.interact(() -> {
            f.setText(text);
            f.fireEvent(new ActionEvent());
        });
    }

    @Test
    @DisplayName("an ambient outside the models' range (-300 °C, below the copper law's intercept) is refused in the field, with the range, and changes nothing")
    void ambientOutsideModelsRefused(FxRobot robot) {
        Stage before = vm.stage();
        robot.interact(() -> vm.select(Selection.EMPTY));
        type(robot, "stage-ambient-min", "-300");
        assertEquals(before, vm.stage(), "nothing is applied");
        String said = vm.messageProperty().get();
        assertTrue(said.contains("-300") && said.contains("from -60 °C to 200 °C"), said);
    }

    @Test
    @DisplayName("with nothing selected the sheet edits the stage's name, ambient range, tolerance, release time and "
            + "Monte Carlo run, each undoable")
    void editsSettings(FxRobot robot) {
        Stage before = vm.stage();
        robot.interact(() -> vm.select(Selection.EMPTY));
        type(robot, "stage-name", "Zone 4 valve");
        type(robot, "stage-ambient-min", "-25");
        type(robot, "stage-ambient-max", "70 °C");
        type(robot, "stage-supply-tolerance", "10");
        type(robot, "stage-release-time", "8m");
        type(robot, "stage-mc-samples", "200");
        type(robot, "stage-mc-seed", "7");
        Stage s = vm.stage();
        assertEquals("Zone 4 valve", s.name());
        assertEquals(-25, s.conditions().ambientMinCelsius(), 0);
        assertEquals(70, s.conditions().ambientMaxCelsius(), 0);
        assertEquals(10, vm.coilSupply().orElseThrow().value(ParamKeys.TOLERANCE_PERCENT), 0);
        assertEquals(new StageSettings(OptionalDouble.of(0.008), 200, 7), s.settings());
        assertEquals("Undo Monte Carlo seed 1 → 7", vm.undoLabelProperty().get());
        for (int i = 0; i < 7; i++) {
            robot.interact(vm::undo);
        }
        assertEquals(before, vm.stage());
    }

    @Test
    @DisplayName("the window's verdicts run the stage's own Monte Carlo samples and seed")
    void verdictsUseSettings() {
        Stage s = Templates.build(StageTemplate.DARLINGTON_CHANNEL).withSettings(new StageSettings(OptionalDouble.empty(), 12, 5));
        CheckReport r = Analyses.engineVerdicts().compute(s).report().orElseThrow();
        assertTrue(r.yield().isPresent());
        assertEquals(12, r.yield().get().samples());
        assertEquals(5, r.yield().get().seed());
    }
}
