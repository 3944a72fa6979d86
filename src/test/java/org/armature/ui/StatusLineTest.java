package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayDeque;
import java.util.Deque;
import javafx.scene.control.Label;
import org.armature.model.ParamKeys;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** The status line and the canvas show the same evaluation, also while a newer one is being solved. */
@ExtendWith(ApplicationExtension.class)
class StatusLineTest {

    private final Deque<Runnable> solves = new ArrayDeque<>();
    private EditorViewModel vm;
    private MainWindow window;

    @Start
    void start(javafx.stage.Stage stage) {
        ReadoutSource r = st -> new ReadoutSource.Readouts(EditorViewModelTest.MARKING.compute(st).annotations(),
                "solved R1 = " + st.require("R1").value(ParamKeys.RESISTANCE_OHMS));
        vm = new EditorViewModel(Templates.defaultStage(), new MainWindowTest.MemoryStore(), r, solves::add, Runnable::run);
        window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(1200, 800));
        stage.show();
    }

    @Test
    @DisplayName("a value edit waiting for its solve keeps the drawn evaluation's status and readouts together")
    void statusFollowsTheDrawing(FxRobot robot) {
        Label status = robot.lookup("#status-solver").queryAs(Label.class);
        robot.interact(() -> solves.poll().run());
        assertEquals("solved R1 = 1000.0", status.getText());
        robot.interact(() -> vm.setValue("R1", ParamKeys.RESISTANCE_OHMS, 2200));
        assertEquals(Evaluation.SOLVING, vm.evaluation().status(), "the newest evaluation is pending");
        assertEquals("solved R1 = 1000.0", status.getText(), "the line stays with the drawing");
        assertEquals(1000, window.canvas().drawnEvaluation().annotations().voltages().get(0).volts(), 0);
        robot.interact(() -> solves.poll().run());
        assertEquals("solved R1 = 2200.0", status.getText());
        assertEquals(2200, window.canvas().drawnEvaluation().annotations().voltages().get(0).volts(), 0);
    }
}
