package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicReference;
import javafx.application.Platform;
import javafx.scene.Node;
import javafx.scene.canvas.Canvas;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.layout.GridPane;
import org.armature.io.StageFiles;
import org.armature.model.LineUp;
import org.armature.model.LineUpContext;
import org.armature.model.StageDocument;
import org.armature.model.Templates;
import org.armature.render.Palette;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The line-up view on real background threads, as in the window (solve thread, checks thread,
 * results through {@code Platform.runLater}): after a shared change the table first shows every
 * figure as pending, never a number from before the change; then the overlay and the rows fill in.
 */
@ExtendWith(ApplicationExtension.class)
class LineUpPhasedViewTest {

    private static final Path GREENHOUSE = Path.of("examples", "greenhouse-valves.stage.json");

    @TempDir
    Path dir;

    private EditorViewModel vm;
    private ExecutorService solver;
    private ExecutorService checks;

    @Start
    void start(javafx.stage.Stage stage) {
        solver = Executors.newSingleThreadExecutor();
        checks = Executors.newSingleThreadExecutor();
        Analyses analyses = new Analyses(Analyses.NO_VERDICTS, Analyses.NO_EDGES, checks, 0);
        vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, ReadoutSource.NONE, solver,
                Platform::runLater, analyses);
        stage.setScene(new MainWindow(vm, new RecentFiles()).scene(1200, 800));
        stage.show();
    }

    @AfterEach
    void stop() {
        solver.shutdownNow();
        checks.shutdownNow();
    }

    @Test
    @DisplayName("after a shared change: every cell pending at once, then the overlay and every row filled in")
    void sharedChangeFillsOverlayAndRows(FxRobot robot) throws TimeoutException {
        StageDocument doc = StageFiles.open(GREENHOUSE);
        Path file = dir.resolve("phased.stage.json");
        StageFiles.save(doc.withLineUp(Optional.of(new LineUp(List.of(0, 1, 2), LineUpContext.of(doc.stages().get(0))))),
                file);
        robot.interact(() -> assertTrue(vm.open(file)));
        AtomicReference<Dialog<ButtonType>> dialog = new AtomicReference<>();
        robot.interact(() -> {
            dialog.set(LineUpView.dialog(vm, Palette.LIGHT));
            dialog.get().show();
        });
        waitUntilComplete(robot);
        Canvas waves = robot.lookup("#line-up-waves").queryAs(Canvas.class);
        Object drawnBefore = waves.getUserData();
        assertTrue(drawnBefore instanceof Long, "the overlay was drawn for the first evaluation");
        List<String> coilBefore = row(robot, "coil current (nominal)");
        assertFalse(coilBefore.contains(LineUpView.PENDING));

        javafx.scene.control.TextField supply = robot.lookup("#line-up-supply").queryAs(javafx.scene.control.TextField.class);
        AtomicReference<List<String>> rightAfter = new AtomicReference<>();
        robot.interact(() -> {
            supply.setText("26.4");
            robot.lookup("#line-up-apply-supply").queryButton().fire();
            // still on the FX thread: no phase of the change can have been published yet
            rightAfter.set(valueCells(robot));
            assertTrue(robot.lookup("#line-up-copy").queryButton().isDisabled(), "nothing to copy while pending");
        });
        assertFalse(rightAfter.get().isEmpty());
        assertTrue(rightAfter.get().stream().allMatch(LineUpView.PENDING::equals),
                "every cell says it is pending, none shows a figure from before the change: " + rightAfter.get());

        WaitForAsyncUtils.waitFor(60, TimeUnit.SECONDS, () -> waves.getUserData() instanceof Long g
                && g > (Long) drawnBefore);
        waitUntilComplete(robot);
        assertEquals("Turn-off waveforms, 3 of 3 stages",
                robot.lookup("#line-up-waves-state").queryAs(Label.class).getText());
        List<String> cells = valueCells(robot);
        assertFalse(cells.contains(LineUpView.PENDING), "every row filled in: " + cells);
        List<String> coilAfter = row(robot, "coil current (nominal)");
        assertEquals(3, coilAfter.size());
        for (int i = 0; i < 3; i++) {
            assertNotEquals(coilBefore.get(i), coilAfter.get(i), "stage " + i + " re-solved at 26.4 V");
        }
        assertEquals(3, row(robot, "peak switch voltage").stream().filter(t -> !t.equals("\u2014")).count(),
                "each stage's turn-off figure");
        assertTrue(row(robot, "check relay.operates").stream().noneMatch(LineUpView.PENDING::equals));
        robot.interact(() -> dialog.get().close());
    }

    private static void waitUntilComplete(FxRobot robot) throws TimeoutException {
        WaitForAsyncUtils.waitFor(90, TimeUnit.SECONDS, () -> !robot.lookup("#line-up-copy").queryButton().isDisabled());
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Every cell of the table outside the label column. */
    private static List<String> valueCells(FxRobot robot) {
        GridPane table = robot.lookup("#line-up-table").queryAs(GridPane.class);
        return table.getChildren().stream().filter(n -> GridPane.getColumnIndex(n) > 0)
                .map(n -> ((Label) n).getText().replace(" \u2605", "")).toList();
    }

    /** The cells of a table row, by its label. */
    private static List<String> row(FxRobot robot, String label) {
        GridPane table = robot.lookup("#line-up-table").queryAs(GridPane.class);
        int r = table.getChildren().stream().filter(n -> ((Label) n).getText().equals(label))
                .map(GridPane::getRowIndex).findFirst().orElseThrow();
        return table.getChildren().stream().filter((Node n) -> GridPane.getRowIndex(n) == r && GridPane.getColumnIndex(n) > 0)
                .map(n -> ((Label) n).getText()).toList();
    }
}
