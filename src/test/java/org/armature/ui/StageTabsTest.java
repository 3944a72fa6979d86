package org.armature.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javafx.scene.control.TabPane;
import org.armature.io.StageFiles;
import org.armature.io.StageJson;
import org.armature.model.HighSideDrive;
import org.armature.model.ParamKeys;
import org.armature.model.Stage;
import org.armature.model.StageDocument;
import org.armature.model.StageTemplate;
import org.armature.model.Suppressor;
import org.armature.model.Templates;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;

/** Every stage of a file in the window: one tab each, edits and undo per stage, save and reopen exact. */
@ExtendWith(ApplicationExtension.class)
class StageTabsTest {

    private static final Path GREENHOUSE = Path.of("examples", "greenhouse-valves.stage.json");

    @TempDir
    Path dir;

    private EditorViewModel vm;
    private MainWindow window;

    @Start
    void start(javafx.stage.Stage stage) {
        vm = new EditorViewModel(Templates.defaultStage(), DocumentStore.FILES, ReadoutSource.NONE, Runnable::run,
                Runnable::run);
        window = new MainWindow(vm, new RecentFiles());
        stage.setScene(window.scene(1200, 800));
        stage.show();
    }

    private static String json(Stage s) {
        return StageJson.write(StageDocument.of(s));
    }

    @Test
    @DisplayName("the greenhouse file opens as three tabs named after its stages")
    void threeTabs(FxRobot robot) {
        robot.interact(() -> assertTrue(vm.open(GREENHOUSE)));
        TabPane tabs = window.stageTabs().tabs();
        assertEquals(3, tabs.getTabs().size());
        assertEquals(List.of("Zone valve, NPN channel", "Zone valve, N-MOSFET channel", "Zone valve, Darlington channel"),
                tabs.getTabs().stream().map(t -> t.getText()).toList());
        assertEquals(StageFiles.open(GREENHOUSE), vm.document());
    }

    @Test
    @DisplayName("an edit in the second stage leaves the first and third byte-identical; save and reopen give the "
            + "same document")
    void editOneStageOnly(FxRobot robot) throws Exception {
        robot.interact(() -> vm.open(GREENHOUSE));
        StageDocument before = vm.document();
        TabPane tabs = window.stageTabs().tabs();
        robot.interact(() -> tabs.getSelectionModel().select(1));
        assertEquals(before.stages().get(1), vm.stage(), "the tab opens its stage");
        String ref = vm.stage().parts().stream().filter(p -> p.kind() == org.armature.model.PartKind.RESISTOR)
                .findFirst().orElseThrow().ref();
        robot.interact(() -> vm.setValue(ref, ParamKeys.RESISTANCE_OHMS, 4700));
        StageDocument after = vm.document();
        assertEquals(json(before.stages().get(0)), json(after.stages().get(0)));
        assertEquals(json(before.stages().get(2)), json(after.stages().get(2)));
        assertFalse(json(before.stages().get(1)).equals(json(after.stages().get(1))));
        Path saved = dir.resolve("valves.stage.json");
        robot.interact(() -> assertTrue(vm.saveAs(saved)));
        assertEquals(StageJson.write(after), Files.readString(saved), "the file holds the document as written");
        robot.interact(() -> vm.newFromTemplate(StageTemplate.LOW_SIDE_NPN, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT));
        robot.interact(() -> vm.open(saved));
        assertEquals(after, vm.document());
        assertFalse(vm.dirtyProperty().get());
    }

    @Test
    @DisplayName("undo is per stage: each tab keeps its own history")
    void undoPerStage(FxRobot robot) {
        robot.interact(() -> vm.open(GREENHOUSE));
        StageDocument before = vm.document();
        robot.interact(() -> vm.setAmbient(40));
        robot.interact(() -> vm.selectStage(2));
        assertFalse(vm.canUndoProperty().get(), "the third stage has nothing to undo");
        robot.interact(() -> vm.setPinHigh(!vm.stage().conditions().pinHigh()));
        assertTrue(vm.undoLabelProperty().get().startsWith("Undo Drive pin"), vm.undoLabelProperty().get());
        robot.interact(vm::undo);
        assertEquals(before.stages().get(2), vm.stage());
        assertEquals(40, vm.document().stages().get(0).conditions().ambientCelsius(), 0, "the first stage keeps its edit");
        robot.interact(() -> vm.selectStage(0));
        assertTrue(vm.undoLabelProperty().get().startsWith("Undo Ambient"), vm.undoLabelProperty().get());
        robot.interact(vm::undo);
        assertEquals(before, vm.document());
    }

    @Test
    @DisplayName("stages are added from a template, duplicated, renamed, reordered and deleted")
    void stageList(FxRobot robot) {
        robot.interact(() -> vm.addStage(StageTemplate.HIGH_SIDE_PNP, Suppressor.DIODE, HighSideDrive.LEVEL_SHIFT));
        assertEquals(2, vm.document().stages().size());
        assertEquals(1, vm.activeStageProperty().get());
        robot.interact(vm::duplicateStage);
        assertEquals(3, window.stageTabs().tabs().getTabs().size());
        assertEquals(vm.document().stages().get(1).parts(), vm.document().stages().get(2).parts());
        robot.interact(() -> vm.renameStage("Spare channel"));
        assertEquals("Spare channel", window.stageTabs().tabs().getTabs().get(2).getText());
        robot.interact(() -> vm.moveStage(-1));
        assertEquals("Spare channel", vm.document().stages().get(1).name());
        assertEquals(1, vm.activeStageProperty().get());
        assertTrue(vm.dirtyProperty().get());
        robot.interact(vm::deleteStage);
        assertEquals(2, vm.document().stages().size());
        assertFalse(vm.document().stages().stream().anyMatch(s -> s.name().equals("Spare channel")));
        robot.interact(vm::deleteStage);
        robot.interact(() -> assertFalse(vm.deleteStage(), "the last stage stays"));
        assertEquals(1, vm.document().stages().size());
    }
}
